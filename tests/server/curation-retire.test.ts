import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { agentFor, type Agent } from '../helpers/agent';
import { post, recordId } from '../helpers/curation';
import { statusChangeResultSchema } from '../../shared/schemas/curation';

const { app, close } = createApp();
let owner: Agent;
let curator: Agent;

const structure = 'OCc1ccc(C)cc1'; // 4-methylbenzyl alcohol, kept to this file

beforeAll(async () => {
  [owner, curator] = await Promise.all([agentFor(app, 'member'), agentFor(app, 'curator')]);
});
afterAll(close);

const listed = async (id: number, status?: string) => {
  const compoundId = (await curator.get(`/api/records/${id}`)).body.compound.id;
  const query = `/api/records?compoundId=${compoundId}&pageSize=200${status ? `&status=${status}` : ''}`;
  return ((await curator.get(query)).body.items as { id: number }[]).some((item) => item.id === id);
};

describe('POST /api/records/:id/retire and /restore', () => {
  it(
    'when a curator retires a record, then it leaves the default list but is kept, listed under ' +
      'status=retired, and can be restored',
    async () => {
      const id = await recordId(owner, { structure });
      const res = await post(curator, `/api/records/${id}/retire`, {
        reason: 'Rf measured on a wet plate; unreliable.',
      });
      expect(res.status).toBe(200);
      expect(statusChangeResultSchema.parse(res.body)).toMatchObject({
        id,
        status: 'retired',
        retiredReason: 'Rf measured on a wet plate; unreliable.',
        revision: 2,
      });
      expect(await listed(id)).toBe(false);
      expect(await listed(id, 'retired')).toBe(true);
      expect((await curator.get(`/api/records/${id}`)).body.spots).toHaveLength(1); // kept whole

      const back = await post(curator, `/api/records/${id}/restore`);
      expect(back.status).toBe(200);
      expect(back.body).toMatchObject({ status: 'active', retiredReason: null, retiredAt: null, revision: 3 });
      expect(await listed(id)).toBe(true);
      const history = (await curator.get(`/api/records/${id}/history`)).body.revisions.map(
        (revision: { action: string }) => revision.action,
      );
      expect(history).toEqual(['restore', 'retire', 'create']);
    },
  );

  it('when a record is retired and restored, then both steps are in the audit log with the curator and the reason', async () => {
    const id = await recordId(owner, { structure });
    await post(curator, `/api/records/${id}/retire`, { reason: 'Duplicate of a better record.' });
    await post(curator, `/api/records/${id}/restore`);
    const rows = await sequelize.query<{ action: string; actor_id: number; details: Record<string, unknown> }>(
      "SELECT action, actor_id, details FROM audit_log WHERE subject_type = 'record' AND subject_id " +
        "= :id AND action LIKE 'record.re%' ORDER BY id",
      { replacements: { id: String(id) }, type: QueryTypes.SELECT },
    );
    expect(rows.map((row) => [row.action, row.actor_id])).toEqual([
      ['record.retire', curator.user!.id],
      ['record.restore', curator.user!.id],
    ]);
    expect(rows[0].details).toEqual({ reason: 'Duplicate of a better record.' });
  });

  it(
    'when the author retires their own record, then 200, and they may restore it; a record a curator ' +
      'retired they may not restore',
    async () => {
      const own = await recordId(owner, { structure });
      expect((await post(owner, `/api/records/${own}/retire`, { reason: 'Wrong compound drawn.' })).status).toBe(200);
      expect((await post(owner, `/api/records/${own}/restore`)).status).toBe(200);
      expect((await post(curator, `/api/records/${own}/retire`, { reason: 'Contaminated sample.' })).status).toBe(200);
      expect((await post(owner, `/api/records/${own}/restore`)).status).toBe(403);
    },
  );

  it('when the record is not active (retired or merged) or the reason is missing, then 409 or 400', async () => {
    const [a, b] = [await recordId(owner, { structure }), await recordId(owner, { structure })];
    expect((await post(curator, `/api/records/${a}/retire`, {})).status).toBe(400);
    expect((await post(curator, `/api/records/${a}/restore`)).status).toBe(409);
    expect((await post(curator, '/api/curation/merge', { survivorId: a, mergedIds: [b] })).status).toBe(201);
    const res = await post(curator, `/api/records/${b}/retire`, { reason: 'Old entry.' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain(`merged into record ${a}`);
    await post(curator, `/api/records/${a}/retire`, { reason: 'Whole series withdrawn.' });
    expect((await post(curator, `/api/records/${a}/retire`, { reason: 'Again.' })).status).toBe(409);
  });
});
