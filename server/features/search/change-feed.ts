import pg from 'pg';
import { logger } from '../../http/logger';

/** The channel the search_changes triggers notify on (migration 202612020215-search-changes). */
export const SEARCH_CHANNEL = 'rfolio_search';

export interface ChangeFeedHandlers {
  /** A notification arrived (payload `compound:<id>` or `record:<id>`). */
  onNotice: (payload: string) => void;
  /** The connection is (re)established and listening: catch up on what was missed meanwhile. */
  onListening: (reconnect: boolean) => void;
}

/**
 * A dedicated PostgreSQL connection that LISTENs for search changes. It survives the database going away:
 * on error or end it reconnects with a growing delay (0.25 s doubling to 5 s) and says so through
 * `onListening(true)`, so the indexes catch up from the change log. Never throws into the process.
 */
export class ChangeFeed {
  /** The connection being opened or in use; events of any other (older) connection are ignored. */
  private current: pg.Client | null = null;
  private client: pg.Client | null = null;
  private timer: NodeJS.Timeout | null = null;
  private delayMs = 250;
  private stopped = false;
  private connectedOnce = false;
  /** Failed attempts since the feed last listened (only the first is logged as a warning). */
  private failures = 0;

  constructor(
    private readonly url: string,
    private readonly handlers: ChangeFeedHandlers,
  ) {}

  /** Connects and listens; resolves once listening (or after the first failed attempt, retrying in the background). */
  async start(): Promise<void> {
    await this.connect();
  }

  get listening(): boolean {
    return this.client !== null;
  }

  /** PostgreSQL backend process id of the listening connection (for diagnostics and fault tests). */
  get backendPid(): number | null {
    return (this.client as (pg.Client & { processID?: number }) | null)?.processID ?? null;
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    const client = this.current;
    this.current = null;
    this.client = null;
    await client?.end().catch(() => undefined);
  }

  private async connect(): Promise<void> {
    if (this.stopped) return;
    const client = new pg.Client({ connectionString: this.url, connectionTimeoutMillis: 3_000, keepAlive: true });
    this.current = client;
    client.on('error', (error) => this.lost(client, error));
    client.on('end', () => this.lost(client));
    client.on('notification', (message) => {
      if (message.channel === SEARCH_CHANNEL && message.payload) this.handlers.onNotice(message.payload);
    });
    try {
      await client.connect();
      await client.query(`LISTEN ${SEARCH_CHANNEL}`);
    } catch (error) {
      this.lost(client, error as Error);
      return;
    }
    if (this.stopped || this.current !== client) {
      await client.end().catch(() => undefined);
      return;
    }
    this.client = client;
    if (this.failures > 0) logger.info({ attempts: this.failures }, 'search change feed listening again');
    this.failures = 0;
    this.delayMs = 250;
    const reconnect = this.connectedOnce;
    this.connectedOnce = true;
    this.handlers.onListening(reconnect);
  }

  private lost(client: pg.Client, error?: Error): void {
    if (client !== this.current) return;
    this.current = null;
    this.client = null;
    client.end().catch(() => undefined);
    if (this.stopped) return;
    this.failures += 1;
    const level = this.failures === 1 ? 'warn' : 'debug';
    logger[level]({ err: error?.message, attempt: this.failures }, 'search change feed has no connection; retrying');
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.connect();
    }, this.delayMs);
    this.timer.unref();
    this.delayMs = Math.min(this.delayMs * 2, 5_000);
  }
}
