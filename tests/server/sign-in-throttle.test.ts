import { afterAll, describe, expect, it, vi } from 'vitest';

const saved = vi.hoisted(() => {
  const before = { ...process.env };
  process.env.SIGNIN_MAX_FAILURES_PER_ACCOUNT = '3';
  process.env.SIGNIN_MAX_FAILURES_PER_ADDRESS = '5';
  // The production store: counters in PostgreSQL, shared by every app server.
  process.env.SIGNIN_THROTTLE_STORE = 'postgres';
  return before;
});

import { randomUUID } from 'node:crypto';
import { createApp } from '../../server/http/app';
import { PgRateLimitStore } from '../../server/auth/pg-rate-limit-store';
import { sequelize } from '../../server/db/sequelize';
import { agentFor, createUser, TEST_PASSWORD } from '../helpers/agent';

const { app, close } = createApp();
afterAll(async () => {
  await close();
  process.env = saved;
});

/** Client addresses from the documentation ranges of RFC 5737, passed through the trusted loopback proxy. */
const address = () => `203.0.113.${Math.floor(Math.random() * 250) + 1}`;

async function attempt(email: string, password: string, from: string) {
  const anon = await agentFor(app);
  return anon.post('/api/auth/login').set('X-CSRF-Token', anon.csrf).set('X-Forwarded-For', from).send({ email, password });
}

describe('sign-in throttling', () => {
  it('when one account has 3 failed sign-ins (limit lowered for the test), then the 4th is 429 in the JSON error shape, even with the right password', async () => {
    const user = await createUser('viewer');
    for (let i = 0; i < 3; i++) expect((await attempt(user.email, 'wrong-password-here', `198.51.100.${i + 1}`)).status).toBe(401);
    const blocked = await attempt(user.email, TEST_PASSWORD, '198.51.100.9');
    expect(blocked.status).toBe(429);
    expect(blocked.body.error).toMatchObject({ code: 'too_many_attempts' });
    expect(blocked.body.error.message).toMatch(/Try again in \d+ min/);
    const [rows] = await sequelize.query('SELECT hits FROM rate_limit_hits WHERE key = :key', { replacements: { key: `signin-account:${user.email}` } });
    expect((rows as { hits: number }[])[0].hits).toBeGreaterThanOrEqual(3);
    const other = await createUser('viewer');
    expect((await attempt(other.email, TEST_PASSWORD, '198.51.100.9')).status).toBe(200);
  });

  it('when one address has 5 failed sign-ins across accounts, then the 6th from it is 429 while another address still signs in', async () => {
    const from = `192.0.2.${Math.floor(Math.random() * 250) + 1}`;
    for (let i = 0; i < 5; i++) expect((await attempt(`nobody-${randomUUID()}@test.invalid`, 'wrong-password-here', from)).status).toBe(401);
    const user = await createUser('viewer');
    expect((await attempt(user.email, TEST_PASSWORD, from)).status).toBe(429);
    expect((await attempt(user.email, TEST_PASSWORD, address())).status).toBe(200);
  });

  it('when sign-ins succeed or are malformed, then they do not use up the allowance (many sign-ins from one address keep working)', async () => {
    const user = await createUser('member');
    const from = address();
    for (let i = 0; i < 8; i++) {
      expect((await attempt(user.email, TEST_PASSWORD, from)).status).toBe(200);
      expect((await attempt('not-an-email', 'x', from)).status).toBe(400);
    }
  });
});

describe('PgRateLimitStore', () => {
  it('when two stores (two app servers) share a prefix, then they count the same hits in PostgreSQL', async () => {
    const prefix = `test-${randomUUID()}:`;
    const first = new PgRateLimitStore(prefix);
    const second = new PgRateLimitStore(prefix);
    for (const s of [first, second]) s.init({ windowMs: 60_000 } as Parameters<PgRateLimitStore['init']>[0]);
    await first.increment('k');
    await second.increment('k');
    const third = await first.increment('k');
    expect(third.totalHits).toBe(3);
    await second.decrement('k');
    expect((await first.increment('k')).totalHits).toBe(3);
    await first.resetKey('k');
    expect((await second.increment('k')).totalHits).toBe(1);
  });
});
