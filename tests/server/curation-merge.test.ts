import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { agentFor, type Agent } from '../helpers/agent';
import { addPhotoRow, post, recordId } from '../helpers/curation';
import { mergeResultSchema } from '../../shared/schemas/curation';
import { recordDtoSchema, recordHistorySchema } from '../../shared/schemas/record';

const { app, close } = createApp();
let alice: Agent;
let bruno: Agent;
let curator: Agent;

// 4-Fluorobenzyl alcohol: a compound this file keeps to itself.
const structure = 'OCc1ccc(F)cc1';

beforeAll(async () => {
  [alice, bruno, curator] = await Promise.all([
    agentFor(app, 'member'),
    agentFor(app, 'member'),
    agentFor(app, 'curator'),
  ]);
});
afterAll(close);

async function pair() {
  const survivor = await recordId(alice, {
    structure,
    notes: 'Survivor notes.',
    notebookRef: 'AL-1-001',
    spots: [
      { role: 'target', rf: 0.3 },
      { role: 'starting_material', rf: 0.55 },
    ],
  });
  const merged = await recordId(bruno, {
    structure,
    notes: 'Ran it twice; same result.',
    notebookRef: 'BR-7-042',
    technique: 'flash',
    spots: [{ role: 'target', rf: 0.32 }],
    visualisation: ['CAM'],
    column: { diameterMm: 20, silicaG: 15 },
  });
  return { survivor, merged };
}

const getRecord = async (id: number) => recordDtoSchema.parse((await curator.get(`/api/records/${id}`)).body);

describe('POST /api/curation/merge', () => {
  it(
    'when a curator merges two records taking the technique from the merged one, then both records ' +
      'say so and nothing is dropped',
    async () => {
      const { survivor, merged } = await pair();
      await addPhotoRow(merged, bruno.user!.id, 'plate after 10 min');
      const res = await post(curator, '/api/curation/merge', {
        survivorId: survivor,
        mergedIds: [merged],
        fields: { technique: merged, 'column.diameterMm': merged },
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      const result = mergeResultSchema.parse(res.body);
      expect(result.survivor).toMatchObject({
        id: survivor,
        status: 'active',
        technique: 'flash',
        notebookRef: 'AL-1-001',
      });
      expect(result.merged[0]).toMatchObject({ id: merged, status: 'merged', mergedIntoId: survivor });

      const united = await getRecord(survivor);
      // One target spot on the united record (the survivor's); the merged record's target stays on its own page.
      expect(united.spots.map((spot) => [spot.role, spot.rf])).toEqual([
        ['target', 0.3],
        ['starting_material', 0.55],
      ]);
      expect(united.visualisations.map((item) => item.method)).toEqual(['uv-254', 'kmno4', 'cam']);
      expect(united.photoCount).toBe(1);
      expect(united.column?.diameterMm).toBe(20);
      expect(united.column?.silicaG).toBeNull(); // not chosen: the survivor's (empty) value stays
      expect(united.notes).toContain('Survivor notes.');
      expect(united.notes).toMatch(/\[From record #\d+, Test member, \d{4}-\d{2}-\d{2}\]\nRan it twice; same result\./);
      const credited = united.contributors.map((person) => `${person.id}:${person.role}`);
      expect(credited).toEqual(expect.arrayContaining([`${alice.user!.id}:author`, `${bruno.user!.id}:merged-from`]));

      const old = await getRecord(merged);
      expect(old).toMatchObject({ status: 'merged', mergedIntoId: survivor });
      expect(old.spots.map((spot) => [spot.role, spot.rf])).toEqual([['target', 0.32]]);
      const history = recordHistorySchema.parse((await curator.get(`/api/records/${survivor}/history`)).body);
      expect(history.revisions[0].action).toBe('merge');
      expect(history.revisions[0].changes.map((change) => change.field)).toEqual(
        expect.arrayContaining(['technique', 'notes', 'visualisations', 'mergedRecords']),
      );
    },
  );

  it('when records that share stains and each have a target are merged, then no stain repeats and one target spot remains', async () => {
    const survivor = await recordId(alice, {
      structure,
      spots: [{ role: 'target', rf: 0.3 }],
      visualisation: ['UV 254', 'KMnO4'],
    });
    const second = await recordId(bruno, {
      structure,
      spots: [
        { role: 'target', rf: 0.31 },
        { role: 'by_product', rf: 0.7 },
      ],
      visualisation: ['KMnO4', 'CAM'],
    });
    const third = await recordId(bruno, {
      structure,
      spots: [{ role: 'target', rf: 0.29 }],
      visualisation: ['UV 254', 'CAM', 'iodine'],
    });
    const res = await post(curator, '/api/curation/merge', {
      survivorId: survivor,
      mergedIds: [second, third],
      fields: {},
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const united = await getRecord(survivor);
    expect(united.visualisations.map((item) => item.method)).toEqual(['uv-254', 'kmno4', 'cam', 'iodine']);
    expect(united.spots.filter((spot) => spot.role === 'target').map((spot) => spot.rf)).toEqual([0.3]);
    expect(united.spots.map((spot) => spot.rf)).toEqual([0.3, 0.7]);
    // What stayed behind is still on the merged records, and an unmerge gives every record its own rows back.
    expect((await getRecord(third)).visualisations.map((item) => item.method)).toEqual(['uv-254', 'cam']);
    const undo = await post(curator, `/api/curation/unmerge/${res.body.mergeId}`, {});
    expect(undo.status, JSON.stringify(undo.body)).toBeLessThan(300);
    expect((await getRecord(second)).visualisations.map((item) => item.method)).toEqual(['kmno4', 'cam']);
    expect((await getRecord(second)).spots.map((spot) => spot.rf)).toEqual([0.31, 0.7]);
    expect((await getRecord(survivor)).visualisations.map((item) => item.method)).toEqual(['uv-254', 'kmno4']);
  });

  it('when the merge is written, then the audit log names the survivor, the merged records and the fields chosen', async () => {
    const { survivor, merged } = await pair();
    const res = await post(curator, '/api/curation/merge', {
      survivorId: survivor,
      mergedIds: [merged],
      fields: { notebookRef: merged },
    });
    expect(res.status).toBe(201);
    const [entry] = await sequelize.query<{
      actor_id: number;
      details: { survivorId: number; mergedIds: number[]; fields: Record<string, number> };
    }>("SELECT actor_id, details FROM audit_log WHERE action = 'record.merge' AND subject_id = :id", {
      replacements: { id: String(res.body.mergeId) },
      type: QueryTypes.SELECT,
    });
    expect(entry.actor_id).toBe(curator.user!.id);
    expect(entry.details).toMatchObject({ survivorId: survivor, mergedIds: [merged], fields: { notebookRef: merged } });
  });

  it('when one of the records is already merged or retired, then 409 and nothing changes', async () => {
    const { survivor, merged } = await pair();
    expect((await post(curator, '/api/curation/merge', { survivorId: survivor, mergedIds: [merged] })).status).toBe(
      201,
    );
    const third = await recordId(alice, { structure });
    const again = await post(curator, '/api/curation/merge', { survivorId: third, mergedIds: [merged] });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toContain(`merged into record ${survivor}`);
    expect(await post(curator, `/api/records/${third}/retire`, { reason: 'Wrong plate photographed.' })).toMatchObject({
      status: 200,
    });
    expect((await post(curator, '/api/curation/merge', { survivorId: survivor, mergedIds: [third] })).status).toBe(409);
    expect((await getRecord(survivor)).revision).toBe(2); // create + the one merge
  });

  it(
    'when one structure was entered as two compounds (stereo drawn and not), then their records merge ' +
      'and the compound can be chosen',
    async () => {
      const drawn = await recordId(alice, {
        structure: 'C[C@@H](O)c1ccc(F)cc1',
        name: '(R)-1-(4-fluorophenyl)ethanol',
      });
      const open = await recordId(bruno, { structure: 'CC(O)c1ccc(F)cc1', name: '4-fluoro-α-methylbenzyl alcohol' });
      const openCompound = (await getRecord(open)).compound.id;
      const res = await post(curator, '/api/curation/merge', {
        survivorId: drawn,
        mergedIds: [open],
        fields: { compound: open },
      });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      expect((await getRecord(drawn)).compound.id).toBe(openCompound);
    },
  );

  it('when the records belong to different compounds, then 409', async () => {
    const one = await recordId(alice, { structure });
    const other = await recordId(alice, { structure: 'OCc1ccc(Cl)cc1' });
    const res = await post(curator, '/api/curation/merge', { survivorId: one, mergedIds: [other] });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/different compounds/);
  });

  it('when the survivor is among the merged ids, or a field names a record outside the merge, then 400', async () => {
    const { survivor, merged } = await pair();
    expect((await post(curator, '/api/curation/merge', { survivorId: survivor, mergedIds: [survivor] })).status).toBe(
      400,
    );
    expect(
      (
        await post(curator, '/api/curation/merge', {
          survivorId: survivor,
          mergedIds: [merged],
          fields: { eluent: 999999 },
        })
      ).status,
    ).toBe(400);
  });

  it('when a record does not exist, then 404', async () => {
    const { survivor } = await pair();
    expect((await post(curator, '/api/curation/merge', { survivorId: survivor, mergedIds: [2147480000] })).status).toBe(
      404,
    );
  });
});
