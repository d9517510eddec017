import { describe, expect, it } from 'vitest';
import { TextIndex } from '../../server/features/search/text-index';
import { conditionWords } from '../../server/features/search/index-rows';

/** Real compound names (IUPAC/trivial names as commonly written); the notes are invented. */
function index() {
  const text = new TextIndex();
  text.load(
    [
      { id: 1, name: 'benzyl alcohol', synonyms: ['phenylmethanol'], classNames: ['alcohol', 'aromatic ring'] },
      { id: 2, name: '4-methoxybenzyl alcohol', synonyms: [], classNames: ['alcohol', 'ether'] },
      { id: 3, name: 'cinnamyl alcohol', synonyms: [], classNames: ['alcohol', 'alkene'] },
      { id: 4, name: 'nicotinamide', synonyms: [], classNames: ['amide', 'pyridine-like nitrogen'] },
      { id: 5, name: 'Crème brûlée ester', synonyms: [], classNames: ['ester'] },
    ],
    [
      {
        id: 10,
        compoundId: 1,
        notes: 'Anisaldehyde dip gave a pink spot after heating.',
        notebookRef: 'QX-02 p. 42',
        outcomeReason: '',
      },
    ],
  );
  return text;
}

describe('the text index', () => {
  it('when two letters of a word are swapped, then the word is still found (benzly → benzyl)', () => {
    expect([...index().search('benzly alcohol').compounds.keys()].sort()).toEqual([1, 2]);
  });

  it('when several words are given, then every word must match somewhere, in any order and any field', () => {
    expect([...index().search('alcohol phenylmethanol').compounds.keys()]).toEqual([1]);
  });

  it('when the exact name is typed, then the shorter name ranks first among equal matches', () => {
    const hits = [...index().search('benzyl alcohol').compounds].sort((a, b) => a[1] - b[1]);
    expect(hits[0][0]).toBe(1);
  });

  it('when a part of a name matches exactly, then words two letters away elsewhere are left out (cinnam is not nicotinamide)', () => {
    expect([...index().search('cinnam').compounds.keys()]).toEqual([3]);
  });

  it('when accents are left out, then accented names are still found', () => {
    expect([...index().search('creme brulee').compounds.keys()]).toEqual([5]);
  });

  it('when a misspelt word of the notes or the notebook reference is typed, then the record is found', () => {
    expect([...index().search('anisaldehide').records.keys()]).toEqual([10]);
    expect([...index().search('QX-02 p. 42').records.keys()]).toEqual([10]);
  });

  it('when a record leaves the active set, then its words no longer find it', () => {
    const text = index();
    text.apply([], [], [10]);
    expect(text.search('anisaldehyde').records.size).toBe(0);
  });

  it('when a stain or a solvent is typed, then records visualised or run with it are found (KMnO4, Dragendorff, EtOAc)', () => {
    // Stain and solvent names as the catalogue spells them (shared/catalogue); common practice names of the trade.
    const text = new TextIndex();
    const plain = { notes: '', notebookRef: '', outcomeReason: '' };
    text.load(
      [],
      [
        {
          id: 21,
          compoundId: 1,
          ...plain,
          conditions: conditionWords({
            eluent: { components: [{ solvent: 'hexanes' }, { solvent: 'ethyl-acetate' }] },
            stains: [{ method: 'kmno4', note: null }],
          }),
        },
        {
          id: 22,
          compoundId: 2,
          ...plain,
          conditions: conditionWords({
            eluent: {
              components: [{ solvent: 'dichloromethane' }, { solvent: 'methanol' }],
              additives: [{ additive: 'triethylamine' }],
            },
            stains: [{ method: 'dragendorff', note: null }],
          }),
        },
      ],
    );
    expect([...text.search('KMnO4').records.keys()]).toEqual([21]);
    expect([...text.search('permanganate').records.keys()]).toEqual([21]);
    expect([...text.search('Dragendorff').records.keys()]).toEqual([22]);
    expect([...text.search('EtOAc').records.keys()]).toEqual([21]);
    expect([...text.search('methanol Et3N').records.keys()]).toEqual([22]);
  });

  it('when nothing is like the words, then nothing is returned', () => {
    expect(index().search('xqzvw').compounds.size).toBe(0);
  });
});
