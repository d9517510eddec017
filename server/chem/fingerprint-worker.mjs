// Fingerprints and compact search graphs from OpenChemLib ID codes, off the request thread.
// Plain JavaScript importing only openchemlib, so it runs as a worker under node, tsx and vitest.
// Its functions are also imported directly (server/chem/search-keys.ts) for synchronous use.
import { parentPort, workerData } from 'node:worker_threads';
import { Molecule } from 'openchemlib';

/** Words in an OpenChemLib substructure index (getIndex): 16 × 32 bits = 512 keys. */
export const FINGERPRINT_WORDS = 16;

/** The 512-bit OpenChemLib index (SSSearcherWithIndex keys) of a molecule, as 16 int32. */
export function fingerprintOf(mol) {
  return Int32Array.from(mol.getIndex());
}

/** Bond codes of a search graph: 1–3 plain orders, 4 delocalised aromatic, 5/6 aromatic single/double, 0 other. */
function bondCode(mol, bond) {
  if (mol.isDelocalizedBond(bond)) return 4;
  const order = mol.getBondOrder(bond);
  if (mol.isAromaticBond(bond)) return order === 1 ? 5 : order === 2 ? 6 : 0;
  return order >= 1 && order <= 3 ? order : 0;
}

/**
 * A compact graph for fast exact substructure matching (server/chem/graph-match.ts):
 * byte 0 = n heavy atoms (0 when over 255: not encodable); then per atom 6 bytes
 * [atomicNo, charge + 128, flags, degree, adjacency offset low, high]; then per atom its neighbours
 * as [atom, bond code] pairs. Flags: 1 aromatic; 2 atom list or pseudo atom; 4 isotope or radical.
 */
export function searchGraphOf(mol) {
  mol.ensureHelperArrays(Molecule.cHelperRings);
  const n = mol.getAtoms();
  if (n > 255 || n === 0) return new Uint8Array([0]);
  let edges = 0;
  for (let a = 0; a < n; a++) edges += mol.getConnAtoms(a);
  const out = new Uint8Array(1 + 6 * n + 2 * edges);
  out[0] = n;
  let adjacency = 1 + 6 * n;
  for (let a = 0; a < n; a++) {
    const listOrPseudo = mol.getAtomList(a) !== null || mol.getAtomicNo(a) === 0;
    const isotopeOrRadical = mol.getAtomMass(a) !== 0 || mol.getAtomRadical(a) !== 0;
    const base = 1 + 6 * a;
    out[base] = mol.getAtomicNo(a);
    out[base + 1] = mol.getAtomCharge(a) + 128;
    out[base + 2] = (mol.isAromaticAtom(a) ? 1 : 0) | (listOrPseudo ? 2 : 0) | (isotopeOrRadical ? 4 : 0);
    out[base + 3] = mol.getConnAtoms(a);
    out[base + 4] = adjacency & 0xff;
    out[base + 5] = adjacency >> 8;
    for (let i = 0; i < mol.getConnAtoms(a); i++) {
      out[adjacency++] = mol.getConnAtom(a, i);
      out[adjacency++] = bondCode(mol, mol.getConnBond(a, i));
    }
  }
  return out;
}

function handle({ id, idcodes, graphs }) {
  const fingerprints = new Int32Array(idcodes.length * FINGERPRINT_WORDS);
  const graphList = [];
  const failed = [];
  idcodes.forEach((idcode, i) => {
    try {
      const mol = Molecule.fromIDCode(idcode, false);
      fingerprints.set(fingerprintOf(mol), i * FINGERPRINT_WORDS);
      if (graphs) graphList.push(searchGraphOf(mol));
    } catch {
      failed.push(i);
      if (graphs) graphList.push(new Uint8Array([0]));
    }
  });
  const transfer = [fingerprints.buffer, ...graphList.map((g) => g.buffer)];
  parentPort.postMessage({ id, fingerprints, graphs: graphs ? graphList : undefined, failed }, transfer);
}

/** Set in workerData by server/chem/fingerprint-pool.ts; importing this file elsewhere starts nothing. */
export const WORKER_FLAG = 'rfolioFingerprintWorker';

if (parentPort && workerData?.[WORKER_FLAG] === true) parentPort.on('message', handle);
