import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';

export interface ChangeBatch {
  compoundIds: number[];
  recordIds: number[];
}

interface LogRow {
  horizon: string;
  seq: string | null;
  kind: 'compound' | 'record' | null;
  subject_id: number | null;
  xid: string | null;
}

/** Changes kept in search_changes before a process prunes them; a process asleep longer rebuilds. */
export const RETENTION_DAYS = 7;

/** pg_snapshot_xmin of the current snapshot: every change it cannot see has an xid at or above it. */
export async function snapshotHorizon(transaction?: Transaction): Promise<bigint> {
  const [row] = await sequelize.query<{ horizon: string }>(
    'SELECT pg_snapshot_xmin(pg_current_snapshot())::text AS horizon',
    {
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return BigInt(row.horizon);
}

/**
 * Reads the search change log from a horizon on (see the migration): what changed since the last sync,
 * without what was applied already. `applied` maps log seq → xid of rows at or above the horizon that
 * were applied; it is updated and pruned here. Returns the new horizon and the ids to reload.
 */
export class ChangeLogReader {
  private applied = new Map<string, bigint>();

  constructor(public horizon: bigint) {}

  async read(): Promise<ChangeBatch> {
    const rows = await sequelize.query<LogRow>(
      `WITH h AS (SELECT pg_snapshot_xmin(pg_current_snapshot()) AS horizon)
       SELECT h.horizon::text AS horizon, c.seq::text AS seq, c.kind, c.subject_id, c.xid::text AS xid
       FROM h LEFT JOIN search_changes c ON c.xid >= CAST(:horizon AS xid8)
       ORDER BY c.seq`,
      { replacements: { horizon: this.horizon.toString() }, type: QueryTypes.SELECT },
    );
    const compounds = new Set<number>();
    const records = new Set<number>();
    for (const row of rows) {
      if (row.seq === null || this.applied.has(row.seq)) continue;
      this.applied.set(row.seq, BigInt(row.xid as string));
      (row.kind === 'compound' ? compounds : records).add(row.subject_id as number);
    }
    this.horizon = BigInt(rows[0].horizon);
    for (const [seq, xid] of this.applied) if (xid < this.horizon) this.applied.delete(seq);
    return { compoundIds: [...compounds], recordIds: [...records] };
  }
}

/** Deletes log rows older than the retention; harmless when several processes do it at once. */
export async function pruneChangeLog(): Promise<void> {
  await sequelize.query(`DELETE FROM search_changes WHERE at < now() - interval '${RETENTION_DAYS} days'`);
}
