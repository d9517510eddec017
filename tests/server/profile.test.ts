import { afterAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { AuditEntry } from '../../server/db/models';
import { agentFor, TEST_PASSWORD } from '../helpers/agent';

const { app, close } = createApp();
afterAll(close);

const NEW_PASSWORD = 'column volumes to elution 4';

describe('PATCH /api/auth/me', () => {
  it('when a viewer renames themselves, then the session shows the new name', async () => {
    const viewer = await agentFor(app, 'viewer');
    const res = await viewer.patch('/api/auth/me').set('X-CSRF-Token', viewer.csrf).send({ name: '  Rosalind Spot  ' });
    expect(res.status).toBe(200);
    expect((await viewer.get('/api/auth/me')).body.user.name).toBe('Rosalind Spot');
  });

  it('when the name is blank, then 400 on body.name', async () => {
    const viewer = await agentFor(app, 'viewer');
    const res = await viewer.patch('/api/auth/me').set('X-CSRF-Token', viewer.csrf).send({ name: '   ' });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('body.name');
  });
});

describe('POST /api/auth/me/password', () => {
  it('when the current password is right, then the new one works, this session stays and other sessions end', async () => {
    const here = await agentFor(app, 'member');
    const elsewhere = await agentFor(app);
    await elsewhere
      .post('/api/auth/login')
      .set('X-CSRF-Token', elsewhere.csrf)
      .send({ email: here.user!.email, password: TEST_PASSWORD });
    expect((await elsewhere.get('/api/auth/me')).body.user?.email).toBe(here.user!.email);

    const res = await here
      .post('/api/auth/me/password')
      .set('X-CSRF-Token', here.csrf)
      .send({ currentPassword: TEST_PASSWORD, newPassword: NEW_PASSWORD });
    expect(res.status).toBe(204);
    expect((await here.get('/api/auth/me')).body.user.id).toBe(here.user!.id);
    expect((await elsewhere.get('/api/auth/me')).body.user).toBeNull();

    const fresh = await agentFor(app);
    const login = await fresh
      .post('/api/auth/login')
      .set('X-CSRF-Token', fresh.csrf)
      .send({ email: here.user!.email, password: NEW_PASSWORD });
    expect(login.status).toBe(200);
    expect(
      await AuditEntry.count({ where: { action: 'user.password_change', subjectId: String(here.user!.id) } }),
    ).toBe(1);
  });

  it('when the current password is wrong, then 400 wrong_password on body.currentPassword', async () => {
    const member = await agentFor(app, 'member');
    const res = await member
      .post('/api/auth/me/password')
      .set('X-CSRF-Token', member.csrf)
      .send({ currentPassword: 'not-it-at-all', newPassword: NEW_PASSWORD });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'wrong_password', details: [{ path: 'body.currentPassword' }] });
  });

  it('when the new password is under 12 characters or built on the e-mail, then 400 on body.newPassword', async () => {
    const member = await agentFor(app, 'member');
    const short = await member
      .post('/api/auth/me/password')
      .set('X-CSRF-Token', member.csrf)
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'elevenchars' });
    expect(short.status).toBe(400);
    expect(short.body.error.details[0].path).toBe('body.newPassword');
    const local = member.user!.email.split('@')[0];
    const own = await member
      .post('/api/auth/me/password')
      .set('X-CSRF-Token', member.csrf)
      .send({ currentPassword: TEST_PASSWORD, newPassword: `${local}!2026` });
    expect(own.status).toBe(400);
    expect(own.body.error.details[0].path).toBe('body.newPassword');
  });

  it('when anonymous, then 401', async () => {
    const anon = await agentFor(app);
    const res = await anon
      .post('/api/auth/me/password')
      .set('X-CSRF-Token', anon.csrf)
      .send({ currentPassword: 'x', newPassword: NEW_PASSWORD });
    expect(res.status).toBe(401);
  });
});
