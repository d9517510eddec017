import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { createApp } from '../../server/http/app';
import { AuditEntry, Compound, ConditionRecord, Import, ImportRow } from '../../server/db/models';
import { withLease } from '../../server/jobs/lease';
import { importEvents } from '../../server/features/imports/commit-batch';
import { agentFor, type Agent } from '../helpers/agent';
import { runTag, settled, upload } from '../helpers/imports';
import { startPostgres, stopPostgres } from '../helpers/pg-control';

const { app, close } = createApp();
let curator: Agent;
const tag = runTag();

/** n-alkyl chains CnH2n+1–OH, n = 30…: a homologous series no other test file uses. */
const alcohol = (carbons: number) => `${'C'.repeat(carbons)}O`;
const ROWS = 1000;

/**
 * 1,000 rows (five batches of 200): rows 1–400 use alcohols C30–C39, rows 401–600 (batch 3) also C40–C44,
 * which appear nowhere else, rows 601–1000 C30–C39 again; every 50th row has an Rf above 1.
 */
function historyFile(): string {
  const lines = ['name,smiles,eluent,rf,notes'];
  for (let row = 1; row <= ROWS; row++) {
    const carbons = row > 400 && row <= 600 && row % 2 === 0 ? 40 + (row % 5) : 30 + (row % 10);
    const rf = row % 50 === 0 ? '1.5' : (0.1 + (row % 80) / 100).toFixed(2);
    lines.push(`C${carbons} alcohol,${alcohol(carbons)},EtOAc/hexanes 1:${1 + (row % 7)},${rf},${tag} row ${row}`);
  }
  return lines.join('\n');
}

beforeAll(async () => {
  curator = await agentFor(app, 'curator');
});
afterAll(close);

describe('when PostgreSQL stops in the middle of an import', () => {
  it(
    'leaves nothing of the failed batch, waits for the database and resumes by itself with the right ' +
      'counts (issue 24 point 6)',
    async () => {
      let stoppedIn = 0;
      let stopped = false;
      // Inside batch 3's transaction, after its compounds, records and rejected rows are written, before it commits.
      const stopInThirdBatch = ({ importId: id, batch }: { importId: number; batch: number }) => {
        if (batch !== 3 || stopped) return;
        stopPostgres();
        stopped = true;
        stoppedIn = id;
      };
      let importId: number;
      importEvents.on('writing', stopInThirdBatch);
      try {
        const res = await upload(curator, historyFile(), { query: 'wait=0', name: 'long-history.csv' });
        expect(res.status).toBe(202);
        importId = res.body.id;
        await waitUntil(() => stopped);
        await sleep(1_000);
      } finally {
        importEvents.off('writing', stopInThirdBatch);
        if (stopped) startPostgres();
      }

      expect(stoppedIn).toBe(importId);
      // Nobody resumes it: the import's job waits for the database and continues from row 401.
      const done = await settled(curator, importId);
      expect(done).toMatchObject({
        status: 'completed',
        total: ROWS,
        processed: ROWS,
        rejected: 20,
        duplicates: 0,
        accepted: ROWS - 20,
        error: null,
      });
      expect(await AuditEntry.count({ where: { action: 'import.resume', subjectId: String(importId) } })).toBe(0);
      // Nothing of the batch the stop cut short was kept twice: every row once, the C40–C44 alcohols once each.
      expect(await ConditionRecord.count({ where: { importId } })).toBe(ROWS - 20);
      expect(await ImportRow.count({ where: { importId, kind: 'rejected' } })).toBe(20);
      expect(await ConditionRecord.count({ where: { notes: { [Op.like]: `${tag} row %` } } })).toBe(ROWS - 20);
      expect(await Compound.count({ where: { inputStructure: [40, 41, 42, 43, 44].map(alcohol) } })).toBe(5);
    },
  );
});

describe('when the server process running an import ends', () => {
  it('reports the import failed once it has been silent for two minutes, and a resume finishes it', async () => {
    const csv =
      `smiles,eluent,rf,notes\n${alcohol(29)},EtOAc/hexanes 1:5,0.3,${tag} stalled ` +
      `1\n${alcohol(29)},EtOAc/hexanes 1:6,0.35,${tag} stalled 2\n`;
    const res = await upload(curator, csv, { name: 'stalled.csv' });
    const done = await settled(curator, res.body.id);
    // As a process that died after its first batch leaves it: still "running", last heartbeat three minutes ago.
    await Import.update(
      { status: 'running', finishedAt: null, heartbeatAt: new Date(Date.now() - 3 * 60_000) },
      { where: { id: done.id } },
    );
    const seen = await curator.get(`/api/imports/${done.id}`);
    expect(seen.body).toMatchObject({
      status: 'failed',
      error: 'The import stopped without finishing (its server process ended).',
    });
    const resumed = await curator.post(`/api/imports/${done.id}/resume`).set('X-CSRF-Token', curator.csrf);
    expect(resumed.status).toBe(202);
    expect(await settled(curator, done.id)).toMatchObject({ status: 'completed', processed: 2, accepted: 2 });
    const again = await curator.post(`/api/imports/${done.id}/resume`).set('X-CSRF-Token', curator.csrf);
    expect(again.status).toBe(409);
  });
});

describe('after a database restart (issue 23 point 7)', () => {
  it('the app says an import is waiting to resume while its job waits for the database', async () => {
    const csv = `smiles,eluent,rf,notes\n${alcohol(28)},EtOAc/hexanes 1:5,0.3,${tag} waiting\n`;
    const done = await settled(curator, (await upload(curator, csv, { name: 'waiting.csv' })).body.id);
    expect(done).toMatchObject({ status: 'completed', waitingToResume: false });
    // As the job leaves it while the database is away: still running, the wait recorded on it.
    await Import.update(
      { status: 'running', finishedAt: null, error: 'The database became unavailable.', heartbeatAt: new Date() },
      { where: { id: done.id } },
    );
    const seen = await curator.get(`/api/imports/${done.id}`);
    expect(seen.body).toMatchObject({
      status: 'running',
      waitingToResume: true,
      error: 'The database became unavailable.',
    });
    await Import.update({ status: 'completed', finishedAt: new Date(), error: null }, { where: { id: done.id } });
  });
});

describe('the lease an import job holds while it runs', () => {
  it('is refused to a second holder while the first runs, and free again once the first ends', async () => {
    const key = 900_000 + Math.floor(Math.random() * 1000);
    const inner = await withLease(key, async () => withLease(key, async () => 'second'));
    expect(inner).toEqual({ value: null });
    expect(await withLease(key, async () => 'again')).toEqual({ value: 'again' });
  });
});

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function waitUntil(condition: () => boolean, timeoutMs = 30_000) {
  const deadline = Date.now() + timeoutMs;
  while (!condition()) {
    if (Date.now() > deadline) throw new Error('condition not met in time');
    await sleep(50);
  }
}
