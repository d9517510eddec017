import { describe, expect, it } from 'vitest';
import { readPlate, readStains } from '../../shared/domain/plate-stain-grammar';

/**
 * The trade's usual TLC visualisations and how chemists write them in notebooks and sheets (common practice:
 * the standard stain list of an organic teaching or research lab — UV 254/365, permanganate, CAM (Hanessian's),
 * PMA, p-anisaldehyde, vanillin, ninhydrin, iodine, 2,4-DNP, bromocresol green, FeCl3, Dragendorff, Ehrlich —
 * with the usual qualifiers: dip, heat, heat gun, a hot-plate temperature, weak/faint).
 */
describe('readStains', () => {
  it.each([
    ['UV', [['uv-254', null]]],
    ['UV 254 nm', [['uv-254', null]]],
    [
      'UV254/365',
      [
        ['uv-254', null],
        ['uv-365', null],
      ],
    ],
    ['UV (faint)', [['uv-254', 'faint']]],
    ['KMnO4', [['kmno4', null]]],
    ['KMnO₄ dip', [['kmno4', 'dip']]],
    ['potassium permanganate, heat', [['kmno4', 'heat']]],
    ['CAM', [['cam', null]]],
    ["Hanessian's stain", [['cam', null]]],
    ['PMA + heat gun', [['pma', 'heat gun']]],
    ['phosphomolybdic acid (after heating)', [['pma', 'after heating']]],
    ['p-anisaldehyde', [['p-anisaldehyde', null]]],
    ['anisaldehyde stain, heat', [['p-anisaldehyde', 'stain, heat']]],
    ['vanillin dip, 120 °C', [['vanillin', 'dip, 120 °C']]],
    ['ninhydrin (after heating)', [['ninhydrin', 'after heating']]],
    ['iodine', [['iodine', null]]],
    ['I2 chamber', [['iodine', 'chamber']]],
    ['2,4-DNP', [['dnp', null]]],
    ['2,4-dinitrophenylhydrazine', [['dnp', null]]],
    ['bromocresol green', [['bromocresol-green', null]]],
    ['FeCl3', [['ferric-chloride', null]]],
    ['iron(III) chloride', [['ferric-chloride', null]]],
    ['Dragendorff', [['dragendorff', null]]],
    ["Ehrlich's reagent", [['ehrlich', null]]],
  ])('reads "%s"', (cell, expected) => {
    const read = readStains(cell);
    expect(read.unrecognised).toEqual([]);
    expect(read.items.map((item) => [item.method, item.note])).toEqual(expected);
  });

  it.each([
    ['UV, KMnO4', ['uv-254', 'kmno4']],
    ['UV; CAM', ['uv-254', 'cam']],
    ['UV / PMA', ['uv-254', 'pma']],
    ['UV + anisaldehyde', ['uv-254', 'p-anisaldehyde']],
    ['UV and ninhydrin', ['uv-254', 'ninhydrin']],
    ['UV, 2,4-DNP', ['uv-254', 'dnp']],
    ['2,4-DNP; KMnO4 (weak)', ['dnp', 'kmno4']],
    ['UV then iodine', ['uv-254', 'iodine']],
  ])('splits the list "%s" at , ; / + "and" "then" but not inside "2,4-DNP"', (cell, methods) => {
    const read = readStains(cell);
    expect(read.unrecognised).toEqual([]);
    expect(read.items.map((item) => item.method)).toEqual(methods);
  });

  it('keeps what it recognises and names what it does not, so the row is not lost', () => {
    const read = readStains('UV, sparkle dust');
    expect(read.items.map((item) => item.method)).toEqual(['uv-254']);
    expect(read.unrecognised).toEqual(['sparkle dust']);
    expect(readStains('magic')).toEqual({ items: [], unrecognised: ['magic'] });
  });

  it('reads an empty cell as no visualisation', () => {
    expect(readStains('  ')).toEqual({ items: [], unrecognised: [] });
  });
});

/** Plates and column media as written (brands, grades, F254, backing: common practice in experimental sections). */
describe('readPlate', () => {
  it.each([
    ['SiO2 (Merck 60)', 'silica-tlc-f254', 'silica-gel'],
    ['Si gel 60 F254', 'silica-tlc-f254', 'silica-gel'],
    ['silica gel 60 F254 (Merck, aluminium sheets)', 'silica-tlc-f254', 'silica-gel'],
    ['Kieselgel 60', 'silica-tlc-f254', 'silica-gel'],
    ['silica', 'silica-tlc-f254', 'silica-gel'],
    ['silica, glass-backed', 'silica-tlc-f254', 'silica-gel'],
    ['silica 230-400 mesh', 'silica-tlc-f254', 'silica-gel'],
    ['Al2O3 basic', 'alumina-basic', 'alumina-basic'],
    ['neutral alumina (Brockmann I)', 'alumina-neutral', 'alumina-neutral'],
    ['RP-18 F254s', 'c18', 'c18'],
    ['C18 silica', 'c18', 'c18'],
    ['NH2 silica', 'amine-silica', 'amine-silica'],
  ])('reads "%s" as %s on a TLC row and %s on a column', (cell, tlc, flash) => {
    const onPlate = readPlate(cell, 'tlc');
    expect(onPlate.unrecognised).toEqual([]);
    expect(onPlate.key).toBe(tlc);
    expect(readPlate(cell, 'flash').key).toBe(flash);
  });

  it("takes a catalogue name written out in full (as the app's own export writes it) as it is", () => {
    expect(readPlate('silica gel 40–63 µm', 'tlc').key).toBe('silica-gel');
    expect(readPlate('silica TLC plate with fluorescent indicator (F254)', 'flash').key).toBe('silica-tlc-f254');
  });

  it('names the words it does not know and gives no phase when nothing is recognised', () => {
    expect(readPlate('silica gold', 'tlc')).toMatchObject({ key: 'silica-tlc-f254', unrecognised: ['gold'] });
    expect(readPlate('mystery resin', 'flash')).toMatchObject({ key: null, unrecognised: ['mystery resin'] });
  });
});
