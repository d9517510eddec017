/**
 * Load benchmark (`npm run bench:load [-- --connections 100 --duration 20 --warmup 5]`).
 *
 * From a fresh clone, one command: a throwaway database in the benchmarks' own PostgreSQL cluster, the app
 * (server/index.ts, NODE_ENV=production, demo group seeded) on 127.0.0.1 only, four demo users signed in,
 * then autocannon with 100 connections for 20 s over a mix of signed-in reads (tests/bench/load-mix.ts).
 * Routes the app does not answer yet are left out and named. First a cold pass sends every distinct read of
 * the mix (each list page, record, word and structure) `--cold-repeats` times (default 3, shuffled, as many at
 * a time as there are connections) to the freshly started app and prints its figures: the cost of empty caches,
 * as after a start (a write empties the per-data-stamp answers too, but not the structure reads). Then
 * `--warmup` seconds of the mix unmeasured, then the measured run. `--write-every S` adds a real write every S
 * seconds of the measured run: `--write-kind bookmark` (default; a member bookmarks a record, or takes the
 * bookmark off: not content, kept answers stay) or `edit` (the admin edits a record's notes: a content change,
 * so every kept answer is computed again once per app process). Prints per-route figures, the load average
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
const COLD_REPEATS = option('cold-repeats', 3);
const WRITE_EVERY_S = option('write-every', 0);
const WRITE_KIND = process.argv.includes('--write-kind')
  ? process.argv[process.argv.indexOf('--write-kind') + 1]
  : 'bookmark';
if (!['bookmark', 'edit'].includes(WRITE_KIND)) throw new Error('--write-kind is bookmark or edit');
const loadAverage = () =>
  os
    .loadavg()
    .map((value) => value.toFixed(2))
    .join(' ');

async function getJson<T>(app: RunningApp, session: Session, path: string): Promise<T> {
  const res = await fetch(app.base + path, { headers: sessionHeaders(session) });
  if (!res.ok) throw new Error(`GET ${path}: ${res.status}`);
  return (await res.json()) as T;
}

/** Record ids, name words and structures from the seeded data, read through the API as a user would. */
async function mixInputs(app: RunningApp, session: Session): Promise<MixInputs> {
  type Page = {
    items: { id: number; compound: { name: string | null; canonicalSmiles: string } }[];
    total: number;
    pageSize: number;
  };
  const first = await getJson<Page>(app, session, '/api/records?page=1');
  const pages = Math.max(1, Math.ceil(first.total / first.pageSize));
  const items = (
    await Promise.all(
      Array.from({ length: pages }, (_, i) => getJson<Page>(app, session, `/api/records?page=${i + 1}`)),
    )
  ).flatMap((page) => page.items);
  const words = [
    ...new Set(
      items.flatMap((item) =>
        (item.compound.name ?? '')
          .toLowerCase()
          .split(/[^a-z]+/)
          .filter((word) => word.length >= 4),
      ),
    ),
  ];
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

/** Every distinct read `repeats` times in random order, `CONNECTIONS` at a time, each by a random signed-in user. */
async function coldPass(app: RunningApp, routes: MixRoute[], sessions: Session[], repeats: number) {
  const requests = routes.flatMap((route) =>
    Array.from({ length: repeats }, () => route.all().map((request) => ({ label: route.label, ...request }))).flat(),
  );
  for (let i = requests.length - 1; i > 0; i--) {
    const j = Math.floor(Math.random() * (i + 1));
    [requests[i], requests[j]] = [requests[j], requests[i]];
  }
  const stats = new RouteStats();
  let next = 0;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: CONNECTIONS }, async () => {
      while (next < requests.length) {
        const { label, method = 'GET', path, body } = requests[next++];
        const session = sessions[Math.floor(Math.random() * sessions.length)];
        const sent = performance.now();
        const res = await fetch(app.base + path!, { method, body, headers: sessionHeaders(session, method) });
        await res.arrayBuffer();
        stats.add(label, res.status, performance.now() - sent);
      }
    }),
  );
  return { stats, durationS: (performance.now() - started) / 1000, count: requests.length };
}

async function load(app: RunningApp, routes: MixRoute[], sessions: Session[], durationS: number) {
  const stats = new RouteStats();
  const instance = autocannon({
    url: app.base,
    connections: CONNECTIONS,
    duration: durationS,
    timeout: 10,
    requests: autocannonRequests(routes, sessions, EQUAL),
  });
  instance.on('response', (client, status, _bytes, ms) =>
    stats.add(client.requestIterator.currentRequest.label ?? '?', status, ms),
  );
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

/** A write every `everyS` seconds until stopped: a bookmark added or removed, or a record's notes edited. */
function writer(app: RunningApp, session: Session, recordIds: number[], everyS: number, kind: string) {
  const statuses = new Map<number, number>();
  let marked: number | null = null;
  let edits = 0;
  const send = async (method: string, path: string, body?: unknown) => {
    const res = await fetch(app.base + path, {
      method,
      headers: sessionHeaders(session, method),
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    await res.arrayBuffer();
    statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
    return res.ok;
  };
  const write = async () => {
    const recordId = marked ?? recordIds[Math.floor(Math.random() * recordIds.length)];
    if (kind === 'edit') {
      await send('PATCH', `/api/records/${recordId}`, { notes: `Edited during the load benchmark (${++edits}).` });
    } else if (marked === null) {
      if (await send('POST', '/api/bookmarks', { recordId })) marked = recordId;
    } else if (await send('DELETE', `/api/bookmarks?recordId=${recordId}`)) {
      marked = null;
    }
  };
  const timer = setInterval(() => void write().catch(() => statuses.set(0, (statuses.get(0) ?? 0) + 1)), everyS * 1000);
  return {
    stop: () => clearInterval(timer),
    summary: () => [...statuses].map(([status, n]) => `${status}×${n}`).join(' ') || 'none',
    failed: () => [...statuses].filter(([status]) => status < 200 || status >= 300).reduce((sum, [, n]) => sum + n, 0),
  };
}

let app = runningApp();
const database = app ? undefined : throwawayDatabase('load');
try {
  console.log(`load average before start (1/5/15 min): ${loadAverage()} on ${os.cpus().length} cores`);
  app ??= await startApp(database!.url);
  const sessions = await Promise.all(
    ['admin', 'curator', 'member', 'viewer'].map((role) => signIn(app!.base, `${role}@example.org`, DEMO_PASSWORD)),
  );
  const inputs = await mixInputs(app, sessions[0]);
  console.log(
    `demo data: ${inputs.recordIds.length} records, ${inputs.structures.length} structures, ` +
      `${inputs.words.length} name words; ${sessions.length} users signed in`,
  );
  const { kept, skipped } = await probe(app, mixRoutes(inputs), sessions[0]);
  const shares = kept.map((route) => `${route.label} ${EQUAL ? 1 : route.weight}`);
  console.log(`mix (relative shares): ${shares.join(', ')}`);
  if (skipped.length > 0) console.log(`skipped: ${skipped.join('; ')}`);
  if (COLD_REPEATS > 0) {
    const cold = await coldPass(app, kept, sessions, COLD_REPEATS);
    const all = cold.stats.overall();
    console.log(
      `cold pass: every distinct read ×${COLD_REPEATS}, ${cold.count} requests, ${CONNECTIONS} at a ` +
        `time, in ${cold.durationS.toFixed(1)} s`,
    );
    printRouteTable(cold.stats, cold.durationS);
    console.log(`cold_rps=${Math.round(cold.count / cold.durationS)} cold_p99_ms=${all.p99} cold_errors=${all.non2xx}`);
  }
  if (WARMUP_S > 0) await load(app, kept, sessions, WARMUP_S);
  console.log(`load average before the run: ${loadAverage()}`);
  const writes =
    WRITE_EVERY_S > 0
      ? writer(app, WRITE_KIND === 'edit' ? sessions[0] : sessions[2], inputs.recordIds, WRITE_EVERY_S, WRITE_KIND)
      : null;
  const { result, stats } = await load(app, kept, sessions, DURATION_S);
  writes?.stop();
  if (writes)
    console.log(
      `writes during the run (one every ${WRITE_EVERY_S} s, ` +
        `${WRITE_KIND === 'edit' ? 'record edits by the admin' : 'bookmarks by a member'}): ${writes.summary()}`,
    );
  console.log(`load average after the run: ${loadAverage()}`);
  printRouteTable(stats, result.duration);
  const errors = result.non2xx + result.errors + result.timeouts + (writes?.failed() ?? 0);
  console.log(
    `connections=${CONNECTIONS} duration_s=${result.duration} requests=${result.requests.total} ` +
      `non2xx=${result.non2xx} socket_errors=${result.errors} timeouts=${result.timeouts}`,
  );
  console.log(
    `rps=${Math.round(result.requests.total / result.duration)} p99_ms=${stats.overall().p99} errors=${errors}`,
  );
} finally {
  await app?.stop();
  database?.cleanup();
}
