import pg from 'pg';
import { env } from '../config/env';

/** Advisory-lock namespace of job leases (the first key of pg_try_advisory_lock's pair). */
const LEASE_SPACE = 7_346_101;

/**
 * Runs `work` while this process holds the lease on `key`: a session advisory lock on a connection of its own,
 * so the lease ends when the work ends or the process (or its connection) dies, and two processes never run
 * the same work at once. Answers null without running when another process holds the lease.
 */
export async function withLease<T>(key: number, work: () => Promise<T>): Promise<{ value: T } | null> {
  const client = new pg.Client({ connectionString: env().DATABASE_URL, application_name: 'rfolio-lease' });
  client.on('error', () => undefined);
  await client.connect();
  try {
    const { rows } = await client.query<{ held: boolean }>('SELECT pg_try_advisory_lock($1, $2) AS held', [
      LEASE_SPACE,
      key,
    ]);
    if (!rows[0]?.held) return null;
    return { value: await work() };
  } finally {
    await client.end().catch(() => undefined);
  }
}
