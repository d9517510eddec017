import { afterAll, describe, expect, it, vi } from 'vitest';

/** Issue 19 point 4: failures that were swallowed without a word now reach the log. */
const captured = vi.hoisted(() => ({ lines: [] as string[] }));
vi.mock('../../server/http/logger', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../server/http/logger')>();
  const { default: pino } = await import('pino');
  return {
    ...original,
    logger: pino(
      { ...original.loggerOptions, level: 'trace' },
      { write: (line: string) => void captured.lines.push(line) },
    ),
  };
});
// Pruning that fails, as it would with the database away; the rest of the change log is the real one.
vi.mock('../../server/features/search/change-log', async (importOriginal) => ({
  ...(await importOriginal<typeof import('../../server/features/search/change-log')>()),
  pruneChangeLog: () => Promise.reject(new Error('prune-failure-for-the-test')),
}));

import { SearchIndexes } from '../../server/features/search/search-indexes';
import { SEARCH_CHANNEL } from '../../server/features/search/change-feed';
import { sessionMiddleware } from '../../server/auth/session';
import { sequelize } from '../../server/db/sequelize';

const waitFor = async (check: () => boolean) => {
  for (let i = 0; i < 200 && !check(); i++) await new Promise((resolve) => setTimeout(resolve, 25));
  return check();
};
const logged = (text: string) =>
  captured.lines
    .filter((line) => line.includes(text))
    .map((line) => JSON.parse(line) as { level: number; msg: string });

const indexes = new SearchIndexes();
afterAll(() => indexes.stop());

describe('failures that used to vanish', () => {
  it('when the hourly change-log pruning fails, then a warning says so with the error', async () => {
    vi.useFakeTimers({ toFake: ['setInterval', 'clearInterval'] });
    try {
      await indexes.start();
      vi.advanceTimersByTime(60 * 60 * 1000 + 1);
    } finally {
      vi.useRealTimers();
    }
    expect(await waitFor(() => logged('prune-failure-for-the-test').length > 0)).toBe(true);
    expect(logged('prune-failure-for-the-test')[0]).toMatchObject({ level: 40, msg: 'change-log pruning failed' });
  });

  it('when a change notice arrives and the index sync fails, then a warning says so with the error', async () => {
    indexes.sync = () => Promise.reject(new Error('sync-failure-for-the-test'));
    await sequelize.query(`SELECT pg_notify('${SEARCH_CHANNEL}', 'record:0')`);
    expect(await waitFor(() => logged('sync-failure-for-the-test').length > 0)).toBe(true);
    expect(logged('sync-failure-for-the-test')[0]).toMatchObject({ level: 40, msg: 'search index sync failed' });
  });

  it('when an idle session-store connection fails, then a warning says so with the error', async () => {
    const { pool } = sessionMiddleware();
    pool.emit('error', new Error('session-pool-failure-for-the-test'), undefined as never);
    await pool.end();
    expect(logged('session-pool-failure-for-the-test')).toEqual([
      expect.objectContaining({ level: 40, msg: 'session store connection failed' }),
    ]);
  });
});
