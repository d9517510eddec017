import { describe, expect, it } from 'vitest';
import { detectMapping, detectTarget } from '../../shared/domain/import-headers';

// Header names as people write them in lab spreadsheets (common practice; no single source).
describe('detectTarget', () => {
  it.each([
    ['Compound', 'name'],
    ['compound name', 'name'],
    ['SMILES', 'structure'],
    ['Structure', 'structure'],
    ['molfile', 'structure'],
    ['Stationary Phase', 'phase'],
    ['adsorbent', 'phase'],
    ['Eluent', 'eluent'],
    ['Solvent System', 'eluent'],
    ['mobile_phase', 'eluent'],
    ['Rf', 'rf'],
    ['RF value', 'rf'],
    ['R.f.', 'rf'],
    ['Rf (product)', 'rf'],
    ['Rf (SM)', 'rfStartingMaterial'],
    ['Rf impurity', 'rfOther'],
    ['Stain', 'stain'],
    ['Visualisation', 'stain'],
    ['VISUALIZATION', 'stain'],
    ['TLC stain', 'stain'],
    ['Notes', 'notes'],
    ['Comments', 'notes'],
    ['NB ref', 'notebook'],
    ['Notebook page', 'notebook'],
    ['Yield (%)', 'yield'],
    ['yield %', 'yield'],
    ['Technique', 'technique'],
    ['Outcome', 'outcome'],
    ['Date', 'date'],
    ['Author', 'author'],
    ['Chemist', 'author'],
    ['Silica (g)', 'silica'],
    ['Fraction size (mL)', 'fractionSize'],
  ])('reads the header "%s" as %s, whatever its case, spacing or punctuation', (header, field) => {
    expect(detectTarget(header)).toBe(field);
  });

  it.each([
    ['hexane', 'solvent:hexanes'],
    ['ethyl_acetate', 'solvent:ethyl-acetate'],
    ['% EtOAc', 'solvent:ethyl-acetate'],
    ['MeOH (%)', 'solvent:methanol'],
    ['DCM fraction', 'solvent:dichloromethane'],
    ['diethyl_ether', 'solvent:diethyl-ether'],
  ])('reads a column named after a solvent ("%s") as the amount of that solvent', (header, target) => {
    expect(detectTarget(header)).toBe(target);
  });

  it('ignores what it does not know, such as a CAS number or the reason column of a rejected-rows download', () => {
    expect(detectTarget('cas')).toBe('ignore');
    expect(detectTarget('reason')).toBe('ignore');
  });

  it('reads "record id" (the app\'s own export carries it) as the record id, so a re-imported export is recognised', () => {
    expect(detectTarget('record id')).toBe('recordId');
  });
});

describe('detectMapping', () => {
  it("keeps the user's choice for a header and gives a field to only the first column that claims it", () => {
    const mapping = detectMapping(['Cpd', 'SMILES', 'Rf', 'Rf value', 'Notes', 'Comments'], { Cpd: 'name' });
    expect(mapping).toEqual({
      Cpd: 'name',
      SMILES: 'structure',
      Rf: 'rf',
      'Rf value': 'ignore',
      Notes: 'notes',
      Comments: 'notes',
    });
  });
});
