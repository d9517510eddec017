/**
 * Fields a curator chooses, one record per field, when merging. Notes are never chosen: every record's
 * notes are appended to the survivor's with attribution. Spots, photos, visualisations, bookmarks and
 * contributor credits are united, not chosen. `compound` matters only when the records belong to two
 * entries of one structure (see the same-structure duplicates).
 */
export const mergeableFields = [
  'compound',
  'technique',
  'stationaryPhase',
  'eluent',
  'outcome',
  'column.diameterMm',
  'column.cartridgeSize',
  'column.silicaG',
  'column.sampleMg',
  'column.loadMethod',
  'column.fractionMl',
  'column.fractionsPooled',
  'column.yieldPercent',
  'column.purityNote',
  'notebookRef',
] as const;
export type MergeableField = (typeof mergeableFields)[number];

export const mergeableFieldLabels: Record<MergeableField, string> = {
  compound: 'compound',
  technique: 'technique',
  stationaryPhase: 'stationary phase',
  eluent: 'eluent',
  outcome: 'outcome',
  'column.diameterMm': 'column diameter (mm)',
  'column.cartridgeSize': 'cartridge',
  'column.silicaG': 'silica (g)',
  'column.sampleMg': 'sample (mg)',
  'column.loadMethod': 'loading',
  'column.fractionMl': 'fraction size (mL)',
  'column.fractionsPooled': 'fractions pooled',
  'column.yieldPercent': 'yield (%)',
  'column.purityNote': 'purity note',
  notebookRef: 'notebook reference',
};
