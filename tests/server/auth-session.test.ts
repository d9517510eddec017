import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { agentFor, createUser, TEST_PASSWORD } from '../helpers/agent';

const { app, close } = createApp();
afterAll(close);

describe('sign-in and sessions', () => {
  it('when the password is right, then the session knows the user and their role', async () => {
    const agent = await agentFor(app, 'member');
    const me = await agent.get('/api/auth/me');
    expect(me.body.user).toMatchObject({ email: agent.user!.email, role: 'member' });
  });

  it('when the password is wrong or the e-mail unknown, then the same generic 401', async () => {
    const user = await createUser('viewer');
    const anon = await agentFor(app);
    const wrong = await anon
      .post('/api/auth/login')
      .set('X-CSRF-Token', anon.csrf)
      .send({ email: user.email, password: 'not-the-password-1' });
    const unknown = await anon
      .post('/api/auth/login')
      .set('X-CSRF-Token', anon.csrf)
      .send({ email: 'nobody@test.invalid', password: TEST_PASSWORD });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('when a mutation has no CSRF token, then 403', async () => {
    const res = await request(app).post('/api/auth/login').send({ email: 'a@b.c', password: 'x' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
  });

  it('when signed out, then the session no longer knows the user', async () => {
    const agent = await agentFor(app, 'viewer');
    const out = await agent.post('/api/auth/logout').set('X-CSRF-Token', agent.csrf);
    expect(out.status).toBe(204);
    const me = await agent.get('/api/auth/me');
    expect(me.body.user).toBeNull();
  });
});
