import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useUrlUpdater } from '../../../lib/url-params';
import type { RecordListQuery } from '../../../../shared/schemas/record';

/** Filters a user can set on the records table; each is one URL parameter. */
const filterKeys = [
  'q',
  'phase',
  'solvent',
  'stain',
  'outcome',
  'technique',
  'class',
  'status',
  'author',
  'compoundId',
  'from',
  'to',
  'demo',
] as const;

const defaultColumns = [
  'structure',
  'compound',
  'plate',
  'eluent',
  'phase',
  'targetRf',
  'outcome',
  'visualisation',
  'author',
  'createdAt',
];

/**
 * The records table's state — filters, sort, order, page, page size and visible columns — lives in the URL,
 * so a link reproduces the view. Changing a filter returns to page 1.
 */
export function useRecordsUrl() {
  const [params] = useSearchParams();
  const query = useMemo<RecordListQuery>(() => {
    const out: Record<string, string | number> = {};
    for (const key of filterKeys) {
      const value = params.get(key);
      if (value) out[key] = value;
    }
    out.sort = params.get('sort') ?? 'createdAt';
    out.order = params.get('order') ?? 'desc';
    out.page = Number(params.get('page') ?? 1) || 1;
    out.pageSize = Number(params.get('pageSize') ?? 25) || 25;
    return out as RecordListQuery;
  }, [params]);
  const columns = useMemo(() => params.get('cols')?.split(',').filter(Boolean) ?? defaultColumns, [params]);

  const update = useUrlUpdater();
  return { query, columns, update, params };
}
