import { createHash } from 'node:crypto';
import type { Transaction } from 'sequelize';
import { sequelize } from '../db/sequelize';
import type { BlobStorage, StoredObject } from './blob-storage';

/** Blob storage in PostgreSQL (table stored_blobs, bytea); keys are SHA-256 hex digests. */
export class PostgresBlobStorage implements BlobStorage {
  async put(bytes: Buffer, contentType: string, transaction?: Transaction): Promise<string> {
    const key = createHash('sha256').update(bytes).digest('hex');
    await sequelize.query(
      `INSERT INTO stored_blobs (key, bytes, content_type, byte_size) VALUES (:key, :bytes, :contentType, :size)
       ON CONFLICT (key) DO NOTHING`,
      { replacements: { key, bytes, contentType, size: bytes.length }, transaction },
    );
    return key;
  }

  async get(key: string): Promise<StoredObject | null> {
    const [rows] = await sequelize.query(
      'SELECT key, bytes, content_type AS "contentType", byte_size AS "byteSize" FROM stored_blobs WHERE key = :key',
      { replacements: { key } },
    );
    return (rows[0] as StoredObject | undefined) ?? null;
  }
}
