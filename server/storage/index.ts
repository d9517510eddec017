import type { BlobStorage } from './blob-storage';
import { PostgresBlobStorage } from './postgres-blob-storage';

export type { BlobStorage } from './blob-storage';

const current: BlobStorage = new PostgresBlobStorage();

/** The blob storage in use (PostgreSQL unless a test or deployment swaps it). */
export function blobStorage(): BlobStorage {
  return current;
}
