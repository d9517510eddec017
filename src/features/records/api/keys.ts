import type { RecordListQuery } from '../../../../shared/schemas/record';

/** Query keys of the records feature, general to specific (curation invalidates ['records'] too). */
export const recordKeys = {
  all: ['records'] as const,
  lists: () => [...recordKeys.all, 'list'] as const,
  list: (query: RecordListQuery) => [...recordKeys.lists(), query] as const,
  detail: (id: number) => [...recordKeys.all, 'detail', id] as const,
  history: (id: number) => [...recordKeys.all, 'history', id] as const,
};

/** Compound pages show records, so record changes invalidate them as well. */
export const compoundsKey = ['compounds'] as const;
