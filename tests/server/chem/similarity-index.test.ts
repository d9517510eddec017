import { Molecule, SSSearcherWithIndex } from 'openchemlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeFingerprintPool, fingerprintIdcodes } from '../../../server/chem/fingerprint';
import { FingerprintIndex, popcount32 } from '../../../server/chem/similarity-index';
import { generateLibrary } from '../../bench/library';
import { morganBits } from './rdkit-reference';

/** Drug-like molecules of varied scaffolds plus a slice of the generated benchmark library. */
const SET = [
  'CC(=O)Oc1ccccc1C(=O)O',
  'OC(=O)c1ccccc1O',
  'CC(=O)Nc1ccc(O)cc1',
  'CC(C)Cc1ccc(cc1)C(C)C(=O)O',
  'COc1ccc2cc(ccc2c1)C(C)C(=O)O',
  'Cn1cnc2c1c(=O)n(C)c(=O)n2C',
  'Cn1cnc2c1c(=O)[nH]c(=O)n2C',
  'c1ccc2[nH]ccc2c1',
  'NCCc1c[nH]c2ccccc12',
  'CN(C)CCc1c[nH]c2ccc(O)cc12',
  'c1ccncc1',
  'Cc1ccccn1',
  'c1ccc2ncccc2c1',
  'CN1CCC[C@H]1c1cccnc1',
  'CCN(CC)CC',
  'C1CCNCC1',
  'C1COCCN1',
  'CC(C)(C)OC(=O)N1CCCC1',
  'O=C(O)C1CCCN1',
  'NC(Cc1ccccc1)C(=O)O',
  'NC(CO)C(=O)O',
  'CCOC(=O)C',
  'CCCCCCCC',
  'c1ccccc1',
  'Cc1ccccc1',
  'Clc1ccccc1',
  'CS(=O)(=O)Nc1ccccc1',
  'Cc1ccc(cc1)S(N)(=O)=O',
  'O=C1CCCCC1',
  'OC1CCCCC1',
  ...generateLibrary(30, 7),
];

let fingerprints: Int32Array[] = [];

beforeAll(async () => {
  fingerprints = await fingerprintIdcodes(SET.map((smiles) => Molecule.fromSmiles(smiles).getIDCode()));
});
afterAll(() => closeFingerprintPool());

function indexOfSet(): FingerprintIndex {
  const index = new FingerprintIndex(4);
  fingerprints.forEach((fp, i) => index.upsert(i, fp));
  return index;
}

function ranks(values: number[]): number[] {
  const order = values.map((value, i) => ({ value, i })).sort((a, b) => a.value - b.value);
  const result = new Array<number>(values.length);
  for (let start = 0; start < order.length;) {
    let end = start;
    while (end + 1 < order.length && order[end + 1].value === order[start].value) end++;
    for (let k = start; k <= end; k++) result[order[k].i] = (start + end) / 2;
    start = end + 1;
  }
  return result;
}

/** Spearman rank correlation: Pearson correlation of the ranks (ties get their average rank). */
function spearman(a: number[], b: number[]): number {
  const [ra, rb] = [ranks(a), ranks(b)];
  const mean = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
  const [ma, mb] = [mean(ra), mean(rb)];
  let num = 0,
    da = 0,
    db = 0;
  ra.forEach((x, i) => {
    num += (x - ma) * (rb[i] - mb);
    da += (x - ma) ** 2;
    db += (rb[i] - mb) ** 2;
  });
  return num / Math.sqrt(da * db);
}

const jaccard = (a: Set<number>, b: Set<number>) =>
  [...a].filter((bit) => b.has(bit)).length / new Set([...a, ...b]).size;

describe('FingerprintIndex', () => {
  it('counts bits like a plain loop over the 32 positions', () => {
    for (const word of [0, 1, -1, 0x80000000 | 0, 0x55555555, 123456789, -987654321]) {
      let naive = 0;
      for (let bit = 0; bit < 32; bit++) naive += (word >>> bit) & 1;
      expect(popcount32(word)).toBe(naive);
    }
  });

  it('scores every entry with the Tanimoto coefficient OpenChemLib itself computes', () => {
    const hits = indexOfSet().topK(fingerprints[0], SET.length, 0);
    expect(hits).toHaveLength(SET.length);
    for (const hit of hits) {
      expect(hit.similarity).toBeCloseTo(
        SSSearcherWithIndex.getSimilarityTanimoto(Array.from(fingerprints[0]), Array.from(fingerprints[hit.id])),
        6,
      );
    }
  });

  it('returns the k best, best first, the query itself at 1, and honours the threshold', () => {
    const index = indexOfSet();
    const top = index.topK(fingerprints[7], 5);
    expect(top).toHaveLength(5);
    expect(top[0]).toEqual({ id: 7, similarity: 1 });
    for (let i = 1; i < top.length; i++) expect(top[i - 1].similarity).toBeGreaterThanOrEqual(top[i].similarity);
    const above = index.topK(fingerprints[7], 50, 0.6);
    expect(above[0]).toEqual({ id: 7, similarity: 1 });
    expect(above.every((hit) => hit.similarity >= 0.6)).toBe(true);
  });

  it('gives the same k best scores as ranking every entry (the bit-count bound only skips losers)', () => {
    const index = indexOfSet();
    for (const query of [0, 9, 17, 33, 50]) {
      const all = index.topK(fingerprints[query], SET.length).map((hit) => hit.similarity);
      expect(index.topK(fingerprints[query], 7).map((hit) => hit.similarity)).toEqual(all.slice(0, 7));
      expect(index.topK(fingerprints[query], 50, 0.4).map((hit) => hit.similarity)).toEqual(
        all.filter((score) => score >= 0.4),
      );
    }
  });

  it('forgets removed entries and keeps the others findable after the swap', () => {
    const index = indexOfSet();
    expect(index.remove(0)).toBe(true);
    expect(index.remove(0)).toBe(false);
    expect(index.size).toBe(SET.length - 1);
    expect(index.topK(fingerprints[0], SET.length).map((hit) => hit.id)).not.toContain(0);
    expect(index.topK(fingerprints[SET.length - 1], 1)[0]).toEqual({ id: SET.length - 1, similarity: 1 });
  });

  it('replaces the fingerprint of an id on upsert', () => {
    const index = indexOfSet();
    index.upsert(3, fingerprints[8]);
    expect(index.size).toBe(SET.length);
    expect(
      index
        .topK(fingerprints[8], 2)
        .map((hit) => hit.id)
        .sort(),
    ).toEqual([3, 8]);
  });

  it('pre-screens: keeps exactly the entries holding every bit of the query', () => {
    const index = indexOfSet();
    const query = fingerprints[23].map((word, w) => word & fingerprints[24][w]);
    const expected = fingerprints.flatMap((fp, id) =>
      fp.every((word, w) => (word & query[w]) === query[w]) ? [id] : [],
    );
    expect(index.screen(query).sort((a, b) => a - b)).toEqual(expected);
    expect(expected).toEqual(expect.arrayContaining([23, 24]));
  });
});

/**
 * Six analogue series (benzamides, indoles, piperidines/morpholines, sulfonamides, aliphatic
 * esters/alcohols, pyridines), the situation similarity search serves: finding a compound's
 * analogues. Over unrelated drugs both fingerprints call everything dissimilar and the order among
 * those is noise (median Spearman ~0.3 measured while writing this test), so that is not checked.
 */
const SERIES = [
  [
    'O=C(NC)c1ccccc1',
    'O=C(NC)c1ccc(Cl)cc1',
    'O=C(NC)c1ccc(OC)cc1',
    'O=C(NC)c1cccc(F)c1',
    'O=C(NCC)c1ccccc1',
    'O=C(N(C)C)c1ccccc1',
  ],
  [
    'c1ccc2[nH]ccc2c1',
    'COc1ccc2[nH]ccc2c1',
    'NCCc1c[nH]c2ccccc12',
    'CC(=O)NCCc1c[nH]c2ccccc12',
    'OC(=O)Cc1c[nH]c2ccccc12',
    'Cn1ccc2ccccc21',
  ],
  [
    'C(N1CCCCC1)c1ccccc1',
    'C1CC(CCN1)c1ccccc1',
    'C(N1CCOCC1)c1ccccc1',
    'C(CN1CCCCC1)c1ccccc1',
    'CN1CCC(O)CC1',
    'C(C1CCNCC1)c1ccccc1',
  ],
  [
    'Cc1ccc(cc1)S(N)(=O)=O',
    'CNS(=O)(=O)c1ccc(C)cc1',
    'Cc1ccc(cc1)S(=O)(=O)N1CCOCC1',
    'O=S(=O)(Nc1ccccc1)c1ccccc1',
    'Cc1cc(NS(=O)(=O)c2ccc(N)cc2)no1',
    'CS(=O)(=O)Nc1ccccc1',
  ],
  ['CCCCCC(=O)OCC', 'CCCCCCCC(=O)OC', 'CCCCCCO', 'CCCCCCCCO', 'CCCCOC(C)=O', 'CCCC(=O)OCC'],
  ['Cc1ccccn1', 'OC(=O)c1cccnc1', 'NC(=O)c1cccnc1', 'CN(C)c1ccncc1', 'Nc1ccccn1', 'Brc1cccnc1'],
].flat();

describe('similarity ranking against RDKit Morgan fingerprints (sanity check; the two differ by design)', () => {
  it('has a median Spearman correlation of at least 0.5 over the first two members of each series as queries', async () => {
    const seriesFingerprints = await fingerprintIdcodes(
      SERIES.map((smiles) => Molecule.fromSmiles(smiles).getIDCode()),
    );
    const seriesMorgan = await Promise.all(SERIES.map(morganBits));
    const index = new FingerprintIndex();
    seriesFingerprints.forEach((fp, i) => index.upsert(i, fp));
    const queries = SERIES.map((_, i) => i).filter((i) => i % 6 < 2);
    const correlations = queries.map((query) => {
      const ours = new Map(index.topK(seriesFingerprints[query], SERIES.length).map((hit) => [hit.id, hit.similarity]));
      const others = SERIES.map((_, i) => i).filter((i) => i !== query);
      return spearman(
        others.map((i) => ours.get(i) ?? 0),
        others.map((i) => jaccard(seriesMorgan[query], seriesMorgan[i])),
      );
    });
    correlations.sort((a, b) => a - b);
    const median = (correlations[5] + correlations[6]) / 2;
    expect(median).toBeGreaterThanOrEqual(0.5);
  });
});
