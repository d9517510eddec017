import { describe, expect, it } from 'vitest';
import { additives } from '../../shared/catalogue/additives';
import { NameIndex } from '../../shared/catalogue/lookup';
import { requireSolvent, solventByKey, solvents } from '../../shared/catalogue/solvents';
import { stains } from '../../shared/catalogue/stains';

// IUPAC CIAAW standard atomic weights, conventional values (ciaaw.org; see docs/references.md).
const atomicWeights: Record<string, number> = { H: 1.008, C: 12.011, N: 14.007, O: 15.999, Cl: 35.45 };

function formulaMass(formula: string): number {
  let mass = 0;
  for (const [, element, count] of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) {
    if (!(element in atomicWeights)) throw new Error(`No atomic weight for ${element}`);
    mass += atomicWeights[element] * (count ? Number(count) : 1);
  }
  return mass;
}

// The compound class keys the chemistry catalogue defines (brief for compound-classes.ts).
const classKeys = new Set([
  'carboxylic-acid',
  'ester',
  'lactone',
  'amide',
  'lactam',
  'carbamate',
  'urea',
  'primary-amine',
  'secondary-amine',
  'tertiary-amine',
  'aniline',
  'pyridine',
  'indole',
  'imidazole',
  'heteroaromatic',
  'aromatic',
  'alcohol',
  'phenol',
  'diol',
  'ether',
  'acetal',
  'aldehyde',
  'ketone',
  'alkene',
  'alkyne',
  'nitrile',
  'nitro',
  'aryl-halide',
  'alkyl-halide',
  'sulfonamide',
  'sulfone',
  'sulfide',
  'thiol',
  'boronic',
  'silyl-ether',
  'epoxide',
  'ammonium-salt',
  'amino-acid',
  'phosphine-oxide',
  'conjugated',
]);

describe('solvent catalogue', () => {
  it('lists at least twenty chromatography solvents with unique keys', () => {
    expect(solvents.length).toBeGreaterThanOrEqual(20);
    expect(new Set(solvents.map((solvent) => solvent.key)).size).toBe(solvents.length);
  });

  it('gives every pure solvent the molar mass of its formula (IUPAC CIAAW conventional atomic weights)', () => {
    for (const solvent of solvents.filter((entry) => entry.formula !== null)) {
      expect(solvent.molarMassGPerMol, solvent.key).toBeCloseTo(formulaMass(solvent.formula as string), 1);
    }
  });

  it('keeps densities and boiling points in the range of liquid organic solvents (handbook values, from memory)', () => {
    for (const solvent of solvents) {
      expect(solvent.densityGPerMl, solvent.key).toBeGreaterThan(0.6);
      expect(solvent.densityGPerMl, solvent.key).toBeLessThan(1.6);
      expect(solvent.boilingPointC, solvent.key).toBeGreaterThan(30);
      expect(solvent.boilingPointC, solvent.key).toBeLessThan(200);
    }
  });

  it.each([
    // Alumina: Snyder's eluotropic series (Snyder 1968, Principles of Adsorption Chromatography).
    ['pentane', 'alumina', 0.0, /^Snyder 1968/],
    ['hexanes', 'alumina', 0.01, /^Snyder 1968/],
    ['heptane', 'alumina', 0.01, /^Snyder 1968/],
    ['cyclohexane', 'alumina', 0.04, /^Snyder 1968/],
    ['toluene', 'alumina', 0.29, /^Snyder 1968/],
    ['diethyl-ether', 'alumina', 0.38, /^Snyder 1968/],
    ['ethyl-acetate', 'alumina', 0.58, /^Snyder 1968/],
    // Silica: P. C. Sadek, The Illustrated Pocket Dictionary of Chromatography, p. 74.
    ['diethyl-ether', 'silica', 0.43, /^Sadek, .*p\. 74/],
    ['ethyl-acetate', 'silica', 0.48, /^Sadek, .*p\. 74/],
  ] as const)('gives %s on %s the published ε° %s and cites it', (key, adsorbent, value, citation) => {
    const strength = requireSolvent(key).strength[adsorbent];
    expect(strength?.value).toBe(value);
    expect(strength?.provenance).toBe('confirmed');
    expect(strength?.source).toMatch(citation);
  });

  it.each([
    // Snyder ε° recalled from memory (no published table checked): the recalled value or range
    ['toluene', 'silica', 0.22, 0.22],
    ['dichloromethane', 'alumina', 0.42, 0.42],
    ['dichloromethane', 'silica', 0.3, 0.32],
    ['acetone', 'alumina', 0.56, 0.56],
    ['acetone', 'silica', 0.53, 0.53],
    ['acetonitrile', 'alumina', 0.65, 0.65],
    ['acetonitrile', 'silica', 0.52, 0.52],
    ['isopropanol', 'alumina', 0.82, 0.82],
    ['isopropanol', 'silica', 0.6, 0.6],
    ['methanol', 'alumina', 0.95, 0.95],
    ['methanol', 'silica', 0.7, 0.73],
  ] as const)('labels %s on %s as from memory within the recalled %s–%s', (key, adsorbent, low, high) => {
    const strength = requireSolvent(key).strength[adsorbent];
    expect(strength?.value).toBeGreaterThanOrEqual(low);
    expect(strength?.value).toBeLessThanOrEqual(high);
    expect(strength?.provenance).toBe('from-memory');
    expect(strength?.source).toMatch(/from memory/);
  });

  it.each([
    ['ethyl-acetate', 5.2],
    ['dichloromethane', 4.1],
    ['diethyl-ether', 4.5],
    ['acetone', 4.2],
    ['acetonitrile', 3.1],
  ] as const)('gives %s the adsorbed area n_b %s, labelled from memory (Snyder’s n_b, recalled)', (key, area) => {
    expect(requireSolvent(key).adsorbedArea).toMatchObject({ value: area, provenance: 'from-memory' });
  });

  it('says where every ε° value comes from', () => {
    for (const solvent of solvents) {
      for (const strength of Object.values(solvent.strength)) {
        const cited = /^(Snyder 1968|Sadek, |Snyder ε° from memory|from memory|estimate)/;
        if (strength) expect(strength.source, solvent.key).toMatch(cited);
      }
    }
  });

  it('offers heptane for hexanes and greener swaps for ethers and DCM/MeOH (common practice)', () => {
    const swaps = (key: string) =>
      requireSolvent(key).greenerAlternatives.map((swap) => swap.solvents.map((part) => part.solvent).join('+'));
    expect(swaps('hexanes')).toContain('heptane');
    expect(swaps('diethyl-ether')).toEqual(expect.arrayContaining(['mtbe', '2-methyltetrahydrofuran', 'cpme']));
    expect(swaps('tetrahydrofuran')).toEqual(expect.arrayContaining(['2-methyltetrahydrofuran', 'cpme']));
    expect(swaps('methanol')).toContain('ethyl-acetate+ethanol');
    for (const solvent of solvents) {
      for (const swap of solvent.greenerAlternatives)
        for (const part of swap.solvents) expect(solventByKey(part.solvent)?.key, part.solvent).toBe(part.solvent);
    }
  });

  it('marks the usual peroxide formers and suspected carcinogens (common practice)', () => {
    for (const key of ['diethyl-ether', 'tetrahydrofuran', 'dioxane'])
      expect(requireSolvent(key).hazards).toContain('peroxide-former');
    for (const key of ['dichloromethane', 'chloroform'])
      expect(requireSolvent(key).hazards).toContain('carcinogen-suspect');
    expect(requireSolvent('benzene').hazards).toContain('carcinogen');
  });
});

describe('additive and stain catalogues', () => {
  it('pairs bases with amines and acids with carboxylic acids (common practice)', () => {
    const purpose = (key: string) => additives.find((additive) => additive.key === key);
    expect(purpose('triethylamine')).toMatchObject({ purpose: 'base' });
    expect(purpose('triethylamine')?.helpsClasses).toContain('primary-amine');
    expect(purpose('acetic-acid')).toMatchObject({ purpose: 'acid' });
    expect(purpose('acetic-acid')?.helpsClasses).toContain('carboxylic-acid');
  });

  it('refers only to compound class keys the chemistry catalogue defines', () => {
    for (const stain of stains)
      for (const key of stain.detects) expect(classKeys.has(key), `${stain.key}: ${key}`).toBe(true);
    for (const additive of additives)
      for (const key of additive.helpsClasses) expect(classKeys.has(key), `${additive.key}: ${key}`).toBe(true);
  });

  it.each([
    // Standard TLC stain tables (common practice; no published source recorded, see docs/references.md)
    ['kmno4', 'alkene'],
    ['ninhydrin', 'primary-amine'],
    ['ninhydrin', 'amino-acid'],
    ['dnp', 'ketone'],
    ['dnp', 'aldehyde'],
    ['bromocresol-green', 'carboxylic-acid'],
  ])('records that %s shows %s, cited as common practice', (stainKey, classKey) => {
    const stain = stains.find((entry) => entry.key === stainKey);
    expect(stain?.detects).toContain(classKey);
    expect(stain?.source).toMatch(/^common practice/);
  });

  it('never lets one name mean both a solvent and an additive', () => {
    expect(() => new NameIndex([...solvents, ...additives])).not.toThrow();
  });
});
