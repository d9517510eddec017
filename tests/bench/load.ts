/**
 * Load benchmark (`npm run bench:load [-- --connections 100 --duration 20 --warmup 5]`).
 *
 * From a fresh clone, one command: a throwaway database in the benchmarks' own PostgreSQL cluster, the app
 * (server/index.ts, NODE_ENV=production, demo group seeded) on 127.0.0.1 only, four demo users signed in,
 * then autocannon with 100 connections for 20 s over a mix of signed-in reads (tests/bench/load-mix.ts).
 * Routes the app does not answer yet are left out and named. Prints per-route figures, the load average
 * of the machine (shared, 2 cores) and, last, `rps=<n> p99_ms=<n> errors=<n>` (errors = non-2xx + socket
 * errors + timeouts). Goal: rps ≥ 500, p99 ≤ 250 ms, errors 0.
 * Shares of the mix (load-mix.ts): records list 30 %, record page 35 %, text search 15 %, similarity 10 %,
 * Scout 10 %; `--equal` gives each route the same share.
 * `--app http://127.0.0.1:<port>` loads an app already running there (loopback only) instead of starting one.
 */
import autocannon from 'autocannon';
import os from 'node:os';
import { throwawayDatabase } from './bench-database';
import { signIn, startApp, type RunningApp, type Session } from './load-app';
import { autocannonRequests, mixRoutes, sessionHeaders, type MixInputs, type MixRoute } from './load-mix';
import { RouteStats, printRouteTable } from './load-report';

const option = (name: string, fallback: number) => {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? Number(process.argv[at + 1]) : fallback;
};
const CONNECTIONS = option('connections', 100);
const DURATION_S = option('duration', 20);
const WARMUP_S = option('warmup', 5);
const DEMO_PASSWORD = process.env.RFOLIO_DEMO_PASSWORD ?? 'rfolio-demo-2026';
const EQUAL = process.argv.includes('--equal');
const loadAverage = () => os.loadavg().map((value) => value.toFixed(2)).join(' ');

async function getJson<T>(app: RunningApp, session: Session, path: string): Promise<T> {
  const res = await fetch(app.base + path, { headers: sessionHeaders(session) });
  if (!res.ok) throw new Error(`GET ${path}: ${res.status}`);
  return (await res.json()) as T;
}

/** Record ids, name words and structures from the seeded data, read through the API as a user would. */
async function mixInputs(app: RunningApp, session: Session): Promise<MixInputs> {
  type Page = { items: { id: number; compound: { name: string | null; canonicalSmiles: string } }[]; total: number; pageSize: number };
  const first = await getJson<Page>(app, session, '/api/records?page=1');
  const pages = Math.max(1, Math.ceil(first.total / first.pageSize));
  const items = (await Promise.all(Array.from({ length: pages }, (_, i) => getJson<Page>(app, session, `/api/records?page=${i + 1}`)))).flatMap((page) => page.items);
  const words = [...new Set(items.flatMap((item) => (item.compound.name ?? '').toLowerCase().split(/[^a-z]+/).filter((word) => word.length >= 4)))];
  const structures = [...new Set(items.map((item) => item.compound.canonicalSmiles))];
  return { recordIds: items.map((item) => item.id), words, structures, pages };
}

/** Sends each route once; keeps those answering 2xx and names the rest. */
async function probe(app: RunningApp, routes: MixRoute[], session: Session) {
  const kept: MixRoute[] = [];
  const skipped: string[] = [];
  for (const route of routes) {
    const { method = 'GET', path, body } = route.build();
    const res = await fetch(app.base + path!, { method, body, headers: sessionHeaders(session, method) });
    if (res.ok) kept.push(route);
    else skipped.push(`${route.label} (${method} ${path!.split('?')[0]} answered ${res.status})`);
  }
  return { kept, skipped };
}

async function load(app: RunningApp, routes: MixRoute[], sessions: Session[], durationS: number) {
  const stats = new RouteStats();
  const instance = autocannon({ url: app.base, connections: CONNECTIONS, duration: durationS, timeout: 10, requests: autocannonRequests(routes, sessions, EQUAL) });
  instance.on('response', (client, status, _bytes, ms) => stats.add(client.requestIterator.currentRequest.label ?? '?', status, ms));
  const result = await instance;
  return { result, stats };
}

/** An app the caller already runs, on loopback only: this benchmark never targets another address. */
function runningApp(): RunningApp | undefined {
  const at = process.argv.indexOf('--app');
  if (at < 0) return undefined;
  const url = new URL(process.argv[at + 1]);
  if (url.hostname !== '127.0.0.1') throw new Error('--app must be http://127.0.0.1:<port>');
  return { base: url.origin, port: Number(url.port), stop: async () => undefined };
}

let app = runningApp();
const database = app ? undefined : throwawayDatabase('load');
try {
  console.log(`load average before start (1/5/15 min): ${loadAverage()} on ${os.cpus().length} cores`);
  app ??= await startApp(database!.url);
  const sessions = await Promise.all(['admin', 'curator', 'member', 'viewer'].map((role) => signIn(app!.base, `${role}@example.org`, DEMO_PASSWORD)));
  const inputs = await mixInputs(app, sessions[0]);
  console.log(`demo data: ${inputs.recordIds.length} records, ${inputs.structures.length} structures, ${inputs.words.length} name words; ${sessions.length} users signed in`);
  const { kept, skipped } = await probe(app, mixRoutes(inputs), sessions[0]);
  const shares = kept.map((route) => `${route.label} ${EQUAL ? 1 : route.weight}`);
  console.log(`mix (relative shares): ${shares.join(', ')}`);
  if (skipped.length > 0) console.log(`skipped: ${skipped.join('; ')}`);
  if (WARMUP_S > 0) await load(app, kept, sessions, WARMUP_S);
  console.log(`load average before the run: ${loadAverage()}`);
  const { result, stats } = await load(app, kept, sessions, DURATION_S);
  console.log(`load average after the run: ${loadAverage()}`);
  printRouteTable(stats, result.duration);
  const errors = result.non2xx + result.errors + result.timeouts;
  console.log(`connections=${CONNECTIONS} duration_s=${result.duration} requests=${result.requests.total} non2xx=${result.non2xx} socket_errors=${result.errors} timeouts=${result.timeouts}`);
  console.log(`rps=${Math.round(result.requests.total / result.duration)} p99_ms=${stats.overall().p99} errors=${errors}`);
} finally {
  await app?.stop();
  database?.cleanup();
}
