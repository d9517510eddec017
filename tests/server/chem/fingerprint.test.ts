import { Molecule } from 'openchemlib';
import { afterAll, describe, expect, it } from 'vitest';
import {
  closeFingerprintPool,
  FINGERPRINT_WORDS,
  fingerprintIdcodes,
  fingerprintIdcodeSync,
  searchKeysForIdcodes,
} from '../../../server/chem/fingerprint';
import { searchGraphOf } from '../../../server/chem/fingerprint-worker.mjs';
import { fingerprintBytes, fingerprintOfIdcode } from '../../../server/core/compound-fingerprints';

const SMILES = [
  'CC(=O)Oc1ccccc1C(=O)O',
  'c1ccc2[nH]ccc2c1',
  'CCN(CC)CC',
  'O=C(NCc1ccccc1)c1ccncc1',
  'CS(=O)(=O)N1CCOCC1',
  'OC[C@H]1OC(O)[C@H](O)[C@@H](O)[C@@H]1O',
];
const idcodes = SMILES.map((smiles) => Molecule.fromSmiles(smiles).getIDCode());

afterAll(() => closeFingerprintPool());

describe('fingerprints in worker threads', () => {
  it('equal OpenChemLib getIndex() on this thread, in input order, 16 int32 each', async () => {
    const pooled = await fingerprintIdcodes([...idcodes, ...idcodes]);
    expect(pooled).toHaveLength(idcodes.length * 2);
    pooled.forEach((fingerprint, i) => {
      expect(fingerprint).toBeInstanceOf(Int32Array);
      expect(fingerprint).toHaveLength(FINGERPRINT_WORDS);
      expect(Array.from(fingerprint)).toEqual(
        Array.from(Molecule.fromIDCode(idcodes[i % idcodes.length], false).getIndex()),
      );
    });
  });

  it(
    'a stored fingerprint read back (as search and Scout use it for a known compound) equals the one ' +
      'computed from the ID code',
    async () => {
      const stored = await fingerprintBytes(idcodes);
      for (const [i, idcode] of idcodes.entries()) {
        const computed = Array.from(Molecule.fromIDCode(idcode, false).getIndex());
        expect(Array.from(await fingerprintOfIdcode(idcode, stored[i]))).toEqual(computed);
        expect(Array.from(await fingerprintOfIdcode(idcode, null))).toEqual(computed);
      }
    },
  );

  it('the synchronous variant gives the same words', () => {
    expect(Array.from(fingerprintIdcodeSync(idcodes[0]))).toEqual(
      Array.from(Molecule.fromIDCode(idcodes[0], false).getIndex()),
    );
  });

  it('also return search graphs equal to those built on this thread', async () => {
    const { fingerprints, graphs } = await searchKeysForIdcodes(idcodes);
    expect(fingerprints).toHaveLength(idcodes.length);
    graphs.forEach((graph, i) =>
      expect(Array.from(graph)).toEqual(Array.from(searchGraphOf(Molecule.fromIDCode(idcodes[i], false)))),
    );
  });

  it('reject a batch with an ID code that cannot be decoded, naming its position', async () => {
    await expect(fingerprintIdcodes([idcodes[0], '!!not an idcode'])).rejects.toThrow(/positions 1/);
  });

  it('handle an empty batch', async () => {
    await expect(fingerprintIdcodes([])).resolves.toEqual([]);
  });
});
