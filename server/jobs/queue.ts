import PgBoss from 'pg-boss';
import { env } from '../config/env';
import { logger } from '../http/logger';

/**
 * Background jobs on a PostgreSQL-backed queue (pg-boss: jobs are rows in the app's own database, claimed with
 * SELECT … FOR UPDATE SKIP LOCKED, so any app process may pick one up and no two claim it at once). A job whose
 * process dies stays "active" until it expires, then is retried by whichever process polls next; handlers that
 * must never run twice at once also hold a lease (lease.ts) for as long as they run.
 */
export interface JobDefinition<T extends object> {
  name: string;
  handler: (data: T) => Promise<void>;
  /** Seconds after which an active job whose process went silent is handed to another process. */
  expireInSeconds: number;
  /** Seconds between retries (a failed attempt, or one that found the work running elsewhere). */
  retryDelay: number;
  retryLimit: number;
}

const definitions = new Map<string, JobDefinition<object>>();
let started: Promise<PgBoss> | null = null;
let boss: PgBoss | null = null;

/** Registers a kind of job; this process works on it once the queue is started. */
export function defineJob<T extends object>(definition: JobDefinition<T>): void {
  definitions.set(definition.name, definition as unknown as JobDefinition<object>);
}

async function start(): Promise<PgBoss> {
  const created = new PgBoss({
    connectionString: env().DATABASE_URL,
    schema: 'rfolio_jobs',
    max: 4,
    application_name: 'rfolio-jobs',
    maintenanceIntervalSeconds: 10,
    monitorStateIntervalSeconds: 60,
    archiveCompletedAfterSeconds: 3_600,
    deleteAfterDays: 7,
  });
  created.on('error', (error) => logger.warn({ err: error }, 'job queue error (it keeps polling)'));
  await created.start();
  for (const definition of definitions.values()) {
    const { name, expireInSeconds, retryDelay, retryLimit } = definition;
    await created.createQueue(name, { name, expireInSeconds, retryDelay, retryLimit, retentionDays: 7 });
    await created.work<object>(name, { pollingIntervalSeconds: 1, batchSize: 1 }, async ([job]) =>
      definition.handler(job.data),
    );
  }
  boss = created;
  return created;
}

/** Starts the queue in this process (once) and works on every defined job. */
export function startJobs(): Promise<PgBoss> {
  started ??= start().catch((error) => {
    started = null;
    throw error;
  });
  return started;
}

/** Adds a job (one per `singletonKey` while it waits or runs) and starts the queue here if it is not yet. */
export async function enqueue(name: string, data: object, singletonKey: string): Promise<void> {
  const queue = await startJobs();
  await queue.send(name, data, { singletonKey });
}

/** Stops working on jobs in this process; what it was running is picked up again elsewhere after expiry. */
export async function stopJobs(): Promise<void> {
  const current = boss;
  boss = null;
  started = null;
  if (current) await current.stop({ graceful: false, wait: true, close: true }).catch(() => undefined);
}
