import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { changedByImports } from '../../src/features/imports/api/keys';
import { watchImport } from '../../src/features/imports/api/watch';
import { overviewQueryOptions } from '../../src/features/home/api/overview';
import { recordKeys } from '../../src/features/records/api/keys';
import { searchKeys } from '../../src/features/search/api/keys';
import { compoundKeys } from '../../src/features/compounds/api/get-compound';
import { classKeys } from '../../src/features/classes/api/keys';
import type { ImportDto } from '../../shared/schemas/import';

const finished = {
  id: 1,
  fileName: 'history.xlsx',
  sha256: 'a'.repeat(64),
  byteSize: 10,
  format: 'xlsx',
  status: 'completed',
  user: { id: 1, name: 'curator' },
  headers: [],
  mapping: {},
  total: 1,
  processed: 1,
  accepted: 1,
  rejected: 0,
  duplicates: 0,
  blankRows: 0,
  newCompounds: 1,
  lastCommittedRow: 1,
  batchesCommitted: 1,
  error: null,
  createdAt: new Date().toISOString(),
  finishedAt: new Date().toISOString(),
  undoneAt: null,
  retiredRecords: null,
  warned: 0,
  sheet: 'data',
  headerRow: 3,
  dateOrder: null,
  rate: null,
  waitingToResume: false,
} satisfies ImportDto;

describe('what a finished import refreshes (issue 19: the home counts went stale after an import)', () => {
  it('every prefix it invalidates is the root key of a query another feature really uses, the home counts included', () => {
    const roots = [recordKeys.all, searchKeys.all, compoundKeys.all, classKeys.all, overviewQueryOptions.queryKey].map(
      (key) => JSON.stringify(key.slice(0, 1)),
    );
    expect(changedByImports.length).toBeGreaterThan(0);
    for (const prefix of changedByImports) expect(roots).toContain(JSON.stringify(prefix));
    expect(changedByImports.map((prefix) => prefix[0])).toContain(overviewQueryOptions.queryKey[0]);
  });

  it('when an import finishes, then the cached home counts are marked stale', async () => {
    const qc = new QueryClient();
    qc.setQueryData(overviewQueryOptions.queryKey, { records: 1 } as never);
    expect(qc.getQueryState(overviewQueryOptions.queryKey)?.isInvalidated).toBe(false);
    watchImport(qc, finished);
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(qc.getQueryState(overviewQueryOptions.queryKey)?.isInvalidated).toBe(true);
  });
});
