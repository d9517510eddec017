import { Import } from '../../db/models';
import { defineJob, enqueue } from '../../jobs/queue';
import { withLease } from '../../jobs/lease';
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

const running = new Set<number>();

/** The queue's name for import jobs. */
export const IMPORT_JOB = 'import';

/** True while this process runs the import. */
export const isRunningHere = (importId: number) => running.has(importId);

/** Rows prepared between two turns of the event loop, so the previous batch's commit proceeds meanwhile. */
const YIELD_EVERY = 20;

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** A connection that took too long to open or to be handed out: the database is busy, not gone. */
function isSlowConnection(error: unknown): boolean {
  const e = error as { name?: string; message?: string; parent?: { message?: string } } | null;
  return (
    e?.name === 'SequelizeConnectionAcquireTimeoutError' ||
    (e?.name === 'SequelizeConnectionError' && /timeout expired/i.test(`${e.message} ${e.parent?.message ?? ''}`))
  );
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
 * Records that the import stopped for a reason other than the database (a bug, a missing file): status failed
 * with the reason; what it committed stays and it can be resumed by hand.
 */
async function markFailed(importId: number, error: unknown): Promise<void> {
  logger.warn({ err: error, importId }, 'import stopped');
  await Import.update(
    { status: 'failed', error: describeFailure(error), finishedAt: new Date() },
    { where: { id: importId, status: 'running' } },
  );
}

/** What a running import says while it waits for the database to come back (the page shows it). */
const WAITING_MESSAGE = 'The database became unavailable.';

/**
 * Waits (every 0.5 s, up to five minutes) until the database answers again, then records on the import that it
 * waited, so the page says it resumes by itself; false if the database stayed away.
 */
async function waitForDatabase(importId: number): Promise<boolean> {
  for (let attempt = 0; attempt < 600; attempt++) {
    try {
      await Import.update({ error: WAITING_MESSAGE }, { where: { id: importId, status: 'running' } });
      return true;
    } catch (retryError) {
      if (!isDatabaseDown(retryError)) throw retryError;
      await sleep(500);
    }
  }
  return false;
}

async function execute(importId: number): Promise<void> {
  const importRow = await patiently(() => Import.findByPk(importId, { rejectOnEmpty: true }));
  if (importRow.status !== 'running') return;
  if (importRow.error !== null)
    await patiently(() =>
      Import.update({ error: null, heartbeatAt: new Date() }, { where: { id: importId, status: 'running' } }),
    );
  const stored = await patiently(() => blobStorage().get(importRow.fileBlobKey));
  if (!stored) throw new AppError(500, 'import_file_missing', 'The uploaded file is no longer stored.');
  const source = await openUpload(stored.bytes, importRow.fileName, {
    sheet: importRow.sheet ?? undefined,
    headerRow: importRow.headerRow ?? undefined,
  });
  const context = await patiently(() => rowContext(importRow.dateOrder));
  const structures = new StructureCache();
  const ahead = new FingerprintsAhead();
  let batchNumber = importRow.batchesCommitted;
  let pending: { rows: PreparedRow[]; number: number } | null = null;
  const commit = async (batch: { rows: PreparedRow[]; number: number }) => {
    const fingerprints = await ahead.forBatch(batch.rows);
    await patiently(() => commitBatch(importRow, batch.rows, fingerprints, batch.number));
    importEvents.emit('batch', {
      importId,
      batch: batch.number,
      lastRow: batch.rows[batch.rows.length - 1].source.row,
    });
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
  await patiently(() =>
    Import.update(
      { status: 'completed', finishedAt: new Date(), heartbeatAt: new Date() },
      { where: { id: importId, status: 'running' } },
    ),
  );
}

/** Thrown when another process holds the import's lease: the queue tries the job again later. */
class RunningElsewhere extends Error {}

/**
 * One import job: runs (or resumes, from the row after `lastCommittedRow`) the import while holding its lease,
 * so no two processes run it at once. Each batch is prepared while the previous one commits, and its new
 * compounds' fingerprints are computed in worker threads meanwhile; each batch commits in its own transaction
 * (commitBatch). When the database goes away the import stays "running", waits for it and resumes by itself; a
 * process that dies releases the lease with its connection and the queue hands the job to another process.
 */
async function importJob({ importId }: { importId: number }): Promise<void> {
  for (let attempt = 0; attempt < 20; attempt++) {
    let outcome: 'done' | 'database-down';
    try {
      const leased = await withLease(importId, async () => {
        running.add(importId);
        try {
          await execute(importId);
          return 'done' as const;
        } catch (error) {
          if (isDatabaseDown(error)) return 'database-down' as const;
          await markFailed(importId, error).catch((markError) =>
            logger.error({ err: markError, importId }, 'import could not be marked failed'),
          );
          return 'done' as const;
        } finally {
          running.delete(importId);
        }
      });
      if (!leased) throw new RunningElsewhere(`Import ${importId} runs in another process.`);
      outcome = leased.value;
    } catch (error) {
      if (!isDatabaseDown(error)) throw error;
      outcome = 'database-down';
    }
    if (outcome === 'done') return;
    logger.warn({ importId }, 'import waits for the database to resume');
    if (!(await waitForDatabase(importId)))
      throw new Error('The database stayed unavailable; the queue retries the import.');
  }
}

defineJob({ name: IMPORT_JOB, handler: importJob, expireInSeconds: 60, retryDelay: 5, retryLimit: 2_000 });

/** Puts the import on the job queue; whichever app process is free runs it (usually this one). */
export async function runImport(importId: number): Promise<void> {
  await enqueue(IMPORT_JOB, { importId }, `import-${importId}`);
}
