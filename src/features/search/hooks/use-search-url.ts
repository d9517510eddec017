import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useUrlUpdater } from '../../../lib/url-params';
import type { SearchMode, SearchSort, SearchView } from '../../../../shared/schemas/search';

/** Filters of a search; each is one URL parameter and one API parameter of the same name. */
export const searchFilterKeys = [
  'class',
  'phase',
  'solvent',
  'stain',
  'outcome',
  'technique',
  'contributor',
  'from',
  'to',
] as const;
export type SearchFilterKey = (typeof searchFilterKeys)[number];

export interface SearchState {
  mode: SearchMode;
  q: string;
  structure: string;
  threshold: string;
  view: SearchView;
  sort: SearchSort;
  page: number;
  pageSize: number;
  filters: Partial<Record<SearchFilterKey, string>>;
}

const oneOf = <T extends string>(value: string | null, allowed: readonly T[], fallback: T): T =>
  allowed.includes(value as T) ? (value as T) : fallback;

/** The search state read from URL parameters (unknown values fall back to the defaults). */
export function searchStateOf(params: URLSearchParams): SearchState {
  const filters: SearchState['filters'] = {};
  for (const key of searchFilterKeys) {
    const value = params.get(key);
    if (value) filters[key] = value;
  }
  return {
    mode: oneOf(params.get('mode'), ['text', 'similar', 'substructure'] as const, 'text'),
    q: params.get('q') ?? '',
    structure: params.get('structure') ?? '',
    threshold: params.get('threshold') ?? '',
    view: oneOf(params.get('view'), ['records', 'compounds'] as const, 'records'),
    sort: oneOf(params.get('sort'), ['relevance', 'newest', 'oldest', 'compound', 'rf'] as const, 'relevance'),
    page: Math.max(1, Number(params.get('page')) || 1),
    pageSize: Math.min(200, Math.max(1, Number(params.get('pageSize')) || 25)),
    filters,
  };
}

/** The API query string of a search (also used by the export links): only the parameters that are set. */
export function searchApiParams(state: SearchState, options: { paged?: boolean } = {}): URLSearchParams {
  const params = new URLSearchParams({ mode: state.mode });
  if (state.q) params.set('q', state.q);
  if (state.mode !== 'text' && state.structure) params.set('structure', state.structure);
  if (state.mode === 'similar' && state.threshold) params.set('threshold', state.threshold);
  for (const [key, value] of Object.entries(state.filters)) if (value) params.set(key, value);
  params.set('sort', state.sort);
  if (options.paged !== false) {
    params.set('view', state.view);
    params.set('page', String(state.page));
    params.set('pageSize', String(state.pageSize));
  }
  return params;
}

/** The search page's state in the URL; `update` changes some parameters and, unless told otherwise, returns to page 1. */
export function useSearchUrl() {
  const [params] = useSearchParams();
  const state = useMemo(() => searchStateOf(params), [params]);
  const update = useUrlUpdater();
  return { state, update };
}
