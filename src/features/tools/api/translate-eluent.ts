import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { translateEluentResultSchema, type TranslateEluentInput } from '../../../../shared/schemas/tools';
import { toolKeys } from './keys';

/** `POST /api/tools/translate-eluent`: the equal-strength mixture in another pair, with hazards of both. */
const getTranslation = (input: TranslateEluentInput, signal?: AbortSignal) =>
  api('/api/tools/translate-eluent', { method: 'POST', body: input, signal }, translateEluentResultSchema);

const translationQueryOptions = (input: TranslateEluentInput) =>
  queryOptions({
    queryKey: toolKeys.translation(input),
    queryFn: ({ signal }) => getTranslation(input, signal),
    staleTime: Infinity,
    retry: false,
  });

export function useTranslation(input: TranslateEluentInput | null) {
  return useQuery({
    ...translationQueryOptions(input ?? { from: '', to: { weak: 'hexanes', strong: 'EtOAc' } }),
    enabled: input !== null,
  });
}
