import type { Transaction } from 'sequelize';

/** Bytes and their content type, as stored. */
export interface StoredObject {
  key: string;
  bytes: Buffer;
  contentType: string;
  byteSize: number;
}

/**
 * Where photo bytes live. Content-addressed: the key is the SHA-256 of the bytes, so storing the same
 * bytes twice keeps one copy. Objects are never deleted by the app (removed photos keep their bytes).
 */
export interface BlobStorage {
  put(bytes: Buffer, contentType: string, transaction?: Transaction): Promise<string>;
  get(key: string): Promise<StoredObject | null>;
}
