import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { Molecule } from 'openchemlib';
import { searchKeysForIdcodes } from '../../server/chem/fingerprint';
import { generateLibrary } from './library';

/** The generated library with stored search keys, as a database would hold them (base64 blobs). */
export interface CachedLibrary {
  version: number;
  size: number;
  smiles: string[];
  idcodes: string[];
  /** 16 int32 per compound, little-endian, base64. */
  fingerprints: string[];
  graphs: string[];
}

const VERSION = 1;
const CHUNK = 2000;

const toBase64 = (bytes: ArrayBufferView) =>
  Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('base64');

/** Distinct compounds (by ID code) from the generated library, a few extra drawn to cover duplicates. */
function distinctCompounds(size: number): { smiles: string[]; idcodes: string[] } {
  const seen = new Set<string>();
  const smiles: string[] = [];
  const idcodes: string[] = [];
  for (const candidate of generateLibrary(Math.ceil(size * 1.03))) {
    const idcode = Molecule.fromSmiles(candidate, { noCoordinates: true, noStereo: true }).getIDCode();
    if (seen.has(idcode)) continue;
    seen.add(idcode);
    smiles.push(candidate);
    idcodes.push(idcode);
    if (smiles.length === size) break;
  }
  return { smiles, idcodes };
}

/**
 * Loads the library of `size` compounds from `file`, or generates it and computes fingerprints and
 * search graphs in the worker pool (minutes at 100k), then writes the file for the next run.
 */
export async function loadOrBuildLibrary(
  file: string,
  size: number,
  log: (line: string) => void,
): Promise<CachedLibrary> {
  if (existsSync(file)) {
    const cached = JSON.parse(readFileSync(file, 'utf8')) as CachedLibrary;
    if (cached.version === VERSION && cached.size === size) return cached;
  }
  const started = performance.now();
  const { smiles, idcodes } = distinctCompounds(size);
  log(
    `generated ${smiles.length} distinct structures in ${((performance.now() - started) / 1000).toFixed(1)} s; fingerprinting…`,
  );
  const fingerprints: string[] = [];
  const graphs: string[] = [];
  for (let start = 0; start < idcodes.length; start += CHUNK) {
    const keys = await searchKeysForIdcodes(idcodes.slice(start, start + CHUNK));
    keys.fingerprints.forEach((fp) => fingerprints.push(toBase64(fp)));
    keys.graphs.forEach((graph) => graphs.push(toBase64(graph)));
    const done = Math.min(start + CHUNK, idcodes.length);
    log(`  ${done}/${idcodes.length} fingerprinted, ${((performance.now() - started) / 1000).toFixed(0)} s`);
  }
  const library: CachedLibrary = { version: VERSION, size, smiles, idcodes, fingerprints, graphs };
  mkdirSync(dirname(file), { recursive: true });
  writeFileSync(file, JSON.stringify(library));
  return library;
}
