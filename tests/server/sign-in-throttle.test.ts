import { afterAll, describe, expect, it, vi } from 'vitest';

const saved = vi.hoisted(() => {
  const before = { ...process.env };
  process.env.SIGNIN_FREE_FAILURES_PER_ACCOUNT = '3';
  process.env.SIGNIN_FREE_FAILURES_PER_ADDRESS = '5';
  process.env.SIGNIN_MAX_WAIT_SECONDS = '2';
  // The production store: counters in PostgreSQL, shared by every app server.
  process.env.SIGNIN_THROTTLE_STORE = 'postgres';
  // The tests stand behind a proxy on loopback, so each attempt can come from an address of its own.
  process.env.TRUST_PROXY = 'loopback';
  return before;
});

import { randomUUID } from 'node:crypto';
import { createApp } from '../../server/http/app';
import { PgRateLimitStore } from '../../server/auth/pg-rate-limit-store';
import { MemoryAttemptStore, waitAfter } from '../../server/auth/sign-in-waits';
import { sequelize } from '../../server/db/sequelize';
import { caughtMail } from '../../server/mail/mailbox';
import { agentFor, createUser, TEST_PASSWORD } from '../helpers/agent';
import { lastMailId } from '../helpers/mail';

const { app, close } = createApp();
afterAll(async () => {
  await close();
  process.env = saved;
});

/** Client addresses from the documentation ranges of RFC 5737, passed through the trusted loopback proxy. */
const address = () => `203.0.113.${Math.floor(Math.random() * 250) + 1}`;
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function attempt(email: string, password: string, from: string) {
  const anon = await agentFor(app);
  return anon
    .post('/api/auth/login')
    .set('X-CSRF-Token', anon.csrf)
    .set('X-Forwarded-For', from)
    .send({ email, password });
}

/** Tries the right password, waiting what each 429 asks, until it is let in; returns the attempts it took. */
async function signInPatiently(email: string, from: () => string, limit = 8) {
  for (let tries = 1; tries <= limit; tries++) {
    const res = await attempt(email, TEST_PASSWORD, from());
    if (res.status === 200) return tries;
    expect(res.status).toBe(429);
    await sleep(Number(res.headers['retry-after']) * 1000);
  }
  return Infinity;
}

describe('sign-in waits (NIST SP 800-63B § 5.2.2: rate limiting, no hard lock-out)', () => {
  it(
    'when one account has 3 failed sign-ins (the free allowance, lowered for the test), then the next ' +
      'try waits seconds — Retry-After, not 15 minutes — and then the right password works',
    async () => {
      const user = await createUser('viewer');
      for (let i = 0; i < 3; i++)
        expect((await attempt(user.email, 'wrong-password-here', `198.51.100.${i + 1}`)).status).toBe(401);
      const waiting = await attempt(user.email, TEST_PASSWORD, '198.51.100.9');
      expect(waiting.status).toBe(429);
      expect(waiting.body.error).toMatchObject({ code: 'too_many_attempts' });
      expect(waiting.body.error.message).toMatch(/Try again in [12] s/);
      expect(waiting.body.error.details[0].retryAfterSeconds).toBeLessThanOrEqual(2);
      expect(Number(waiting.headers['retry-after'])).toBeLessThanOrEqual(2);
      const [rows] = await sequelize.query('SELECT hits FROM rate_limit_hits WHERE key = :key', {
        replacements: { key: `signin-wait:account:${user.email}` },
      });
      expect((rows as { hits: number }[])[0].hits).toBe(3);
      await sleep(waiting.body.error.details[0].retryAfterSeconds * 1000);
      expect((await attempt(user.email, TEST_PASSWORD, '198.51.100.9')).status).toBe(200);
      // A success forgets the account's failures: the next wrong password is free again.
      expect((await attempt(user.email, 'wrong-password-here', '198.51.100.9')).status).toBe(401);
    },
  );

  it(
    'when a burst of 30 wrong guesses hits one account from many addresses, then the right person ' +
      'gets in after at most the longest wait (2 s here), not minutes',
    async () => {
      const user = await createUser('member');
      const agents = await Promise.all(Array.from({ length: 30 }, () => agentFor(app)));
      const burst = await Promise.all(
        agents.map((anon) =>
          anon
            .post('/api/auth/login')
            .set('X-CSRF-Token', anon.csrf)
            .set('X-Forwarded-For', address())
            .send({ email: user.email, password: 'a-wrong-guess-123' }),
        ),
      );
      const statuses = burst.map((res) => res.status);
      expect(statuses.filter((s) => s === 401).length).toBeGreaterThanOrEqual(3);
      // The check and the count are one statement: parallel guesses do not all get through.
      expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(4);
      expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(26);
      for (const res of burst.filter((r) => r.status === 429))
        expect(res.body.error.details[0].retryAfterSeconds).toBeLessThanOrEqual(2);
      expect(await signInPatiently(user.email, address)).toBeLessThanOrEqual(3);
    },
  );

  it(
    'when the owner’s own browser (where they signed in before) comes back during someone else’s ' +
      'burst, then it is let in at once; a fresh browser waits',
    async () => {
      const user = await createUser('member');
      const own = await agentFor(app);
      const first = await own
        .post('/api/auth/login')
        .set('X-CSRF-Token', own.csrf)
        .set('X-Forwarded-For', address())
        .send({ email: user.email, password: TEST_PASSWORD });
      expect(first.status).toBe(200);
      expect(String(first.headers['set-cookie'])).toMatch(/rfolio\.known=[\w-]{43};.*HttpOnly/);
      for (let i = 0; i < 4; i++) await attempt(user.email, 'wrong-password-here', address());
      expect((await attempt(user.email, TEST_PASSWORD, address())).status).toBe(429);
      const again = await own.get('/api/auth/csrf');
      const back = await own
        .post('/api/auth/login')
        .set('X-CSRF-Token', again.body.token)
        .set('X-Forwarded-For', address())
        .send({ email: user.email, password: TEST_PASSWORD });
      expect(back.status).toBe(200);
      // The cookie is the owner's account's only: for another account the same browser waits like any other.
      const other = await createUser('viewer');
      for (let i = 0; i < 3; i++) await attempt(other.email, 'wrong-password-here', address());
      const token = (await own.get('/api/auth/csrf')).body.token;
      expect(
        (
          await own
            .post('/api/auth/login')
            .set('X-CSRF-Token', token)
            .set('X-Forwarded-For', address())
            .send({ email: other.email, password: TEST_PASSWORD })
        ).status,
      ).toBe(429);
    },
  );

  it(
    'when one address has 5 failed sign-ins across accounts, then the next from it waits seconds ' +
      'while another address signs in at once',
    async () => {
      const from = `192.0.2.${Math.floor(Math.random() * 250) + 1}`;
      for (let i = 0; i < 5; i++)
        expect((await attempt(`nobody-${randomUUID()}@test.invalid`, 'wrong-password-here', from)).status).toBe(401);
      const user = await createUser('viewer');
      const waiting = await attempt(user.email, TEST_PASSWORD, from);
      expect(waiting.status).toBe(429);
      expect(waiting.body.error.message).toMatch(/from this address/);
      expect((await attempt(user.email, TEST_PASSWORD, address())).status).toBe(200);
      expect(await signInPatiently(user.email, () => from)).toBeLessThanOrEqual(3);
    },
  );

  it(
    'when sign-ins succeed or are malformed, then they do not use up the allowance (many sign-ins ' +
      'from one address keep working)',
    async () => {
      const user = await createUser('member');
      const from = address();
      for (let i = 0; i < 8; i++) {
        expect((await attempt(user.email, TEST_PASSWORD, from)).status).toBe(200);
        expect((await attempt('not-an-email', 'x', from)).status).toBe(400);
      }
    },
  );

  it(
    'when an account’s free allowance is used up, then its owner gets one e-mail saying it is being ' +
      'guessed; an unknown e-mail sends nothing',
    async () => {
      const user = await createUser('curator');
      const since = lastMailId();
      for (let i = 0; i < 3; i++)
        expect((await attempt(user.email, 'wrong-password-here', address())).status).toBe(401);
      for (let i = 0; i < 3; i++) await attempt(`ghost-${randomUUID()}@test.invalid`, 'wrong-password-here', address());
      let mails = caughtMail().filter((m) => m.id > since && m.to.includes(user.email));
      for (let i = 0; i < 100 && mails.length === 0; i++) {
        await sleep(20);
        mails = caughtMail().filter((m) => m.id > since && m.to.includes(user.email));
      }
      expect(mails).toHaveLength(1);
      expect(mails[0].subject).toBe('Failed sign-ins to your Rfolio account');
      expect(mails[0].text).toMatch(/wrong password for this address on the group’s Rfolio 3 times/);
      await sleep(1100);
      expect((await attempt(user.email, 'wrong-password-here', address())).status).toBe(401);
      await sleep(100);
      expect(caughtMail().filter((m) => m.id > since && m.to.includes(user.email))).toHaveLength(1);
      expect(caughtMail().filter((m) => m.id > since && m.to.some((to) => to.startsWith('ghost-')))).toEqual([]);
    },
  );
});

describe('wait schedule', () => {
  it(
    'when failures pass the free allowance, then waits double from 1 s up to the longest wait (common ' +
      'practice: exponential back-off)',
    () => {
      const rule = { free: 5, maxWaitMs: 30_000, windowMs: 900_000 };
      expect([4, 5, 6, 7, 8, 9, 10, 40].map((n) => waitAfter(n, rule))).toEqual([
        0, 1000, 2000, 4000, 8000, 16000, 30000, 30000,
      ]);
    },
  );

  it(
    'when the memory store is asked within a wait, then it refuses with the time left, and lets the ' +
      'attempt through after it',
    async () => {
      const store = new MemoryAttemptStore();
      const rule = { free: 1, maxWaitMs: 60_000, windowMs: 60_000 };
      expect(await store.claim('k', rule)).toEqual({ ok: true, attempts: 1 });
      const refused = await store.claim('k', rule);
      expect(refused.ok).toBe(false);
      expect(refused.ok === false && refused.retryAfterMs).toBeGreaterThan(900);
      await store.clear('k');
      expect(await store.claim('k', rule)).toEqual({ ok: true, attempts: 1 });
    },
  );
});

describe('PgRateLimitStore (profile password confirmations, reset requests)', () => {
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
