import { createHash } from 'node:crypto';
import type { Eluent } from '../../shared/schemas/eluent';
import type { ColumnDetails, Spot, Visualisation } from '../../shared/schemas/record-parts';
import { strongPercentOf } from '../../shared/domain/eluent-summary';

/** The content of a record that decides whether two records say the same thing. */
export interface RecordContent {
  compoundId: number;
  technique: string;
  stationaryPhase: string;
  stationaryPhaseOther: string | null;
  eluent: Eluent;
  spots: readonly Spot[];
  visualisation: readonly Visualisation[];
  outcome: string;
  outcomeReason: string | null;
  column: ColumnDetails | null;
  notebookRef: string | null;
  notes: string | null;
  /** The day the plate was run (YYYY-MM-DD); not part of the content hash (the same conditions on another day are the same). */
  runOn?: string | null;
}

const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places;

function normalisedMixture(components: Eluent['components']) {
  const total = components.reduce((sum, part) => sum + part.parts, 0);
  return components
    .map((part) => [part.solvent, round(part.parts / total, 4)] as const)
    .sort(([a], [b]) => a.localeCompare(b));
}

/**
 * SHA-256 of a record's content, insensitive to how ratios are scaled (1 : 4 = 2 : 8), to the order of
 * solvents, spots and visualisations, and to case and spacing in text. Imports use it to count a row seen
 * before as a duplicate rather than add it twice.
 */
export function recordContentHash(content: RecordContent): string {
  const text = (value: string | null) => (value ? value.trim().replace(/\s+/g, ' ').toLowerCase() : null);
  const canonical = {
    compound: content.compoundId,
    technique: content.technique,
    phase: content.stationaryPhase,
    phaseOther: text(content.stationaryPhaseOther),
    mode: content.eluent.mode,
    mixture: normalisedMixture(content.eluent.components),
    additives: content.eluent.additives.map((item) => [item.additive, round(item.percent, 3)]).sort(),
    steps: content.eluent.steps.map((step) => [normalisedMixture(step.components), step.columnVolumes]),
    spots: content.spots
      .map((spot) => [spot.role, round(spot.rf, 3), spot.lane, text(spot.label)])
      .sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b))),
    visualisation: content.visualisation
      .map((item) => [item.method, text(item.note)])
      .sort((a, b) => JSON.stringify(a).localeCompare(JSON.stringify(b))),
    outcome: content.outcome,
    outcomeReason: text(content.outcomeReason),
    column: content.column
      ? Object.entries(content.column)
          .filter(([, value]) => value !== null)
          .sort()
      : null,
    notebookRef: text(content.notebookRef),
    notes: text(content.notes),
  };
  return createHash('sha256').update(JSON.stringify(canonical)).digest('hex');
}

/** The columns kept in step with the eluent and spots, for filters and sorts. */
export function derivedColumns(content: Pick<RecordContent, 'eluent' | 'spots' | 'stationaryPhase'>) {
  const solvents = new Set(content.eluent.components.map((part) => part.solvent));
  for (const step of content.eluent.steps) for (const part of step.components) solvents.add(part.solvent);
  const target = content.spots.find((spot) => spot.role === 'target');
  return {
    solventKeys: [...solvents].sort(),
    additiveKeys: content.eluent.additives.map((item) => item.additive).sort(),
    eluentMode: content.eluent.mode,
    strongPercent: strongPercentOf(content.eluent.components, content.stationaryPhase),
    targetRf: target ? target.rf : null,
  };
}

/** Row attributes of the flash-column details (null fields when none were given). */
export function columnAttributes(column: ColumnDetails | null) {
  return {
    columnDiameterMm: column?.diameterMm ?? null,
    cartridgeSize: column?.cartridgeSize ?? null,
    silicaG: column?.silicaG ?? null,
    sampleMg: column?.sampleMg ?? null,
    loadMethod: column?.loadMethod ?? null,
    fractionMl: column?.fractionMl ?? null,
    fractionsPooled: column?.fractionsPooled ?? null,
    yieldPercent: column?.yieldPercent ?? null,
    purityNote: column?.purityNote ?? null,
  };
}
