import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatEluent, parseEluent } from '../../shared/domain/eluent-notation';
import { eluentSchema, type Eluent } from '../../shared/schemas/eluent';

/** Volume fraction of each solvent, so "1:4" and "20% … in …" compare equal. */
function fractions(components: Eluent['components']): Record<string, number> {
  const total = components.reduce((sum, part) => sum + part.parts, 0);
  return Object.fromEntries(components.map((part) => [part.solvent, Math.round((1000 * part.parts) / total) / 1000]));
}

function parsed(notation: string): Eluent {
  const result = parseEluent(notation);
  if (!result.ok) throw new Error(`${notation}: ${result.error.message}`);
  return result.eluent;
}

// Notations found in lab spreadsheets (issue 9; common practice).
describe('reading eluent notations from lab spreadsheets', () => {
  it.each([
    ['EtOAc/hexanes 1:4', { 'ethyl-acetate': 0.2, hexanes: 0.8 }],
    ['hexane:EtOAc, 9:1', { hexanes: 0.9, 'ethyl-acetate': 0.1 }],
    ['20% EtOAc in hexanes', { 'ethyl-acetate': 0.2, hexanes: 0.8 }],
    ['100% DCM', { dichloromethane: 1 }],
    ['EtOAc', { 'ethyl-acetate': 1 }],
    ['1:1 Et2O:hexane', { 'diethyl-ether': 0.5, hexanes: 0.5 }],
    ['5% MeOH/DCM', { methanol: 0.05, dichloromethane: 0.95 }],
    ['PE/EA 10:1', { 'petroleum-ether': 0.909, 'ethyl-acetate': 0.091 }],
    ['hexanes–EtOAc (3:1)', { hexanes: 0.75, 'ethyl-acetate': 0.25 }],
    ['ETOAC/HEXANES 1:4', { 'ethyl-acetate': 0.2, hexanes: 0.8 }],
    ['ethyl acetate / petroleum ether 1 : 2', { 'ethyl-acetate': 0.333, 'petroleum-ether': 0.667 }],
    ['Hex/EtOAc 4:1 (v/v)', { hexanes: 0.8, 'ethyl-acetate': 0.2 }],
    ['EtOAc 1 : hexanes 4', { 'ethyl-acetate': 0.2, hexanes: 0.8 }],
    ['petroleum ether (40–60)/EtOAc 5:1', { 'petroleum-ether': 0.833, 'ethyl-acetate': 0.167 }],
    ['CH2Cl2-MeOH 95:5', { dichloromethane: 0.95, methanol: 0.05 }],
    ['cyclohexane/AcOEt 7/3', { cyclohexane: 0.7, 'ethyl-acetate': 0.3 }],
  ])('reads "%s"', (notation, expected) => {
    const eluent = parsed(notation);
    expect(eluent.mode).toBe('isocratic');
    expect(eluent.additives).toEqual([]);
    expect(fractions(eluent.components)).toEqual(expected);
  });

  it('reads "DCM/MeOH 9:1 + 1% Et3N" with triethylamine as an additive', () => {
    const eluent = parsed('DCM/MeOH 9:1 + 1% Et3N');
    expect(fractions(eluent.components)).toEqual({ dichloromethane: 0.9, methanol: 0.1 });
    expect(eluent.additives).toEqual([{ additive: 'triethylamine', percent: 1 }]);
  });

  it('reads ammonia written inside the ratio, "DCM/MeOH/NH4OH 90:9:1", as 1% additive', () => {
    const eluent = parsed('DCM/MeOH/NH4OH 90:9:1');
    expect(fractions(eluent.components)).toEqual({ dichloromethane: 0.909, methanol: 0.091 });
    expect(eluent.additives).toEqual([{ additive: 'ammonia', percent: 1 }]);
  });

  it('reads "10% MeOH in CH2Cl2 with 0.5% AcOH"', () => {
    const eluent = parsed('10% MeOH in CH2Cl2 with 0.5% AcOH');
    expect(fractions(eluent.components)).toEqual({ methanol: 0.1, dichloromethane: 0.9 });
    expect(eluent.additives).toEqual([{ additive: 'acetic-acid', percent: 0.5 }]);
  });

  it.each([
    'EtOAc in hexanes 0→30%',
    '0–30% EtOAc in hexanes',
    'EtOAc/hexanes 0-30%',
    'gradient 0 to 30% EtOAc in hexanes',
  ])('reads the gradient "%s" from hexanes to 30% EtOAc', (notation) => {
    const eluent = parsed(notation);
    expect(eluent.mode).toBe('gradient');
    expect(eluent.steps.map((step) => fractions(step.components))).toEqual([
      { hexanes: 1 },
      { 'ethyl-acetate': 0.3, hexanes: 0.7 },
    ]);
    expect(fractions(eluent.components)).toEqual({ 'ethyl-acetate': 0.3, hexanes: 0.7 });
  });

  it('reads a ratio gradient "hexanes/EtOAc 9:1 → 1:1"', () => {
    const eluent = parsed('hexanes/EtOAc 9:1 → 1:1');
    expect(eluent.steps.map((step) => fractions(step.components))).toEqual([
      { hexanes: 0.9, 'ethyl-acetate': 0.1 },
      { hexanes: 0.5, 'ethyl-acetate': 0.5 },
    ]);
  });

  it('reads a three-step ratio gradient "PE/EA 10:1→5:1→2:1"', () => {
    expect(parsed('PE/EA 10:1→5:1→2:1').steps.map((step) => fractions(step.components)['ethyl-acetate'])).toEqual([
      0.091, 0.167, 0.333,
    ]);
  });

  it('reads "EtOAc:hexanes 1:1 to 100% EtOAc" as a step from a ratio to a pure solvent', () => {
    expect(parsed('EtOAc:hexanes 1:1 to 100% EtOAc').steps.map((step) => fractions(step.components))).toEqual([
      { 'ethyl-acetate': 0.5, hexanes: 0.5 },
      { 'ethyl-acetate': 1 },
    ]);
  });

  it('reads step gradients with column volumes, "hexanes, 2 CV → EtOAc/hexanes 1:4, 5 CV"', () => {
    const eluent = parsed('hexanes, 2 CV → EtOAc/hexanes 1:4, 5 CV');
    expect(eluent.steps.map((step) => step.columnVolumes)).toEqual([2, 5]);
  });
});

describe('refusing notations it cannot read, with a reason', () => {
  it('names an unknown solvent and suggests the nearest known one', () => {
    expect(parseEluent('EtOAc/hexnaes 1:4')).toEqual({
      ok: false,
      error: { message: expect.stringContaining('hexnaes'), unknownWord: 'hexnaes', suggestion: 'hexanes' },
    });
    expect(parseEluent('20% ethyl acetat in hexanes')).toMatchObject({
      ok: false,
      error: { unknownWord: 'ethyl acetat', suggestion: 'ethyl acetate' },
    });
    expect(parseEluent('DCM/methanl 9:1')).toMatchObject({
      ok: false,
      error: { unknownWord: 'methanl', suggestion: 'methanol' },
    });
  });

  it.each([
    ['EtOAc/hexanes', /ratio/],
    ['EtOAc/hexanes 1:2:3', /2 solvents but 3 numbers/],
    ['hexanes/EtOAc 4:1 + Et3N', /amount of Et3N/],
    ['60% EtOAc, 60% hexanes', /120%/],
    ['DCM/MeOH 9:1 + 30% Et3N', /outside 0–20%/],
    ['EtOAc : hexanes 1 : 4 (30% EtOAc)', /gives 20% EtOAc, but 30%/],
    ['EtOAc/EtOAc 1:1', /named twice/],
    ['', /Enter an eluent/],
  ])('refuses "%s"', (notation, reason) => {
    const result = parseEluent(notation);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.message).toMatch(reason);
  });
});

describe('writing eluents', () => {
  it('writes "EtOAc : hexanes 1 : 4 (20% EtOAc)"', () => {
    expect(formatEluent(parsed('EtOAc/hexanes 1:4'))).toBe('EtOAc : hexanes 1 : 4 (20% EtOAc)');
  });

  it('writes the additives after the solvents', () => {
    expect(formatEluent(parsed('DCM/MeOH 9:1 + 1% Et3N'))).toBe('DCM : MeOH 9 : 1 (10% MeOH) + 1% Et3N');
  });

  it.each([
    'EtOAc/hexanes 1:4',
    '5% MeOH/DCM + 1% NH4OH',
    'PE/EA 10:1',
    'EtOAc in hexanes 0→30%',
    'hexanes, 2 CV → EtOAc/hexanes 1:4, 5 CV',
    'toluene/acetone/MeOH 8:1:1',
    'MeCN/water 1:1 + 0.1% TFA',
    '2-MeTHF/heptane 1:3',
  ])('reads back what it writes for "%s"', (notation) => {
    const eluent = parsed(notation);
    expect(parsed(formatEluent(eluent))).toEqual({
      ...eluent,
      components: expect.any(Array),
      steps: eluent.steps.map((step) => ({ ...step, components: expect.any(Array) })),
    });
    const again = parsed(formatEluent(eluent));
    expect(fractions(again.components)).toEqual(fractions(eluent.components));
    expect(again.steps.map((step) => fractions(step.components))).toEqual(
      eluent.steps.map((step) => fractions(step.components)),
    );
  });
});

describe('any text a spreadsheet cell may hold', () => {
  const pieces = fc.constantFrom(
    'EtOAc',
    'hexanes',
    'DCM',
    'MeOH',
    'Et3N',
    'NH4OH',
    'PE',
    '/',
    ':',
    ' ',
    '%',
    '→',
    '-',
    '(',
    ')',
    '+',
    'in',
    '1',
    '4',
    '0.5',
    '20',
    '100',
    'CV',
    ',',
    'to',
    'gradient',
  );
  const cells = fc.oneof(
    fc.string({ maxLength: 40 }),
    fc.array(pieces, { maxLength: 12 }).map((parts) => parts.join('')),
  );

  it('either reads into a valid eluent or refuses with a message, never throwing', () => {
    fc.assert(
      fc.property(cells, (cell) => {
        const result = parseEluent(cell);
        if (result.ok) expect(eluentSchema.safeParse(result.eluent).success).toBe(true);
        else expect(result.error.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 3000, seed: 20240601 },
    );
  });
});
