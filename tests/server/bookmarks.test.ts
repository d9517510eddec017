import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { bookmarkDtoSchema, bookmarkListSchema } from '../../shared/schemas/bookmark';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord } from '../helpers/search';

const { app, close } = createApp();
let member: Agent;
let viewer: Agent;
let otherViewer: Agent;
let record: Awaited<ReturnType<typeof createRecord>>;

const post = (agent: Agent, body: unknown) =>
  agent
    .post('/api/bookmarks')
    .set('X-CSRF-Token', agent.csrf)
    .send(body as object);
const list = async (agent: Agent) => bookmarkListSchema.parse((await agent.get('/api/bookmarks')).body).items;

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  otherViewer = await agentFor(app, 'viewer');
  record = await createRecord(member, {
    structure: 'CCCCCCCCCCCCCCCCCCCCCC(=O)O',
    name: 'behenic acid (bookmarks test)',
  });
});
afterAll(close);

describe('POST /api/bookmarks', () => {
  it('when a viewer bookmarks a record with a note, then 201 and the bookmark carries the record row', async () => {
    const res = await post(viewer, { recordId: record.id, note: '  try this first  ' });
    expect(res.status).toBe(201);
    const bookmark = bookmarkDtoSchema.parse(res.body);
    expect(bookmark).toMatchObject({ recordId: record.id, compoundId: null, note: 'try this first' });
    expect(bookmark.record?.id).toBe(record.id);
  });

  it('when the same record is bookmarked again, then 409 naming the existing bookmark', async () => {
    const res = await post(viewer, { recordId: record.id });
    expect(res.status).toBe(409);
    expect(res.body.error.details[0].bookmarkId).toEqual(expect.any(Number));
  });

  it('when a compound is bookmarked, then it carries the compound and its active record count', async () => {
    const res = await post(viewer, { compoundId: record.compound.id });
    expect(res.status).toBe(201);
    expect(res.body.compound).toMatchObject({ id: record.compound.id, recordCount: 1 });
  });

  it.each([
    ['neither target', {}],
    ['both targets', { recordId: 1, compoundId: 1 }],
    ['a non-numeric id', { recordId: 'abc' }],
    ['an over-long note', { compoundId: 1, note: 'x'.repeat(1001) }],
  ])('when the body has %s, then 400', async (_case, body) => {
    expect((await post(viewer, body)).status).toBe(400);
  });

  it('when the record does not exist, then 422', async () => {
    expect((await post(viewer, { recordId: 2_000_000_000 })).status).toBe(422);
  });

  it('when nobody is signed in, then 401', async () => {
    expect((await post(await agentFor(app), { recordId: record.id })).status).toBe(401);
  });
});

describe('GET, PATCH and DELETE /api/bookmarks', () => {
  it('when another user lists bookmarks, then they see only their own (none)', async () => {
    expect(await list(otherViewer)).toEqual([]);
    expect((await list(viewer)).map((item) => item.recordId ?? item.compoundId)).toEqual([
      record.compound.id,
      record.id,
    ]);
  });

  it('when the note is changed, then the list shows the new note', async () => {
    const [bookmark] = (await list(viewer)).filter((item) => item.recordId === record.id);
    const res = await viewer
      .patch(`/api/bookmarks/${bookmark.id}`)
      .set('X-CSRF-Token', viewer.csrf)
      .send({ note: 'worked twice' });
    expect(res.status).toBe(200);
    expect((await list(viewer)).find((item) => item.id === bookmark.id)?.note).toBe('worked twice');
  });

  it('when another user tries to remove someone’s bookmark, then 404 and it stays', async () => {
    const [bookmark] = await list(viewer);
    expect(
      (await otherViewer.delete(`/api/bookmarks/${bookmark.id}`).set('X-CSRF-Token', otherViewer.csrf)).status,
    ).toBe(404);
    expect((await list(viewer)).map((item) => item.id)).toContain(bookmark.id);
  });

  it('when a bookmark is removed by its target, then 204 and it is gone; removing again is 404', async () => {
    const remove = () =>
      viewer.delete('/api/bookmarks').query({ compoundId: record.compound.id }).set('X-CSRF-Token', viewer.csrf);
    expect((await remove()).status).toBe(204);
    expect((await list(viewer)).some((item) => item.compoundId === record.compound.id)).toBe(false);
    expect((await remove()).status).toBe(404);
  });

  it('when the session ends and the user signs in again, then the bookmarks are still there', async () => {
    await viewer.post('/api/auth/logout').set('X-CSRF-Token', viewer.csrf);
    expect((await viewer.get('/api/bookmarks')).status).toBe(401);
    const csrf = (await viewer.get('/api/auth/csrf')).body.token as string;
    const login = await viewer
      .post('/api/auth/login')
      .set('X-CSRF-Token', csrf)
      .send({ email: viewer.user!.email, password: 'correct-horse-battery-42' });
    expect(login.status).toBe(200);
    expect((await list(viewer)).map((item) => item.recordId)).toContain(record.id);
  });
});
