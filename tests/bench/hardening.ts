// Issue 23's figures, measured against a running app (production mode, one process, demo group seeded):
//   1. a translate-eluent request with a 40,000-character solvent name, and one with a 600 kB body: how long each
//      takes, and the worst /api/health latency while it runs (polled every 50 ms);
//   2. after a burst of wrong passwords for one account, seconds until the right password is let in.
// `npm run bench:hardening`; RFOLIO_BENCH_APP_ROOT=<dir> runs the app from another checkout (e.g. the code
// before the fix, extracted with `git archive`), against the same throwaway database cluster.
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createServer } from 'node:net';
import { projectRoot, throwawayDatabase } from './bench-database';

const HOST = '127.0.0.1';
const appRoot = process.env.RFOLIO_BENCH_APP_ROOT ?? projectRoot;
const BURST = Number(process.env.RFOLIO_BENCH_BURST ?? 30);
const GIVE_UP_S = Number(process.env.RFOLIO_BENCH_GIVE_UP_S ?? 90);
const DEMO_PASSWORD = process.env.RFOLIO_DEMO_PASSWORD ?? 'rfolio-demo-2026';

const freePort = () =>
  new Promise<number>((resolve) => {
    const probe = createServer();
    probe.listen(0, HOST, () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function startApp(url: string) {
  const seeded = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/seed.ts'], {
    cwd: appRoot,
    env: { ...process.env, NODE_ENV: 'test', DATABASE_URL: url, LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  if (seeded.status !== 0) throw new Error('seeding failed');
  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    SESSION_SECRET: randomBytes(32).toString('hex'),
    DATABASE_URL: url,
    HOST,
    PORT: String(port),
    RFOLIO_WORKERS: '1',
    LOG_LEVEL: 'warn',
    TRUST_PROXY: 'loopback',
  };
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: appRoot,
    env,
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const base = `http://${HOST}:${port}`;
  for (
    let i = 0;
    !(await fetch(`${base}/api/health`).then(
      (r) => r.ok,
      () => false,
    ));
    i++
  ) {
    if (child.exitCode !== null || i > 600) throw new Error('the app did not start');
    await sleep(300);
  }
  return { base, stop: () => new Promise((resolve) => (child.once('exit', resolve), child.kill('SIGTERM'))) };
}

/** A fresh cookie + CSRF token, signed in when credentials are given. */
async function session(base: string, email?: string, password?: string, from?: string) {
  // As behind a TLS proxy on loopback (production's session cookie is Secure).
  const csrfRes = await fetch(`${base}/api/auth/csrf`, { headers: { 'X-Forwarded-Proto': 'https' } });
  let cookie = csrfRes.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  let csrf = ((await csrfRes.json()) as { token: string }).token;
  if (!email) return { cookie, csrf, status: 0, body: null as unknown };
  const res = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: {
      'Content-Type': 'application/json',
      'X-Forwarded-Proto': 'https',
      Cookie: cookie,
      'X-CSRF-Token': csrf,
      ...(from ? { 'X-Forwarded-For': from } : {}),
    },
    body: JSON.stringify({ email, password }),
  });
  const body = (await res.json()) as { csrfToken?: string };
  if (res.ok) {
    cookie =
      res.headers
        .getSetCookie()
        .map((c) => c.split(';')[0])
        .join('; ') || cookie;
    csrf = body.csrfToken ?? csrf;
  }
  return { cookie, csrf, status: res.status, body: body as unknown, retryAfter: res.headers.get('retry-after') };
}

/** Times one request while polling /api/health every 50 ms; answers the request's time and the worst health latency. */
async function timedWithHealth(base: string, send: () => Promise<Response>) {
  let done = false;
  let worst = 0;
  const poller = (async () => {
    while (!done) {
      const t = performance.now();
      await fetch(`${base}/api/health`).catch(() => undefined);
      worst = Math.max(worst, performance.now() - t);
      await sleep(50);
    }
  })();
  const t0 = performance.now();
  const res = await send();
  const ms = performance.now() - t0;
  done = true;
  await poller;
  return { status: res.status, ms, healthWorstMs: worst };
}

const database = throwawayDatabase('hardening');
const app = await startApp(database.url);
try {
  const viewer = await session(app.base, 'viewer@example.org', DEMO_PASSWORD);
  if (viewer.status !== 200) throw new Error(`viewer sign-in failed: ${viewer.status}`);
  const translate = (components: { solvent: string; parts: number }[]) => () =>
    fetch(`${app.base}/api/tools/translate-eluent`, {
      method: 'POST',
      headers: {
        'Content-Type': 'application/json',
        'X-Forwarded-Proto': 'https',
        Cookie: viewer.cookie,
        'X-CSRF-Token': viewer.csrf,
      },
      body: JSON.stringify({ from: { components }, to: { weak: 'hexanes', strong: 'EtOAc' } }),
      signal: AbortSignal.timeout(GIVE_UP_S * 1000),
    });
  const longName = await timedWithHealth(app.base, translate([{ solvent: 'x'.repeat(40_000), parts: 1 }]));
  console.log(
    `40,000-char solvent name: ${longName.status} in ${longName.ms.toFixed(0)} ms; /api/health worst ` +
      `${longName.healthWorstMs.toFixed(0)} ms meanwhile`,
  );
  const bigBody = await timedWithHealth(
    app.base,
    translate(['a', 'b', 'c', 'd'].map((c) => ({ solvent: c.repeat(150_000), parts: 1 }))),
  ).catch((err: Error) => ({
    status: `gave up after ${GIVE_UP_S} s (${err.name})`,
    ms: GIVE_UP_S * 1000,
    healthWorstMs: NaN,
  }));
  console.log(
    `600 kB translate body: ${bigBody.status} in ${bigBody.ms.toFixed(0)} ms; /api/health worst ` +
      `${bigBody.healthWorstMs.toFixed(0)} ms meanwhile`,
  );

  // A burst of wrong guesses for the curator, then the curator (the right person) tries every 250 ms.
  const target = 'curator@example.org';
  const burst = await Promise.all(Array.from({ length: BURST }, () => session(app.base, target, 'a-wrong-guess-1234')));
  const tally = burst.reduce<Record<number, number>>(
    (acc, r) => ({ ...acc, [r.status]: (acc[r.status] ?? 0) + 1 }),
    {},
  );
  const t0 = performance.now();
  let announced = '';
  let waited: number | null = null;
  while ((performance.now() - t0) / 1000 < GIVE_UP_S) {
    const attempt = await session(app.base, target, DEMO_PASSWORD);
    if (attempt.status === 200) {
      waited = (performance.now() - t0) / 1000;
      break;
    }
    announced ||= JSON.stringify((attempt.body as { error?: { message?: string } }).error?.message ?? attempt.status);
    await sleep(250);
  }
  console.log(
    `burst of ${BURST} wrong passwords (${JSON.stringify(tally)}); first refusal of the right one said ${announced || '(none)'}`,
  );
  console.log(
    waited === null
      ? `right password still refused after ${GIVE_UP_S} s`
      : `right password let in after ${waited.toFixed(1)} s`,
  );
  console.log(
    `summary: long name ${longName.ms.toFixed(0)} ms (health ${longName.healthWorstMs.toFixed(0)} ms), ` +
      `600 kB ${bigBody.ms.toFixed(0)} ms, right password after ${waited === null ? `>${GIVE_UP_S}` : waited.toFixed(1)} s`,
  );
} finally {
  await app.stop();
  database.cleanup();
}
