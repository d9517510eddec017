import type { MergePreview } from '../../../../shared/schemas/curation';

type PreviewRecord = MergePreview['records'][number];
export type UnitedSpot = PreviewRecord['spots'][number] & { fromRecord: number };
export type UnitedStain = PreviewRecord['stains'][number] & { fromRecord: number };

/**
 * The spots and stains the survivor will hold, by the server's merge rule (server/features/curation/merge-rows.ts):
 * the survivor's own first; a merged record's stain only if no earlier record has it (same method and note);
 * a merged target spot only when the survivor has none, and then only the first. What does not move stays
 * on its merged record.
 */
export function unitedValues(
  records: PreviewRecord[],
  survivorId: number,
): { spots: UnitedSpot[]; stains: UnitedStain[]; leftBehind: number } {
  const survivor = records.find((record) => record.id === survivorId);
  if (!survivor) return { spots: [], stains: [], leftBehind: 0 };
  const merged = records.filter((record) => record.id !== survivorId);
  const spots: UnitedSpot[] = survivor.spots.map((spot) => ({ ...spot, fromRecord: survivor.id }));
  const stains: UnitedStain[] = survivor.stains.map((stain) => ({ ...stain, fromRecord: survivor.id }));
  const stainKey = (stain: { method: string; note: string | null }) => `${stain.method}|${stain.note ?? ''}`;
  const seen = new Set(stains.map(stainKey));
  let hasTarget = spots.some((spot) => spot.role === 'target');
  let leftBehind = 0;
  for (const record of merged) {
    for (const spot of record.spots) {
      if (spot.role === 'target' && hasTarget) {
        leftBehind += 1;
        continue;
      }
      if (spot.role === 'target') hasTarget = true;
      spots.push({ ...spot, fromRecord: record.id });
    }
    for (const stain of record.stains) {
      if (seen.has(stainKey(stain))) {
        leftBehind += 1;
        continue;
      }
      seen.add(stainKey(stain));
      stains.push({ ...stain, fromRecord: record.id });
    }
  }
  return { spots, stains, leftBehind };
}
