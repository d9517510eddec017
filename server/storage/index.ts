import type { BlobStorage } from './blob-storage';
import { PostgresBlobStorage } from './postgres-blob-storage';

export type { BlobStorage, StoredObject } from './blob-storage';

let current: BlobStorage = new PostgresBlobStorage();

/** The blob storage in use (PostgreSQL unless a test or deployment swaps it). */
export function blobStorage(): BlobStorage {
  return current;
}

/** Replaces the storage, e.g. with another backend; returns the previous one. */
export function useBlobStorage(storage: BlobStorage): BlobStorage {
  const previous = current;
  current = storage;
  return previous;
}
