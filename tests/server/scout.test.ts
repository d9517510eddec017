import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { scoutResultSchema } from '../../shared/schemas/scout';

/**
 * POST /api/scout against records this file creates. The Rf values below are invented for the test but shaped
 * by Soczewiński's relation (E. Soczewiński, Anal. Chem. 1969, 41, 179–182, from memory: RM = log10((1 − Rf)/Rf)
 * falls linearly with log10 of the strong solvent's fraction): each ketone moves further as EtOAc rises.
 */
const { app, close } = createApp();
let member: Agent;
let viewer: Agent;
const ketoneCompoundIds = new Set<number>();

const hexEtOAc = (strong: number, weak: number, additives: { additive: string; percent: number }[] = []) => ({
  components: [
    { solvent: 'EtOAc', parts: strong },
    { solvent: 'hexanes', parts: weak },
  ],
  additives,
});
const dcmMeOH = (additives: { additive: string; percent: number }[] = []) => ({
  components: [
    { solvent: 'DCM', parts: 19 },
    { solvent: 'MeOH', parts: 1 },
  ],
  additives,
});

/** Butyrophenones: [SMILES, Rf at EtOAc : hexanes 1 : 19, 1 : 9, 1 : 4]. */
const ketones: [string, number, number, number][] = [
  ['CCCC(=O)c1ccc(OC)cc1', 0.1, 0.2, 0.36],
  ['CCCC(=O)c1ccc(C)cc1', 0.16, 0.29, 0.47],
  ['CCCC(=O)c1ccc(Cl)cc1', 0.18, 0.31, 0.5],
  ['CCCC(=O)c1ccc(F)cc1', 0.15, 0.27, 0.45],
  ['CCCC(=O)c1ccc(Br)cc1', 0.19, 0.32, 0.51],
];
const amines = ['C(c1ccccc1)N1CCCCC1', 'C(c1ccc(C)cc1)N1CCCCC1', 'C(c1ccc(OC)cc1)N1CCCCC1', 'C(c1ccc(Cl)cc1)N1CCCCC1'];

const scoutAs = (agent: Agent, body: Record<string, unknown>) =>
  agent.post('/api/scout').set('X-CSRF-Token', agent.csrf).send(body);

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  for (const [structure, ...rfs] of ketones) {
    for (const [index, [strong, weak]] of [
      [1, 19],
      [1, 9],
      [1, 4],
    ].entries()) {
      const res = await postRecord(member, {
        structure,
        eluent: hexEtOAc(strong, weak),
        spots: [{ role: 'target', rf: rfs[index] }],
        visualisation: ['UV 254', '2,4-DNP'],
      });
      expect(res.status).toBe(201);
      ketoneCompoundIds.add(res.body.compound.id);
    }
  }
  for (const structure of amines) {
    const res = await postRecord(member, {
      structure,
      eluent: dcmMeOH([{ additive: 'Et3N', percent: 1 }]),
      spots: [{ role: 'target', rf: 0.35 }],
      visualisation: ['Dragendorff'],
    });
    expect(res.status).toBe(201);
  }
  const failed = await postRecord(member, {
    structure: amines[0],
    eluent: dcmMeOH(),
    spots: [{ role: 'target', rf: 0.2 }],
    outcome: 'failed',
    outcomeReason: 'Streaked from the origin without a base.',
    visualisation: ['Dragendorff'],
  });
  expect(failed.status).toBe(201);
});
afterAll(close);

describe('POST /api/scout', () => {
  it(
    'when a viewer draws a new butyrophenone, then the recorded analogues come back as neighbours ' +
      'with similarity and conditions, and a ratio is suggested',
    async () => {
      const res = await scoutAs(viewer, {
        structure: 'CCCC(=O)c1ccc(CC)cc1',
        solventPair: { weak: 'hexanes', strong: 'EtOAc' },
      });
      expect(res.status).toBe(200);
      const result = scoutResultSchema.parse(res.body);
      const recorded = result.neighbours.filter((neighbour) => ketoneCompoundIds.has(neighbour.compoundId));
      expect(recorded.length).toBeGreaterThanOrEqual(4);
      expect(result.neighbours[0].similarity).toBeGreaterThan(0.6);
      // Other test files share the database, so the check is on this file's own analogues, not whichever compound ranks first.
      expect(
        recorded[0].conditions.some((condition) => condition.recordId !== null && condition.notation.includes('EtOAc')),
      ).toBe(true);
      const suggestion = result.suggestion!;
      expect(suggestion.pair).toMatchObject({ weak: 'hexanes', strong: 'ethyl-acetate' });
      // Its analogues run at Rf 0.27–0.32 in 1 : 9, so a ratio for Rf 0.3 lies between 1 : 19 and 1 : 4 (5–20 % EtOAc).
      expect(suggestion.strongPercent).toBeGreaterThanOrEqual(5);
      expect(suggestion.strongPercent).toBeLessThanOrEqual(20);
      expect(suggestion.label).toMatch(/^EtOAc : hexanes \d+(\.\d+)? : \d+(\.\d+)? \(\d+(\.\d)? % EtOAc\)$/);
      expect(suggestion.interval[0]).toBeLessThan(suggestion.predictedRf);
      expect(suggestion.interval[1]).toBeGreaterThan(suggestion.predictedRf);
      expect(result.evidence.map((line) => line.quantity)).toEqual(
        expect.arrayContaining(['ratio', 'predicted Rf', 'ε°']),
      );
      expect(result.stains.map((stain) => stain.stain)).toContain('dnp');
      expect(result.cautions.map((caution) => caution.key)).toContain('flammable-solvent');
    },
  );

  it(
    'when the molecule itself was recorded, then the first plate is its own record nearest the target ' +
      'and the model ratio lies between the bracketing ones',
    async () => {
      const res = await scoutAs(viewer, {
        structure: 'CCCC(=O)c1ccc(OC)cc1',
        targetRf: 0.2,
        solventPair: { weak: 'hexanes', strong: 'EtOAc' },
      });
      const result = scoutResultSchema.parse(res.body);
      expect(result.query.existingCompoundId).not.toBeNull();
      expect(result.neighbours[0].similarity).toBe(1);
      // Recorded: Rf 0.10 at 5 %, 0.20 at 10 %, 0.36 at 20 % EtOAc: the record at 1 : 9 is the one to run again.
      expect(result.firstPlate).toMatchObject({ source: 'recorded', rf: 0.2, notation: 'EtOAc : hexanes 1 : 9' });
      expect(result.suggestion!.strongPercent).toBeGreaterThan(5);
      expect(result.suggestion!.strongPercent).toBeLessThan(20);
    },
  );

  it(
    'when the neighbours are amines that needed triethylamine, then the base is recommended with its ' +
      'count and the failure without it is a warning',
    async () => {
      const res = await scoutAs(viewer, { structure: 'C(c1ccc(F)cc1)N1CCCCC1' });
      const result = scoutResultSchema.parse(res.body);
      const base = result.additives.find((item) => item.additive === 'triethylamine');
      expect(base?.count).toBeGreaterThanOrEqual(amines.length);
      expect(base?.recordIds.length).toBe(base?.count);
      expect(
        result.warnings.some(
          (warning) => warning.outcome === 'failed' && warning.message.includes('Streaked from the origin'),
        ),
      ).toBe(true);
      expect(result.query.classes).toContain('tertiary-amine');
    },
  );

  it('when nothing recorded is close, then the estimate comes from descriptors alone with low confidence', async () => {
    const res = await scoutAs(viewer, { structure: 'C[Si](C)(C)C#C[Si](C)(C)C' });
    const result = scoutResultSchema.parse(res.body);
    expect(result.neighbours[0].similarity).toBeLessThan(0.5);
    expect(result.suggestion?.basis).toBe('descriptors-only');
    expect(result.confidence.level).toBe('low');
    expect(result.confidence.reasons.join(' ')).toMatch(/descriptors alone/);
  });

  it('when a record of a new compound is added, then the very next Scout sees it (no stale model or kept answer)', async () => {
    const structure = 'O=C(OCC)c1ccc(N(=O)=O)c2ccccc12';
    const before = scoutResultSchema.parse((await scoutAs(viewer, { structure })).body);
    expect(before.neighbours[0].similarity).toBeLessThan(1);
    expect(
      (await postRecord(member, { structure, eluent: hexEtOAc(1, 4), spots: [{ role: 'target', rf: 0.33 }] })).status,
    ).toBe(201);
    const after = scoutResultSchema.parse((await scoutAs(viewer, { structure })).body);
    expect(after.neighbours[0].similarity).toBe(1);
    expect(after.knowledge.measurements).toBeGreaterThan(before.knowledge.measurements);
  });

  it('when the SMILES is malformed, then 400 with the parser’s reason; when a valence is impossible, then 422', async () => {
    const syntax = await scoutAs(viewer, { structure: 'CC(C' });
    expect(syntax.status).toBe(400);
    expect(syntax.body.error.code).toMatch(/smiles/);
    const valence = await scoutAs(viewer, { structure: 'C(C)(C)(C)(C)C' });
    expect(valence.status).toBe(422);
    expect(valence.body.error.code).toBe('valence');
  });

  it('when the target Rf is outside 0.15–0.45 or a solvent is unknown, then 400 naming the field', async () => {
    const target = await scoutAs(viewer, { structure: 'CCO', targetRf: 0.8 });
    expect(target.status).toBe(400);
    expect(target.body.error.details[0].path).toBe('body.targetRf');
    const solvent = await scoutAs(viewer, {
      structure: 'CCO',
      solventPair: { weak: 'hexanes', strong: 'ethyl acetat' },
    });
    expect(solvent.status).toBe(400);
    expect(solvent.body.error.message).toMatch(/Did you mean/);
  });

  it('when nobody is signed in, then 401', async () => {
    const anonymous = await agentFor(app);
    expect(
      (await anonymous.post('/api/scout').set('X-CSRF-Token', anonymous.csrf).send({ structure: 'CCO' })).status,
    ).toBe(401);
    expect((await request(app).post('/api/scout').send({ structure: 'CCO' })).status).toBeGreaterThanOrEqual(400);
  });
});
