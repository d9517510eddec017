import { afterAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { AuditEntry, PasswordReset } from '../../server/db/models';
import { caughtMail } from '../../server/mail/mailbox';
import { agentFor, createUser, TEST_PASSWORD } from '../helpers/agent';
import { lastMailId, mailedLink } from '../helpers/mail';

const { app, close } = createApp();
afterAll(close);

const NEW_PASSWORD = 'silica dust settles slowly 7';

async function requestReset(email: string) {
  const anon = await agentFor(app);
  return anon.post('/api/auth/password-reset').set('X-CSRF-Token', anon.csrf).send({ email });
}

async function sessionRowsOf(userId: number): Promise<number> {
  const [rows] = await sequelize.query(`SELECT sid FROM sessions WHERE (sess -> 'passport' ->> 'user') = :id`, {
    replacements: { id: String(userId) },
  });
  return rows.length;
}

describe('POST /api/auth/password-reset', () => {
  it('when the address has an account or not, then the answer is byte-for-byte the same', async () => {
    const user = await createUser('member');
    const known = await requestReset(user.email);
    const unknown = await requestReset('nobody-here@test.invalid');
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(known.status);
    expect(unknown.text).toBe(known.text);
    await mailedLink(user.email, '/password-reset/');
    expect(caughtMail().some((m) => m.to.includes('nobody-here@test.invalid'))).toBe(false);
  });

  it('when the mailed link is followed, then the new password works, the old does not, and every session has ended', async () => {
    const user = await createUser('member');
    const signedIn = await agentFor(app);
    await signedIn
      .post('/api/auth/login')
      .set('X-CSRF-Token', signedIn.csrf)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect((await signedIn.get('/api/auth/me')).body.user.id).toBe(user.id);
    expect(await sessionRowsOf(user.id)).toBe(1);

    const before = lastMailId();
    await requestReset(user.email);
    const { link, token } = await mailedLink(user.email, '/password-reset/', before);
    expect(link).toMatch(/\/password-reset\/[A-Za-z0-9_-]{43}$/);
    const stored = await PasswordReset.findOne({ where: { userId: user.id } });
    expect(stored!.expiresAt.getTime() - stored!.createdAt.getTime()).toBeCloseTo(3600_000, -4);

    const anon = await agentFor(app);
    expect((await anon.get(`/api/auth/password-reset/${token}`)).status).toBe(200);
    const set = await anon
      .post(`/api/auth/password-reset/${token}`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ password: NEW_PASSWORD });
    expect(set.status).toBe(204);

    expect(await sessionRowsOf(user.id)).toBe(0);
    expect((await signedIn.get('/api/auth/me')).body.user).toBeNull();
    const oldLogin = await anon
      .post('/api/auth/login')
      .set('X-CSRF-Token', anon.csrf)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(oldLogin.status).toBe(401);
    const newLogin = await anon
      .post('/api/auth/login')
      .set('X-CSRF-Token', anon.csrf)
      .send({ email: user.email, password: NEW_PASSWORD });
    expect(newLogin.status).toBe(200);
    const actions = (await AuditEntry.findAll({ where: { subjectType: 'user', subjectId: String(user.id) } })).map(
      (a) => a.action,
    );
    expect(actions).toEqual(expect.arrayContaining(['user.password_reset_request', 'user.password_reset']));
  });

  it('when the link is used twice, then the second time is 410', async () => {
    const user = await createUser('viewer');
    const before = lastMailId();
    await requestReset(user.email);
    const { token } = await mailedLink(user.email, '/password-reset/', before);
    const anon = await agentFor(app);
    await anon
      .post(`/api/auth/password-reset/${token}`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ password: NEW_PASSWORD });
    const again = await anon
      .post(`/api/auth/password-reset/${token}`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ password: 'another fine passphrase 8' });
    expect(again.status).toBe(410);
  });

  it('when a newer link has been sent, then the older one is 410 (replaced) and the newer one works (issue 23 point 7)', async () => {
    const user = await createUser('member');
    const before = lastMailId();
    await requestReset(user.email);
    const first = await mailedLink(user.email, '/password-reset/', before);
    const between = lastMailId();
    await requestReset(user.email);
    const second = await mailedLink(user.email, '/password-reset/', between);
    expect(second.token).not.toBe(first.token);
    expect((await agentFor(app).then((a) => a.get(`/api/auth/password-reset/${first.token}`))).status).toBe(410);
    const anon = await agentFor(app);
    const old = await anon
      .post(`/api/auth/password-reset/${first.token}`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ password: NEW_PASSWORD });
    expect(old.status).toBe(410);
    expect(old.body.error.code).toBe('reset_invalid');
    expect(
      (
        await anon
          .post(`/api/auth/password-reset/${second.token}`)
          .set('X-CSRF-Token', anon.csrf)
          .send({ password: NEW_PASSWORD })
      ).status,
    ).toBe(204);
  });

  it('when the link is older than an hour, then 410 and the password is unchanged', async () => {
    const user = await createUser('viewer');
    const before = lastMailId();
    await requestReset(user.email);
    const { token } = await mailedLink(user.email, '/password-reset/', before);
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1) }, { where: { userId: user.id } });
    const anon = await agentFor(app);
    const res = await anon
      .post(`/api/auth/password-reset/${token}`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ password: NEW_PASSWORD });
    expect(res.status).toBe(410);
    const login = await anon
      .post('/api/auth/login')
      .set('X-CSRF-Token', anon.csrf)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(login.status).toBe(200);
  });

  it('when the new password is one of the common ones, then 400 and the link still works', async () => {
    const user = await createUser('viewer');
    const before = lastMailId();
    await requestReset(user.email);
    const { token } = await mailedLink(user.email, '/password-reset/', before);
    const anon = await agentFor(app);
    // "1qaz2wsx3edc" is in the NCSC 100k most-used list (SecLists).
    const res = await anon
      .post(`/api/auth/password-reset/${token}`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ password: '1qaz2wsx3edc' });
    expect(res.status).toBe(400);
    expect((await anon.get(`/api/auth/password-reset/${token}`)).status).toBe(200);
  });

  it('when the account is disabled, then no mail is sent', async () => {
    const user = await createUser('viewer');
    await user.update({ status: 'disabled' });
    const before = lastMailId();
    await requestReset(user.email);
    const enabled = await createUser('viewer');
    await requestReset(enabled.email);
    await mailedLink(enabled.email, '/password-reset/', before);
    expect(caughtMail().some((m) => m.id > before && m.to.includes(user.email))).toBe(false);
  });
});
