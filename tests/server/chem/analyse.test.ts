import { describe, expect, it } from 'vitest';
import { analyseStructure } from '../../../server/chem/analyse';
import { idcodeToSvg } from '../../../server/chem/depict';
import { StructureError } from '../../../server/chem/errors';

describe('analyseStructure, the one call behind the structure parse endpoint', () => {
  it('describes an amine hydrochloride by its neutral parent and keeps the salt visible', () => {
    const analysis = analyseStructure('NCc1ccccc1.Cl benzylamine hydrochloride');
    expect(analysis.name).toBe('benzylamine hydrochloride');
    expect(analysis.identity).toMatchObject({ canonicalSmiles: analysis.parent.toIsomericSmiles(), isSalt: true });
    expect(analysis.descriptors).toMatchObject({ formula: 'C7H9N', charge: 0 });
    expect(analysis.classes).toEqual(expect.arrayContaining(['primary-amine', 'ammonium-salt', 'aromatic']));
    expect(analysis.input.getAllAtoms()).toBe(analysis.parent.getAllAtoms() + 1);
  });

  it('draws a cropped SVG without stereo labels', () => {
    const { svg } = analyseStructure('C[C@H](N)C(=O)O');
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).not.toMatch(/>\s*(abs|rel|R|S|this enantiomer|racemic)\s*</);
    expect(Number(/width="(\d+)px"/.exec(svg)?.[1])).toBeLessThan(360);
  });

  it('gives a drawing from an ID code the same id attribute every time (stable for HTTP caching)', () => {
    const { identity } = analyseStructure('c1ccccc1O');
    expect(idcodeToSvg(identity.idcode)).toBe(idcodeToSvg(identity.idcode));
  });

  it('throws the StructureError of the parser for bad input', () => {
    expect(() => analyseStructure('CC(C')).toThrow(StructureError);
  });
});
