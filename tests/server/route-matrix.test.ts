import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import express, { Router } from 'express';
import type { Express } from 'express';
import { createApp } from '../../server/http/app';
import { allow } from '../../server/http/middleware/access';
import { apiRouter } from '../../server/http/routes';
import { roleAtLeast, roles, type AccessLevel, type Role } from '../../shared/schemas/auth';
import { agentFor, type Agent } from '../helpers/agent';
import { probeUrl, routeTable, type RouteEntry } from '../helpers/route-table';

const { app, close } = createApp();
afterAll(close);

const apiRoutes = routeTable(app).filter((r) => r.path.startsWith('/api/'));
type Caller = 'anonymous' | Role;
const callers: Caller[] = ['anonymous', ...roles];

function expected(access: AccessLevel, caller: Caller): 'allowed' | 401 | 403 {
  if (access === 'public') return 'allowed';
  if (caller === 'anonymous') return 401;
  return roleAtLeast(caller, access) ? 'allowed' : 403;
}

async function send(agent: Agent, route: RouteEntry) {
  const url = probeUrl(route.path);
  const method = (route.method === 'ALL' ? 'get' : route.method.toLowerCase()) as
    'get' | 'post' | 'put' | 'patch' | 'delete';
  const req = agent[method](url);
  return method === 'get' ? req : req.set('X-CSRF-Token', agent.csrf).send({});
}

describe('the route table', () => {
  it('is read from nested routers, with full paths', () => {
    const keys = apiRoutes.map((r) => `${r.method} ${r.path}`);
    expect(keys).toEqual(
      expect.arrayContaining([
        'GET /api/health',
        'POST /api/auth/login',
        'POST /api/auth/invitations/:token/accept',
        'PATCH /api/admin/users/:id',
        'GET /api/dev/mailbox',
      ]),
    );
  });

  it('has allow(level) as the first handler of every API route (deny by default)', () => {
    expect(apiRoutes.filter((r) => r.access === undefined).map((r) => `${r.method} ${r.path}`)).toEqual([]);
  });

  it('flags a route added without allow(), or with allow() not first, in a fresh app', () => {
    const fresh: Express = express();
    const careless = Router();
    careless.get('/forgotten', (_req, res) => void res.json({}));
    careless.post('/late', express.json(), allow('admin'), (_req, res) => void res.json({}));
    const api = apiRouter();
    api.use('/careless', careless);
    fresh.use('/api', api);
    const undeclared = routeTable(fresh)
      .filter((r) => r.access === undefined)
      .map((r) => `${r.method} ${r.path}`);
    expect(undeclared).toEqual(['GET /api/careless/forgotten', 'POST /api/careless/late']);
  });
});

describe.each(callers)('the role × route matrix for %s', (caller) => {
  let agent: Agent;
  const fresh = () => agentFor(app, caller === 'anonymous' ? undefined : caller);
  beforeAll(async () => {
    agent = await fresh();
  });

  it.each(apiRoutes.map((r) => [`${r.method} ${r.path}`, r] as const))('%s', async (_name, route) => {
    const res = await send(agent, route);
    const want = expected(route.access!, caller);
    if (want === 'allowed') expect([401, 403], `${res.status} ${JSON.stringify(res.body)}`).not.toContain(res.status);
    else expect(res.status, JSON.stringify(res.body)).toBe(want);
    // A route such as POST /api/auth/logout ends the session: sign in again for the next route.
    if (caller !== 'anonymous' && route.method !== 'GET' && !(await agent.get('/api/auth/me')).body.user)
      agent = await fresh();
  });
});
