import { describe, expect, it } from 'vitest';
import { eluentSummary, strongPercentOf, strongSolventOf } from '../../shared/domain/eluent-summary';

const pair = (a: string, pa: number, b: string, pb: number) => [
  { solvent: a, parts: pa },
  { solvent: b, parts: pb },
];

describe('eluent summary', () => {
  it(
    'when EtOAc and hexanes are mixed 1 : 4 on silica, then EtOAc is the strong solvent at 20 % v/v ' +
      '(ε° on silica 0.48, Sadek p. 74, vs 0.01 from memory)',
    () => {
      expect(strongSolventOf(pair('hexanes', 4, 'ethyl-acetate', 1), 'silica-gel')).toBe('ethyl-acetate');
      expect(strongPercentOf(pair('ethyl-acetate', 1, 'hexanes', 4), 'silica-gel')).toBeCloseTo(20, 10);
    },
  );

  it(
    'when MeOH is added to DCM, then MeOH is the strong solvent whichever order the solvents are ' +
      'written in (Snyder ε° on silica about 0.7 vs 0.3, from memory)',
    () => {
      expect(strongSolventOf(pair('methanol', 1, 'dichloromethane', 9))).toBe('methanol');
      expect(strongSolventOf(pair('dichloromethane', 9, 'methanol', 1))).toBe('methanol');
    },
  );

  it('when water and MeCN run on C18, then MeCN is the strong solvent (reversed phase: water is the weak eluent, common practice)', () => {
    expect(strongSolventOf(pair('water', 7, 'acetonitrile', 3), 'c18')).toBe('acetonitrile');
    expect(strongPercentOf(pair('water', 7, 'acetonitrile', 3), 'c18')).toBeCloseTo(30, 10);
  });

  it('when a component has no known ε°, then no strong solvent is claimed', () => {
    expect(strongSolventOf(pair('isopropyl-acetate', 1, 'hexanes', 3))).toBeNull();
    expect(strongPercentOf(pair('isopropyl-acetate', 1, 'hexanes', 3))).toBeNull();
  });

  it(
    'when the eluent is a gradient with an additive, then the notation lists the steps with column ' +
      'volumes and the additive in % v/v',
    () => {
      const summary = eluentSummary(
        {
          components: pair('hexanes', 2, 'ethyl-acetate', 1),
          additives: [{ additive: 'triethylamine', percent: 1 }],
          mode: 'gradient',
          steps: [
            { components: pair('hexanes', 9, 'ethyl-acetate', 1), columnVolumes: 2 },
            { components: pair('hexanes', 2, 'ethyl-acetate', 1), columnVolumes: 5 },
          ],
        },
        'silica-gel',
      );
      expect(summary.notation).toBe('gradient hexanes : EtOAc 9 : 1 (2 CV) → hexanes : EtOAc 2 : 1 (5 CV) + 1% Et3N');
      expect(summary.strongPercent).toBeCloseTo(100 / 3, 10);
    },
  );
});
