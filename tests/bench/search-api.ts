/**
 * The live search path, end to end: `node --import tsx tests/bench/search-api.ts [--size N] [--cache FILE]`.
 *
 * Loads the generated library of tests/bench/search.ts (generated structures, not a real collection; its
 * stored fingerprints come from the cache that benchmark writes, or are computed once) into a throwaway
 * database — one compound row with its fingerprint and one condition record each — then starts the app's
 * own search indexes from that database (as a server does at start) and times GET /api/search over HTTP
 * (supertest against createApp): similarity, the five substructure queries of the engine benchmark, and
 * text with a typo. Prints p50/p95 in ms (wall clock of the request, and the server's tookMs) and, last,
 * `api_similarity_p50_ms=<n> api_substructure_p50_ms=<n> api_text_p50_ms=<n> index_build_s=<n>`.
 */
import { performance } from 'node:perf_hooks';
import { Molecule } from 'openchemlib';
import { throwawayDatabase } from './bench-database';
import { generateLibrary } from './library';
import { loadOrBuildLibrary } from './library-cache';
import { insertLibrary, queryWords } from './search-api-data';

const option = (name: string) =>
  process.argv.includes(`--${name}`) ? process.argv[process.argv.indexOf(`--${name}`) + 1] : undefined;
const size = Number(option('size') ?? 100_000);
const cacheFile = option('cache') ?? `.cache/bench-library-${size}.json`;
const percentile = (values: number[], p: number) =>
  [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.max(0, Math.ceil((p / 100) * values.length) - 1))];
const fmt = (values: number[]) =>
  `p50 ${percentile(values, 50).toFixed(1)} ms, p95 ${percentile(values, 95).toFixed(1)} ms`;

const library = await loadOrBuildLibrary(cacheFile, size, console.log);
const database = throwawayDatabase('searchapi');
process.env.DATABASE_URL = database.url;
process.env.LOG_LEVEL ??= 'warn';
try {
  const started = performance.now();
  await insertLibrary(database.url, library);
  console.log(
    `loaded ${library.smiles.length} compounds and records into a throwaway database in ` +
      `${((performance.now() - started) / 1000).toFixed(1)} s`,
  );

  const { createApp } = await import('../../server/http/app');
  const { searchIndexes } = await import('../../server/features/search/process-indexes');
  const { agentFor } = await import('../helpers/agent');
  const { sequelize } = await import('../../server/db/sequelize');
  const { closeFingerprintPool } = await import('../../server/chem');
  const buildStarted = performance.now();
  const indexes = await searchIndexes();
  const buildSeconds = (performance.now() - buildStarted) / 1000;
  console.log(
    `index build at start (stored fingerprints + Fuse text index): ${buildSeconds.toFixed(2)} s for ${indexes.structures.size} compounds`,
  );
  const graphsStarted = performance.now();
  await indexes.graphsReady;
  console.log(`search graphs attached in the background: ${((performance.now() - graphsStarted) / 1000).toFixed(1)} s`);

  const { app, close } = createApp();
  const viewer = await agentFor(app, 'viewer');
  const time = async (path: string) => {
    const t = performance.now();
    const res = await viewer.get(path);
    if (res.status !== 200) throw new Error(`${path} → ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`);
    return { ms: performance.now() - t, took: res.body.tookMs as number, total: res.body.total as number };
  };

  const known = new Set(library.idcodes);
  const queries = generateLibrary(120, 4242)
    .filter((smiles) => !known.has(Molecule.fromSmiles(smiles).getIDCode()))
    .slice(0, 50);
  const similar = [];
  for (const smiles of queries)
    similar.push(await time(`/api/search?mode=similar&threshold=0&limit=50&structure=${encodeURIComponent(smiles)}`));
  console.log(
    `similarity top-50 over HTTP (${similar.length} novel queries): ${fmt(similar.map((r) => r.ms))}; ` +
      `server ${fmt(similar.map((r) => r.took))}`,
  );

  const substructureMedians: number[] = [];
  for (const smiles of ['c1ccccc1', 'NC=O', 'NS(=O)=O', 'c1ccncc1', 'c1ccc2[nH]ccc2c1']) {
    const runs = [];
    for (let i = 0; i < 9; i++)
      runs.push(await time(`/api/search?mode=substructure&structure=${encodeURIComponent(smiles)}`));
    substructureMedians.push(
      percentile(
        runs.map((r) => r.ms),
        50,
      ),
    );
    console.log(
      `substructure ${smiles.padEnd(18)} ${String(runs[0].total).padStart(5)} records (first 500 ` +
        `matching compounds): ${fmt(runs.map((r) => r.ms))}; server ${fmt(runs.map((r) => r.took))}`,
    );
  }

  const text = [];
  for (const words of queryWords(30)) text.push(await time(`/api/search?q=${encodeURIComponent(words)}`));
  console.log(
    `text with a typo over HTTP (${text.length} queries): ${fmt(text.map((r) => r.ms))}; server ` +
      `${fmt(text.map((r) => r.took))}; mean hits ${(text.reduce((n, r) => n + r.total, 0) / text.length).toFixed(0)}`,
  );

  await close();
  await closeFingerprintPool();
  await sequelize.close();
  const substructureP50 = percentile(substructureMedians, 50);
  console.log(
    `api_similarity_p50_ms=${percentile(
      similar.map((r) => r.ms),
      50,
    ).toFixed(1)} api_substructure_p50_ms=${substructureP50.toFixed(1)} api_text_p50_ms=${percentile(
      text.map((r) => r.ms),
      50,
    ).toFixed(1)} index_build_s=${buildSeconds.toFixed(2)}`,
  );
} finally {
  database.cleanup();
}
