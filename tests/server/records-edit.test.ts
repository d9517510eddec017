import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { recordHistorySchema } from '../../shared/schemas/record';

const { app, close } = createApp();
let owner: Agent;
let otherMember: Agent;
let curator: Agent;
let admin: Agent;
let viewer: Agent;

beforeAll(async () => {
  [owner, otherMember, curator, admin, viewer] = await Promise.all([
    agentFor(app, 'member'),
    agentFor(app, 'member'),
    agentFor(app, 'curator'),
    agentFor(app, 'admin'),
    agentFor(app, 'viewer'),
  ]);
});
afterAll(close);

async function newRecordId(): Promise<number> {
  const res = await postRecord(owner);
  expect(res.status).toBe(201);
  return res.body.id as number;
}

const patch = (agent: Agent, id: number, body: Record<string, unknown>) =>
  agent.patch(`/api/records/${id}`).set('X-CSRF-Token', agent.csrf).send(body);

describe('PATCH /api/records/:id', () => {
  it(
    'when the author changes the ratio and outcome, then 200, the revision counter rises and the ' +
      'history lists each field changed',
    async () => {
      const id = await newRecordId();
      const res = await patch(owner, id, {
        eluent: {
          components: [
            { solvent: 'EtOAc', parts: 1 },
            { solvent: 'hexanes', parts: 3 },
          ],
        },
        spots: [{ role: 'target', rf: 0.35 }],
        outcome: 'partial',
        outcomeReason: 'Co-eluted with the aldehyde.',
      });
      expect(res.status).toBe(200);
      expect(res.body.revision).toBe(2);
      expect(res.body.eluentSummary.strongPercent).toBeCloseTo(25, 10); // 1 part in 4 = 25 % v/v
      expect(res.body.targetRf).toBe(0.35);
      expect(res.body.notes).toBe('Benzyl alcohol ran as one tight spot.'); // untouched fields stay

      const history = recordHistorySchema.parse((await owner.get(`/api/records/${id}/history`)).body);
      expect(history.revisions.map((revision) => revision.action)).toEqual(['update', 'create']);
      const [latest] = history.revisions;
      expect(latest.author?.id).toBe(owner.user?.id);
      const fields = latest.changes.map((change) => change.field).sort();
      expect(fields).toEqual(['eluent', 'outcome', 'outcomeReason', 'spots']);
      expect(latest.changes.find((change) => change.field === 'outcome')).toEqual({
        field: 'outcome',
        from: 'clean',
        to: 'partial',
      });
    },
  );

  it('when column details change, then the history names each column field separately', async () => {
    const id = await newRecordId();
    await patch(owner, id, { column: { diameterMm: 20, silicaG: 15 } });
    const res = await patch(owner, id, { column: { diameterMm: 20, silicaG: 18, loadMethod: 'dry' } });
    expect(res.status).toBe(200);
    const history = (await owner.get(`/api/records/${id}/history`)).body;
    expect(history.revisions[0].changes).toEqual([
      { field: 'column.silicaG', from: 15, to: 18 },
      { field: 'column.loadMethod', from: null, to: 'dry' },
    ]);
  });

  it('when the patch changes nothing, then no revision is stored', async () => {
    const id = await newRecordId();
    const res = await patch(owner, id, { outcome: 'clean' });
    expect(res.status).toBe(200);
    expect(res.body.revision).toBe(1);
    expect((await owner.get(`/api/records/${id}/history`)).body.revisions).toHaveLength(1);
  });

  it('when another member edits the record, then 403 and it is unchanged', async () => {
    const id = await newRecordId();
    expect((await patch(otherMember, id, { notes: 'mine now' })).status).toBe(403);
    expect((await owner.get(`/api/records/${id}`)).body.notes).toBe('Benzyl alcohol ran as one tight spot.');
  });

  it('when a viewer edits, then 403', async () => {
    const id = await newRecordId();
    expect((await patch(viewer, id, { notes: 'x' })).status).toBe(403);
  });

  it.each([['curator'], ['admin']])(
    'when a %s edits someone’s record, then 200 and they are credited as editor',
    async (role) => {
      const id = await newRecordId();
      const agent = role === 'curator' ? curator : admin;
      const res = await patch(agent, id, { notebookRef: 'NB-12 p. 40' });
      expect(res.status).toBe(200);
      expect(res.body.contributors).toEqual([
        { id: owner.user?.id, name: owner.user?.name, role: 'author' },
        { id: agent.user?.id, name: agent.user?.name, role: 'editor' },
      ]);
    },
  );

  it('when expectedRevision is stale, then 409 and nothing changes', async () => {
    const id = await newRecordId();
    await patch(owner, id, { notes: 'first edit' });
    const res = await patch(owner, id, { notes: 'second edit', expectedRevision: 1 });
    expect(res.status).toBe(409);
    expect((await owner.get(`/api/records/${id}`)).body.notes).toBe('first edit');
  });

  it('when the body is empty, then 400 "Nothing to change"', async () => {
    const id = await newRecordId();
    const res = await patch(owner, id, {});
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Nothing to change/);
  });

  it('when the record does not exist, then 404', async () => {
    expect((await patch(owner, 999_999_999, { notes: 'x' })).status).toBe(404);
  });
});

describe('retiring from the record (one endpoint: POST /api/records/:id/retire; nothing is hard-deleted)', () => {
  const retire = (agent: Agent, id: number, reason = 'Wrong plate photographed.') =>
    agent.post(`/api/records/${id}/retire`).set('X-CSRF-Token', agent.csrf).send({ reason });

  it('when the author retires, then the record is retired, still readable, and leaves the default list', async () => {
    const id = await newRecordId();
    const res = await retire(owner, id);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id, status: 'retired', retiredReason: 'Wrong plate photographed.' });
    expect((await viewer.get(`/api/records/${id}`)).body.status).toBe('retired');
    const active = await viewer.get(`/api/records?author=${owner.user?.id}&pageSize=200`);
    expect(active.body.items.map((item: { id: number }) => item.id)).not.toContain(id);
    const retired = await viewer.get(`/api/records?author=${owner.user?.id}&status=retired&pageSize=200`);
    expect(retired.body.items.map((item: { id: number }) => item.id)).toContain(id);
    const history = (await viewer.get(`/api/records/${id}/history`)).body;
    expect(history.revisions[0].action).toBe('retire');
  });

  it('when another member or a viewer retires, then 403; when a curator retires, then 200', async () => {
    const id = await newRecordId();
    expect((await retire(otherMember, id)).status).toBe(403);
    expect((await retire(viewer, id)).status).toBe(403);
    const res = await retire(curator, id, 'Duplicate of an older record.');
    expect(res.status).toBe(200);
    expect(res.body.retiredReason).toBe('Duplicate of an older record.');
  });

  it('when the second endpoint with other rules is tried (DELETE /api/records/:id, issue 19 point 4), then 404: it is gone', async () => {
    const id = await newRecordId();
    expect((await owner.delete(`/api/records/${id}`).set('X-CSRF-Token', owner.csrf)).status).toBe(404);
    expect((await viewer.get(`/api/records/${id}`)).body.status).toBe('active');
  });
});

describe('GET /api/records/:id', () => {
  it('when a viewer reads a record, then 200 with canEdit false; the author gets canEdit true', async () => {
    const id = await newRecordId();
    expect((await viewer.get(`/api/records/${id}`)).body.canEdit).toBe(false);
    expect((await otherMember.get(`/api/records/${id}`)).body.canEdit).toBe(false);
    expect((await owner.get(`/api/records/${id}`)).body.canEdit).toBe(true);
  });

  it('when the id is not a number, then 400', async () => {
    expect((await viewer.get('/api/records/abc')).status).toBe(400);
  });
});
