import { afterAll, describe, expect, it } from 'vitest';
import { Op } from 'sequelize';
import { createApp } from '../../server/http/app';
import { AuditEntry, User } from '../../server/db/models';
import { agentFor, createUser } from '../helpers/agent';

const { app, close } = createApp();
afterAll(close);

describe('GET /api/admin/users', () => {
  it('when an admin lists people, then each shows name, e-mail, role, status and last sign-in', async () => {
    const admin = await agentFor(app, 'admin');
    const quiet = await createUser('viewer');
    const res = await admin.get('/api/admin/users');
    expect(res.status).toBe(200);
    const me = res.body.items.find((u: { id: number }) => u.id === admin.user!.id);
    expect(me).toMatchObject({ email: admin.user!.email, role: 'admin', status: 'active' });
    expect(Date.parse(me.lastSignInAt)).toBeGreaterThan(Date.now() - 60_000);
    expect(res.body.items.find((u: { id: number }) => u.id === quiet.id).lastSignInAt).toBeNull();
  });

  it('when a curator asks, then 403; when anonymous, then 401', async () => {
    const curator = await agentFor(app, 'curator');
    expect((await curator.get('/api/admin/users')).status).toBe(403);
    expect((await (await agentFor(app)).get('/api/admin/users')).status).toBe(401);
  });
});

describe('PATCH /api/admin/users/:id', () => {
  it('when an admin changes a role, then the person has the new role on their next request and it is audited', async () => {
    const admin = await agentFor(app, 'admin');
    const member = await agentFor(app, 'member');
    const res = await admin
      .patch(`/api/admin/users/${member.user!.id}`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ role: 'curator' });
    expect(res.status).toBe(200);
    expect(res.body.role).toBe('curator');
    expect((await member.get('/api/auth/me')).body.user.role).toBe('curator');
    const entry = await AuditEntry.findOne({ where: { action: 'user.role', subjectId: String(member.user!.id) } });
    expect(entry!.details).toMatchObject({ from: 'member', to: 'curator' });
    expect(entry!.actorId).toBe(admin.user!.id);
  });

  it('when an admin disables someone, then their open session ends at once and they cannot sign in; enabling lets them back', async () => {
    const admin = await agentFor(app, 'admin');
    const member = await agentFor(app, 'member');
    expect((await member.get('/api/auth/me')).body.firstSignIn).toBe(true);
    const off = await admin
      .patch(`/api/admin/users/${member.user!.id}`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ status: 'disabled' });
    expect(off.body.status).toBe('disabled');
    expect((await member.get('/api/auth/me')).body.user).toBeNull();
    const retry = await agentFor(app);
    const login = await retry
      .post('/api/auth/login')
      .set('X-CSRF-Token', retry.csrf)
      .send({ email: member.user!.email, password: 'correct-horse-battery-42' });
    expect(login.status).toBe(403);
    expect(login.body.error).toMatchObject({ code: 'account_disabled', message: expect.stringMatching(/disabled/) });
    const wrong = await retry
      .post('/api/auth/login')
      .set('X-CSRF-Token', retry.csrf)
      .send({ email: member.user!.email, password: 'not-the-password-at-all' });
    expect(wrong.status).toBe(401);
    const on = await admin
      .patch(`/api/admin/users/${member.user!.id}`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ status: 'active' });
    expect(on.body.status).toBe('active');
    const back = await retry
      .post('/api/auth/login')
      .set('X-CSRF-Token', retry.csrf)
      .send({ email: member.user!.email, password: 'correct-horse-battery-42' });
    expect(back.status).toBe(200);
    expect((await retry.get('/api/auth/me')).body.firstSignIn).toBe(false);
    const actions = (
      await AuditEntry.findAll({ where: { subjectType: 'user', subjectId: String(member.user!.id) } })
    ).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['user.disable', 'user.enable']));
  });

  it('when only one active admin is left, then demoting or disabling them is 409; with a second admin it works', async () => {
    const admin = await agentFor(app, 'admin');
    // Leave exactly one active admin in this database for the duration of the check.
    const others = await User.findAll({ where: { role: 'admin', status: 'active', id: { [Op.ne]: admin.user!.id } } });
    await User.update({ status: 'disabled' }, { where: { id: others.map((o) => o.id) } });
    try {
      const demote = await admin
        .patch(`/api/admin/users/${admin.user!.id}`)
        .set('X-CSRF-Token', admin.csrf)
        .send({ role: 'curator' });
      expect(demote.status).toBe(409);
      const disable = await admin
        .patch(`/api/admin/users/${admin.user!.id}`)
        .set('X-CSRF-Token', admin.csrf)
        .send({ status: 'disabled' });
      expect(disable.status).toBe(409);
      expect((await User.findByPk(admin.user!.id))!.role).toBe('admin');

      const second = await createUser('admin');
      const demoteSecond = await admin
        .patch(`/api/admin/users/${second.id}`)
        .set('X-CSRF-Token', admin.csrf)
        .send({ role: 'member' });
      expect(demoteSecond.status).toBe(200);
    } finally {
      await User.update({ status: 'active' }, { where: { id: others.map((o) => o.id) } });
    }
  });

  it('when two admins demote each other at the same moment, then exactly one change goes through', async () => {
    const a = await agentFor(app, 'admin');
    const b = await agentFor(app, 'admin');
    const others = await User.findAll({
      where: { role: 'admin', status: 'active', id: { [Op.notIn]: [a.user!.id, b.user!.id] } },
    });
    await User.update({ status: 'disabled' }, { where: { id: others.map((o) => o.id) } });
    try {
      const [ra, rb] = await Promise.all([
        a.patch(`/api/admin/users/${b.user!.id}`).set('X-CSRF-Token', a.csrf).send({ role: 'viewer' }),
        b.patch(`/api/admin/users/${a.user!.id}`).set('X-CSRF-Token', b.csrf).send({ role: 'viewer' }),
      ]);
      const statuses = [ra.status, rb.status].sort();
      // Whoever loses may see 409 (last admin) or 403 (already demoted before their request was checked).
      expect(statuses.filter((s) => s === 200)).toHaveLength(1);
      const admins = await User.count({ where: { id: [a.user!.id, b.user!.id], role: 'admin' } });
      expect(admins).toBe(1);
    } finally {
      await User.update({ status: 'active' }, { where: { id: others.map((o) => o.id) } });
    }
  });

  it('when the body has neither role nor status, or an unknown role, then 400; an unknown id is 404', async () => {
    const admin = await agentFor(app, 'admin');
    const target = await createUser('viewer');
    expect((await admin.patch(`/api/admin/users/${target.id}`).set('X-CSRF-Token', admin.csrf).send({})).status).toBe(
      400,
    );
    expect(
      (await admin.patch(`/api/admin/users/${target.id}`).set('X-CSRF-Token', admin.csrf).send({ role: 'owner' }))
        .status,
    ).toBe(400);
    expect(
      (await admin.patch('/api/admin/users/999999999').set('X-CSRF-Token', admin.csrf).send({ role: 'viewer' })).status,
    ).toBe(404);
  });
});
