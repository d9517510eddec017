import { Molecule } from 'openchemlib';
import { FingerprintPool, type SearchKeyBatch } from './fingerprint-pool';
import { FINGERPRINT_WORDS, fingerprintOf, searchGraphOf } from './fingerprint-worker.mjs';

export { FINGERPRINT_WORDS };

let sharedPool: FingerprintPool | null = null;

function pool(): FingerprintPool {
  sharedPool ??= new FingerprintPool(2);
  return sharedPool;
}

function unpack(batch: SearchKeyBatch, count: number): Int32Array[] {
  if (batch.failed.length > 0)
    throw new Error(`Could not decode ID codes at positions ${batch.failed.slice(0, 10).join(', ')}.`);
  return Array.from({ length: count }, (_, i) =>
    batch.fingerprints.slice(i * FINGERPRINT_WORDS, (i + 1) * FINGERPRINT_WORDS),
  );
}

/**
 * OpenChemLib fingerprint (getIndex: 512 substructure keys as 16 int32) of a molecule, on this
 * thread. Takes ~9 ms; use it for one structure at a time (a search query), else fingerprintIdcodes.
 * For a substructure query pass the molecule flagged as fragment (`setFragment(true)`).
 */
export function fingerprintMolecule(mol: Molecule): Int32Array {
  return fingerprintOf(mol);
}

/** Fingerprint of one ID code, on this thread (see fingerprintMolecule). */
export function fingerprintIdcodeSync(idcode: string): Int32Array {
  return fingerprintOf(Molecule.fromIDCode(idcode, false));
}

/** Search graph (graph-match.ts) of a molecule, on this thread (~0.02 ms). */
export function searchGraphMolecule(mol: Molecule): Uint8Array {
  return searchGraphOf(mol);
}

/** Fingerprints of many ID codes, computed in the shared pool of 2 worker threads, input order kept. */
export async function fingerprintIdcodes(idcodes: string[]): Promise<Int32Array[]> {
  return unpack(await pool().run(idcodes, false), idcodes.length);
}

/** Fingerprints and search graphs of many ID codes in the worker pool (to store or to warm an index). */
export async function searchKeysForIdcodes(
  idcodes: string[],
): Promise<{ fingerprints: Int32Array[]; graphs: Uint8Array[] }> {
  const batch = await pool().run(idcodes, true);
  return { fingerprints: unpack(batch, idcodes.length), graphs: batch.graphs ?? [] };
}

/** Stops the shared worker pool (at shutdown or after a script). */
export async function closeFingerprintPool(): Promise<void> {
  const current = sharedPool;
  sharedPool = null;
  await current?.close();
}
