/**
 * Search benchmark (npm run bench:search [-- --size N] [--out FILE] [--cache FILE]).
 *
 * Builds a generated library (tests/bench/library.ts; generated structures, not a real collection)
 * of 100,000 compounds by default, fingerprints it once in worker threads (cached in .cache/), then
 * measures on this thread: the index rebuild from the stored fingerprints and graphs, similarity
 * top-50 for novel query molecules, and five substructure queries. Prints p50/p95 in ms and, last,
 * `similarity_p50_ms=<n> substructure_p50_ms=<n> rebuild_s=<n>`.
 */
import { writeFileSync } from 'node:fs';
import { Molecule } from 'openchemlib';
import { closeFingerprintPool, fingerprintMolecule, searchGraphMolecule } from '../../server/chem/fingerprint';
import { parseStructure } from '../../server/chem/parse';
import { StructureSearchIndex } from '../../server/chem/search-index';
import { generateLibrary } from './library';
import { loadOrBuildLibrary } from './library-cache';

const SUBSTRUCTURE_QUERIES = ['c1ccccc1', 'NC=O', 'NS(=O)=O', 'c1ccncc1', 'c1ccc2[nH]ccc2c1'];
const SIMILARITY_QUERIES = 200;
const SUBSTRUCTURE_RUNS = 9;

function option(name: string): string | undefined {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? process.argv[at + 1] : undefined;
}

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

const median = (values: number[]) => percentile(values, 50);
const fmt = (ms: number) => ms.toFixed(2);
const log = (line: string) => console.log(line);

const size = Number(option('size') ?? 100_000);
const cacheFile = option('cache') ?? `.cache/bench-library-${size}.json`;
const library = await loadOrBuildLibrary(cacheFile, size, log);
log(`library: ${library.smiles.length} generated compounds (tests/bench/library.ts), cached in ${cacheFile}`);

const outFile = option('out');
if (outFile) {
  writeFileSync(outFile, `${library.smiles.join('\n')}\n`);
  log(`wrote ${library.smiles.length} SMILES to ${outFile}`);
}

/** Stored bytes (base64, as from a database blob) back to typed arrays; copied so offsets are aligned. */
const bytesOf = (base64: string) => Uint8Array.from(Buffer.from(base64, 'base64'));

let started = performance.now();
const index = new StructureSearchIndex(library.idcodes.length);
for (let id = 0; id < library.idcodes.length; id++) {
  index.upsert({
    id,
    idcode: library.idcodes[id],
    fingerprint: new Int32Array(bytesOf(library.fingerprints[id]).buffer),
    graph: bytesOf(library.graphs[id]),
  });
}
const rebuildSeconds = (performance.now() - started) / 1000;
log(`index rebuild from stored fingerprints and graphs: ${rebuildSeconds.toFixed(2)} s for ${index.size} compounds`);

// Novel queries: products outside the library (another seed), fingerprinted before timing the search.
const known = new Set(library.idcodes);
const queryMolecules = generateLibrary(SIMILARITY_QUERIES * 2, 4242)
  .map((smiles) => Molecule.fromSmiles(smiles))
  .filter((mol) => !known.has(mol.getIDCode()))
  .slice(0, SIMILARITY_QUERIES);
started = performance.now();
const queryFingerprints = queryMolecules.map(fingerprintMolecule);
const queryFingerprintMs = (performance.now() - started) / queryMolecules.length;
// What the search route hands over besides the fingerprint (server/features/search/structure-query.ts): ID code and
// search graph, for the re-ranking.
const queryKeys = queryMolecules.map((mol) => ({ idcode: mol.getIDCode(), graph: searchGraphMolecule(mol) }));
const similarityMs: number[] = [];
let topSimilarity = 0;
for (const [position, fingerprint] of queryFingerprints.entries()) {
  const t = performance.now();
  const hits = index.similar({ fingerprint, ...queryKeys[position] }, { limit: 50 });
  similarityMs.push(performance.now() - t);
  topSimilarity += hits[0]?.similarity ?? 0;
}
log(
  `similarity top-50 (${queryFingerprints.length} novel queries): p50 ${fmt(median(similarityMs))} ` +
    `ms, p95 ${fmt(percentile(similarityMs, 95))} ms; mean best Tanimoto ${(topSimilarity / queryFingerprints.length).toFixed(3)}; ` +
    `query fingerprint ${fmt(queryFingerprintMs)} ms on top`,
);

const substructureMedians: number[] = [];
for (const smiles of SUBSTRUCTURE_QUERIES) {
  const query = parseStructure(smiles).molecule;
  const times: number[] = [];
  const first = performance.now();
  let last = index.substructure(query);
  const firstMs = performance.now() - first;
  for (let run = 0; run < SUBSTRUCTURE_RUNS; run++) {
    const t = performance.now();
    last = index.substructure(query);
    times.push(performance.now() - t);
  }
  substructureMedians.push(median(times));
  log(
    `substructure ${smiles.padEnd(18)} hits ${String(last.ids.length).padStart(6)}, screened ` +
      `${String(last.candidates).padStart(6)} (fast ${last.fastChecks}, SSSearcher ${last.searcherChecks}): ` +
      `p50 ${fmt(median(times))} ms, p95 ${fmt(percentile(times, 95))} ms, first run ${fmt(firstMs)} ms`,
  );
}

await closeFingerprintPool();
console.log(
  `similarity_p50_ms=${fmt(median(similarityMs))} substructure_p50_ms=${fmt(median(substructureMedians))} ` +
    `rebuild_s=${rebuildSeconds.toFixed(2)}`,
);
