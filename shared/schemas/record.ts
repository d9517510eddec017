import { z } from 'zod';
import { eluentFromInputSchema } from './eluent';
import { paginationQuerySchema } from './common';
import {
  columnDetailsSchema,
  outcomes,
  phaseNameSchema,
  spotInputSchema,
  techniques,
  visualisationInputSchema,
} from './record-parts';
import { resolvePhase, resolveSolvent, resolveStain } from '../catalogue/lookup';

export * from './record-parts';
export * from './record-dto';
export * from './record-history';

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .nullish()
    .transform((value) => (value ? value : null));

/** Fields of a record other than its compound; every one optional in a PATCH. */
const recordFields = z.object({
  technique: z.enum(techniques),
  stationaryPhase: phaseNameSchema,
  /** The phase's name when `stationaryPhase` is "other". */
  stationaryPhaseOther: optionalText(120),
  eluent: eluentFromInputSchema,
  spots: z.array(spotInputSchema).min(1, 'Record at least one spot (the target).').max(20),
  visualisation: z.array(visualisationInputSchema).max(12),
  outcome: z.enum(outcomes),
  outcomeReason: optionalText(1000),
  column: columnDetailsSchema.nullish().transform((value) => value ?? null),
  notebookRef: optionalText(120),
  notes: optionalText(10_000),
  /** The day the plate was run (YYYY-MM-DD): not in the future (a day's grace for time zones), not before 1900. */
  runOn: z.iso
    .date('Give the date as YYYY-MM-DD.')
    .refine(
      (day) => day >= '1900-01-01' && Date.parse(`${day}T00:00:00Z`) <= Date.now() + 86_400_000,
      'The plate cannot have been run in the future.',
    )
    .nullish()
    .transform((value) => value ?? null),
});

/** Structure text (SMILES or molfile) or an existing compound's id; the chemistry engine checks the size and content. */
const compoundReference = {
  // Not trimmed: a molfile's first (title) line may be blank and is significant.
  structure: z
    .string()
    .max(200_000)
    .refine((s) => s.trim().length > 0, 'Give a structure (SMILES or molfile).')
    .optional(),
  compoundId: z.number().int().positive().optional(),
  /** The compound's name; kept as its name when it has none yet, otherwise added to its synonyms. */
  name: z.string().trim().min(1).max(200).optional(),
};

type RecordFieldsOut = Partial<z.output<typeof recordFields>> & { structure?: string; compoundId?: number };

function checkRecord(record: RecordFieldsOut, context: z.RefinementCtx, creating: boolean) {
  if (record.structure !== undefined && record.compoundId !== undefined) {
    context.addIssue({ code: 'custom', path: ['structure'], message: 'Give a structure or a compoundId, not both.' });
  }
  if (creating && record.structure === undefined && record.compoundId === undefined) {
    context.addIssue({
      code: 'custom',
      path: ['structure'],
      message: 'Give the compound: a structure (SMILES or molfile) or a compoundId.',
    });
  }
  if (record.stationaryPhase === 'other' && !record.stationaryPhaseOther) {
    context.addIssue({
      code: 'custom',
      path: ['stationaryPhaseOther'],
      message: 'Name the stationary phase when choosing "other".',
    });
  }
  if (record.spots && record.spots.filter((spot) => spot.role === 'target').length > 1) {
    context.addIssue({ code: 'custom', path: ['spots'], message: 'Only one spot can be the target.' });
  }
}

/**
 * Body of `POST /api/records`. Solvent, additive, stain and phase names or abbreviations are resolved to
 * catalogue keys; an unknown word is refused with the closest known name.
 */
export const recordInputSchema = recordFields
  .extend({ ...compoundReference, visualisation: recordFields.shape.visualisation.default([]) })
  .superRefine((record, context) => checkRecord(record, context, true));
export type RecordInput = z.input<typeof recordInputSchema>;
export type RecordInputParsed = z.output<typeof recordInputSchema>;

/** Body of `PATCH /api/records/:id`: any subset of the fields; `expectedRevision` refuses a stale edit with 409. */
export const recordUpdateSchema = recordFields
  .partial()
  .extend({ ...compoundReference, expectedRevision: z.number().int().positive().optional() })
  .superRefine((record, context) => {
    checkRecord(record, context, false);
    if (Object.keys(record).filter((key) => key !== 'expectedRevision').length === 0) {
      context.addIssue({ code: 'custom', path: [], message: 'Nothing to change.' });
    }
  });
export type RecordUpdate = z.input<typeof recordUpdateSchema>;
export type RecordUpdateParsed = z.output<typeof recordUpdateSchema>;

export const recordSortKeys = [
  'createdAt',
  'updatedAt',
  'compound',
  'technique',
  'phase',
  'strongPercent',
  'targetRf',
  'outcome',
  'yieldPercent',
  'author',
] as const;

const listOf = <T extends z.ZodType>(item: T) =>
  z.preprocess(
    (value) => (value === undefined || value === '' ? undefined : typeof value === 'string' ? value.split(',') : value),
    z.array(item).max(20).optional(),
  );

const catalogueKey = (
  resolve: (input: string) => { ok: true; value: { key: string } } | { ok: false; suggestion: string | null },
  kind: string,
) =>
  z
    .string()
    .trim()
    .min(1)
    .max(80)
    .transform((input, context) => {
      const found = resolve(input);
      if (found.ok) return found.value.key;
      context.addIssue({
        code: 'custom',
        message: `Unknown ${kind} "${input}".${found.suggestion ? ` Did you mean "${found.suggestion}"?` : ''}`,
      });
      return z.NEVER;
    });

/** Query of `GET /api/records`: page, sort, order and filters (lists are comma-separated or repeated). */
export const recordListQuerySchema = paginationQuerySchema.extend({
  sort: z.enum(recordSortKeys).default('createdAt'),
  order: z.enum(['asc', 'desc']).default('desc'),
  q: z.string().trim().max(200).optional(),
  compoundId: z.coerce.number().int().positive().optional(),
  class: z.string().trim().max(60).optional(),
  phase: listOf(catalogueKey(resolvePhase, 'stationary phase')),
  solvent: listOf(catalogueKey(resolveSolvent, 'solvent')),
  stain: listOf(
    catalogueKey(
      (input) => (input === 'other' ? { ok: true, value: { key: 'other' } } : resolveStain(input)),
      'visualisation',
    ),
  ),
  outcome: listOf(z.enum(outcomes)),
  technique: listOf(z.enum(techniques)),
  author: z.coerce.number().int().positive().optional(),
  status: z.enum(['active', 'merged', 'retired', 'all']).default('active'),
  demo: z
    .enum(['true', 'false'])
    .transform((value) => value === 'true')
    .optional(),
  from: z.iso.date().optional(),
  to: z.iso.date().optional(),
});
export type RecordListQuery = z.input<typeof recordListQuerySchema>;
export type RecordListQueryParsed = z.output<typeof recordListQuerySchema>;

/** Query of `GET /api/photos/:id`: the photo as taken or its thumbnail. */
export const photoSizeQuerySchema = z.object({ size: z.enum(['full', 'thumb']).default('full') });
