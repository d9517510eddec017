import { randomUUID, createHash } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { expect } from 'vitest';
import { sequelize } from '../../server/db/sequelize';
import type { Agent } from './agent';
import { exampleRecordBody } from './records';

/** Posts a record (issue 5's example body with overrides) and returns its id; fails the test on anything but 201. */
export async function recordId(agent: Agent, overrides: Record<string, unknown> = {}): Promise<number> {
  const res = await agent.post('/api/records').set('X-CSRF-Token', agent.csrf).send(exampleRecordBody(overrides));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.id as number;
}

/** A plate photo row with blob rows of its own (bytes are not an image; nothing here decodes them). */
export async function addPhotoRow(
  recordId: number,
  uploadedBy: number,
  caption: string | null = null,
): Promise<number> {
  const bytes = Buffer.from(`plate ${randomUUID()}`);
  const key = `test/${randomUUID()}`;
  const thumb = `${key}-thumb`;
  for (const blob of [key, thumb]) {
    await sequelize.query(
      "INSERT INTO stored_blobs (key, bytes, content_type, byte_size) VALUES (:blob, :bytes, 'image/png', :size)",
      {
        replacements: { blob, bytes, size: bytes.length },
      },
    );
  }
  const [row] = await sequelize.query<{ id: number }>(
    `INSERT INTO record_photos (record_id, origin_record_id, uploaded_by, blob_key, thumb_key, content_type,
      byte_size, width, height, sha256, caption)
     VALUES (:recordId, :recordId, :uploadedBy, :key, :thumb, 'image/png', :size, 10, 30, :sha, :caption) RETURNING id`,
    {
      replacements: {
        recordId,
        uploadedBy,
        key,
        thumb,
        size: bytes.length,
        sha: createHash('sha256').update(bytes).digest('hex'),
        caption,
      },
      type: QueryTypes.SELECT,
    },
  );
  return row.id;
}

/** A record bookmark row for a user. */
export async function addBookmarkRow(userId: number, recordId: number, note: string | null): Promise<number> {
  const [row] = await sequelize.query<{ id: number }>(
    'INSERT INTO bookmarks (user_id, record_id, note) VALUES (:userId, :recordId, :note) RETURNING id',
    { replacements: { userId, recordId, note }, type: QueryTypes.SELECT },
  );
  return row.id;
}

export type Dump = Record<string, Record<string, unknown>[]>;

/**
 * Full row dumps (every column, PostgreSQL to_jsonb) of the records and every table hanging from them,
 * ordered by id — what "every row as it was" is checked against.
 */
export async function dumpAffected(ids: number[]): Promise<Dump> {
  const dump: Dump = {};
  const tables: [string, string][] = [
    ['condition_records', 'id'],
    ['record_spots', 'record_id'],
    ['record_visualisations', 'record_id'],
    ['record_photos', 'record_id'],
    ['record_contributors', 'record_id'],
    ['record_revisions', 'record_id'],
    ['bookmarks', 'record_id'],
  ];
  for (const [table, column] of tables) {
    const rows = await sequelize.query<{ row: Record<string, unknown> }>(
      `SELECT to_jsonb(t) AS row FROM ${table} t WHERE ${column} IN (:ids) ORDER BY id`,
      { replacements: { ids }, type: QueryTypes.SELECT },
    );
    dump[table] = rows.map((item) => item.row);
  }
  return dump;
}

/** Sends a JSON POST with the agent's CSRF token. */
export const post = (agent: Agent, path: string, body: Record<string, unknown> = {}) =>
  agent.post(path).set('X-CSRF-Token', agent.csrf).send(body);
