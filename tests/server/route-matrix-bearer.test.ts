import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

// The calls below come from many client addresses through a trusted proxy on loopback (X-Forwarded-For), so the
// refused-token throttle, which counts per address, never stands between a call and the answer under test.
const savedEnv = vi.hoisted(() => {
  const before = { ...process.env };
  process.env.TRUST_PROXY = 'loopback';
  return before;
});
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { roleAtLeast, roles, type AccessLevel, type Role } from '../../shared/schemas/auth';
import { agentFor } from '../helpers/agent';
import { probeUrl, routeTable, type RouteEntry } from '../helpers/route-table';

/**
 * The role × route matrix of tests/server/route-matrix.test.ts for scripts: every API route Express mounts, called
 * with `Authorization: Bearer <token>` and no cookie or CSRF token, by a full and a read-only token of every role,
 * and by an unknown token. A token may do what its owner's role may and never more; a read-only one only reads.
 */
const { app, close } = createApp();
afterAll(() => {
  process.env = savedEnv;
});
afterAll(close);

const apiRoutes = routeTable(app).filter((r) => r.path.startsWith('/api/'));
const READS = new Set(['GET', 'HEAD']);
/** Routes a token may never call whatever its role: a token cannot mint tokens (it must not outlive itself). */
const SESSION_ONLY = new Set(['POST /api/tokens']);

/** Routes that manage a cookie session (they may set or clear one, whoever calls); no other route sets a cookie. */
const COOKIE_SESSION_ROUTES = new Set(['GET /api/auth/csrf', 'POST /api/auth/login', 'POST /api/auth/logout']);

type Caller = { role: Role; readOnly: boolean };
const callers: Caller[] = roles.flatMap((role) => [
  { role, readOnly: false },
  { role, readOnly: true },
]);

function expected(route: RouteEntry, caller: Caller): 'allowed' | 403 {
  if (caller.readOnly && !READS.has(route.method)) return 403;
  if (SESSION_ONLY.has(`${route.method} ${route.path}`)) return 403;
  const access: AccessLevel = route.access!;
  if (access === 'public') return 'allowed';
  return roleAtLeast(caller.role, access) ? 'allowed' : 403;
}

let probe = 0;
async function send(token: string, route: RouteEntry) {
  const method = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  // A fresh client address per request: the refused-token throttle counts per address.
  const req = request(app)
    [method](probeUrl(route.path))
    .set('Authorization', `Bearer ${token}`)
    .set('X-Forwarded-For', `198.18.${Math.floor(probe / 250)}.${(probe++ % 250) + 1}`);
  return method === 'get' ? req : req.send({});
}

it('walks a non-empty route table with a declared level on every route', () => {
  expect(apiRoutes.length).toBeGreaterThan(60);
  expect(apiRoutes.filter((r) => r.access === undefined)).toEqual([]);
});

describe.each(callers.map((c) => [`${c.readOnly ? 'read-only' : 'full'} ${c.role} token`, c] as const))(
  'the Bearer matrix for a %s',
  (_name, caller) => {
    let token: string;
    beforeAll(async () => {
      const owner = await agentFor(app, caller.role);
      const res = await owner
        .post('/api/tokens')
        .set('X-CSRF-Token', owner.csrf)
        .send({ name: `matrix ${caller.role}`, readOnly: caller.readOnly });
      expect(res.status).toBe(201);
      token = res.body.token;
    });

    it.each(apiRoutes.map((r) => [`${r.method} ${r.path}`, r] as const))('%s', async (_key, route) => {
      const res = await send(token, route);
      const want = expected(route, caller);
      if (want === 'allowed') expect([401, 403], `${res.status} ${JSON.stringify(res.body)}`).not.toContain(res.status);
      else expect(res.status, JSON.stringify(res.body)).toBe(want);
      if (!COOKIE_SESSION_ROUTES.has(`${route.method} ${route.path}`)) {
        expect(res.headers['set-cookie'] ?? [], 'a Bearer caller gets no session cookie').toEqual([]);
      }
    });
  },
);

describe('the Bearer matrix for an unknown token', () => {
  it.each(apiRoutes.map((r) => [`${r.method} ${r.path}`, r] as const))('%s is 401', async (_key, route) => {
    const res = await send(`rfo_${'Z'.repeat(43)}`, route);
    expect(res.status, JSON.stringify(res.body)).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });
});
