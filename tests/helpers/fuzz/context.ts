import type { Express } from 'express';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { createHttpServer } from '../../../server/http/http-server';
import sharp from 'sharp';
import { createUser, TEST_PASSWORD, type Agent } from '../agent';
import { postRecord } from '../records';
import { routeTable, type RouteEntry } from '../route-table';

/** What the fuzz cases aim at: an admin session (CSRF included) and rows of its own, so ids in paths exist. */
export interface FuzzContext {
  agent: Agent;
  recordIds: [number, number];
  compoundId: number;
  photoId: number;
  bookmarkId: number;
  importId: number;
  /** A user whose role and status the admin-user routes may change (never the fuzzing admin itself). */
  victimUserId: number;
  /** POST and PATCH API routes, from the app's router stack (route-table.ts). */
  writeRoutes: RouteEntry[];
  /** GET API routes with a path parameter. */
  paramRoutes: RouteEntry[];
  png: Buffer;
}

/** Ends the session by design; every other write route is fuzzed. */
const notFuzzed = new Set(['POST /api/auth/logout']);

function expectStatus(res: { status: number; body: unknown }, want: number[], what: string) {
  if (!want.includes(res.status))
    throw new Error(`fuzz setup: ${what} answered ${res.status} ${JSON.stringify(res.body)}`);
}

/** A fresh admin signed in through the API, holding its session cookie and CSRF token. */
async function signedInAdmin(target: Express | string): Promise<Agent> {
  const admin = await createUser('admin');
  const agent = request.agent(target as Express) as Agent;
  const { token } = (await agent.get('/api/auth/csrf')).body as { token: string };
  const login = await agent
    .post('/api/auth/login')
    .set('X-CSRF-Token', token)
    .send({ email: admin.email, password: TEST_PASSWORD });
  expectStatus(login, [200], 'POST /api/auth/login');
  agent.csrf = login.body.csrfToken;
  agent.user = admin;
  return agent;
}

/**
 * Signs in a fresh admin and creates the rows the cases point at. `target` is the app itself (supertest) or the
 * http://127.0.0.1:<port> it listens on; the route table is read from `app` either way.
 */
export async function prepareFuzz(app: Express, target: Express | string = app): Promise<FuzzContext> {
  const agent = await signedInAdmin(target);
  const victim = await createUser('viewer');
  const first = await postRecord(agent, { notes: 'fuzz target one' });
  const second = await postRecord(agent, { notes: 'fuzz target two', spots: [{ role: 'target', rf: 0.31 }] });
  expectStatus(first, [201], 'POST /api/records');
  expectStatus(second, [201], 'POST /api/records');
  const png = await sharp({ create: { width: 40, height: 90, channels: 3, background: '#dde8d0' } })
    .png()
    .toBuffer();
  const photo = await agent
    .post(`/api/records/${first.body.id}/photos`)
    .set('X-CSRF-Token', agent.csrf)
    .attach('photo', png, 'plate.png');
  expectStatus(photo, [201], 'POST /api/records/:id/photos');
  const bookmark = await agent
    .post('/api/bookmarks')
    .set('X-CSRF-Token', agent.csrf)
    .send({ recordId: second.body.id });
  expectStatus(bookmark, [201], 'POST /api/bookmarks');
  const csv =
    'name,smiles,eluent,rf\nbenzyl alcohol,OCc1ccccc1,EtOAc/hexanes 1:4,0.28\nbad row,C1CC,EtOAc/hexanes 1:4,1.7\n';
  const imported = await agent
    .post('/api/imports?wait=10000')
    .set('X-CSRF-Token', agent.csrf)
    .attach('file', Buffer.from(csv), 'fuzz.csv');
  expectStatus(imported, [201, 202], 'POST /api/imports');
  const api = routeTable(app).filter((route) => route.path.startsWith('/api/'));
  return {
    agent,
    recordIds: [first.body.id, second.body.id],
    compoundId: first.body.compound.id,
    photoId: photo.body.id,
    bookmarkId: bookmark.body.id,
    importId: imported.body.id,
    victimUserId: victim.id,
    writeRoutes: api.filter(
      (route) => ['POST', 'PATCH'].includes(route.method) && !notFuzzed.has(`${route.method} ${route.path}`),
    ),
    paramRoutes: api.filter((route) => route.method === 'GET' && route.path.includes(':')),
    png,
  };
}

/**
 * The app behind the project's own HTTP server (server/http/http-server.ts, as server/index.ts runs it), listening
 * on 127.0.0.1 only; fuzz cases go to its URL so refusals Node makes before the app are checked too.
 */
export async function serveOnLoopback(app: Express): Promise<{ base: string; stop: () => Promise<void> }> {
  const server = createHttpServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return { base, stop: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
