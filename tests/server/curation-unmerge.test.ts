import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { QueryTypes } from 'sequelize';
import { sequelize } from '../../server/db/sequelize';
import { addBookmarkRow, dumpAffected, post, recordId } from '../helpers/curation';
import { mergeHistorySchema, unmergeResultSchema } from '../../shared/schemas/curation';
import { recordDtoSchema } from '../../shared/schemas/record';

const { app, close } = createApp();
let member: Agent;
let curator: Agent;

// 3-Phenylpropan-1-ol: a compound this file keeps to itself.
const structure = 'OCCCc1ccccc1';

beforeAll(async () => {
  [member, curator] = await Promise.all([agentFor(app, 'member'), agentFor(app, 'curator')]);
});
afterAll(close);

const merge = async (survivorId: number, mergedIds: number[], fields: Record<string, number> = {}) => {
  const res = await post(curator, '/api/curation/merge', { survivorId, mergedIds, fields });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.mergeId as number;
};
const unmerge = (mergeId: number) => post(curator, `/api/curation/unmerge/${mergeId}`);
const getRecord = async (id: number) => recordDtoSchema.parse((await curator.get(`/api/records/${id}`)).body);
const record = (overrides: Record<string, unknown> = {}) => recordId(member, { structure, ...overrides });

describe('POST /api/curation/unmerge/:mergeId', () => {
  it('when a merge is undone, then both records are active again with their own fields, spots and notes', async () => {
    const survivor = await record({ notes: 'first', spots: [{ role: 'target', rf: 0.25 }] });
    const merged = await record({
      notes: 'second',
      outcome: 'partial',
      spots: [
        { role: 'target', rf: 0.27 },
        { role: 'by_product', rf: 0.6 },
      ],
    });
    const mergeId = await merge(survivor, [merged], { outcome: merged });
    expect((await getRecord(survivor)).outcome).toBe('partial');

    const res = await unmerge(mergeId);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const result = unmergeResultSchema.parse(res.body);
    expect(result.restored.map((item) => [item.id, item.status])).toEqual([
      [survivor, 'active'],
      [merged, 'active'],
    ]);
    const [first, second] = [await getRecord(survivor), await getRecord(merged)];
    expect(first).toMatchObject({ outcome: 'clean', notes: 'first', mergedIntoId: null });
    expect(first.spots.map((spot) => spot.rf)).toEqual([0.25]);
    expect(second).toMatchObject({ outcome: 'partial', notes: 'second', status: 'active' });
    expect(second.spots.map((spot) => spot.rf)).toEqual([0.27, 0.6]);
  });

  it('when a merge was already undone, then a second unmerge answers 409', async () => {
    const mergeId = await merge(await record(), [await record()]);
    expect((await unmerge(mergeId)).status).toBe(200);
    const again = await unmerge(mergeId);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already undone/);
  });

  it(
    'when the survivor was merged again since, then 409 names the later merge; after undoing that ' +
      'one, the first can be undone',
    async () => {
      const [a, s, t] = [await record(), await record(), await record()];
      const first = await merge(s, [a]);
      const second = await merge(t, [s]);
      const refused = await unmerge(first);
      expect(refused.status).toBe(409);
      expect(refused.body.error.details[0]).toMatchObject({ laterMergeId: second, mergedIntoId: t });
      expect((await unmerge(second)).status).toBe(200);
      expect((await unmerge(first)).status).toBe(200);
      expect((await Promise.all([a, s, t].map(getRecord))).map((item) => item.status)).toEqual([
        'active',
        'active',
        'active',
      ]);
    },
  );

  it('when the survivor was edited after the merge, then 409 lists it and every row stays as the edit left it', async () => {
    const survivor = await record();
    const mergeId = await merge(survivor, [await record()]);
    const edit = await curator
      .patch(`/api/records/${survivor}`)
      .set('X-CSRF-Token', curator.csrf)
      .send({ notebookRef: 'FIX-2' });
    expect(edit.status).toBe(200);
    const before = await dumpAffected([survivor]);
    const res = await unmerge(mergeId);
    expect(res.status).toBe(409);
    expect(res.body.error.details[0].changedRecordIds).toEqual([survivor]);
    expect(await dumpAffected([survivor])).toEqual(before);
  });

  it('when the history is listed, then each merge says whether it can still be undone and why not', async () => {
    const survivor = await record();
    const mergeId = await merge(survivor, [await record()]);
    const open = mergeHistorySchema.parse((await curator.get(`/api/curation/merges?recordId=${survivor}`)).body);
    expect(open.items.find((item) => item.id === mergeId)).toMatchObject({ blockedReason: null, undoneAt: null });
    await unmerge(mergeId);
    const done = mergeHistorySchema.parse((await curator.get(`/api/curation/merges?recordId=${survivor}`)).body);
    expect(done.items.find((item) => item.id === mergeId)?.undoneBy?.id).toBe(curator.user!.id);
  });

  it(
    'when a user had bookmarked both records, then the merge leaves one bookmark with both notes and ' +
      'the unmerge gives back both',
    async () => {
      const reader = await agentFor(app, 'viewer');
      const [survivor, merged] = [await record(), await record()];
      const kept = await addBookmarkRow(reader.user!.id, survivor, 'reference plate');
      const other = await addBookmarkRow(reader.user!.id, merged, 'scale-up run');
      const mergeId = await merge(survivor, [merged]);
      const during = await sequelize.query<{ id: number; record_id: number; note: string }>(
        'SELECT id, record_id, note FROM bookmarks WHERE user_id = :userId',
        {
          replacements: { userId: reader.user!.id },
          type: QueryTypes.SELECT,
        },
      );
      expect(during).toEqual([
        { id: kept, record_id: survivor, note: `reference plate\n[Bookmark note from record #${merged}] scale-up run` },
      ]);
      expect((await unmerge(mergeId)).status).toBe(200);
      const after = await sequelize.query(
        'SELECT id, record_id, note FROM bookmarks WHERE user_id = :userId ORDER BY id',
        {
          replacements: { userId: reader.user!.id },
          type: QueryTypes.SELECT,
        },
      );
      expect(after).toEqual([
        { id: kept, record_id: survivor, note: 'reference plate' },
        { id: other, record_id: merged, note: 'scale-up run' },
      ]);
    },
  );

  it('when the user deleted the united bookmark after the merge, then the unmerge does not bring either back', async () => {
    const reader = await agentFor(app, 'viewer');
    const [survivor, merged] = [await record(), await record()];
    const kept = await addBookmarkRow(reader.user!.id, survivor, null);
    await addBookmarkRow(reader.user!.id, merged, null);
    const mergeId = await merge(survivor, [merged]);
    await sequelize.query('DELETE FROM bookmarks WHERE id = :kept', { replacements: { kept } });
    expect((await unmerge(mergeId)).status).toBe(200);
    const [{ n }] = await sequelize.query<{ n: string }>(
      'SELECT count(*) AS n FROM bookmarks WHERE user_id = :userId',
      {
        replacements: { userId: reader.user!.id },
        type: QueryTypes.SELECT,
      },
    );
    expect(Number(n)).toBe(0);
  });

  it('when the merge id is unknown, then 404', async () => {
    expect((await unmerge(2147480000)).status).toBe(404);
  });
});
