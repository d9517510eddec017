import { z } from 'zod';
import {
  recordInputSchema,
  recordUpdateSchema,
  type RecordDto,
  type RecordInput,
  type RecordUpdate,
} from '../../../../shared/schemas/record';
import { formatDate } from '../../../lib/dates';
import type { loadMethods, outcomes, spotLanes, spotRoles, techniques } from '../../../../shared/schemas/record-parts';

/** A number input's value: NaN (empty input with valueAsNumber) counts as "not given". */
type FormNumber = number | null;

export interface SpotRow {
  role: (typeof spotRoles)[number];
  rf: FormNumber;
  /** Measure on the plate instead of typing the Rf. */
  useDistances: boolean;
  spotDistanceMm: FormNumber;
  frontDistanceMm: FormNumber;
  lane: (typeof spotLanes)[number] | '';
  label: string;
}

export interface RecordFormValues {
  structure: string;
  name: string;
  technique: (typeof techniques)[number];
  stationaryPhase: string;
  stationaryPhaseOther: string;
  eluent: {
    mode: 'isocratic' | 'gradient';
    components: { solvent: string; parts: FormNumber }[];
    additives: { additive: string; percent: FormNumber }[];
    /** Gradient steps: parts of each component (same order as `components`) and the column volumes run. */
    steps: { parts: FormNumber[]; columnVolumes: FormNumber }[];
  };
  spots: SpotRow[];
  visualisation: string[];
  otherVisualisation: string;
  outcome: (typeof outcomes)[number];
  outcomeReason: string;
  showColumn: boolean;
  column: {
    diameterMm: FormNumber;
    cartridgeSize: string;
    silicaG: FormNumber;
    sampleMg: FormNumber;
    loadMethod: (typeof loadMethods)[number] | '';
    fractionMl: FormNumber;
    fractionsPooled: string;
    yieldPercent: FormNumber;
    purityNote: string;
  };
  notebookRef: string;
  notes: string;
  /** The day the plate was run, YYYY-MM-DD (a date input's value); empty when not known. */
  runOn: string;
}

const num = (value: FormNumber | undefined) =>
  value === null || value === undefined || Number.isNaN(value) ? null : value;
const text = (value: string) => (value.trim() === '' ? null : value.trim());

export const emptySpot = (role: SpotRow['role'] = 'target'): SpotRow => ({
  role,
  rf: null,
  useDistances: false,
  spotDistanceMm: null,
  frontDistanceMm: null,
  lane: '',
  label: '',
});

export function emptyRecordForm(): RecordFormValues {
  return {
    structure: '',
    name: '',
    technique: 'tlc',
    stationaryPhase: 'silica-tlc-f254',
    stationaryPhaseOther: '',
    eluent: {
      mode: 'isocratic',
      components: [
        { solvent: 'ethyl-acetate', parts: 1 },
        { solvent: 'hexanes', parts: 4 },
      ],
      additives: [],
      steps: [],
    },
    spots: [emptySpot('target')],
    visualisation: ['uv-254'],
    otherVisualisation: '',
    outcome: 'clean',
    outcomeReason: '',
    showColumn: false,
    column: {
      diameterMm: null,
      cartridgeSize: '',
      silicaG: null,
      sampleMg: null,
      loadMethod: '',
      fractionMl: null,
      fractionsPooled: '',
      yieldPercent: null,
      purityNote: '',
    },
    notebookRef: '',
    notes: '',
    runOn: formatDate(new Date().toISOString()),
  };
}

/** The API body for the form's values (structure left out when `withStructure` is false). */
export function toRecordInput(values: RecordFormValues, withStructure = true): RecordInput {
  const components = values.eluent.components.map((part) => ({
    solvent: part.solvent,
    parts: num(part.parts) as number,
  }));
  const column = values.showColumn
    ? {
        diameterMm: num(values.column.diameterMm),
        cartridgeSize: text(values.column.cartridgeSize),
        silicaG: num(values.column.silicaG),
        sampleMg: num(values.column.sampleMg),
        loadMethod: values.column.loadMethod || null,
        fractionMl: num(values.column.fractionMl),
        fractionsPooled: text(values.column.fractionsPooled),
        yieldPercent: num(values.column.yieldPercent),
        purityNote: text(values.column.purityNote),
      }
    : null;
  return {
    ...(withStructure
      ? { structure: values.structure.trim() || undefined, name: values.name.trim() || undefined }
      : {}),
    technique: values.technique,
    stationaryPhase: values.stationaryPhase,
    stationaryPhaseOther: values.stationaryPhase === 'other' ? text(values.stationaryPhaseOther) : null,
    eluent: {
      components,
      additives: values.eluent.additives.map((item) => ({
        additive: item.additive,
        percent: num(item.percent) as number,
      })),
      mode: values.eluent.mode,
      steps:
        values.eluent.mode === 'gradient'
          ? values.eluent.steps.map((step) => ({
              components: components
                .map((part, index) => ({ solvent: part.solvent, parts: num(step.parts[index]) as number }))
                .filter((part) => part.parts !== 0),
              columnVolumes: num(step.columnVolumes),
            }))
          : [],
    },
    spots: values.spots.map((spot) => ({
      role: spot.role,
      rf: spot.useDistances ? null : num(spot.rf),
      spotDistanceMm: spot.useDistances ? num(spot.spotDistanceMm) : null,
      frontDistanceMm: spot.useDistances ? num(spot.frontDistanceMm) : null,
      lane: spot.lane || null,
      label: text(spot.label),
    })),
    visualisation: [
      ...values.visualisation.filter((key) => key !== 'other'),
      ...(values.visualisation.includes('other') ? [{ method: 'other', note: text(values.otherVisualisation) }] : []),
    ],
    outcome: values.outcome,
    outcomeReason: text(values.outcomeReason),
    column,
    notebookRef: text(values.notebookRef),
    notes: text(values.notes),
    runOn: values.runOn || null,
  };
}

const formRules = (values: RecordFormValues, context: z.RefinementCtx) => {
  if (values.outcome === 'failed' && !values.outcomeReason.trim()) {
    context.addIssue({
      code: 'custom',
      path: ['outcomeReason'],
      message: 'Say why it failed: failures are knowledge too.',
    });
  }
};

/** Form schema for a new record: the form's own rules, then the shared API schema on the body it makes. */
export const createRecordFormSchema = z
  .custom<RecordFormValues>()
  .superRefine(formRules)
  .transform((values) => toRecordInput(values, true))
  .pipe(recordInputSchema);

/** Form schema for an edit: the structure is sent only when it was changed. */
export function editRecordFormSchema(originalStructure: string) {
  return z
    .custom<RecordFormValues>()
    .superRefine(formRules)
    .transform((values): RecordUpdate => toRecordInput(values, values.structure.trim() !== originalStructure.trim()))
    .pipe(recordUpdateSchema);
}

/** Form values showing an existing record (for the edit page). */
export function recordToFormValues(record: RecordDto): RecordFormValues {
  const components = record.eluent.components;
  return {
    structure: record.compound.canonicalSmiles,
    name: '',
    technique: record.technique,
    stationaryPhase: record.stationaryPhase,
    stationaryPhaseOther: record.stationaryPhaseOther ?? '',
    eluent: {
      mode: record.eluent.mode,
      components: components.map((part) => ({ ...part })),
      additives: record.eluent.additives.map((item) => ({ ...item })),
      steps: record.eluent.steps.map((step) => ({
        parts: components.map((part) => step.components.find((other) => other.solvent === part.solvent)?.parts ?? 0),
        columnVolumes: step.columnVolumes,
      })),
    },
    spots: record.spots.map((spot) => ({
      role: spot.role,
      rf: spot.rf,
      useDistances: spot.spotDistanceMm !== null,
      spotDistanceMm: spot.spotDistanceMm,
      frontDistanceMm: spot.frontDistanceMm,
      lane: spot.lane ?? '',
      label: spot.label ?? '',
    })),
    visualisation: record.visualisations.map((item) => item.method),
    otherVisualisation: record.visualisations.find((item) => item.method === 'other')?.note ?? '',
    outcome: record.outcome,
    outcomeReason: record.outcomeReason ?? '',
    showColumn: record.column !== null,
    column: {
      diameterMm: record.column?.diameterMm ?? null,
      cartridgeSize: record.column?.cartridgeSize ?? '',
      silicaG: record.column?.silicaG ?? null,
      sampleMg: record.column?.sampleMg ?? null,
      loadMethod: record.column?.loadMethod ?? '',
      fractionMl: record.column?.fractionMl ?? null,
      fractionsPooled: record.column?.fractionsPooled ?? '',
      yieldPercent: record.column?.yieldPercent ?? null,
      purityNote: record.column?.purityNote ?? '',
    },
    notebookRef: record.notebookRef ?? '',
    notes: record.notes ?? '',
    runOn: record.runOn ?? '',
  };
}
