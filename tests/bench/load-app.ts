// The app under load: server/index.ts in a child process of its own (so the load generator does not share
// its event loop), production-like, on 127.0.0.1 only, with the invented demo group seeded.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createServer } from 'node:net';
import { projectRoot } from './bench-database';

const HOST = '127.0.0.1';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.listen(0, HOST, () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
    probe.on('error', reject);
  });
}

export interface RunningApp {
  base: string;
  port: number;
  stop: () => Promise<void>;
}

/**
 * Extra Node flags for the app process, from RFOLIO_BENCH_APP_NODE_FLAGS (space-separated), e.g.
 * `--cpu-prof --cpu-prof-dir=/tmp/prof` to profile the app under load (Node refuses --cpu-prof in NODE_OPTIONS).
 */
const appNodeFlags = () => (process.env.RFOLIO_BENCH_APP_NODE_FLAGS ?? '').split(/\s+/).filter(Boolean);

/**
 * Seeds the invented demo group (outside production: production refuses RFOLIO_SEED_DEMO), then starts the app
 * with NODE_ENV=production and a random SESSION_SECRET; resolves once /api/health is 200.
 */
export async function startApp(databaseUrl: string): Promise<RunningApp> {
  const seeded = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/seed.ts'], {
    cwd: projectRoot,
    env: { ...process.env, NODE_ENV: 'test', DATABASE_URL: databaseUrl, LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  if (seeded.status !== 0) throw new Error('seeding the demo group failed');
  const port = await freePort();
  const child: ChildProcess = spawn(process.execPath, [...appNodeFlags(), '--import', 'tsx', 'server/index.ts'], {
    cwd: projectRoot,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      SESSION_SECRET: randomBytes(32).toString('hex'),
      // The load stands for a TLS proxy on loopback (X-Forwarded-Proto: https, see behindTlsProxy).
      TRUST_PROXY: 'loopback',
      DATABASE_URL: databaseUrl,
      HOST,
      PORT: String(port),
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'info',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const base = `http://${HOST}:${port}`;
  const deadline = Date.now() + 180_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app exited with code ${child.exitCode}`);
    const healthy = await fetch(`${base}/api/health`).then(
      (res) => res.ok,
      () => false,
    );
    if (healthy) break;
    if (Date.now() > deadline) throw new Error('the app did not become healthy within 180 s');
    await new Promise((resolve) => setTimeout(resolve, 300));
  }
  return {
    base,
    port,
    stop: async () => {
      if (child.exitCode !== null) return;
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      await exited;
    },
  };
}

export interface Session {
  email: string;
  cookie: string;
  csrf: string;
}

const cookieOf = (res: Response, previous = '') => {
  const set = res.headers.getSetCookie().map((value) => value.split(';')[0]);
  return set.length > 0 ? set.join('; ') : previous;
};

/**
 * In production the session cookie is Secure, so the app must see HTTPS: as behind the TLS-terminating proxy a
 * deployment puts in front of it (the app trusts X-Forwarded-Proto from loopback only).
 */
export const behindTlsProxy = { 'x-forwarded-proto': 'https' } as const;

/** Signs in through the API as a browser would: CSRF token first, then POST /api/auth/login. */
export async function signIn(base: string, email: string, password: string): Promise<Session> {
  const first = await fetch(`${base}/api/auth/csrf`, { headers: behindTlsProxy });
  let cookie = cookieOf(first);
  const { token } = (await first.json()) as { token: string };
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { ...behindTlsProxy, 'content-type': 'application/json', 'x-csrf-token': token, cookie },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`sign-in of ${email} failed: ${login.status} ${await login.text()}`);
  cookie = cookieOf(login, cookie);
  const { csrfToken } = (await login.json()) as { csrfToken: string };
  return { email, cookie, csrf: csrfToken };
}
