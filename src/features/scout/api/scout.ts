import { useMutation } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { scoutResultSchema, type ScoutInput } from '../../../../shared/schemas/scout';

/** `POST /api/scout`: starting conditions for a structure, checked against the shared schema. */
const postScout = (input: ScoutInput) => api('/api/scout', { method: 'POST', body: input }, scoutResultSchema);

/** Runs Scout on demand (each run is a question, not a cached list). */
export function useScout() {
  return useMutation({ mutationKey: ['scout', 'run'], mutationFn: postScout });
}
