import { describe, expect, it } from 'vitest';
import {
  compareConditions,
  compareMixtures,
  conditionScore,
  relativeDifference,
  type ComparableConditions,
} from '../../shared/domain/duplicate-conditions';

// Thresholds are the curation brief's own (ratio within 5 % relative, target Rf within 0.05), not a published standard.
const base: ComparableConditions = {
  technique: 'tlc',
  stationaryPhase: 'silica-gel',
  stationaryPhaseOther: null,
  eluent: {
    components: [
      { solvent: 'ethyl-acetate', parts: 1 },
      { solvent: 'hexanes', parts: 4 },
    ],
    additives: [],
    mode: 'isocratic',
  },
  targetRf: 0.3,
  notebookRef: null,
};
const withRatio = (ea: number, hex: number, extra: Partial<ComparableConditions> = {}): ComparableConditions => ({
  ...base,
  eluent: {
    ...base.eluent,
    components: [
      { solvent: 'ethyl-acetate', parts: ea },
      { solvent: 'hexanes', parts: hex },
    ],
  },
  ...extra,
});

describe('compareMixtures', () => {
  it(
    'compares a two-solvent eluent on its strong solvent: EtOAc over hexanes on silica (Snyder ε° on ' +
      'silica 0.48 vs 0.01 in the solvent catalogue: confirmed and from memory)',
    () => {
      const result = compareMixtures(
        withRatio(1, 4).eluent.components,
        withRatio(1, 3.8).eluent.components,
        'silica-gel',
      );
      expect(result.basis).toBe('strong-solvent');
      expect(result.compared.map((item) => item.solvent)).toEqual(['ethyl-acetate']);
      // 1 : 4 is 20 % v/v, 1 : 3.8 is 20.83 % v/v: 0.83 / 20.83 = 4.0 % relative, inside 5 %.
      expect(result.compared[0].relative).toBeCloseTo(0.04, 6);
      expect(result.within).toBe(true);
    },
  );

  it('refuses 1 : 4 against 1 : 3 (20 % vs 25 % v/v, 20 % relative) and 2 % against 7 % MeOH in CH2Cl2', () => {
    expect(
      compareMixtures(withRatio(1, 4).eluent.components, withRatio(1, 3).eluent.components, 'silica-gel').within,
    ).toBe(false);
    const dcm = (methanol: number) => [
      { solvent: 'dichloromethane', parts: 100 - methanol },
      { solvent: 'methanol', parts: methanol },
    ];
    expect(compareMixtures(dcm(2), dcm(7), 'silica-gel').within).toBe(false);
    expect(compareMixtures(dcm(5), dcm(5.2), 'silica-gel').within).toBe(true);
  });

  it('ignores how the parts are scaled: 2 : 8 equals 1 : 4', () => {
    expect(
      compareMixtures(withRatio(2, 8).eluent.components, withRatio(1, 4).eluent.components, 'silica-gel').maxRelative,
    ).toBe(0);
  });

  it('compares every component of a three-solvent eluent', () => {
    const mix = (methanol: number) => [
      { solvent: 'dichloromethane', parts: 90 },
      { solvent: 'methanol', parts: methanol },
      { solvent: 'water', parts: 1 },
    ];
    const close = compareMixtures(mix(9), mix(9.3), 'silica-gel');
    expect(close.basis).toBe('every-component');
    expect(close.compared).toHaveLength(3);
    expect(close.within).toBe(true);
    expect(compareMixtures(mix(9), mix(12), 'silica-gel').within).toBe(false);
  });

  it('never matches different solvents, whatever the ratio', () => {
    const result = compareMixtures(
      withRatio(1, 4).eluent.components,
      [
        { solvent: 'diethyl-ether', parts: 1 },
        { solvent: 'hexanes', parts: 4 },
      ],
      'silica-gel',
    );
    expect(result).toMatchObject({ sameSolvents: false, within: false });
  });

  it('measures relative difference against the larger value', () => {
    expect(relativeDifference(0.2, 0.25)).toBeCloseTo(0.2, 12);
    expect(relativeDifference(0, 0)).toBe(0);
  });
});

describe('compareConditions', () => {
  it('calls two entries of one plate a duplicate when phase, mode, solvents, ratio (5 %) and target Rf (0.05) agree', () => {
    const result = compareConditions(base, withRatio(1, 3.9, { targetRf: 0.33 }));
    expect(result.duplicate).toBe(true);
    expect(result.rfDifference).toBeCloseTo(0.03, 12);
    expect(result.score).toBeGreaterThan(0.5);
  });

  it('does not when the target Rf differs by more than 0.05, the phase differs, or either record has no target Rf', () => {
    expect(compareConditions(base, { ...base, targetRf: 0.36 }).duplicate).toBe(false);
    expect(compareConditions(base, { ...base, stationaryPhase: 'alumina-neutral' }).duplicate).toBe(false);
    expect(compareConditions(base, { ...base, targetRf: null }).duplicate).toBe(false);
    expect(compareConditions(base, { ...base, eluent: { ...base.eluent, mode: 'gradient' } }).duplicate).toBe(false);
  });

  it('scores an identical entry with the same notebook page 1.0 and lowers the score for other additives or technique', () => {
    const page = { ...base, notebookRef: 'JS-12-045' };
    expect(compareConditions(page, { ...page, notebookRef: ' js-12-045 ' }).score).toBe(1);
    const withBase = { ...base, eluent: { ...base.eluent, additives: [{ additive: 'triethylamine', percent: 1 }] } };
    expect(compareConditions(base, withBase).score).toBe(0.85);
    expect(compareConditions(base, { ...base, technique: 'flash' }).score).toBe(0.9);
  });

  it('lowers the score as the records drift towards the tolerances', () => {
    expect(conditionScore(0, 0, { additives: true, technique: true, notebookRef: false })).toBe(0.95);
    expect(conditionScore(0.05, 0, { additives: true, technique: true, notebookRef: false })).toBe(0.65);
    expect(conditionScore(0.025, 0.01, { additives: true, technique: true, notebookRef: false })).toBe(0.8);
  });
});
