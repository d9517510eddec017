import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pg from 'pg';
import { createApp } from '../../server/http/app';
import { contentStamp, dataStamp } from '../../server/db/data-stamp';
import { NOT_CONTENT } from '../../server/db/migrations/202612030100-content-version';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord, recordHits, searchFor, uniqueWord } from '../helpers/search';

/**
 * The records list, record page, search and Scout keep their answers per data stamp (server/db/data-stamp.ts,
 * read-cache.ts). These checks read an answer twice (the second time it is kept), write, and expect the very next
 * read to show the write: through this app (its own process), and through a raw pg connection of its own, the
 * way another app process or a script writes, which never touches this process's memory.
 */
const { app, close } = createApp();
let author: Agent;
let otherMember: Agent;
let viewer: Agent;
let other: pg.Client;

const patch = (agent: Agent, id: number, body: Record<string, unknown>) =>
  agent.patch(`/api/records/${id}`).set('X-CSRF-Token', agent.csrf).send(body);

beforeAll(async () => {
  author = await agentFor(app, 'member');
  otherMember = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  other = new pg.Client({ connectionString: process.env.DATABASE_URL });
  await other.connect();
});
afterAll(async () => {
  await other.end();
  await close();
});

describe('data stamp', () => {
  it('when this app or another connection commits a write, then the stamp changes', async () => {
    const first = await dataStamp();
    const word = uniqueWord();
    const { id } = await createRecord(author, { notes: `stamp ${word}` });
    const afterCreate = await dataStamp();
    expect(afterCreate).not.toBe(first);
    await other.query('UPDATE condition_records SET notebook_ref = $1 WHERE id = $2', [`NB-${word}`, id]);
    expect(await dataStamp()).not.toBe(afterCreate);
  });
});

describe('content stamp', () => {
  it('when records, compounds or users change (through the API or plain SQL), then the content stamp moves', async () => {
    const first = await contentStamp();
    const word = uniqueWord();
    const { id } = await createRecord(author, { notes: `content ${word}` });
    const afterCreate = await contentStamp();
    expect(afterCreate).not.toBe(first);
    await other.query('UPDATE condition_records SET notebook_ref = $1 WHERE id = $2', [`NB-${word}`, id]);
    const afterSql = await contentStamp();
    expect(afterSql).not.toBe(afterCreate);
    await other.query(
      `UPDATE compounds SET name = name WHERE id = (SELECT compound_id FROM condition_records WHERE id = $1)`,
      [id],
    );
    const afterCompound = await contentStamp();
    expect(afterCompound).not.toBe(afterSql);
    const { rows } = await other.query<{ id: number }>(
      `INSERT INTO users (email, name, role, password_hash) VALUES ($1, 'Stamp Check', 'viewer', 'x') RETURNING id`,
      [`stamp-${word}@example.org`],
    );
    const afterUser = await contentStamp();
    expect(afterUser).not.toBe(afterCompound);
    await other.query(`UPDATE users SET name = 'Stamp Checked' WHERE id = $1`, [rows[0].id]);
    expect(await contentStamp()).not.toBe(afterUser);
  });

  it('when a transaction is rolled back, then neither its data nor a new content stamp is seen', async () => {
    const before = await contentStamp();
    await other.query('BEGIN');
    await other.query(
      `UPDATE condition_records SET notebook_ref = 'rolled back' WHERE id = (SELECT min(id) FROM condition_records)`,
    );
    await other.query('ROLLBACK');
    expect(await contentStamp()).toBe(before);
  });

  it(
    'when a member bookmarks a record, someone signs in, or a session is written, then the data stamp ' +
      'moves but the content stamp does not, and kept answers are reused',
    async () => {
      const { id } = await createRecord(author, { notes: `bookmark ${uniqueWord()}` });
      const page = await viewer.get(`/api/records/${id}`);
      const content = await contentStamp();
      const data = await dataStamp();
      expect((await viewer.post('/api/bookmarks').set('X-CSRF-Token', viewer.csrf).send({ recordId: id })).status).toBe(
        201,
      );
      await other.query(`UPDATE users SET last_sign_in_at = now() WHERE id = (SELECT min(id) FROM users)`);
      await other.query(`UPDATE sessions SET expire = expire WHERE sid = (SELECT min(sid) FROM sessions)`);
      expect(await dataStamp()).not.toBe(data);
      expect(await contentStamp()).toBe(content);
      const again = await viewer.get(`/api/records/${id}`);
      expect(again.headers.etag).toBe(page.headers.etag);
    },
  );

  it('every table of the schema is either watched for content changes or listed as not content (a new table must choose)', async () => {
    const { rows } = await other.query<{ tablename: string; watched: boolean }>(`
      SELECT t.tablename, EXISTS (SELECT 1 FROM pg_trigger g JOIN pg_class c ON c.oid = g.tgrelid
        WHERE c.relname = t.tablename AND g.tgname = 'content_changed') AS watched
        FROM pg_tables t WHERE t.schemaname = current_schema() ORDER BY t.tablename`);
    const unwatched = rows.filter((row) => !row.watched).map((row) => row.tablename);
    expect(unwatched.sort()).toEqual(
      [...NOT_CONTENT].filter((name) => rows.some((row) => row.tablename === name)).sort(),
    );
    expect(rows.filter((row) => row.watched).map((row) => row.tablename)).toEqual(
      expect.arrayContaining(['compounds', 'condition_records', 'record_spots', 'users']),
    );
  });
});

describe('kept answers follow every write', () => {
  it('when a record page was read and the author edits the notes, then the next read shows the new notes and revision', async () => {
    const { id } = await createRecord(author, { notes: 'first notes' });
    const before = await viewer.get(`/api/records/${id}`);
    const again = await viewer.get(`/api/records/${id}`);
    expect(again.body).toEqual(before.body);
    expect(again.headers.etag).toBe(before.headers.etag);
    expect((await patch(author, id, { notes: 'second notes' })).status).toBe(200);
    const after = await viewer.get(`/api/records/${id}`);
    expect(after.body.notes).toBe('second notes');
    expect(after.body.revision).toBe(before.body.revision + 1);
    expect(after.headers.etag).not.toBe(before.headers.etag);
  });

  it('when the same record page is read by its author, another member and a viewer, then canEdit answers for each of them', async () => {
    const { id } = await createRecord(author, {});
    for (let round = 0; round < 2; round++) {
      expect((await author.get(`/api/records/${id}`)).body.canEdit).toBe(true);
      expect((await otherMember.get(`/api/records/${id}`)).body.canEdit).toBe(false);
      expect((await viewer.get(`/api/records/${id}`)).body.canEdit).toBe(false);
    }
  });

  it('when another connection changes a record with plain SQL, then the next records list and record page show it', async () => {
    const { id } = await createRecord(author, {});
    const query = { sort: 'createdAt', order: 'desc', pageSize: 100 };
    const listed = (res: { body: { items: { id: number; notebookRef: string | null }[] } }) =>
      res.body.items.find((item) => item.id === id);
    expect(listed(await viewer.get('/api/records').query(query))?.notebookRef).toBeNull();
    expect((await viewer.get(`/api/records/${id}`)).body.notebookRef).toBeNull();
    const ref = `NB-${uniqueWord()}`;
    await other.query('UPDATE condition_records SET notebook_ref = $1 WHERE id = $2', [ref, id]);
    expect(listed(await viewer.get('/api/records').query(query))?.notebookRef).toBe(ref);
    expect((await viewer.get(`/api/records/${id}`)).body.notebookRef).toBe(ref);
  });

  it('when a text search found nothing and a record with the word is added, then the very next search finds it', async () => {
    const word = uniqueWord();
    expect((await searchFor(viewer, { q: word })).total).toBe(0);
    expect((await searchFor(viewer, { q: word })).total).toBe(0);
    const { id } = await createRecord(author, { notes: `ran clean ${word}` });
    expect(recordHits(await searchFor(viewer, { q: word })).map((hit) => hit.recordId)).toContain(id);
  });

  it('when a similarity search was answered and a record of a new compound is added, then the next search lists it', async () => {
    const structure = 'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCc1ccc(O)cc1';
    const before = recordHits(await searchFor(viewer, { mode: 'similar', structure, threshold: 0.99 }));
    expect(recordHits(await searchFor(viewer, { mode: 'similar', structure, threshold: 0.99 }))).toEqual(before);
    const { id } = await createRecord(author, { structure });
    const after = recordHits(await searchFor(viewer, { mode: 'similar', structure, threshold: 0.99 }));
    expect(after.map((hit) => hit.recordId)).toContain(id);
    expect(before.map((hit) => hit.recordId)).not.toContain(id);
  });

  it('when a search is answered from what was kept, then tookMs is this request’s own time and the rest is unchanged', async () => {
    const word = uniqueWord();
    await createRecord(author, { notes: `timed ${word}` });
    const first = await searchFor(viewer, { q: word });
    const second = await searchFor(viewer, { q: word });
    expect(second.tookMs).toBeGreaterThanOrEqual(0);
    expect({ ...second, tookMs: 0 }).toEqual({ ...first, tookMs: 0 });
  });
});
