import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { SESSION_CACHE_TTL_MS } from '../../server/auth/session-cache';
import { USER_CACHE_TTL_MS } from '../../server/auth/user-cache';
import { agentFor, type Agent } from '../helpers/agent';

/**
 * Signed-in reads reuse the session and user rows for a few seconds (auth/session-cache.ts, auth/user-cache.ts),
 * but only while the data stamp (db/data-stamp.ts) is unchanged: changes made through this process and
 * changes made behind its back (another process, plain SQL) both apply to the very next request.
 */
const { app, close } = createApp();
let admin: Agent;

beforeAll(async () => {
  admin = await agentFor(app, 'admin');
});
afterEach(() => vi.useRealTimers());
afterAll(close);

const me = (agent: Agent) => agent.get('/api/auth/me');
const later = (ms: number) => vi.setSystemTime(Date.now() + ms + 1);

describe('cached sessions and users', () => {
  it('when an admin makes a viewer a member, then the very next request of that person may contribute', async () => {
    const viewer = await agentFor(app, 'viewer');
    expect((await me(viewer)).body.user.role).toBe('viewer'); // now cached
    const change = await admin
      .patch(`/api/admin/users/${viewer.user!.id}`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ role: 'member' });
    expect(change.status).toBe(200);
    expect((await me(viewer)).body.user.role).toBe('member');
  });

  it('when someone signs out, then their old cookie is refused at once, though the session had just been read', async () => {
    const member = await agentFor(app, 'member');
    const cookie = (await member.get('/api/auth/csrf')).request.cookies;
    expect((await me(member)).body.user?.id).toBe(member.user!.id);
    expect((await member.post('/api/auth/logout').set('X-CSRF-Token', member.csrf)).status).toBeLessThan(300);
    const stranger = await agentFor(app);
    expect((await stranger.get('/api/auth/me').set('Cookie', cookie)).body.user).toBeNull();
  });

  it('when another process deletes a session row, then the very next request with that cookie is signed out', async () => {
    const member = await agentFor(app, 'member');
    expect((await me(member)).body.user?.id).toBe(member.user!.id);
    expect((await me(member)).body.user?.id).toBe(member.user!.id); // kept
    await sequelize.query(`DELETE FROM sessions WHERE (sess -> 'passport' ->> 'user') = :id`, {
      replacements: { id: String(member.user!.id) },
    });
    expect((await me(member)).body.user).toBeNull();
  });

  it('when another process disables a user with plain SQL, then their very next request is refused', async () => {
    const member = await agentFor(app, 'member');
    expect((await me(member)).body.user?.id).toBe(member.user!.id);
    expect((await member.get('/api/records')).status).toBe(200);
    await sequelize.query(`UPDATE users SET status = 'disabled' WHERE id = :id`, {
      replacements: { id: member.user!.id },
    });
    expect((await me(member)).body.user).toBeNull();
    expect((await member.get('/api/records')).status).toBe(401);
  });

  it('when nothing changes for longer than the time to live, then the rows are read again and the person stays signed in', async () => {
    const member = await agentFor(app, 'member');
    expect((await me(member)).body.user?.id).toBe(member.user!.id);
    vi.useFakeTimers({ toFake: ['Date'] });
    later(Math.max(USER_CACHE_TTL_MS, SESSION_CACHE_TTL_MS));
    expect((await me(member)).body.user?.id).toBe(member.user!.id);
  });
});
