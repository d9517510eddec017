import { Worker } from 'node:worker_threads';
import { FINGERPRINT_WORDS, WORKER_FLAG } from './fingerprint-worker.mjs';

/** What a batch returns: fingerprints packed 16 words each, graphs when asked, undecodable positions. */
export interface SearchKeyBatch {
  fingerprints: Int32Array;
  graphs?: Uint8Array[];
  failed: number[];
}

interface Chunk {
  idcodes: string[];
  graphs: boolean;
  resolve: (batch: SearchKeyBatch) => void;
  reject: (error: Error) => void;
}

interface Slot {
  worker: Worker;
  chunk: Chunk | null;
}

const WORKER_URL = new URL('./fingerprint-worker.mjs', import.meta.url);

/**
 * A small pool of worker threads (default 2) computing OpenChemLib fingerprints (~9 ms a molecule,
 * ../shared/STACK.md) and search graphs from ID codes, in chunks, so the request thread stays free.
 * Workers start on first use and are unreferenced while idle (they never keep the process alive).
 */
export class FingerprintPool {
  private slots: Slot[] = [];
  private queue: Chunk[] = [];
  private nextId = 0;

  constructor(
    private readonly size = 2,
    private readonly chunkSize = 100,
  ) {}

  /** Fingerprints (and graphs) for the ID codes, in input order. */
  async run(idcodes: string[], graphs = false): Promise<SearchKeyBatch> {
    const parts: Promise<SearchKeyBatch>[] = [];
    for (let start = 0; start < idcodes.length; start += this.chunkSize) {
      const slice = idcodes.slice(start, start + this.chunkSize);
      parts.push(new Promise((resolve, reject) => this.queue.push({ idcodes: slice, graphs, resolve, reject })));
    }
    this.dispatch();
    const results = await Promise.all(parts);
    const fingerprints = new Int32Array(idcodes.length * FINGERPRINT_WORDS);
    const failed: number[] = [];
    results.forEach((batch, i) => {
      fingerprints.set(batch.fingerprints, i * this.chunkSize * FINGERPRINT_WORDS);
      failed.push(...batch.failed.map((index) => index + i * this.chunkSize));
    });
    return { fingerprints, graphs: graphs ? results.flatMap((batch) => batch.graphs ?? []) : undefined, failed };
  }

  /** Stops all workers; queued work is rejected. */
  async close(): Promise<void> {
    for (const chunk of this.queue.splice(0)) chunk.reject(new Error('Fingerprint pool closed.'));
    const slots = this.slots.splice(0);
    await Promise.all(slots.map((slot) => slot.worker.terminate()));
  }

  private spawn(): Slot {
    const worker = new Worker(WORKER_URL, { workerData: { [WORKER_FLAG]: true } });
    const slot: Slot = { worker, chunk: null };
    worker.on('message', (message: SearchKeyBatch & { id: number }) => this.finish(slot, message));
    worker.on('error', (error) => this.fail(slot, error));
    worker.unref();
    return slot;
  }

  private dispatch(): void {
    while (this.queue.length > 0) {
      let slot = this.slots.find((s) => s.chunk === null);
      if (!slot && this.slots.length < this.size) {
        slot = this.spawn();
        this.slots.push(slot);
      }
      if (!slot) return;
      const chunk = this.queue.shift() as Chunk;
      slot.chunk = chunk;
      slot.worker.ref();
      slot.worker.postMessage({ id: this.nextId++, idcodes: chunk.idcodes, graphs: chunk.graphs });
    }
  }

  private finish(slot: Slot, message: SearchKeyBatch): void {
    const chunk = slot.chunk;
    slot.chunk = null;
    slot.worker.unref();
    chunk?.resolve({ fingerprints: message.fingerprints, graphs: message.graphs, failed: message.failed });
    this.dispatch();
  }

  private fail(slot: Slot, error: Error): void {
    slot.chunk?.reject(error);
    this.slots = this.slots.filter((s) => s !== slot);
    this.dispatch();
  }
}
