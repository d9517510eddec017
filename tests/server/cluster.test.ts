import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { request as httpRequest } from 'node:http';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import { createUser, TEST_PASSWORD } from '../helpers/agent';
import { exampleRecordBody } from '../helpers/records';

/**
 * server/index.ts with RFOLIO_WORKERS=2 (node:cluster, production settings) on the tests' database. Every
 * request below opens a connection of its own, so the primary hands them to the two workers in turn: both
 * have answered (and kept) a record page before it is edited through one of them, and every read after the
 * edit, whichever worker serves it, must show it.
 */
const root = fileURLToPath(new URL('../..', import.meta.url));
let child: ChildProcess;
let base = '';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
    probe.on('error', reject);
  });
}

interface Answer {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON answers of several routes, read field by field
  body: Record<string, any>;
}

/** One request on a fresh connection (no keep-alive), as a browser behind the TLS proxy sends it. */
function send(method: string, path: string, headers: Record<string, string> = {}, body?: unknown): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const payload = body === undefined ? undefined : JSON.stringify(body);
    const req = httpRequest(
      base + path,
      {
        method,
        agent: false,
        headers: {
          'x-forwarded-proto': 'https',
          accept: 'application/json',
          ...(payload ? { 'content-type': 'application/json' } : {}),
          ...headers,
        },
      },
      (res) => {
        let text = '';
        res.setEncoding('utf8');
        res.on('data', (chunk) => (text += chunk));
        res.on('end', () =>
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body: text ? JSON.parse(text) : null }),
        );
      },
    );
    req.on('error', reject);
    req.end(payload);
  });
}

const cookieOf = (answer: Answer, previous = '') => {
  const set = (answer.headers['set-cookie'] ?? []) as string[];
  return set.length ? set.map((value) => value.split(';')[0]).join('; ') : previous;
};

beforeAll(async () => {
  const port = await freePort();
  base = `http://127.0.0.1:${port}`;
  child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      RFOLIO_WORKERS: '2',
      SESSION_SECRET: randomBytes(32).toString('hex'),
      HOST: '127.0.0.1',
      PORT: String(port),
      LOG_LEVEL: 'silent',
      TRUST_PROXY: 'loopback',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`the app exited with code ${child.exitCode}`);
    if (
      await send('GET', '/api/health').then(
        (res) => res.status === 200,
        () => false,
      )
    )
      break;
    if (Date.now() > deadline) throw new Error('the app did not become healthy');
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}, 120_000);

afterAll(async () => {
  if (child && child.exitCode === null) {
    const exited = new Promise((resolve) => child.once('exit', resolve));
    child.kill('SIGTERM');
    await exited;
  }
});

describe('RFOLIO_WORKERS=2', () => {
  it('when it has started, then the primary runs two worker processes', () => {
    // Children running the app itself (tsx may also have an esbuild helper of its own).
    const children = execFileSync('ps', ['-o', 'pid=,args=', '--ppid', String(child.pid)], { encoding: 'utf8' })
      .trim()
      .split('\n');
    const workers = children.filter((line) => line.includes('server/index.ts'));
    expect(workers, children.join('\n')).toHaveLength(2);
  });

  it('when a record page was kept by both workers and the author edits it through one, then every later read shows the edit', async () => {
    const user = await createUser('member');
    const csrf = await send('GET', '/api/auth/csrf');
    let cookie = cookieOf(csrf);
    const login = await send(
      'POST',
      '/api/auth/login',
      { cookie, 'x-csrf-token': csrf.body.token },
      { email: user.email, password: TEST_PASSWORD },
    );
    expect(login.status).toBe(200);
    cookie = cookieOf(login, cookie);
    const token = login.body.csrfToken as string;

    const created = await send(
      'POST',
      '/api/records',
      { cookie, 'x-csrf-token': token },
      exampleRecordBody({ notes: 'before the edit' }),
    );
    expect(created.status).toBe(201);
    const id = created.body.id as number;
    for (let i = 0; i < 6; i++)
      expect((await send('GET', `/api/records/${id}`, { cookie })).body.notes).toBe('before the edit');

    const edited = await send(
      'PATCH',
      `/api/records/${id}`,
      { cookie, 'x-csrf-token': token },
      { notes: 'after the edit' },
    );
    expect(edited.status).toBe(200);
    for (let i = 0; i < 6; i++) {
      const read = await send('GET', `/api/records/${id}`, { cookie });
      expect(read.status).toBe(200);
      expect(read.body.notes).toBe('after the edit');
      expect(read.body.revision).toBe(edited.body.revision);
    }
  });
});
