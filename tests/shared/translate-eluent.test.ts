import { describe, expect, it } from 'vitest';
import { mixtureStrength } from '../../shared/domain/eluent-strength';
import { translateEluent, type TranslationTarget } from '../../shared/domain/translate-eluent';

const side = (solvent: string) => [{ solvent, parts: 1 }];
const fractionOf = (components: { solvent: string; parts: number }[], solvent: string) =>
  (components.find((part) => part.solvent === solvent)?.parts ?? 0) /
  components.reduce((sum, part) => sum + part.parts, 0);

describe('eluent translation at equal Snyder strength', () => {
  it('turns hexanes/EtOAc 4:1 into heptane/EtOAc of the same ε° and back into 4:1', () => {
    const heptane: TranslationTarget = { weak: side('heptane'), strong: side('ethyl-acetate') };
    const there = translateEluent(
      [
        { solvent: 'hexanes', parts: 4 },
        { solvent: 'ethyl-acetate', parts: 1 },
      ],
      heptane,
    );
    if (!there.ok) throw new Error(there.message);
    expect(there.target.epsilon).toBeCloseTo(there.source.epsilon, 9);
    const back = translateEluent(there.target.components, { weak: side('hexanes'), strong: side('ethyl-acetate') });
    if (!back.ok) throw new Error(back.message);
    expect(fractionOf(back.target.components, 'ethyl-acetate')).toBeCloseTo(0.2, 6);
  });

  it('turns DCM/MeOH 19:1 into EtOAc/EtOH and back (greener swap, common practice)', () => {
    const there = translateEluent(
      [
        { solvent: 'dichloromethane', parts: 19 },
        { solvent: 'methanol', parts: 1 },
      ],
      { weak: side('ethyl-acetate'), strong: side('ethanol') },
    );
    if (!there.ok) throw new Error(there.message);
    expect(there.reach).toBe('within');
    const back = translateEluent(there.target.components, { weak: side('dichloromethane'), strong: side('methanol') });
    if (!back.ok) throw new Error(back.message);
    expect(fractionOf(back.target.components, 'methanol')).toBeCloseTo(0.05, 6);
  });

  it('translates into a pair whose strong side is a blend, heptane with EtOAc/EtOH 3:1', () => {
    const result = translateEluent(
      [
        { solvent: 'dichloromethane', parts: 9 },
        { solvent: 'methanol', parts: 1 },
      ],
      {
        weak: side('heptane'),
        strong: [
          { solvent: 'ethyl-acetate', parts: 3 },
          { solvent: 'ethanol', parts: 1 },
        ],
      },
    );
    if (!result.ok) throw new Error(result.message);
    expect(
      fractionOf(result.target.components, 'ethyl-acetate') / fractionOf(result.target.components, 'ethanol'),
    ).toBeCloseTo(3, 9);
    const check = mixtureStrength(result.target.components, 'silica');
    expect(check.ok && check.epsilon).toBeCloseTo(result.source.epsilon, 6);
  });

  it('lists the hazards of the solvents on both sides', () => {
    const result = translateEluent(
      [
        { solvent: 'hexanes', parts: 9 },
        { solvent: 'diethyl-ether', parts: 1 },
      ],
      { weak: side('heptane'), strong: side('mtbe') },
    );
    if (!result.ok) throw new Error(result.message);
    expect(result.hazards.source.map((entry) => entry.solvent)).toEqual(['hexanes', 'diethyl-ether']);
    expect(result.hazards.source[1].hazards).toContain('peroxide-former');
    expect(result.hazards.target.map((entry) => entry.solvent)).toEqual(['heptane', 'mtbe']);
  });

  it('warns when the target pair cannot reach the strength, and gives its strongest mixture', () => {
    const result = translateEluent(
      [
        { solvent: 'dichloromethane', parts: 1 },
        { solvent: 'methanol', parts: 1 },
      ],
      { weak: side('hexanes'), strong: side('diethyl-ether') },
    );
    if (!result.ok) throw new Error(result.message);
    expect(result.reach).toBe('above-range');
    expect(result.target.strongVolumeFraction).toBe(1);
    expect(result.warnings.join(' ')).toMatch(/cannot reach/);
  });

  it('always reminds that equal strength is not equal selectivity (common practice)', () => {
    const result = translateEluent(
      [
        { solvent: 'hexanes', parts: 3 },
        { solvent: 'ethyl-acetate', parts: 1 },
      ],
      { weak: side('toluene'), strong: side('acetone') },
    );
    expect(result.ok && result.warnings.some((warning) => /selectivity/.test(warning))).toBe(true);
  });

  it('refuses a pair with a solvent that has no known ε°, naming it', () => {
    expect(
      translateEluent(
        [
          { solvent: 'hexanes', parts: 1 },
          { solvent: 'ethyl-acetate', parts: 1 },
        ],
        { weak: side('heptane'), strong: side('isopropyl-acetate') },
      ),
    ).toMatchObject({ ok: false, missing: ['isopropyl-acetate'] });
  });
});
