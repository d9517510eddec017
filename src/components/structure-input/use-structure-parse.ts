import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { api, ApiRequestError } from '../../lib/api-client';
import { structureToSend } from './structure-text';
import { structureParseResultSchema } from '../../../shared/schemas/compound';
import type { ParsedStructure } from './types';

const structureKeys = {
  parse: (structure: string) => ['structures', 'parse', structure] as const,
};

/** The value once it has stopped changing for `ms` milliseconds. */
function useDebounced<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return settled;
}

/** `POST /api/structures/parse`, the answer checked against the shared schema. */
function parseStructure(structure: string, signal?: AbortSignal): Promise<ParsedStructure> {
  return api('/api/structures/parse', { method: 'POST', body: { structure }, signal }, structureParseResultSchema);
}

/**
 * Live check of a structure text: waits until typing pauses, then asks the server. The previous
 * answer stays visible (flagged `isStale`) while the next is on its way.
 */
export function useStructureParse(text: string, debounceMs = 400) {
  const structure = structureToSend(text);
  const settled = useDebounced(structure, debounceMs);
  const query = useQuery({
    queryKey: structureKeys.parse(settled),
    queryFn: ({ signal }) => parseStructure(settled, signal),
    enabled: settled !== '',
    staleTime: Infinity,
    placeholderData: keepPreviousData,
    retry: (count, err) => !(err instanceof ApiRequestError && err.status < 500) && count < 1,
  });
  const current = structure !== '' && settled === structure;
  return {
    parsed: structure === '' ? undefined : query.data,
    /** The answer belongs to the text now in the box. */
    isCurrent: current && !query.isPlaceholderData && query.isSuccess,
    isStale: structure !== settled || query.isPlaceholderData,
    isChecking: structure !== '' && (structure !== settled || query.isFetching),
    error: current && !query.isFetching ? query.error : null,
  };
}
