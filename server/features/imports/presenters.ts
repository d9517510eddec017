import type { ImportDto } from '../../../shared/schemas/import';
import type { Import, User } from '../../db/models';

const iso = (date: Date | null | undefined) => (date ? new Date(date).toISOString() : null);

/** An import row (with its `user` included) as the API's ImportDto. */
export function presentImport(
  row: Import & { user?: Pick<User, 'id' | 'name'> },
  live: Pick<ImportDto, 'rate' | 'waitingToResume'> = { rate: null, waitingToResume: false },
): ImportDto {
  return {
    id: row.id,
    fileName: row.fileName,
    sha256: row.fileSha256,
    byteSize: row.byteSize,
    format: row.format,
    status: row.status,
    user: { id: row.userId, name: row.user?.name ?? `user ${row.userId}` },
    headers: row.headers,
    mapping: row.mapping,
    total: row.total,
    processed: row.processed,
    accepted: row.accepted,
    rejected: row.rejected,
    duplicates: row.duplicates,
    blankRows: row.blankRows,
    newCompounds: row.newCompounds,
    lastCommittedRow: row.lastCommittedRow,
    batchesCommitted: row.batchesCommitted,
    error: row.error,
    createdAt: iso(row.createdAt) as string,
    finishedAt: iso(row.finishedAt),
    undoneAt: iso(row.undoneAt),
    retiredRecords: row.retiredRecords,
    warned: row.warned ?? 0,
    sheet: row.sheet ?? null,
    headerRow: row.headerRow ?? null,
    dateOrder: row.dateOrder ?? null,
    ...live,
  };
}
