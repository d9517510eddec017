import { afterAll, describe, expect, it, vi } from 'vitest';

const saved = vi.hoisted(() => {
  const before = { ...process.env };
  process.env.SIGNIN_FREE_FAILURES_PER_ADDRESS = '3';
  process.env.SIGNIN_MAX_WAIT_SECONDS = '2';
  delete process.env.TRUST_PROXY;
  return before;
});

import { randomUUID } from 'node:crypto';
import { createApp } from '../../server/http/app';
import { agentFor, createUser, TEST_PASSWORD } from '../helpers/agent';

const { app, close } = createApp();
afterAll(async () => {
  await close();
  process.env = saved;
});

async function attempt(email: string, password: string, forwardedFor: string) {
  const anon = await agentFor(app);
  return anon
    .post('/api/auth/login')
    .set('X-CSRF-Token', anon.csrf)
    .set('X-Forwarded-For', forwardedFor)
    .send({ email, password });
}

describe('X-Forwarded-For (issue 23 point 3)', () => {
  it(
    'when TRUST_PROXY is not set, then a loopback client cannot pick its address with X-Forwarded-For: ' +
      'its failures count against its real address',
    async () => {
      for (let i = 0; i < 3; i++)
        expect(
          (await attempt(`nobody-${randomUUID()}@test.invalid`, 'wrong-password-here', `198.51.100.${i + 1}`)).status,
        ).toBe(401);
      const user = await createUser('viewer');
      const res = await attempt(user.email, TEST_PASSWORD, '203.0.113.77');
      expect(res.status).toBe(429);
      expect(res.body.error.message).toMatch(/from this address/);
    },
  );
});
