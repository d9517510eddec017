import { describe, expect, it } from 'vitest';
import { solvents } from '../../shared/catalogue/solvents';
import type { Adsorbent } from '../../shared/catalogue/types';
import {
  adsorbedArea,
  defaultActivity,
  mixtureFractions,
  mixtureStrength,
  moleFractionFromVolume,
  snyderBinaryStrength,
  volumeFractionForStrength,
  volumeFractionFromMole,
} from '../../shared/domain/eluent-strength';

const pair = (weak: string, strong: string, strongFraction: number) => [
  { solvent: weak, parts: 1 - strongFraction },
  { solvent: strong, parts: strongFraction },
];

const epsilon = (mixture: { solvent: string; parts: number }[], adsorbent: Adsorbent) => {
  const result = mixtureStrength(mixture, adsorbent);
  if (!result.ok) throw new Error(result.message);
  return result.epsilon;
};

describe('volume fractions to mole fractions (density and molar mass from the catalogue, handbook values from memory)', () => {
  it('turns hexanes/EtOAc 1:1 by volume into 0.572 mole fraction EtOAc', () => {
    // n = V·ρ/M: EtOAc 0.902/88.11 = 0.010237, hexane 0.659/86.18 = 0.0076468 mol per mL
    const [, ethylAcetate] = mixtureFractions(pair('hexanes', 'ethyl-acetate', 0.5));
    expect(ethylAcetate.volumeFraction).toBe(0.5);
    expect(ethylAcetate.moleFraction).toBeCloseTo(0.010237 / (0.010237 + 0.0076468), 4);
  });

  it('converts back from mole to volume fraction', () => {
    for (const fraction of [0.01, 0.1, 0.33, 0.5, 0.9]) {
      const mole = moleFractionFromVolume('dichloromethane', 'methanol', fraction);
      expect(volumeFractionFromMole('dichloromethane', 'methanol', mole)).toBeCloseTo(fraction, 12);
    }
  });
});

describe('Snyder solvent strength of mixtures (Snyder 1968; equation from memory)', () => {
  it.each(['silica', 'alumina'] as const)('gives each pure solvent exactly its catalogue ε° on %s', (adsorbent) => {
    const withValues = solvents.filter((solvent) => solvent.strength[adsorbent]);
    expect(withValues.length).toBeGreaterThan(12);
    for (const solvent of withValues) {
      expect(epsilon([{ solvent: solvent.key, parts: 1 }], adsorbent), solvent.key).toBeCloseTo(
        solvent.strength[adsorbent]?.value as number,
        12,
      );
    }
  });

  it.each([
    // Published values: silica from Sadek, Illustrated Pocket Dictionary of Chromatography, p. 74; alumina from
    // Snyder's eluotropic series (Snyder 1968).
    ['ethyl-acetate', 'silica', 0.48],
    ['diethyl-ether', 'silica', 0.43],
    ['ethyl-acetate', 'alumina', 0.58],
    ['diethyl-ether', 'alumina', 0.38],
    ['toluene', 'alumina', 0.29],
    ['pentane', 'alumina', 0],
  ] as const)('gives pure %s on %s its published ε° %s', (solvent, adsorbent, published) => {
    expect(epsilon([{ solvent, parts: 1 }], adsorbent)).toBeCloseTo(published, 9);
  });

  it('gives either pure end of a pair its catalogue ε°', () => {
    expect(epsilon(pair('hexanes', 'ethyl-acetate', 0), 'silica')).toBeCloseTo(0.01, 12);
    expect(epsilon(pair('hexanes', 'ethyl-acetate', 1), 'silica')).toBeCloseTo(0.48, 12);
  });

  it.each([
    ['hexanes', 'ethyl-acetate', 'silica'],
    ['hexanes', 'diethyl-ether', 'silica'],
    ['dichloromethane', 'methanol', 'silica'],
    ['toluene', 'acetone', 'silica'],
    ['heptane', 'ethanol', 'silica'],
    ['pentane', 'dichloromethane', 'alumina'],
    ['hexanes', 'ethyl-acetate', 'alumina'],
    ['chloroform', 'methanol', 'alumina'],
  ] as const)('rises monotonically with the fraction of %s → %s on %s', (weak, strong, adsorbent) => {
    let previous = -Infinity;
    for (let step = 0; step <= 200; step += 1) {
      const value = epsilon(pair(weak, strong, step / 200), adsorbent);
      expect(value).toBeGreaterThan(previous);
      previous = value;
    }
  });

  it('uses Snyder’s binary equation unchanged for two solvents', () => {
    const moleFraction = moleFractionFromVolume('hexanes', 'ethyl-acetate', 0.2);
    const expected = snyderBinaryStrength(0.01, 0.48, moleFraction, 5.2, defaultActivity.silica.value);
    expect(epsilon(pair('hexanes', 'ethyl-acetate', 0.2), 'silica')).toBeCloseTo(expected, 12);
  });

  it('lets a little polar solvent raise the strength far more than its share (the curve of Snyder’s equation)', () => {
    const fivePercent = epsilon(pair('hexanes', 'ethyl-acetate', 0.05), 'silica');
    const linear = 0.01 + 0.05 * (0.48 - 0.01);
    expect(fivePercent).toBeGreaterThan(2 * linear);
  });

  it('puts a three-solvent eluent between its weakest and strongest solvents and above the same mixture without methanol', () => {
    const ternary = epsilon(
      [
        { solvent: 'hexanes', parts: 5 },
        { solvent: 'dichloromethane', parts: 4 },
        { solvent: 'methanol', parts: 1 },
      ],
      'silica',
    );
    const binary = epsilon(
      [
        { solvent: 'hexanes', parts: 5 },
        { solvent: 'dichloromethane', parts: 4 },
      ],
      'silica',
    );
    expect(ternary).toBeGreaterThan(binary);
    expect(ternary).toBeLessThan(0.715);
  });

  it('says which solvent lacks an ε° instead of guessing', () => {
    const result = mixtureStrength(pair('heptane', '2-methyltetrahydrofuran', 0.3), 'silica');
    expect(result).toMatchObject({ ok: false, missing: ['2-methyltetrahydrofuran'] });
  });

  it('labels an adsorbed area estimated from molar volume as an estimate', () => {
    expect(adsorbedArea('ethanol').provenance).toBe('estimate');
    expect(adsorbedArea('ethyl-acetate')).toMatchObject({ value: 5.2, provenance: 'from-memory' });
  });
});

describe('the volume fraction that gives a target strength', () => {
  it('inverts the strength of hexanes/EtOAc and DCM/MeOH mixtures', () => {
    for (const [weak, strong] of [
      ['hexanes', 'ethyl-acetate'],
      ['dichloromethane', 'methanol'],
    ]) {
      for (const fraction of [0.02, 0.1, 0.25, 0.5, 0.8]) {
        const target = epsilon(pair(weak, strong, fraction), 'silica');
        const solution = volumeFractionForStrength(weak, strong, target, 'silica');
        expect(solution).toMatchObject({ ok: true, reach: 'within' });
        if (solution.ok) expect(solution.strongVolumeFraction).toBeCloseTo(fraction, 9);
      }
    }
  });

  it('flags a target stronger than the pure strong solvent and clamps to it', () => {
    expect(volumeFractionForStrength('hexanes', 'diethyl-ether', 0.6, 'silica')).toMatchObject({
      ok: true,
      strongVolumeFraction: 1,
      reach: 'above-range',
    });
  });

  it('flags a target weaker than the pure weak solvent and clamps to it', () => {
    expect(volumeFractionForStrength('dichloromethane', 'methanol', 0.1, 'silica')).toMatchObject({
      ok: true,
      strongVolumeFraction: 0,
      reach: 'below-range',
    });
  });
});
