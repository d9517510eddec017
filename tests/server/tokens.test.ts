import { afterAll, describe, expect, it, vi } from 'vitest';

const saved = vi.hoisted(() => {
  const before = { ...process.env };
  // Lowered so the throttle test needs few requests; the production default is 50 per 15 min.
  process.env.SIGNIN_MAX_FAILURES_PER_ADDRESS = '4';
  process.env.SIGNIN_THROTTLE_STORE = 'postgres';
  // Calls come from many addresses through a trusted proxy on loopback, so each test's throttle count is its own.
  process.env.TRUST_PROXY = 'loopback';
  return before;
});

import request from 'supertest';
import { QueryTypes } from 'sequelize';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { hashApiToken } from '../../server/auth/bearer';
import { expiryOf } from '../../server/features/tokens/service';
import { API_TOKEN_PATTERN, createdTokenSchema, apiTokenListSchema } from '../../shared/schemas/tokens';
import { agentFor, type Agent } from '../helpers/agent';
import { exampleRecordBody } from '../helpers/records';

const { app, close } = createApp();
afterAll(async () => {
  await close();
  process.env = saved;
});

/** Client addresses from the documentation ranges of RFC 5737, passed through the trusted loopback proxy. */
let lastOctet = 1;
const freshAddress = () => `198.51.100.${lastOctet++}`;

async function mint(agent: Agent, body: Record<string, unknown> = { name: 'nightly export' }) {
  const res = await agent.post('/api/tokens').set('X-CSRF-Token', agent.csrf).send(body);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return createdTokenSchema.parse(res.body);
}

const bearer = (token: string) => ({ Authorization: `Bearer ${token}`, 'X-Forwarded-For': freshAddress() });

describe('personal API tokens', () => {
  it(
    'when a member creates a token, then the secret is answered once, only its SHA-256 is stored, ' +
      'and the list shows it without the secret',
    async () => {
      const member = await agentFor(app, 'member');
      const created = await mint(member, { name: 'instrument upload', readOnly: false });
      expect(created.token).toMatch(API_TOKEN_PATTERN);
      expect(created).toMatchObject({
        name: 'instrument upload',
        readOnly: false,
        status: 'active',
        lastUsedAt: null,
        expiresAt: null,
      });
      const rows = await sequelize.query<{ token_hash: string }>('SELECT token_hash FROM api_tokens WHERE id = :id', {
        replacements: { id: created.id },
        type: QueryTypes.SELECT,
      });
      expect(rows).toEqual([{ token_hash: hashApiToken(created.token) }]);
      const list = apiTokenListSchema.parse((await member.get('/api/tokens')).body);
      expect(list.items.map((t) => t.id)).toEqual([created.id]);
      expect(JSON.stringify(list)).not.toContain(created.token);
    },
  );

  it(
    'when a script sends the token as Bearer, then it reads and writes as the owner with no cookie ' +
      'and no CSRF token, and last used is noted',
    async () => {
      const member = await agentFor(app, 'member');
      const { token, id } = await mint(member);
      const me = await request(app).get('/api/auth/me').set(bearer(token));
      expect(me.body.user).toMatchObject({ id: member.user!.id, role: 'member' });
      expect(me.headers['set-cookie']).toBeUndefined();
      const bookmark = await request(app).get('/api/bookmarks').set(bearer(token));
      expect(bookmark.status).toBe(200);
      const write = await request(app).patch('/api/auth/me').set(bearer(token)).send({ name: 'Renamed by a script' });
      expect(write.status, JSON.stringify(write.body)).toBe(200);
      expect(write.body.user.name).toBe('Renamed by a script');
      const listed = apiTokenListSchema.parse((await member.get('/api/tokens')).body).items.find((t) => t.id === id)!;
      expect(listed.lastUsedAt).not.toBeNull();
    },
  );

  it('when a read-only token writes, then 403, while it still reads', async () => {
    const curator = await agentFor(app, 'curator');
    const { token } = await mint(curator, { name: 'archive', readOnly: true });
    expect((await request(app).get('/api/records').set(bearer(token))).status).toBe(200);
    const write = await request(app).patch('/api/auth/me').set(bearer(token)).send({ name: 'Nope' });
    expect(write.status).toBe(403);
    expect(write.body.error.message).toMatch(/read-only/);
  });

  it('when a token is unknown, malformed, expired or revoked, then 401 in the error shape with a Bearer challenge', async () => {
    const viewer = await agentFor(app, 'viewer');
    const { token, id } = await mint(viewer);
    const expired = await mint(viewer, { name: 'short-lived' });
    await sequelize.query("UPDATE api_tokens SET expires_at = now() - interval '1 second' WHERE id = :id", {
      replacements: { id: expired.id },
    });
    expect((await viewer.delete(`/api/tokens/${id}`).set('X-CSRF-Token', viewer.csrf)).body.status).toBe('revoked');
    const unknown = `rfo_${'A'.repeat(43)}`;
    for (const credential of [token, expired.token, unknown, 'not-a-token', '']) {
      const res = await request(app).get('/api/overview').set(bearer(credential));
      expect(res.status, credential).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
      expect(res.headers['www-authenticate']).toMatch(/^Bearer /);
    }
    // A bad token is refused even on a public route, rather than treated as anonymous.
    expect((await request(app).get('/api/auth/me').set(bearer(unknown))).status).toBe(401);
  });

  it('when the owner is demoted or disabled, then the very next token request follows', async () => {
    const admin = await agentFor(app, 'admin');
    const curator = await agentFor(app, 'curator');
    const { token } = await mint(curator);
    expect((await request(app).get('/api/curation/duplicates').set(bearer(token))).status).toBe(200);
    const demote = await admin
      .patch(`/api/admin/users/${curator.user!.id}`)
      .set('X-CSRF-Token', admin.csrf)
      .send({ role: 'viewer' });
    expect(demote.status).toBe(200);
    expect((await request(app).get('/api/curation/duplicates').set(bearer(token))).status).toBe(403);
    // Changed behind the app's back (another process or plain SQL): the user cache follows the data stamp.
    await sequelize.query("UPDATE users SET status = 'disabled' WHERE id = :id", {
      replacements: { id: curator.user!.id },
    });
    expect((await request(app).get('/api/overview').set(bearer(token))).status).toBe(401);
  });

  it('when a token tries to create a token, then 403 (a token cannot outlive itself)', async () => {
    const member = await agentFor(app, 'member');
    const { token } = await mint(member);
    const res = await request(app).post('/api/tokens').set(bearer(token)).send({ name: 'child' });
    expect(res.status).toBe(403);
  });

  it("when someone revokes another person's token, then 404 unless they are an admin, who lists and revokes any token", async () => {
    const owner = await agentFor(app, 'member');
    const other = await agentFor(app, 'curator');
    const admin = await agentFor(app, 'admin');
    const { id, token } = await mint(owner);
    expect((await other.delete(`/api/tokens/${id}`).set('X-CSRF-Token', other.csrf)).status).toBe(404);
    expect((await other.get('/api/admin/tokens')).status).toBe(403);
    const all = apiTokenListSchema.parse((await admin.get('/api/admin/tokens')).body);
    expect(all.items.find((t) => t.id === id)?.owner.id).toBe(owner.user!.id);
    expect((await admin.delete(`/api/tokens/${id}`).set('X-CSRF-Token', admin.csrf)).status).toBe(200);
    expect((await request(app).get('/api/overview').set(bearer(token))).status).toBe(401);
    const [audit] = await sequelize.query<{ actor_id: number }>(
      "SELECT actor_id FROM audit_log WHERE action = 'api_token.revoke' AND subject_id = :id",
      { replacements: { id: String(id) }, type: QueryTypes.SELECT },
    );
    expect(audit.actor_id).toBe(admin.user!.id);
  });

  it('when a token is created with bad input, then 400 names the field; past and far-future expiries are refused', async () => {
    const member = await agentFor(app, 'member');
    const send = (body: unknown) =>
      member
        .post('/api/tokens')
        .set('X-CSRF-Token', member.csrf)
        .send(body as object);
    expect((await send({})).body.error.details[0].path).toBe('body.name');
    expect((await send({ name: 'x', expiresAt: 'soon' })).status).toBe(400);
    expect((await send({ name: 'x', expiresAt: '2001-01-01' })).body.error.details[0].path).toBe('body.expiresAt');
    expect((await send({ name: 'x', expiresAt: '2999-01-01' })).status).toBe(400);
    const dated = await mint(member, { name: 'dated', expiresAt: '2030-06-30' });
    expect(dated.expiresAt).toBe('2030-06-30T23:59:59.999Z');
  });

  it('expiryOf: a date ends at the close of that UTC day, a date-time is kept, nothing means no expiry', () => {
    const now = new Date('2026-12-04T12:00:00Z');
    expect(expiryOf('2026-12-04', now)?.toISOString()).toBe('2026-12-04T23:59:59.999Z');
    expect(expiryOf('2027-01-01T08:00:00+01:00', now)?.toISOString()).toBe('2027-01-01T07:00:00.000Z');
    expect(expiryOf(null, now)).toBeNull();
    expect(() => expiryOf('2026-12-03', now)).toThrow(/future/);
  });

  it(
    'when one address sends 4 refused tokens (limit lowered for the test), then the 5th attempt is ' +
      '429, even with a good token',
    async () => {
      const member = await agentFor(app, 'member');
      const { token } = await mint(member);
      const from = '203.0.113.77';
      for (let i = 0; i < 4; i++) {
        const res = await request(app)
          .get('/api/overview')
          .set({ Authorization: `Bearer rfo_${String(i).repeat(43)}`, 'X-Forwarded-For': from });
        expect(res.status).toBe(401);
      }
      const blocked = await request(app)
        .get('/api/overview')
        .set({ Authorization: `Bearer ${token}`, 'X-Forwarded-For': from });
      expect(blocked.status).toBe(429);
      expect(blocked.body.error.code).toBe('too_many_attempts');
      expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
      const [{ hits }] = await sequelize.query<{ hits: number }>('SELECT hits FROM rate_limit_hits WHERE key = :key', {
        replacements: { key: `api-token-address:${from}` },
        type: QueryTypes.SELECT,
      });
      expect(hits).toBe(4);
      // Another address is not held up, and good calls count nothing: 10 at once from one address all pass.
      const calm = '203.0.113.78';
      const burst = await Promise.all(
        Array.from({ length: 10 }, () =>
          request(app)
            .get('/api/overview')
            .set({ Authorization: `Bearer ${token}`, 'X-Forwarded-For': calm }),
        ),
      );
      expect(burst.map((r) => r.status)).toEqual(Array(10).fill(200));
      const counted = await sequelize.query('SELECT 1 FROM rate_limit_hits WHERE key = :key', {
        replacements: { key: `api-token-address:${calm}` },
        type: QueryTypes.SELECT,
      });
      expect(counted).toEqual([]);
    },
  );

  it("when a token contributes a record, then it needs no CSRF token and the record is the owner's", async () => {
    const member = await agentFor(app, 'member');
    const { token } = await mint(member);
    const res = await request(app)
      .post('/api/records')
      .set(bearer(token))
      .send(exampleRecordBody({ notes: 'contributed by a script' }));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.author.id).toBe(member.user!.id);
  });
});
