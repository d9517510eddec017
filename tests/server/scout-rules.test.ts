import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { recordHits, searchFor } from '../helpers/search';
import { scoutResultSchema, type ScoutResult } from '../../shared/schemas/scout';

/**
 * Scout's first plate against the group's records (issue 26), through POST /api/scout on a real PostgreSQL.
 * The Rf values are invented for the tests; what they stand for is common practice: amines streak on silica
 * without a base, carboxylic acids tail without an acid, a failed condition is not worth repeating.
 */
const { app, close } = createApp();
let member: Agent;
let viewer: Agent;

type Additive = { additive: string; percent: number };
const dcmMeOH = (dcm: number, meoh: number, additives: Additive[] = []) => ({
  components: [
    { solvent: 'DCM', parts: dcm },
    { solvent: 'MeOH', parts: meoh },
  ],
  additives,
});
const etOAcHex = (etoac: number, hex: number, additives: Additive[] = []) => ({
  components: [
    { solvent: 'EtOAc', parts: etoac },
    { solvent: 'hexanes', parts: hex },
  ],
  additives,
});
const et3n = [{ additive: 'Et3N', percent: 1 }];
const acoh = [{ additive: 'AcOH', percent: 1 }];

async function record(
  structure: string,
  eluent: unknown,
  rf: number,
  extra: Record<string, unknown> = {},
): Promise<number> {
  const res = await postRecord(member, {
    structure,
    eluent,
    spots: [{ role: 'target', rf }],
    visualisation: ['UV 254'],
    notes: null,
    ...extra,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id as number;
}

async function scout(body: Record<string, unknown>): Promise<ScoutResult> {
  const res = await viewer.post('/api/scout').set('X-CSRF-Token', viewer.csrf).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return scoutResultSchema.parse(res.body);
}

const streaked = { outcome: 'failed', outcomeReason: 'Streaked from the baseline; no distinct spot.' };
const amine = 'C(c1ccccc1)N1CCN(C)CC1';
const ids: Record<string, number> = {};

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  // An amine family: each streaked in DCM : MeOH 10 : 1 without base and ran clean with 1 % Et3N.
  ids.amineFailed = await record(amine, dcmMeOH(10, 1), 0.12, streaked);
  ids.amineClean = await record(amine, dcmMeOH(10, 1, et3n), 0.3);
  await record('Cc1ccc(CN2CCN(C)CC2)cc1', dcmMeOH(10, 1), 0.1, streaked);
  await record('Cc1ccc(CN2CCN(C)CC2)cc1', dcmMeOH(10, 1, et3n), 0.33);
  await record('Clc1ccc(CN2CCN(C)CC2)cc1', dcmMeOH(10, 1, et3n), 0.36);
  // Arylacetic acids, recorded clean only with 1 % AcOH (and one tailing without it), seen with bromocresol green.
  for (const [structure, rf] of [
    ['OC(=O)Cc1ccc(Cl)cc1', 0.32],
    ['OC(=O)Cc1ccc(C)cc1', 0.3],
    ['OC(=O)Cc1ccc(OC)cc1', 0.26],
  ] as const) {
    await record(structure, etOAcHex(1, 1, acoh), rf, { visualisation: ['UV 254', 'bromocresol green'] });
  }
  ids.acidFailed = await record('OC(=O)Cc1ccc(C)cc1', etOAcHex(1, 1), 0.1, {
    outcome: 'failed',
    outcomeReason: 'Tailed from the origin over half the lane.',
    visualisation: ['bromocresol green'],
  });
  // Free amino acids: AcOH, bromocresol green and ninhydrin, two failures without acid.
  for (const structure of ['NC(Cc1ccccc1)C(=O)O', 'NC(Cc1ccc(Cl)cc1)C(=O)O', 'NC(Cc1ccc(C)cc1)C(=O)O']) {
    await record(structure, dcmMeOH(5, 1, acoh), 0.2, { visualisation: ['ninhydrin', 'bromocresol green'] });
    await record(structure, dcmMeOH(5, 1), 0.05, {
      outcome: 'failed',
      outcomeReason: 'Stuck at the origin as a smear.',
      visualisation: ['ninhydrin'],
    });
  }
  // Naphthyl ketones run in EtOAc : hexanes near 1 : 4; one of them failed there (co-eluted), with nothing clean recorded for it.
  for (const [structure, rf] of [
    ['O=C(CC)c1ccc2ccccc2c1', 0.33],
    ['O=C(CCCC)c1ccc2ccccc2c1', 0.36],
    ['O=C(CCCCC)c1ccc2ccccc2c1', 0.38],
  ] as const) {
    await record(structure, etOAcHex(1, 4), rf);
    await record(structure, etOAcHex(1, 9), rf - 0.13);
  }
  ids.ketoneFailed = await record('O=C(CCC)c1ccc2ccccc2c1', etOAcHex(1, 4), 0.34, {
    outcome: 'failed',
    outcomeReason: 'Co-eluted with the starting material.',
  });
  // Bromopyridine isomers.
  for (const [structure, rf] of [
    ['Brc1ccccn1', 0.35],
    ['Brc1cccnc1', 0.3],
    ['Brc1ccncc1', 0.25],
  ] as const)
    ids[structure] = await record(structure, etOAcHex(1, 4), rf);
}, 120_000);
afterAll(close);

describe('Scout: the group’s records first (rule 1)', () => {
  it(
    'when the compound itself has a clean record beside a failed one, then the first plate is that ' +
      'record, additive included, named by number',
    async () => {
      const result = await scout({ structure: amine });
      const plate = result.firstPlate!;
      expect(plate.source).toBe('recorded');
      expect(plate.recordId).toBe(ids.amineClean);
      expect(plate.notation).toBe('DCM : MeOH 10 : 1 + 1% Et3N');
      expect(plate.summary).toContain(`record #${ids.amineClean}`);
      expect(plate.summary).toContain('Rf 0.30');
      expect(plate.notes.join(' ')).toContain(`record #${ids.amineFailed}`);
      // Scout's own estimate follows as a second opinion.
      expect(result.suggestion).not.toBeNull();
    },
  );
});

describe('Scout: additives by the query’s own groups (rule 3)', () => {
  it(
    'when a new amine of a family recorded clean only with Et3N is scouted, then the headline is in ' +
      'their pair with the base in it',
    async () => {
      const result = await scout({ structure: 'Fc1ccc(CN2CCN(C)CC2)cc1' });
      const plate = result.firstPlate!;
      expect(plate.source).toBe('model');
      expect(plate.components.map((part) => part.solvent).sort()).toEqual(['dichloromethane', 'methanol']);
      expect(plate.additives.map((item) => item.additive)).toEqual(['triethylamine']);
      expect(plate.notation).toMatch(/\+ 1% Et3N$/);
      expect(result.additives.map((item) => item.purpose)).toContain('base');
      expect(result.additives.map((item) => item.purpose)).not.toContain('acid');
    },
  );

  it('when a new acid of a family recorded clean only with 1 % AcOH is scouted, then the headline carries AcOH', async () => {
    const result = await scout({ structure: 'OC(=O)Cc1ccc(Br)cc1' });
    const plate = result.firstPlate!;
    expect(plate.additives.map((item) => item.additive)).toEqual(['acetic-acid']);
    expect(plate.notation).toMatch(/\+ 1% AcOH$/);
    expect(result.stains.map((stain) => stain.stain)).toContain('bromocresol-green');
  });

  it(
    'when an amino ester sits beside free amino acids, then no acid additive, no bromocresol green ' +
      'and no warning from the acids’ failures',
    async () => {
      const result = await scout({ structure: 'NC(Cc1ccccc1)C(=O)OC' });
      expect(result.neighbours.filter((item) => item.similarity >= 0.5).length).toBeGreaterThanOrEqual(3);
      const plate = result.firstPlate!;
      expect(plate.additives.map((item) => item.additive)).not.toContain('acetic-acid');
      expect(plate.additives.map((item) => item.additive)).toContain('triethylamine');
      expect(result.additives.map((item) => item.purpose)).not.toContain('acid');
      expect(result.stains.map((stain) => stain.stain)).not.toContain('bromocresol-green');
      expect(result.warnings.filter((warning) => warning.message.includes('Stuck at the origin'))).toEqual([]);
    },
  );
});

describe('Scout: the confidence word follows the interval (rule 6)', () => {
  it(
    'when several molecules are scouted, then high never stands beside an interval wider than 0.30 ' +
      'Rf, nor medium beside one wider than 0.50',
    async () => {
      const results = await Promise.all(
        ['Fc1ccc(CN2CCN(C)CC2)cc1', 'OC(=O)Cc1ccc(Br)cc1', 'O=C(CCC)c1ccc2ccccc2c1', 'Brc1ccccn1'].map((structure) =>
          scout({ structure }),
        ),
      );
      const widths = results.map((result) => ({
        level: result.confidence.level,
        width: result.suggestion!.interval[1] - result.suggestion!.interval[0],
      }));
      expect(widths).toHaveLength(4);
      for (const { level, width } of widths) {
        if (level === 'high') expect(width).toBeLessThanOrEqual(0.3 + 1e-9);
        if (level === 'medium') expect(width).toBeLessThanOrEqual(0.5 + 1e-9);
      }
      for (const result of results)
        expect(result.confidence.reasons[0]).toMatch(/^The 90 % interval spans \d\.\d\d Rf/);
    },
  );
});

describe('Scout: never a recorded failure (rule 2)', () => {
  it(
    'when the model would land on the compound’s own failed condition, then the headline differs and ' +
      'says which record failed',
    async () => {
      const result = await scout({ structure: 'O=C(CCC)c1ccc2ccccc2c1' });
      expect(result.query.existingCompoundId).not.toBeNull();
      // The neighbours alone point at about 1 : 4, where this compound failed.
      expect(result.suggestion!.pair.strong).toBe('ethyl-acetate');
      expect(result.suggestion!.strongPercent).toBeGreaterThanOrEqual(10);
      expect(result.suggestion!.strongPercent).toBeLessThanOrEqual(40);
      const plate = result.firstPlate!;
      const repeats =
        plate.components.some((part) => part.solvent === 'ethyl-acetate') &&
        plate.strongPercent !== null &&
        plate.strongPercent >= 10 &&
        plate.strongPercent <= 40;
      expect(repeats).toBe(false);
      expect(plate.notes.join(' ')).toContain(`record #${ids.ketoneFailed}`);
    },
  );

  it('when a neighbour of the same family failed without the acid, then the new acid’s headline is not that condition', async () => {
    const result = await scout({ structure: 'OC(=O)Cc1ccc(Br)cc1' });
    expect(result.firstPlate!.notation).not.toBe('EtOAc : hexanes 1 : 1');
    expect(result.warnings.some((warning) => warning.recordId === ids.acidFailed)).toBe(true);
  });
});

describe('Similarity that means what it says (rule 4)', () => {
  it('when 2-bromopyridine is scouted and searched, then only 2-bromopyridine scores 1.00; the 3- and 4-isomers score below', async () => {
    const result = await scout({ structure: 'Brc1ccccn1' });
    const similarity = (smiles: string) =>
      result.neighbours.find((item) => item.conditions.some((condition) => condition.recordId === ids[smiles]))
        ?.similarity;
    expect(similarity('Brc1ccccn1')).toBe(1);
    expect(similarity('Brc1cccnc1')).toBeLessThan(0.95);
    expect(similarity('Brc1ccncc1')).toBeLessThan(0.95);
    const hits = recordHits(
      await searchFor(viewer, { mode: 'similar', structure: 'Brc1ccccn1', threshold: 0.3, pageSize: 100 }),
    );
    const searched = (smiles: string) => hits.find((hit) => hit.recordId === ids[smiles])?.similarity;
    expect(searched('Brc1ccccn1')).toBe(1);
    expect(searched('Brc1cccnc1')).toBeLessThan(0.95);
    expect(searched('Brc1ccncc1')).toBeLessThan(0.95);
    expect(
      hits
        .filter((hit) => hit.similarity === 1)
        .every((hit) => hit.compoundId === hits.find((item) => item.recordId === ids['Brc1ccccn1'])!.compoundId),
    ).toBe(true);
  });
});

describe('Learns from the group (rule 7)', () => {
  it(
    'when close analogues are recorded much more polar through the API, then the next suggestion for ' +
      'the family asks for more EtOAc',
    async () => {
      const query = 'O=C(NC1CCCCC1)c1ccc2ccccc2c1';
      await record('O=C(NC1CCCC1)c1ccc2ccccc2c1', etOAcHex(1, 9), 0.3);
      const before = await scout({ structure: query, solventPair: { weak: 'hexanes', strong: 'EtOAc' } });
      await record('O=C(NC1CCCCCC1)c1ccc2ccccc2c1', etOAcHex(1, 1), 0.3);
      await record('O=C(NC1CCCCC1)c1ccc2ccccc2c1C', etOAcHex(1, 1), 0.28);
      await record('O=C(NC1CCCC1)c1ccc2ccccc2c1', etOAcHex(1, 1), 0.55);
      const after = await scout({ structure: query, solventPair: { weak: 'hexanes', strong: 'EtOAc' } });
      expect(after.knowledge.measurements).toBeGreaterThanOrEqual(before.knowledge.measurements + 3);
      expect(after.suggestion!.strongPercent).toBeGreaterThan(before.suggestion!.strongPercent);
    },
  );
});
