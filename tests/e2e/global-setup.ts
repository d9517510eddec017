import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

let server: ChildProcess | undefined;

/** Starts the built app on loopback with the demo seeded into the e2e database (never the demo's own). */
export async function setup(project: TestProject) {
  if (!process.env.E2E_DATABASE_URL) throw new Error('E2E_DATABASE_URL is not set: run through `npm test`.');
  const port = await freePort();
  server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, DATABASE_URL: process.env.E2E_DATABASE_URL, PORT: String(port), RFOLIO_SEED_DEMO: '1' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (server.exitCode !== null) throw new Error(`app exited with ${server.exitCode}`);
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error('app did not become healthy within 90 s');
    await new Promise((r) => setTimeout(r, 300));
  }
  project.provide('baseUrl', baseUrl);
}

export async function teardown() {
  if (!server || server.exitCode !== null) return;
  const exited = new Promise((r) => server!.once('exit', r));
  server.kill('SIGTERM');
  await exited;
}
