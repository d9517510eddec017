import { Import } from '../../db/models';
import { AppError } from '../../http/errors';
import { logger } from '../../http/logger';
import { isDatabaseDown } from '../../http/middleware/errors';
import { blobStorage } from '../../storage';
import { commitBatch, importEvents } from './commit-batch';
import { FingerprintsAhead } from './fingerprints-ahead';
import { openUpload } from './open-upload';
import { prepareRow, StructureCache, type PreparedRow } from './prepare-row';
import type { SourceRow } from './source';
import { rowContext } from './import-context';

const running = new Map<number, Promise<void>>();

/** True while this process runs the import. */
export const isRunningHere = (importId: number) => running.has(importId);

/** Rows prepared between two turns of the event loop, so the previous batch's commit proceeds meanwhile. */
const YIELD_EVERY = 20;

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** A connection that took too long to open or to be handed out: the database is busy, not gone. */
function isSlowConnection(error: unknown): boolean {
  const e = error as { name?: string; message?: string; parent?: { message?: string } } | null;
  return e?.name === 'SequelizeConnectionAcquireTimeoutError' || (e?.name === 'SequelizeConnectionError' && /timeout expired/i.test(`${e.message} ${e.parent?.message ?? ''}`));
}

/**
 * Runs a database step, retrying twice (after 1 s and 3 s) when only a connection was slow to come, as on a
 * busy machine. A database that is gone (refused, shut down) fails at once, so the import stops and says where.
 */
async function patiently<T>(step: () => Promise<T>): Promise<T> {
  for (const delay of [1_000, 3_000]) {
    try {
      return await step();
    } catch (error) {
      if (!isSlowConnection(error)) throw error;
      await sleep(delay);
    }
  }
  return step();
}

function describeFailure(error: unknown): string {
  if (isDatabaseDown(error)) return 'The database became unavailable.';
  if (error instanceof AppError) return error.message;
  return 'An unexpected error stopped the import (it has been logged).';
}

/**
 * Records that the import stopped. When the database itself is gone, keeps trying (every 0.5 s for up to
 * five minutes) so the import says it failed as soon as the database is back; what it committed stays.
 */
async function markFailed(importId: number, error: unknown): Promise<void> {
  logger.warn({ err: error, importId }, 'import stopped');
  const message = describeFailure(error);
  for (let attempt = 0; attempt < 600; attempt++) {
    try {
      await Import.update({ status: 'failed', error: message, finishedAt: new Date() }, { where: { id: importId, status: 'running' } });
      return;
    } catch (retryError) {
      if (!isDatabaseDown(retryError)) throw retryError;
      await sleep(500);
    }
  }
}

async function execute(importId: number): Promise<void> {
  const importRow = await patiently(() => Import.findByPk(importId, { rejectOnEmpty: true }));
  const stored = await patiently(() => blobStorage().get(importRow.fileBlobKey));
  if (!stored) throw new AppError(500, 'import_file_missing', 'The uploaded file is no longer stored.');
  const source = await openUpload(stored.bytes, importRow.fileName, { sheet: importRow.sheet ?? undefined, headerRow: importRow.headerRow ?? undefined });
  const context = await patiently(() => rowContext(importRow.dateOrder));
  const structures = new StructureCache();
  const ahead = new FingerprintsAhead();
  let batchNumber = importRow.batchesCommitted;
  let pending: { rows: PreparedRow[]; number: number } | null = null;
  const commit = async (batch: { rows: PreparedRow[]; number: number }) => {
    const fingerprints = await ahead.forBatch(batch.rows);
    await patiently(() => commitBatch(importRow, batch.rows, fingerprints, batch.number));
    importEvents.emit('batch', { importId, batch: batch.number, lastRow: batch.rows[batch.rows.length - 1].source.row });
  };
  const step = async (rows: SourceRow[]) => {
    const committing = pending ? commit(pending) : null;
    committing?.catch(() => undefined);
    const prepared: PreparedRow[] = [];
    for (const row of rows) {
      prepared.push(prepareRow(row, importRow.mapping, importRow.format, structures, context));
      if (prepared.length % YIELD_EVERY === 0) await new Promise((resolve) => setImmediate(resolve));
    }
    await patiently(() => ahead.start(prepared));
    await committing;
    pending = { rows: prepared, number: ++batchNumber };
  };
  let buffer: SourceRow[] = [];
  for await (const row of source.rows(importRow.lastCommittedRow)) {
    buffer.push(row);
    if (buffer.length >= importRow.batchSize) {
      await step(buffer);
      buffer = [];
    }
  }
  if (buffer.length > 0) await step(buffer);
  if (pending) await commit(pending);
  await patiently(() => Import.update({ status: 'completed', finishedAt: new Date(), heartbeatAt: new Date() }, { where: { id: importId, status: 'running' } }));
}

/**
 * Runs (or resumes, from the row after `lastCommittedRow`) an import in the background of this process.
 * Each batch is prepared while the previous one commits, and its new compounds' fingerprints are computed
 * in worker threads meanwhile, so the database, the workers and this thread overlap; each batch commits in
 * its own transaction (commitBatch). A failure marks the import failed with the reason; it can be resumed.
 */
export function runImport(importId: number): Promise<void> {
  const current = running.get(importId);
  if (current) return current;
  const run = execute(importId)
    .catch((error) => markFailed(importId, error))
    .catch((error) => logger.error({ err: error, importId }, 'import could not be marked failed'))
    .finally(() => running.delete(importId));
  running.set(importId, run);
  return run;
}
