import { describe, expect, it } from 'vitest';
import { analyseStructure, fingerprintMolecule } from '../../server/chem';
import { buildScoutModel, predictRf, scout } from '../../server/features/scout/engine/engine';
import { cholesky, inverseDiagonal } from '../../server/features/scout/engine/linear-algebra';
import { fitGp, predictGp } from '../../server/features/scout/engine/gaussian-process';
import { nonIncreasing } from '../../server/features/scout/engine/query-curve';
import { positionOf } from '../../server/features/scout/engine/eluent-position';
import { fitLine, lineAt } from '../../server/features/scout/engine/curves';
import { rfToRm, rmToRf } from '../../shared/domain/rf';
import { mixtureStrength } from '../../shared/domain/eluent-strength';
import type {
  KnowledgeSet,
  ScoutCompound,
  ScoutMeasurement,
  ScoutQuery,
} from '../../server/features/scout/engine/types';

function compound(id: number, smiles: string): ScoutCompound {
  const analysis = analyseStructure(smiles);
  return {
    id,
    name: smiles,
    smiles,
    descriptors: analysis.descriptors,
    classes: analysis.classes,
    fingerprint: fingerprintMolecule(analysis.parent),
  };
}
const asQuery = (item: ScoutCompound): ScoutQuery => ({ ...item, id: null });

function plate(
  compoundId: number,
  strong: string,
  weak: string,
  strongParts: number,
  weakParts: number,
  rf: number,
  extra: Partial<ScoutMeasurement> = {},
): ScoutMeasurement {
  return {
    recordId: null,
    compoundId,
    phase: 'silica-gel',
    components: [
      { solvent: strong, parts: strongParts },
      { solvent: weak, parts: weakParts },
    ],
    additives: [],
    mode: 'isocratic',
    rf,
    outcome: 'clean',
    outcomeReason: null,
    visualisations: [],
    ...extra,
  };
}

describe('the algebra under the Scout regression', () => {
  it('when the 3 × 3 Hilbert matrix is factored, then diag(A⁻¹) is 9, 192, 180 (its known integer inverse, from memory)', () => {
    const hilbert = Float64Array.from([1, 1 / 2, 1 / 3, 1 / 2, 1 / 3, 1 / 4, 1 / 3, 1 / 4, 1 / 5]);
    const diagonal = inverseDiagonal(cholesky(hilbert, 3), 3);
    expect(diagonal[0]).toBeCloseTo(9, 8);
    expect(diagonal[1]).toBeCloseTo(192, 6);
    expect(diagonal[2]).toBeCloseTo(180, 6);
  });

  it(
    'when the kernel is linear, then the process mean is ridge regression: slope Σxy / (Σx² + λ) ' +
      '(Rasmussen & Williams 2006, §2.1)',
    () => {
      const x = [-2, -1, 0, 1, 2];
      const y = [-3.9, -2.2, 0.1, 1.8, 4.2];
      const meanY = y.reduce((sum, value) => sum + value, 0) / y.length;
      const fit = fitGp(
        Int32Array.from([0, 1, 2, 3, 4]),
        Float64Array.from(y),
        Float64Array.from([1, 1, 1, 1, 1]),
        0.5,
        (i, j) => x[i] * x[j],
      );
      const slope =
        x.reduce((sum, value, i) => sum + value * (y[i] - meanY), 0) /
        (x.reduce((sum, value) => sum + value * value, 0) + 0.5);
      expect(
        predictGp(
          fit,
          Float64Array.from(x, (value) => value * 3),
          9,
        ).mean,
      ).toBeCloseTo(meanY + 3 * slope, 10);
    },
  );

  it(
    'when predicted RM values rise with strength, then pool-adjacent-violators levels them into a ' +
      'non-increasing curve (Barlow et al. 1972)',
    () => {
      expect(nonIncreasing([1, 2, 0.5], [1, 1, 1])).toEqual([1.5, 1.5, 0.5]);
      // (1·1 + 3·1.6) / 4 = 1.45 for the pooled pair.
      nonIncreasing([2, 1, 1.6, 0.2], [1, 1, 3, 1]).forEach((value, index) =>
        expect(value).toBeCloseTo([2, 1.45, 1.45, 0.2][index], 12),
      );
    },
  );

  it('when an eluent is placed, then a pair gets its strong fraction and Snyder ε°, a pure solvent its own ε° (catalogue)', () => {
    const position = positionOf(
      [
        { solvent: 'ethyl-acetate', parts: 1 },
        { solvent: 'hexanes', parts: 4 },
      ],
      'silica',
    );
    const strength = mixtureStrength(
      [
        { solvent: 'ethyl-acetate', parts: 1 },
        { solvent: 'hexanes', parts: 4 },
      ],
      'silica',
    );
    expect(position).toMatchObject({ kind: 'pair', key: 'hexanes|ethyl-acetate', strongFraction: 0.2 });
    expect(strength.ok && position?.epsilon).toBeCloseTo(strength.ok ? strength.epsilon : Number.NaN, 10);
    expect(positionOf([{ solvent: 'ethyl-acetate', parts: 1 }], 'silica')).toMatchObject({
      kind: 'pure',
      epsilon: 0.48,
    });
    expect(
      positionOf(
        [
          { solvent: 'water', parts: 1 },
          { solvent: 'acetonitrile', parts: 1 },
        ],
        'silica',
      ),
    ).toBeNull();
  });
});

describe('a retention curve that can bend (issue 26, rule 5)', () => {
  it(
    'when one compound ran at Rf 0.16, 0.41 and 0.70 in 1 : 5, 1 : 1 and 5 : 1 Et2O : hexane, then ' +
      'its own curve bends through all three while no straight line can',
    () => {
      // A fact of the trade (common practice, no source) quoted in issue 26.
      const plates = [
        [1, 5, 0.16],
        [1, 1, 0.41],
        [5, 1, 0.7],
      ].map(([strong, weak, rf]) => {
        const position = positionOf(
          [
            { solvent: 'diethyl-ether', parts: strong },
            { solvent: 'hexanes', parts: weak },
          ],
          'silica',
        );
        return { epsilon: position!.epsilon, rm: rfToRm(rf), rf };
      });
      const centre = plates[1].epsilon;
      const curve = fitLine(plates, -5, centre);
      expect(curve.c).not.toBe(0);
      for (const plate of plates) expect(Math.abs(rmToRf(lineAt(curve, plate.epsilon)) - plate.rf)).toBeLessThan(0.03);
      // Any two points through a straight line miss the third: by 0.10–0.15 Rf in log φ (issue 26), by 0.099 or more in ε°.
      for (const [i, j, k] of [
        [0, 1, 2],
        [0, 2, 1],
        [1, 2, 0],
      ]) {
        const slope = (plates[j].rm - plates[i].rm) / (plates[j].epsilon - plates[i].epsilon);
        const straight = rmToRf(plates[i].rm + slope * (plates[k].epsilon - plates[i].epsilon));
        expect(Math.abs(straight - plates[k].rf)).toBeGreaterThan(0.09);
      }
      // Two plates give a straight line (Soczewiński's relation with the pooled slope prior).
      expect(fitLine(plates.slice(0, 2), -5, centre).c).toBe(0);
    },
  );
});

describe('Scout on a small knowledge set', () => {
  const ester = compound(1, 'CCOC(=O)c1ccc(C)cc1');
  const others = [
    compound(2, 'CCOC(=O)c1ccccc1'),
    compound(3, 'CCOC(=O)c1ccc(Cl)cc1'),
    compound(4, 'COC(=O)c1ccc(C)cc1'),
    compound(5, 'CCOC(=O)c1ccc(OC)cc1'),
  ];
  // A fact of the trade (common practice, no source): one compound ran at Rf 0.41 in 1 : 1 Et2O : hexane,
  // 0.16 at 1 : 5 and 0.70 at 5 : 1. The other esters' values are invented around it for the test.
  const measurements: ScoutMeasurement[] = [
    plate(1, 'diethyl-ether', 'hexanes', 1, 1, 0.41),
    plate(1, 'diethyl-ether', 'hexanes', 1, 5, 0.16),
    plate(1, 'diethyl-ether', 'hexanes', 5, 1, 0.7),
    ...others.flatMap((item, index) => [
      plate(item.id, 'diethyl-ether', 'hexanes', 1, 1, 0.35 + 0.04 * index),
      plate(item.id, 'diethyl-ether', 'hexanes', 1, 5, 0.12 + 0.02 * index),
      plate(item.id, 'diethyl-ether', 'hexanes', 5, 1, 0.62 + 0.04 * index),
    ]),
  ];
  const knowledge: KnowledgeSet = { version: 'test', compounds: [ester, ...others], measurements };

  it(
    'when the compound itself was recorded, then its three Rf values come back within 0.1 and the ' +
      'ratio for Rf 0.2 lies between 1 : 5 and 1 : 1',
    () => {
      const model = buildScoutModel(knowledge);
      for (const [strong, weak, rf] of [
        [1, 1, 0.41],
        [1, 5, 0.16],
        [5, 1, 0.7],
      ]) {
        const predicted = predictRf(model, asQuery(ester), 'silica-gel', [
          { solvent: 'diethyl-ether', parts: strong },
          { solvent: 'hexanes', parts: weak },
        ]);
        expect(Math.abs((predicted?.rf ?? Number.NaN) - rf)).toBeLessThan(0.1);
      }
      const result = scout(model, asQuery(ester), {
        targetRf: 0.2,
        solventPair: { weak: 'hexanes', strong: 'diethyl-ether' },
      });
      expect(result.suggestion?.strongPercent).toBeGreaterThan(100 / 6);
      expect(result.suggestion?.strongPercent).toBeLessThan(50);
    },
  );

  it('when the compound is left out, then its neighbours still place Rf 0.3 between 1 : 5 and 1 : 1 Et2O : hexane', () => {
    const model = buildScoutModel({
      ...knowledge,
      compounds: others,
      measurements: measurements.filter((item) => item.compoundId !== 1),
    });
    const result = scout(model, asQuery(ester), { solventPair: { weak: 'hexanes', strong: 'diethyl-ether' } });
    expect(result.neighbours[0].similarity).toBeGreaterThan(0.5);
    expect(result.suggestion?.strongPercent).toBeGreaterThan(100 / 6);
    expect(result.suggestion?.strongPercent).toBeLessThanOrEqual(50);
  });

  it('when even the pure strong solvent leaves a compound low, then the suggestion says it is too polar for the pair', () => {
    const polar = compound(9, 'OCC(O)CO');
    const set: KnowledgeSet = {
      version: 'polar',
      compounds: [polar, ...others],
      measurements: [
        ...measurements.filter((item) => item.compoundId !== 1),
        plate(9, 'diethyl-ether', 'hexanes', 1, 0, 0.03),
        plate(9, 'diethyl-ether', 'hexanes', 5, 1, 0.02),
      ],
    };
    const result = scout(buildScoutModel(set), asQuery(polar), {
      solventPair: { weak: 'hexanes', strong: 'diethyl-ether' },
    });
    expect(result.suggestion?.reach).toBe('too-polar');
    expect(result.suggestion?.strongPercent).toBe(100);
    expect(result.confidence.level).toBe('low');
  });

  it(
    'when the preferred pair was never recorded, then the ratio is translated at equal ε° from a ' +
      'recorded pair and marked low confidence',
    () => {
      const result = scout(buildScoutModel(knowledge), asQuery(others[0]), {
        solventPair: { weak: 'hexanes', strong: 'ethyl-acetate' },
      });
      expect(result.suggestion?.borrowedFrom).toMatchObject({ weak: 'hexanes', strong: 'diethyl-ether' });
      expect(result.confidence.level).toBe('low');
      expect(result.evidence.map((line) => line.quantity)).toContain('pair translation');
    },
  );

  it(
    'when the compound and its neighbours were only ever run in DCM/MeOH, then Scout suggests DCM/MeOH, ' +
      'not a weakly evidenced alkane pair',
    () => {
      // Invented values for the test: polar anilides recorded at three DCM/MeOH ratios (common practice for such compounds).
      const anilides = [
        compound(21, 'CC(=O)Nc1ccc(O)cc1'),
        compound(22, 'CC(=O)Nc1ccc(OC)cc1'),
        compound(23, 'CC(=O)Nc1ccc(N)cc1'),
        compound(24, 'CCC(=O)Nc1ccc(O)cc1'),
      ];
      const polarPlates = anilides.flatMap((item, index) => [
        plate(item.id, 'methanol', 'dichloromethane', 1, 30, 0.12 + 0.02 * index),
        plate(item.id, 'methanol', 'dichloromethane', 1, 10, 0.3 + 0.02 * index),
        plate(item.id, 'methanol', 'dichloromethane', 1, 5, 0.5 + 0.02 * index),
      ]);
      const set: KnowledgeSet = {
        version: 'mixed',
        compounds: [ester, ...others, ...anilides],
        measurements: [...measurements, ...polarPlates],
      };
      const result = scout(buildScoutModel(set), { ...asQuery(anilides[0]), id: anilides[0].id });
      expect(result.suggestion?.pair).toMatchObject({ weak: 'dichloromethane', strong: 'methanol' });
      // Rule 1 of issue 26: the compound's own plate nearest Rf 0.3 (1 : 10, Rf 0.30) comes first, not the model's guess.
      expect(result.firstPlate).toMatchObject({ source: 'recorded', rf: 0.3 });
      expect(result.firstPlate?.components).toEqual([
        { solvent: 'methanol', parts: 1 },
        { solvent: 'dichloromethane', parts: 10 },
      ]);
    },
  );

  it('when nothing has been recorded yet, then there is no suggestion, a reason why, and no neighbours', () => {
    const result = scout(buildScoutModel({ version: 'empty', compounds: [], measurements: [] }), asQuery(ester));
    expect(result.suggestion).toBeNull();
    expect(result.noSuggestion).toMatch(/No Rf has been recorded/);
    expect(result.neighbours).toEqual([]);
    expect(result.confidence.level).toBe('low');
  });
});
