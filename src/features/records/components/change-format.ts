import { stainByKey } from '../../../../shared/catalogue/stains';
import { stationaryPhaseByKey } from '../../../../shared/catalogue/stationary-phases';
import { formatEluent } from '../../../../shared/domain/eluent-summary';
import { spotRoleLabels, techniqueLabels } from '../../../../shared/schemas/record-parts';

const fieldLabels: Record<string, string> = {
  compoundId: 'compound',
  technique: 'technique',
  stationaryPhase: 'stationary phase',
  stationaryPhaseOther: 'phase name',
  eluent: 'eluent',
  spots: 'spots',
  visualisations: 'visualisation',
  outcome: 'outcome',
  outcomeReason: 'reason',
  notebookRef: 'notebook reference',
  notes: 'notes',
  status: 'status',
  photoIds: 'photos',
  photos: 'photo',
  retiredReason: 'retire reason',
  'column.diameterMm': 'column diameter (mm)',
  'column.cartridgeSize': 'cartridge',
  'column.silicaG': 'silica (g)',
  'column.sampleMg': 'sample (mg)',
  'column.loadMethod': 'load',
  'column.fractionMl': 'fraction size (mL)',
  'column.fractionsPooled': 'fractions pooled',
  'column.yieldPercent': 'yield (%)',
  'column.purityNote': 'purity note',
  mergedRecords: 'records merged in',
  mergedIntoId: 'merged into',
  merge: 'merge',
  name: 'name',
  runOn: 'plate run on',
};

/** A field's name in words; an unknown one ("someField" or "some_field") is split into words, never shown raw. */
export const fieldLabel = (field: string) =>
  fieldLabels[field] ??
  field
    .replace(/^column\./, 'column ')
    .replace(/_/g, ' ')
    .replace(/([a-z])([A-Z])/g, (_, a: string, b: string) => `${a} ${b.toLowerCase()}`);

const recordList = (value: unknown) => (Array.isArray(value) ? value : [value]).map((id) => `record #${id}`).join(', ');

type SpotLike = { role: keyof typeof spotRoleLabels; rf: number };
type EluentLike = Parameters<typeof formatEluent>[0];

/** A changed value as a chemist reads it: eluent notation, spots with Rf, stain labels, phase names. */
export function formatChangeValue(field: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  switch (field) {
    case 'eluent':
      return formatEluent(value as EluentLike);
    case 'spots':
      return (value as SpotLike[])
        .map((spot) => `${spotRoleLabels[spot.role] ?? spot.role} ${spot.rf.toFixed(2)}`)
        .join(', ');
    case 'visualisations':
      return (
        (value as { method: string; note: string | null }[])
          .map((item) =>
            item.method === 'other' ? (item.note ?? 'other') : (stainByKey(item.method)?.label ?? item.method),
          )
          .join(', ') || '—'
      );
    case 'stationaryPhase':
      return stationaryPhaseByKey(String(value))?.name ?? String(value);
    case 'technique':
      return techniqueLabels[value as keyof typeof techniqueLabels] ?? String(value);
    case 'compoundId':
      return `compound ${value}`;
    case 'photos':
      return `photo ${value}`;
    case 'mergedRecords':
    case 'mergedIntoId':
      return recordList(value);
    case 'merge':
      return `merge #${value}`;
    case 'photoIds':
      return (value as number[]).length === 0 ? 'none' : (value as number[]).map((id) => `#${id}`).join(', ');
    default:
      return typeof value === 'object' ? JSON.stringify(value) : String(value);
  }
}
