import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { createApp } from '../../server/http/app';
import { env } from '../../server/config/env';
import { AuditEntry, Invitation } from '../../server/db/models';
import { agentFor, createUser } from '../helpers/agent';
import { lastMailId, mailedLink } from '../helpers/mail';

const { app, close } = createApp();
afterAll(close);

const address = () => `invitee-${randomUUID().slice(0, 8)}@test.invalid`;
const GOOD_PASSWORD = 'amber lantern over quiet fjords';

async function invite(email: string, role = 'member') {
  const admin = await agentFor(app, 'admin');
  const before = lastMailId();
  const res = await admin.post('/api/auth/invitations').set('X-CSRF-Token', admin.csrf).send({ email, role });
  return { admin, res, before };
}

describe('POST /api/auth/invitations', () => {
  it('when an admin invites an address, then 201 and the fake SMTP server holds a link under APP_URL', async () => {
    const email = address();
    const { res, before } = await invite(email, 'curator');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, role: 'curator', status: 'pending', sentCount: 1 });
    const { mail, link, token } = await mailedLink(email, '/invitations/', before);
    expect(link.startsWith(`${env().appUrl}/invitations/`)).toBe(true);
    expect(mail.subject).toMatch(/invitation/i);
    const stored = await Invitation.findByPk(res.body.id);
    expect(stored!.tokenHash).not.toContain(token);
    expect(stored!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('when the address already has an account or an open invitation, then 409', async () => {
    const existing = await createUser('viewer');
    const first = await invite(existing.email);
    expect(first.res.status).toBe(409);
    const email = address();
    const { admin } = await invite(email);
    const again = await admin
      .post('/api/auth/invitations')
      .set('X-CSRF-Token', admin.csrf)
      .send({ email: email.toUpperCase(), role: 'viewer' });
    expect(again.status).toBe(409);
    expect(again.body.error.details[0].invitationId).toEqual(expect.any(Number));
  });

  it('when a curator tries to invite, then 403', async () => {
    const curator = await agentFor(app, 'curator');
    const res = await curator
      .post('/api/auth/invitations')
      .set('X-CSRF-Token', curator.csrf)
      .send({ email: address(), role: 'viewer' });
    expect(res.status).toBe(403);
  });
});

describe('accepting an invitation through the mailed link', () => {
  it(
    'when the invitee opens the link, sets name and password, then they are signed in with the invited ' +
      'role and can sign in again',
    async () => {
      const email = address();
      const { res, before } = await invite(email, 'viewer');
      const { token } = await mailedLink(email, '/invitations/', before);
      const anon = await agentFor(app);
      const preview = await anon.get(`/api/auth/invitations/${token}`);
      expect(preview.status).toBe(200);
      expect(preview.body).toMatchObject({ email, role: 'viewer', inviterName: 'Test admin' });

      const accepted = await anon
        .post(`/api/auth/invitations/${token}/accept`)
        .set('X-CSRF-Token', anon.csrf)
        .send({ name: 'Ines Accepting', password: GOOD_PASSWORD });
      expect(accepted.status).toBe(201);
      expect(accepted.body.user).toMatchObject({ email, role: 'viewer', name: 'Ines Accepting' });
      const me = await anon.get('/api/auth/me');
      expect(me.body.user.email).toBe(email);

      const fresh = await agentFor(app);
      const login = await fresh
        .post('/api/auth/login')
        .set('X-CSRF-Token', fresh.csrf)
        .send({ email, password: GOOD_PASSWORD });
      expect(login.status).toBe(200);
      const audit = await AuditEntry.findAll({ where: { subjectType: 'invitation', subjectId: String(res.body.id) } });
      expect(audit.map((a) => a.action).sort()).toEqual(['invitation.accept', 'invitation.create']);
    },
  );

  it('when the link is used a second time, then 410 and no second account', async () => {
    const email = address();
    const { before } = await invite(email);
    const { token } = await mailedLink(email, '/invitations/', before);
    const anon = await agentFor(app);
    await anon
      .post(`/api/auth/invitations/${token}/accept`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ name: 'Once', password: GOOD_PASSWORD });
    const other = await agentFor(app);
    const again = await other
      .post(`/api/auth/invitations/${token}/accept`)
      .set('X-CSRF-Token', other.csrf)
      .send({ name: 'Twice', password: GOOD_PASSWORD });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invitation_used');
  });

  it('when the password is common or too short, then 400 naming the password field, and the link still works', async () => {
    const email = address();
    const { before } = await invite(email);
    const { token } = await mailedLink(email, '/invitations/', before);
    const anon = await agentFor(app);
    // "qwerty123456" is in the NCSC 100k most-used list (SecLists); "short" is under 12 characters.
    for (const password of ['qwerty123456', 'short']) {
      const res = await anon
        .post(`/api/auth/invitations/${token}/accept`)
        .set('X-CSRF-Token', anon.csrf)
        .send({ name: 'Weak', password });
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].path).toBe('body.password');
    }
    const local = email.split('@')[0];
    const named = await anon
      .post(`/api/auth/invitations/${token}/accept`)
      .set('X-CSRF-Token', anon.csrf)
      .send({ name: 'Named', password: `${local}-2026!` });
    expect(named.status).toBe(400);
    expect((await anon.get(`/api/auth/invitations/${token}`)).status).toBe(200);
  });

  it('when the invitation has expired, then 410 invitation_expired', async () => {
    const email = address();
    const { res, before } = await invite(email);
    const { token } = await mailedLink(email, '/invitations/', before);
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: res.body.id } });
    const anon = await agentFor(app);
    const preview = await anon.get(`/api/auth/invitations/${token}`);
    expect(preview.status).toBe(410);
    expect(preview.body.error.code).toBe('invitation_expired');
  });

  it('when the token is unknown, then 404', async () => {
    const res = await request(app).get(`/api/auth/invitations/${'x'.repeat(43)}`);
    expect(res.status).toBe(404);
  });
});

describe('resend, revoke and list', () => {
  it('when an admin resends, then a new link is mailed and the old one stops working', async () => {
    const email = address();
    const { admin, res, before } = await invite(email);
    const first = await mailedLink(email, '/invitations/', before);
    const mark = lastMailId();
    const resent = await admin.post(`/api/auth/invitations/${res.body.id}/resend`).set('X-CSRF-Token', admin.csrf);
    expect(resent.status).toBe(200);
    expect(resent.body.sentCount).toBe(2);
    const second = await mailedLink(email, '/invitations/', mark);
    expect(second.token).not.toBe(first.token);
    expect((await request(app).get(`/api/auth/invitations/${first.token}`)).status).toBe(404);
    expect((await request(app).get(`/api/auth/invitations/${second.token}`)).status).toBe(200);
  });

  it('when an admin revokes, then the link answers 410 and the invitation leaves the open list', async () => {
    const email = address();
    const { admin, res, before } = await invite(email);
    const { token } = await mailedLink(email, '/invitations/', before);
    const revoked = await admin.post(`/api/auth/invitations/${res.body.id}/revoke`).set('X-CSRF-Token', admin.csrf);
    expect(revoked.body.status).toBe('revoked');
    expect((await request(app).get(`/api/auth/invitations/${token}`)).body.error.code).toBe('invitation_revoked');
    const open = await admin.get('/api/auth/invitations');
    expect(open.body.items.map((i: { email: string }) => i.email)).not.toContain(email);
    const all = await admin.get('/api/auth/invitations?status=all');
    expect(all.body.items.find((i: { email: string }) => i.email === email).status).toBe('revoked');
    const actions = (
      await AuditEntry.findAll({ where: { subjectType: 'invitation', subjectId: String(res.body.id) } })
    ).map((a) => a.action);
    expect(actions).toContain('invitation.revoke');
  });
});
