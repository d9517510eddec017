import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { spawnSync } from 'node:child_process';
import type { Express } from 'express';
import { createApp } from '../../server/http/app';
import { loadEnv, trustProxySetting } from '../../server/config/env';
import { eluentNameIndex } from '../../shared/catalogue/lookup';
import { agentFor, type Agent } from '../helpers/agent';
import { serveOnLoopback } from '../helpers/fuzz/context';

/** Issue 23 points 2 and issue 19 point 4: input that stalled the event loop or answered 500. */
const { app, close } = createApp();
let viewer: Agent;
let remote: Agent;
let served: { base: string; stop: () => Promise<void> };

beforeAll(async () => {
  viewer = await agentFor(app, 'viewer');
  served = await serveOnLoopback(app);
  // A viewer signed in against the served app: its requests share one event loop with the health checks.
  remote = await agentFor(served.base as unknown as Express, 'viewer');
});
afterAll(async () => {
  await served.stop();
  await close();
});

/** The viewer's translate request against the served app, alongside a health check on the same event loop. */
async function translateWithHealthBeside(body: unknown) {
  const translate = remote
    .post('/api/tools/translate-eluent')
    .set('X-CSRF-Token', remote.csrf)
    .send(body as object);
  // Sent a moment later, so it waits behind the translation if that one holds the event loop.
  const health = new Promise((resolve) => setTimeout(resolve, 20)).then(() => request(served.base).get('/api/health'));
  return Promise.all([translate, health]);
}

describe('names too long to be any solvent', () => {
  it(
    'when a 40,000-character solvent name is translated, then 400 naming the length, and /api/health ' +
      'answers meanwhile (took 2.5 s, now capped)',
    async () => {
      const [res, health] = await translateWithHealthBeside({
        from: { components: [{ solvent: 'x'.repeat(40_000), parts: 1 }] },
        to: { weak: 'hexanes', strong: 'EtOAc' },
      });
      expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(JSON.stringify(res.body.error.details)).toMatch(/60/);
      expect(health.status).toBe(200);
    },
  );

  it('when a 600 kB translate body carries four 150 kB names, then 400 and /api/health answers meanwhile (took 63.5 s)', async () => {
    const name = (c: string) => c.repeat(150_000);
    const body = {
      from: { components: ['a', 'b', 'c', 'd'].map((c) => ({ solvent: name(c), parts: 1 })) },
      to: { weak: 'hexanes', strong: 'EtOAc' },
    };
    expect(JSON.stringify(body).length).toBeGreaterThan(600_000);
    const [res, health] = await translateWithHealthBeside(body);
    expect(res.status).toBe(400);
    expect(health.status).toBe(200);
  });

  it('when a misspelt name of ordinary length arrives, then it still gets a suggestion (the cap only drops hopeless queries)', async () => {
    const res = await viewer
      .post('/api/tools/translate-eluent')
      .set('X-CSRF-Token', viewer.csrf)
      .send({ from: { components: [{ solvent: 'methanl', parts: 1 }] }, to: { weak: 'hexanes', strong: 'EtOAc' } });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error)).toMatch(/Did you mean \\"(MeOH|methanol)/i);
  });

  it('when the suggester is handed a word longer than any name could be misspelt to, then it answers null without searching', () => {
    expect(eluentNameIndex.suggest('dichloromethane'.repeat(5))).toBeNull();
    expect(eluentNameIndex.suggest('q'.repeat(40_000))).toBeNull();
    expect(eluentNameIndex.suggest('dichloromethan')).not.toBeNull();
  });

  it('when a named additive or a record filter is 10,000 characters long, then 400 (both were uncapped)', async () => {
    const additive = await viewer
      .post('/api/tools/translate-eluent')
      .set('X-CSRF-Token', viewer.csrf)
      .send({
        from: {
          components: [{ solvent: 'EtOAc', parts: 1 }],
          additives: [{ additive: 'y'.repeat(10_000), percent: 1 }],
        },
        to: { weak: 'hexanes', strong: 'EtOAc' },
      });
    expect(additive.status).toBe(400);
    expect(JSON.stringify(additive.body.error.details)).toMatch(/<=60/);
    const list = await viewer.get('/api/records').query({ phase: 'z'.repeat(10_000) });
    expect(list.status).toBe(400);
    expect(JSON.stringify(list.body.error.details)).toMatch(/<=80/);
    const login = await request(app)
      .post('/api/auth/login')
      .send({ email: `${'e'.repeat(10_000)}@test.invalid`, password: 'x' });
    expect([400, 403]).toContain(login.status);
  });
});

describe('CSRF token comparison', () => {
  it('when the token sent has the right length but non-ASCII characters, then 403 csrf (was a 500 from timingSafeEqual)', async () => {
    const agent = await agentFor(app);
    const odd = 'é'.repeat(agent.csrf.length);
    const res = await agent.post('/api/auth/logout').set('X-CSRF-Token', odd);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
  });
});

describe('content security policy', () => {
  it(
    "when any page is served, then script-src is 'self' only (no 'unsafe-eval': neither the client " +
      'build nor OpenChemLib evaluates strings)',
    async () => {
      const res = await request(app).get('/api/health');
      const csp = res.headers['content-security-policy'] as string;
      expect(csp).toMatch(/script-src 'self'(;|$)/);
      expect(csp).not.toMatch(/unsafe-eval/);
    },
  );
});

describe('environment', () => {
  const base = { DATABASE_URL: 'postgres://rfolio@127.0.0.1:5432/x', SESSION_SECRET: 's'.repeat(40) };

  it('when RFOLIO_SEED_DEMO=1 is set in production, then the environment is refused (the demo password is published)', () => {
    expect(() => loadEnv({ ...base, NODE_ENV: 'production', RFOLIO_SEED_DEMO: '1' })).toThrow(
      /RFOLIO_SEED_DEMO: refused in production/,
    );
    expect(loadEnv({ ...base, NODE_ENV: 'production' }).demo).toBe(false);
    expect(loadEnv({ ...base, NODE_ENV: 'test', RFOLIO_SEED_DEMO: '1' }).demo).toBe(true);
  });

  it('when `npm run seed` is run in production, then it refuses and seeds nothing', { timeout: 30_000 }, () => {
    const run = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/seed.ts'], {
      env: { ...process.env, ...base, NODE_ENV: 'production' },
      encoding: 'utf8',
    });
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/Refusing to seed the demo group in production/);
  });

  it('when TRUST_PROXY is unset, then no client is a proxy; a list names the proxies', () => {
    expect(trustProxySetting(undefined)).toBe(false);
    expect(trustProxySetting('')).toBe(false);
    expect(trustProxySetting('1')).toBe(1);
    expect(trustProxySetting('loopback, 10.0.0.0/8')).toEqual(['loopback', '10.0.0.0/8']);
  });
});
