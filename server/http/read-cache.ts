import { createHash } from 'node:crypto';
import type { Response } from 'express';
import { LRUCache } from 'lru-cache';

/**
 * Results of hot reads (records list and page, search, Scout) kept per process under the stamp they were
 * computed at (server/db/data-stamp.ts: the content stamp for these). An entry is used only while the stamp is
 * unchanged, so any committed content write — by this process, another one or plain SQL — makes the next
 * read compute afresh. Concurrent misses
 * for one key share one computation. Failures are never kept.
 */
export class StampedCache<V extends NonNullable<unknown>> {
  private readonly entries: LRUCache<string, { stamp: string; value: V }>;
  private readonly computing = new Map<string, { stamp: string; promise: Promise<V> }>();

  constructor(options: { max: number; maxBytes?: number; sizeOf?: (value: V) => number }) {
    const { maxBytes, sizeOf } = options;
    this.entries = new LRUCache<string, { stamp: string; value: V }>({
      max: options.max,
      ...(maxBytes && sizeOf
        ? {
            maxSize: maxBytes,
            sizeCalculation: (entry: { stamp: string; value: V }) => Math.max(1, sizeOf(entry.value)),
          }
        : {}),
    });
  }

  /** The value for `key` at `stamp`: kept, being computed by another request, or computed now. */
  async get(key: string, stamp: string, compute: () => Promise<V> | V): Promise<V> {
    const hit = this.entries.get(key);
    if (hit && hit.stamp === stamp) return hit.value;
    const pending = this.computing.get(key);
    if (pending && pending.stamp === stamp) return pending.promise;
    const promise = (async () => compute())();
    this.computing.set(key, { stamp, promise });
    try {
      const value = await promise;
      this.entries.set(key, { stamp, value });
      return value;
    } finally {
      if (this.computing.get(key)?.promise === promise) this.computing.delete(key);
    }
  }

  /** Forgets everything (tests). */
  clear(): void {
    this.entries.clear();
    this.computing.clear();
  }
}

/** A JSON answer serialised once: its bytes and a strong ETag over them. */
export interface JsonBody {
  bytes: Buffer;
  etag: string;
}

export function jsonBody(value: unknown): JsonBody {
  const bytes = Buffer.from(JSON.stringify(value));
  return { bytes, etag: `"${createHash('sha1').update(bytes).digest('base64url')}"` };
}

/** Answers 200 with a serialised JSON body (304 when the client already holds it, as express does for any body). */
export function sendJsonBody(res: Response, body: JsonBody): void {
  res.set('ETag', body.etag).type('application/json').send(body.bytes);
}

/** Serialised answers of every hot read, bounded by bytes (64 MB per process). */
export const responseCache = new StampedCache<JsonBody>({
  max: 20_000,
  maxBytes: 64 * 1024 * 1024,
  sizeOf: (body) => body.bytes.length + 100,
});
