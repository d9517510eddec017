import { createHash } from 'node:crypto';
import { Op, QueryTypes } from 'sequelize';
import type { SessionUser } from '../../../shared/schemas/auth';
import { sequelize } from '../../db/sequelize';
import { AuditEntry, Import, User } from '../../db/models';
import { ConflictError, NotFoundError } from '../../http/errors';
import { blobStorage } from '../../storage';
import { formatOf, mappingFor, openUpload, requireEssentialColumns } from './open-upload';
import { IMPORT_JOB, isRunningHere, runImport } from './run-import';
import { dateColumnOrder } from './import-context';
import { presentImport } from './presenters';
import type { ImportChoice, ImportDto } from '../../../shared/schemas/import';

/** Rows committed per transaction. */
const IMPORT_BATCH_SIZE = 200;

/** An import still "running" whose heartbeat is older than this has lost its process (ms). */
const STALE_AFTER_MS = 2 * 60_000;

export interface UploadedFile {
  bytes: Buffer;
  name: string;
}

const contentTypes = {
  sdf: 'chemical/x-mdl-sdfile',
  csv: 'text/csv',
  xlsx: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
} as const;

export const sha256Of = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

/**
 * Stores an upload (content-addressed bytes and an import row holding the mapping and the row count) and
 * starts the import in the background. 415/422 when the file cannot be imported, before anything is stored.
 */
export async function createImport(
  file: UploadedFile,
  overrides: Record<string, string>,
  user: SessionUser,
  choice: ImportChoice = {},
): Promise<Import> {
  const source = await openUpload(file.bytes, file.name, choice);
  const mapping = mappingFor(source, overrides);
  requireEssentialColumns(mapping);
  const dates = await dateColumnOrder(source, mapping, choice.dateOrder);
  const created = await sequelize.transaction(async (transaction) => {
    const key = await blobStorage().put(file.bytes, contentTypes[source.kind], transaction);
    const row = await Import.create(
      {
        userId: user.id,
        fileName: file.name,
        fileSha256: sha256Of(file.bytes),
        fileBlobKey: key,
        byteSize: file.bytes.length,
        format: formatOf(source, mapping),
        delimiter: source.delimiter,
        headers: source.headers,
        mapping,
        total: source.total,
        blankRows: source.blankRows,
        batchSize: IMPORT_BATCH_SIZE,
        heartbeatAt: new Date(),
        sheet: source.sheet,
        headerRow: source.kind === 'sdf' ? null : source.headerRow,
        dateOrder: dates.order,
      },
      { transaction },
    );
    await AuditEntry.create(
      {
        actorId: user.id,
        action: 'import.create',
        subjectType: 'import',
        subjectId: String(row.id),
        details: { fileName: file.name, sha256: row.fileSha256, total: source.total },
      },
      { transaction },
    );
    return row;
  });
  await runImport(created.id);
  return created;
}

/** Ids among these whose job is still queued, running or due for a retry (the queue resumes them by itself). */
async function withLiveJob(ids: number[]): Promise<Set<number>> {
  try {
    const rows = await sequelize.query<{ key: string }>(
      `SELECT singleton_key AS key FROM rfolio_jobs.job WHERE name = :name AND singleton_key IN (:keys) ` +
        `AND state IN ('created', 'retry', 'active')`,
      { replacements: { name: IMPORT_JOB, keys: ids.map((id) => `import-${id}`) }, type: QueryTypes.SELECT },
    );
    return new Set(rows.map((row) => Number(row.key.slice('import-'.length))));
  } catch {
    return new Set();
  }
}

/**
 * Marks imports whose work was lost (no heartbeat for two minutes and no job left to resume them) as failed, so
 * they can be resumed by hand. An import whose job is still queued is left running: the queue resumes it.
 */
async function failStalled(): Promise<void> {
  const stalled = await Import.findAll({
    where: { status: 'running', heartbeatAt: { [Op.lt]: new Date(Date.now() - STALE_AFTER_MS) } },
    attributes: ['id'],
  });
  const candidates = stalled.map((row) => row.id).filter((id) => !isRunningHere(id));
  if (candidates.length === 0) return;
  const live = await withLiveJob(candidates);
  const ids = candidates.filter((id) => !live.has(id));
  if (ids.length === 0) return;
  await Import.update(
    {
      status: 'failed',
      error: 'The import stopped without finishing (its server process ended).',
      finishedAt: new Date(),
    },
    { where: { id: ids, status: 'running' } },
  );
}

const withUser = { model: User, as: 'user', attributes: ['id', 'name'] };

/** Past imports, newest first. */
export async function listImports(limit = 100): Promise<Import[]> {
  await failStalled();
  return Import.findAll({
    include: [withUser],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit,
  });
}

export async function getImport(id: number): Promise<Import> {
  await failStalled();
  const found = await Import.findByPk(id, { include: [withUser] });
  if (!found) throw new NotFoundError('Import');
  return found;
}

/** Continues a failed (or stalled) import from the row after its last committed one. 409 for any other status. */
export async function resumeImport(id: number, user: SessionUser): Promise<Import> {
  await getImport(id);
  const [claimed] = await Import.update(
    { status: 'running', error: null, finishedAt: null, heartbeatAt: new Date() },
    { where: { id, status: 'failed' } },
  );
  if (claimed === 0) {
    const current = await getImport(id);
    throw new ConflictError(`Only a failed import can be resumed; import ${id} is ${current.status}.`, {
      status: current.status,
    });
  }
  await AuditEntry.create({
    actorId: user.id,
    action: 'import.resume',
    subjectType: 'import',
    subjectId: String(id),
    details: {},
  });
  await runImport(id);
  return getImport(id);
}

/** Waits up to `ms` for an import to finish, whichever process runs it (a short file answers with its final counts). */
export async function settle(id: number, ms: number): Promise<Import> {
  const deadline = Date.now() + ms;
  while (Date.now() < deadline) {
    const current = await Import.findByPk(id, { attributes: ['status'] });
    if (!current || current.status !== 'running') break;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  return getImport(id);
}

/**
 * An import as the API shows it, with its pace while it runs (rows a second since it started, seconds left at
 * that pace) and whether it waits to be resumed (its work stopped with the database and is picked up again).
 */
export function presentLive(row: Import): ImportDto {
  const dto = presentImport(row);
  if (row.status !== 'running') return dto;
  const elapsed = ((row.heartbeatAt ?? new Date()).getTime() - new Date(row.createdAt).getTime()) / 1000;
  const rowsPerSecond = row.processed > 0 && elapsed > 0 ? Math.round((row.processed / elapsed) * 10) / 10 : 0;
  const secondsLeft = rowsPerSecond > 0 ? Math.ceil((row.total - row.processed) / rowsPerSecond) : null;
  const silent = Date.now() - (row.heartbeatAt ?? new Date()).getTime() > 60_000 && !isRunningHere(row.id);
  return { ...dto, rate: { rowsPerSecond, secondsLeft }, waitingToResume: row.error !== null || silent };
}
