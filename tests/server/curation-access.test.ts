import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { post, recordId } from '../helpers/curation';

const { app, close } = createApp();
let owner: Agent;
let member: Agent;
let viewer: Agent;
let anonymous: Agent;
let curator: Agent;
let ids: number[];
let mergeId: number;

const structure = 'OCc1ccc(OC)cc1'; // 4-methoxybenzyl alcohol, kept to this file

beforeAll(async () => {
  [owner, member, viewer, anonymous, curator] = await Promise.all([
    agentFor(app, 'member'),
    agentFor(app, 'member'),
    agentFor(app, 'viewer'),
    agentFor(app),
    agentFor(app, 'curator'),
  ]);
  ids = [
    await recordId(owner, { structure }),
    await recordId(owner, { structure }),
    await recordId(owner, { structure }),
  ];
  const merged = await post(curator, '/api/curation/merge', { survivorId: ids[1], mergedIds: [ids[2]] });
  mergeId = merged.body.mergeId;
});
afterAll(close);

type Call = [string, (agent: Agent) => ReturnType<Agent['get']>];
const curationCalls = (): Call[] => [
  ['GET /api/curation/duplicates', (agent) => agent.get('/api/curation/duplicates')],
  [
    'POST /api/curation/duplicates/dismiss',
    (agent) => post(agent, '/api/curation/duplicates/dismiss', { recordIds: [ids[0], ids[1]], reason: 'not the same' }),
  ],
  ['GET /api/curation/merge-preview', (agent) => agent.get(`/api/curation/merge-preview?ids=${ids[0]},${ids[1]}`)],
  [
    'POST /api/curation/merge',
    (agent) => post(agent, '/api/curation/merge', { survivorId: ids[0], mergedIds: [ids[1]] }),
  ],
  ['GET /api/curation/merges', (agent) => agent.get('/api/curation/merges')],
  ['POST /api/curation/unmerge/:mergeId', (agent) => post(agent, `/api/curation/unmerge/${mergeId}`)],
  [
    'POST /api/records/:id/retire (someone else’s record)',
    (agent) => post(agent, `/api/records/${ids[0]}/retire`, { reason: 'looks wrong' }),
  ],
  ['POST /api/records/:id/restore', (agent) => post(agent, `/api/records/${ids[0]}/restore`)],
];

describe('who may curate', () => {
  it.each(['member', 'viewer'] as const)(
    'when a %s calls any curation route, then 403 and nothing changes',
    async (role) => {
      const agent = role === 'member' ? member : viewer;
      for (const [name, call] of curationCalls()) expect((await call(agent)).status, name).toBe(403);
      const status = (await curator.get(`/api/records/${ids[0]}`)).body.status;
      expect(status).toBe('active');
    },
  );

  it('when nobody is signed in, then every curation route answers 401', async () => {
    for (const [name, call] of curationCalls()) expect((await call(anonymous)).status, name).toBe(401);
  });

  it('when a curator calls the read routes, then 200', async () => {
    expect((await curator.get('/api/curation/duplicates')).status).toBe(200);
    expect((await curator.get(`/api/curation/merge-preview?ids=${ids[0]},${ids[1]}`)).status).toBe(200);
    expect((await curator.get('/api/curation/merges')).status).toBe(200);
  });
});
