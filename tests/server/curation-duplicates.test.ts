import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { post, recordId } from '../helpers/curation';
import { duplicatesResponseSchema, type DuplicateGroup } from '../../shared/schemas/curation';

const { app, close } = createApp();
let member: Agent;
let curator: Agent;

// Compounds this file keeps to itself: cyclopentyl(phenyl)methanol; 1-(4-bromophenyl)ethanol with and
// without its stereocentre drawn; 3-bromobutan-2-ol drawn as two different stereoisomers.
const structure = 'OC(C1CCCC1)c1ccccc1';
const eluent = (ea: number, hex: number) => ({
  components: [
    { solvent: 'EtOAc', parts: ea },
    { solvent: 'hexanes', parts: hex },
  ],
  additives: [],
});

beforeAll(async () => {
  [member, curator] = await Promise.all([agentFor(app, 'member'), agentFor(app, 'curator')]);
});
afterAll(close);

async function groups(): Promise<DuplicateGroup[]> {
  const res = await curator.get('/api/curation/duplicates');
  expect(res.status).toBe(200);
  return duplicatesResponseSchema.parse(res.body).groups;
}
const groupWith = (all: DuplicateGroup[], id: number) => all.find((group) => group.recordIds.includes(id));

describe('GET /api/curation/duplicates', () => {
  let near: number[];
  let apart: Record<string, number>;

  beforeAll(async () => {
    near = [
      await recordId(member, {
        structure,
        eluent: eluent(1, 4),
        spots: [{ role: 'target', rf: 0.3 }],
        notebookRef: 'CP-3-011',
      }),
      // 1 : 3.85 is 20.6 % EtOAc v/v against 20 %: 3 % relative; ΔRf 0.03.
      await recordId(member, {
        structure,
        eluent: eluent(1, 3.85),
        spots: [{ role: 'target', rf: 0.33 }],
        notebookRef: 'CP-3-011',
      }),
    ];
    apart = {
      ratio: await recordId(member, { structure, eluent: eluent(1, 3), spots: [{ role: 'target', rf: 0.31 }] }), // 25 % v/v: 20 % relative
      rf: await recordId(member, { structure, eluent: eluent(1, 4), spots: [{ role: 'target', rf: 0.42 }] }), // ΔRf 0.12
      phase: await recordId(member, {
        structure,
        stationaryPhase: 'alumina',
        eluent: eluent(1, 4),
        spots: [{ role: 'target', rf: 0.3 }],
      }),
      solvents: await recordId(member, {
        structure,
        eluent: {
          components: [
            { solvent: 'diethyl ether', parts: 1 },
            { solvent: 'hexanes', parts: 4 },
          ],
        },
        spots: [{ role: 'target', rf: 0.3 }],
      }),
    };
  });

  it(
    'when two records of one compound share phase and solvents with ratios within 5 % and Rf within ' +
      '0.05, then they form one group that says why',
    async () => {
      const group = groupWith(await groups(), near[0]);
      expect(group?.kind).toBe('same-conditions');
      expect(group!.recordIds).toEqual(near);
      expect(group!.pairs[0].rfDifference).toBeCloseTo(0.03, 6);
      expect(group!.pairs[0].fractions[0].relative).toBeCloseTo(0.03, 3); // (0.2062 − 0.2) / 0.2062
      expect(group!.pairs[0].sameNotebookRef).toBe(true);
      expect(group!.reasons.join(' ')).toMatch(/Target Rf within 0.05/);
      expect(group!.score).toBeGreaterThan(0.8);
    },
  );

  it('when records differ in ratio, target Rf, phase or solvents, then none of them is in any group', async () => {
    const all = await groups();
    for (const [why, id] of Object.entries(apart)) expect(groupWith(all, id), why).toBeUndefined();
  });

  it(
    'when a compound was entered with and without its stereocentre under different names, then a ' +
      'same-structure group names both entries',
    async () => {
      const defined = await recordId(member, {
        structure: 'C[C@H](O)c1ccc(Br)cc1',
        name: '(S)-1-(4-bromophenyl)ethanol',
      });
      const open = await recordId(member, { structure: 'CC(O)c1ccc(Br)cc1', name: '4-bromo-α-methylbenzyl alcohol' });
      const group = groupWith(await groups(), defined);
      expect(group?.kind).toBe('same-structure');
      expect(group!.recordIds).toEqual([defined, open]);
      expect(group!.structures.map((entry) => [entry.stereoElements, entry.undefinedStereoElements])).toEqual([
        [1, 0],
        [1, 1],
      ]);
      expect(group!.reasons.join(' ')).toMatch(/names and synonyms differ/);
      // 0.5 one skeleton + 0.15 only one entry draws its stereo + 0.05 their records (same example conditions) also match.
      expect(group!.score).toBe(0.7);
    },
  );

  it('when two entries draw different defined stereoisomers, then the group is scored as less certain', async () => {
    const one = await recordId(member, { structure: 'C[C@@H](Br)[C@H](C)O', name: 'erythro-3-bromobutan-2-ol' });
    await recordId(member, { structure: 'C[C@H](Br)[C@H](C)O', name: 'threo-3-bromobutan-2-ol' });
    const group = groupWith(await groups(), one);
    expect(group?.kind).toBe('same-structure');
    expect(group!.score).toBe(0.35); // 0.5 − 0.2 two entries with defined, different stereo + 0.05 matching conditions
  });

  it('when a merged or retired record would complete a group, then it is left out (active records only)', async () => {
    const a = await recordId(member, { structure, eluent: eluent(2, 3), spots: [{ role: 'target', rf: 0.5 }] });
    const b = await recordId(member, { structure, eluent: eluent(2, 3), spots: [{ role: 'target', rf: 0.52 }] });
    expect(groupWith(await groups(), a)?.recordIds).toEqual([a, b]);
    expect((await post(curator, `/api/records/${b}/retire`, { reason: 'Entered twice by mistake.' })).status).toBe(200);
    expect(groupWith(await groups(), a)).toBeUndefined();
  });
});

describe('POST /api/curation/duplicates/dismiss', () => {
  it('when a curator dismisses a group, then it is hidden until one of its records changes', async () => {
    const a = await recordId(member, { structure, eluent: eluent(1, 9), spots: [{ role: 'target', rf: 0.2 }] });
    const b = await recordId(member, { structure, eluent: eluent(1, 9), spots: [{ role: 'target', rf: 0.21 }] });
    expect(groupWith(await groups(), a)?.recordIds).toEqual([a, b]);

    const res = await post(curator, '/api/curation/duplicates/dismiss', {
      recordIds: [b, a],
      reason: 'Two separate batches, both worth keeping.',
    });
    expect(res.status).toBe(201);
    expect(groupWith(await groups(), a)).toBeUndefined();
    expect((await curator.get('/api/curation/duplicates')).body.dismissedCount).toBeGreaterThanOrEqual(1);

    const edit = await member
      .patch(`/api/records/${b}`)
      .set('X-CSRF-Token', member.csrf)
      .send({ notes: 'Second batch, from the scale-up.' });
    expect(edit.status).toBe(200);
    expect(groupWith(await groups(), a)?.recordIds).toEqual([a, b]);
  });

  it('when the reason is missing or a record does not exist, then 400 or 404', async () => {
    const a = await recordId(member, { structure, eluent: eluent(1, 1) });
    expect(
      (await post(curator, '/api/curation/duplicates/dismiss', { recordIds: [a, a + 1], reason: '' })).status,
    ).toBe(400);
    expect(
      (await post(curator, '/api/curation/duplicates/dismiss', { recordIds: [a, 2147480000], reason: 'not the same' }))
        .status,
    ).toBe(404);
  });
});
