import { fingerprintBytes } from '../../core/compound-fingerprints';
import type { PreparedRow } from './prepare-row';
import { storedCompoundIds } from './stored-keys';

/**
 * Starts the fingerprints of a batch's new compounds in the worker pool while the import reads the next
 * batch, so the slow part (~9 ms a molecule) overlaps the rest. Each ID code is fingerprinted at most once
 * per import, and never when the compound is already stored.
 */
export class FingerprintsAhead {
  private readonly started = new Map<string, Promise<Buffer | null>>();

  private static idcodesOf(rows: readonly PreparedRow[]): string[] {
    return [...new Set(rows.flatMap((row) => (row.ok ? [row.analysis.idcode] : [])))];
  }

  /** Starts work for the batch's ID codes that are neither stored nor started; returns without waiting for it. */
  async start(rows: readonly PreparedRow[]): Promise<void> {
    const candidates = FingerprintsAhead.idcodesOf(rows).filter((idcode) => !this.started.has(idcode));
    if (candidates.length === 0) return;
    const stored = await storedCompoundIds(candidates);
    const fresh = candidates.filter((idcode) => !stored.has(idcode));
    if (fresh.length === 0) return;
    const work = fingerprintBytes(fresh);
    work.catch(() => undefined);
    fresh.forEach((idcode, index) => {
      const one = work.then((bytes) => bytes[index]);
      one.catch(() => undefined);
      this.started.set(idcode, one);
    });
  }

  /** The fingerprints started for a batch's compounds, once computed. */
  async forBatch(rows: readonly PreparedRow[]): Promise<Map<string, Buffer | null>> {
    const ready = new Map<string, Buffer | null>();
    for (const idcode of FingerprintsAhead.idcodesOf(rows)) {
      const pending = this.started.get(idcode);
      if (pending) ready.set(idcode, await pending);
    }
    return ready;
  }
}
