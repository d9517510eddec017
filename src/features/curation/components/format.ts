import { formatNumber } from '../../../../shared/domain/format-number';
import type { CurationRecord } from '../../../../shared/schemas/curation';
import { formatDate } from '../../../lib/dates';

/** "0.85 · high": a duplicate score with a word, so it never rests on a number alone. */
export function certainty(score: number): string {
  const word = score >= 0.8 ? 'high' : score >= 0.6 ? 'medium' : 'low';
  return `${formatNumber(score, 2)} · ${word}`;
}

/** % v/v of the strong solvent, or a dash when the strong solvent is unknown. */
export function strongShare(record: Pick<CurationRecord, 'strongPercent' | 'strongSolvent'>): string {
  if (record.strongPercent === null) return '—';
  return `${formatNumber(record.strongPercent, 1)} %`;
}

export const compoundLabel = (record: CurationRecord) => record.compound.name ?? record.compound.canonicalSmiles;

export const day = (iso: string) => formatDate(iso);
