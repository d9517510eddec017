import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { startPostgres, stopPostgres } from '../helpers/pg-control';

const { app, close } = createApp();
let member: Agent;

beforeAll(async () => {
  member = await agentFor(app, 'member');
});
afterAll(close);

/** What a half-written edit would disturb: the record row, its spots, its revision counter and its revisions. */
async function persisted(db: pg.Client, id: number) {
  const record = await db.query(
    'SELECT revision, outcome, outcome_reason, notes, target_rf FROM condition_records WHERE id = $1',
    [id],
  );
  const spots = await db.query('SELECT role, rf FROM record_spots WHERE record_id = $1 ORDER BY position, id', [id]);
  const revisions = await db.query('SELECT number, action FROM record_revisions WHERE record_id = $1 ORDER BY number', [
    id,
  ]);
  return { record: record.rows[0], spots: spots.rows, revisions: revisions.rows };
}

/** A second connection, as another process would hold it; its death at shutdown is expected, not an error. */
async function sideConnection(): Promise<pg.Client> {
  const client = new pg.Client({ connectionString: process.env.DATABASE_URL });
  client.on('error', () => undefined);
  await client.connect();
  return client;
}

async function waitFor(condition: () => Promise<boolean>, what: string, timeoutMs = 20_000) {
  const deadline = Date.now() + timeoutMs;
  while (!(await condition().catch(() => false))) {
    if (Date.now() > deadline) throw new Error(`timed out waiting until ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** Polls /api/health until PostgreSQL answers again (the app is never restarted). */
async function waitForRecovery() {
  await waitFor(async () => (await request(app).get('/api/health')).status === 200, 'the app reports the database up');
}

const edit = {
  outcome: 'partial',
  outcomeReason: 'The by-product tailed into the last fractions.',
  spots: [
    { role: 'target', rf: 0.33 },
    { role: 'by_product', rf: 0.41 },
  ],
  notes: 'Edited while the database went away.',
};
const patchRecord = (id: number) => member.patch(`/api/records/${id}`).set('X-CSRF-Token', member.csrf).send(edit);

/** The JSON error shape every refusal takes (DESIGN.md "API surface"). */
function expectUnavailable(res: request.Response) {
  expect(res.status, JSON.stringify(res.body)).toBe(503);
  expect(res.body.error.code).toBe('database_unavailable');
  expect(res.body.error.message).toMatch(/database is unavailable/);
}

/**
 * Starts a PATCH that the side connection's lock makes wait, stops PostgreSQL (-m fast, which ends every
 * backend and so the PATCH's open transaction), checks the API meanwhile, restarts, and checks what stayed.
 */
async function stopDuringEdit(lock: (side: pg.Client, id: number) => Promise<void>, waitingStatement: string) {
  const created = await postRecord(member, { notes: 'Before the edit.' });
  expect(created.status).toBe(201);
  const id: number = created.body.id;
  const side = await sideConnection();
  const observer = await sideConnection();
  const before = await persisted(observer, id);
  await lock(side, id);

  const pending = patchRecord(id).then((res) => res);
  const waiting =
    `SELECT count(*)::int AS n FROM pg_stat_activity WHERE wait_event_type = 'Lock' AND ` +
    `datname = current_database() AND query LIKE $1`;
  await waitFor(
    async () => (await observer.query(waiting, [`${waitingStatement}%`])).rows[0].n > 0,
    `the PATCH waits at ${waitingStatement}`,
  );

  stopPostgres();
  try {
    expectUnavailable(await pending);
    expectUnavailable(await member.get(`/api/records/${id}`));
    expectUnavailable(await member.get('/api/records'));
    expectUnavailable(await patchRecord(id));
    const health = await request(app).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body).toMatchObject({ status: 'degraded', db: 'down' });
  } finally {
    startPostgres();
    await Promise.all([side.end().catch(() => undefined), observer.end().catch(() => undefined)]);
  }
  await waitForRecovery();
  const db = await sideConnection();
  try {
    return { id, before, after: await persisted(db, id) };
  } finally {
    await db.end();
  }
}

/** After recovery the same member, still signed in, makes the same edit: it lands whole, with one revision. */
async function editLandsWhole(id: number, revisionBefore: number) {
  const res = await patchRecord(id);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  expect(res.body).toMatchObject({ revision: revisionBefore + 1, outcome: 'partial', notes: edit.notes });
  expect(res.body.spots.map((spot: { rf: number }) => spot.rf)).toEqual([0.33, 0.41]);
  const history = await member.get(`/api/records/${id}/history`);
  expect(history.body.revisions.map((revision: { action: string }) => revision.action)).toEqual(['update', 'create']);
}

describe('when PostgreSQL stops in the middle of a record edit (PATCH /api/records/:id)', () => {
  it(
    'while the edit waits for the record row: 503 meanwhile, nothing written, and the edit succeeds ' +
      'once the database is back',
    async () => {
      const { id, before, after } = await stopDuringEdit(async (side, recordId) => {
        await side.query('BEGIN');
        await side.query('SELECT id FROM condition_records WHERE id = $1 FOR UPDATE', [recordId]);
      }, 'SELECT');
      expect(after).toEqual(before);
      await editLandsWhole(id, before.record.revision);
    },
  );

  it('after the record row and its spots are written, before its revision: the open transaction is lost whole, never half', async () => {
    const { id, before, after } = await stopDuringEdit(async (side) => {
      await side.query('BEGIN');
      // SHARE lets the edit read revisions but makes its INSERT of the new revision wait, after the row and spots are written.
      await side.query('LOCK TABLE record_revisions IN SHARE MODE');
    }, 'INSERT INTO "record_revisions"');
    expect(after).toEqual(before);
    expect(after.spots).toEqual([{ role: 'target', rf: 0.28 }]);
    expect(after.revisions).toEqual([{ number: 1, action: 'create' }]);
    await editLandsWhole(id, before.record.revision);
  });
});
