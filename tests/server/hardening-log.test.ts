import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

/** Every line the app logs, at every level, captured from the app's own logger options (redaction included). */
const captured = vi.hoisted(() => ({ lines: [] as string[] }));
vi.mock('../../server/http/logger', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../server/http/logger')>();
  const { default: pino } = await import('pino');
  const sink = { write: (line: string) => void captured.lines.push(line) };
  return { ...original, logger: pino({ ...original.loggerOptions, level: 'trace' }, sink) };
});

import { Router } from 'express';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { allow } from '../../server/http/middleware/access';
import { agentFor, createUser, type Agent } from '../helpers/agent';
import { lastMailId, mailedLink } from '../helpers/mail';
import { startMailCatcher } from '../../server/mail/catcher';

const { app, close } = createApp();
let curator: Agent;
let sessionCookie: string;

beforeAll(async () => {
  await startMailCatcher(0);
  curator = await agentFor(app, 'curator');
  const me = await curator.get('/api/auth/me');
  sessionCookie = String((me as unknown as { req: { getHeader(name: string): unknown } }).req.getHeader('cookie'));
});
afterAll(close);

/** The session id inside the signed cookie value `rfolio.sid=s%3A<sid>.<signature>`. */
const sidOf = (cookie: string) =>
  decodeURIComponent(/rfolio\.sid=([^;]+)/.exec(cookie)![1])
    .replace(/^s:/, '')
    .split('.')[0];

describe('secrets never reach the log (issue 23 point 1)', () => {
  it(
    'when a signed-in curator makes reads and a write, then neither the session cookie nor the CSRF ' +
      'token appears in any log line',
    async () => {
      expect(sessionCookie).toMatch(/rfolio\.sid=/);
      captured.lines.length = 0;
      expect((await curator.get('/api/records')).status).toBe(200);
      expect(
        (await curator.post('/api/bookmarks').set('X-CSRF-Token', curator.csrf).send({ recordId: 999_999_999 })).status,
      ).toBeGreaterThanOrEqual(400);
      expect((await curator.get('/api/no-such-route')).status).toBe(404);
      const log = captured.lines.join('');
      expect(captured.lines.length).toBeGreaterThanOrEqual(3);
      expect(log).toContain('/api/records');
      expect(log).not.toContain(sidOf(sessionCookie));
      expect(log).not.toContain(curator.csrf);
      expect(log).not.toMatch(/rfolio\.sid/);
    },
  );

  it('when a script calls with a Bearer token, then the token is in no log line', async () => {
    const minted = await curator.post('/api/tokens').set('X-CSRF-Token', curator.csrf).send({ name: 'log check' });
    expect(minted.status).toBe(201);
    const token = String(minted.body.token);
    expect(token.length).toBeGreaterThan(20);
    captured.lines.length = 0;
    expect((await request(app).get('/api/records').set('Authorization', `Bearer ${token}`)).status).toBe(200);
    expect((await request(app).get('/api/records').set('Authorization', `Bearer ${token}x`)).status).toBe(401);
    expect(captured.lines.length).toBeGreaterThanOrEqual(2);
    expect(captured.lines.join('')).not.toContain(token);
  });

  it(
    'when a password-reset link is requested and opened, then its token is in no log line (the URL ' +
      'is logged as /password-reset/[redacted])',
    async () => {
      const user = await createUser('member');
      const since = lastMailId();
      const anon = await agentFor(app);
      expect(
        (await anon.post('/api/auth/password-reset').set('X-CSRF-Token', anon.csrf).send({ email: user.email })).status,
      ).toBe(202);
      const { token } = await mailedLink(user.email, '/password-reset/', since);
      captured.lines.length = 0;
      expect((await request(app).get(`/api/auth/password-reset/${token}`)).status).toBe(200);
      expect((await request(app).get(`/password-reset/${token}`)).status).toBeLessThan(500);
      const log = captured.lines.join('');
      expect(log).toContain('/password-reset/[redacted]');
      expect(log).not.toContain(token);
    },
  );
});

describe('a 500 is logged once (issue 19 point 4)', () => {
  it('when a route throws an unexpected error, then exactly one log line carries it, at level error, with the request', async () => {
    const { app: broken, close: closeBroken } = createApp();
    // A throwing route mounted ahead of the real ones on a second app.
    const boom = Router();
    boom.get('/boom', allow('public'), () => {
      throw new Error('kaboom-for-the-log-test');
    });
    const stack = (broken as unknown as { router: { stack: { name: string }[] } }).router.stack;
    broken.use('/api', boom);
    const added = stack.pop()!;
    stack.splice(
      stack.findIndex((layer) => layer.name === 'apiNotFound'),
      0,
      added,
    );
    captured.lines.length = 0;
    const res = await request(broken).get('/api/boom');
    await closeBroken();
    expect(res.status).toBe(500);
    const lines = captured.lines.filter((line) => line.includes('kaboom-for-the-log-test'));
    expect(lines).toHaveLength(1);
    expect(JSON.parse(lines[0])).toMatchObject({ level: 50, req: { method: 'GET', url: '/api/boom' } });
  });
});
