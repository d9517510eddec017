import { performance } from 'node:perf_hooks';
import { StructureSearchIndex } from '../../chem';
import { env } from '../../config/env';
import { sequelize } from '../../db/sequelize';
import { logger } from '../../http/logger';
import { ChangeFeed } from './change-feed';
import { ChangeLogReader, pruneChangeLog, RETENTION_DAYS, snapshotHorizon } from './change-log';
import { loadIndexedCompounds, loadRecordDocs, type IndexedCompound } from './index-rows';
import { attachGraphsInBackground, graphOfIdcode } from './structure-graphs';
import { TextIndex } from './text-index';

const PRUNE_EVERY_MS = 60 * 60 * 1000;
const REBUILD_AFTER_MS = (RETENTION_DAYS / 2) * 24 * 3600 * 1000;

/**
 * The search indexes one server process holds: the chemistry engine's StructureSearchIndex (fingerprints
 * as stored in compounds.fingerprint, never recomputed) and the fuse.js TextIndex. Built at start from
 * one consistent snapshot; kept current from the search_changes log — woken by LISTEN/NOTIFY on a
 * dedicated connection (so writes by any process show up), and read once more before every search
 * (`sync`, one indexed query), so a search always sees every write committed before it began.
 */
export class SearchIndexes {
  readonly structures = new StructureSearchIndex(4096);
  readonly text = new TextIndex();
  /** Wall-clock milliseconds the last full rebuild took. */
  rebuildMs = 0;
  /** Settles when the last rebuild's search graphs are attached (substructure search is fastest from then on). */
  graphsReady: Promise<void> = Promise.resolve();
  private reader: ChangeLogReader | null = null;
  private feed: ChangeFeed;
  private syncing: Promise<void> | null = null;
  private again = false;
  private lastSyncAt = 0;
  private generation = 0;
  private pruneTimer: NodeJS.Timeout | null = null;

  constructor(url = env().DATABASE_URL) {
    this.feed = new ChangeFeed(url, {
      onNotice: () => void this.sync().catch((error) => logger.warn({ err: error }, 'search index sync failed')),
      onListening: (reconnect) => {
        if (reconnect)
          void this.catchUp().catch((error) => logger.warn({ err: error }, 'search index catch-up failed'));
      },
    });
  }

  /** The change feed's connection state: whether it listens, and its backend pid. */
  get listener(): { listening: boolean; backendPid: number | null } {
    return { listening: this.feed.listening, backendPid: this.feed.backendPid };
  }

  /** Listens for changes, then builds both indexes from the database. */
  async start(): Promise<void> {
    await this.feed.start();
    await this.rebuild();
    this.pruneTimer = setInterval(
      () => void pruneChangeLog().catch((error) => logger.warn({ err: error }, 'change-log pruning failed')),
      PRUNE_EVERY_MS,
    );
    this.pruneTimer.unref();
  }

  async stop(): Promise<void> {
    this.generation++;
    if (this.pruneTimer) clearInterval(this.pruneTimer);
    await this.feed.stop();
  }

  /** Applies every change committed since the last sync; concurrent callers share one round trip. */
  async sync(): Promise<void> {
    if (this.syncing) {
      this.again = true;
      return this.syncing;
    }
    this.syncing = this.drain().finally(() => {
      this.syncing = null;
    });
    return this.syncing;
  }

  private async drain(): Promise<void> {
    do {
      this.again = false;
      if (!this.reader) return;
      const batch = await this.reader.read();
      const [compounds, records] = await Promise.all([
        loadIndexedCompounds(batch.compoundIds),
        loadRecordDocs(batch.recordIds),
      ]);
      for (const compound of compounds) this.upsertStructure(compound, graphOfIdcode(compound.idcode));
      this.text.apply(
        compounds.map((compound) => compound.doc),
        records.active,
        records.inactiveIds,
      );
      this.lastSyncAt = Date.now();
    } while (this.again);
  }

  /** After the feed reconnects: the log covers the gap unless the process was away longer than it is kept. */
  private async catchUp(): Promise<void> {
    if (Date.now() - this.lastSyncAt > REBUILD_AFTER_MS) await this.rebuild();
    else await this.sync();
  }

  /** Reloads everything from one snapshot; searches keep using the previous indexes until it is done. */
  async rebuild(): Promise<void> {
    const started = performance.now();
    const generation = ++this.generation;
    const { horizon, compounds, records } = await sequelize.transaction(
      { isolationLevel: 'REPEATABLE READ' as never, readOnly: true },
      async (transaction) => ({
        horizon: await snapshotHorizon(transaction),
        compounds: await loadIndexedCompounds(undefined, transaction),
        records: await loadRecordDocs(undefined, transaction),
      }),
    );
    for (const compound of compounds) this.upsertStructure(compound);
    this.text.load(
      compounds.map((compound) => compound.doc),
      records.active,
    );
    this.reader = new ChangeLogReader(horizon);
    this.lastSyncAt = Date.now();
    this.rebuildMs = performance.now() - started;
    logger.info(
      { compounds: this.structures.size, records: records.active.length, ms: Math.round(this.rebuildMs) },
      'search indexes built',
    );
    const needGraphs = compounds.filter((compound) => compound.fingerprint).map(({ id, idcode }) => ({ id, idcode }));
    this.graphsReady = attachGraphsInBackground(
      this.structures,
      needGraphs,
      () => generation !== this.generation,
    ).catch((error) => {
      logger.warn({ err: error }, 'search graphs could not be attached; substructure search falls back to SSSearcher');
    });
  }

  private upsertStructure(compound: IndexedCompound, graph?: Uint8Array): void {
    if (compound.fingerprint)
      this.structures.upsert({ id: compound.id, idcode: compound.idcode, fingerprint: compound.fingerprint, graph });
    else this.structures.remove(compound.id);
  }
}
