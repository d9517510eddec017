import { z } from 'zod';
import { solventKeys } from '../catalogue/solvents';

/**
 * What a column of an imported file can hold. A column may also hold the amount of one solvent
 * (`solvent:<catalogue key>`: volume fraction, % or parts, as in the open TLC dataset) or be ignored.
 */
export const importFields = [
  'name',
  'structure',
  'phase',
  'eluent',
  'additive',
  'rf',
  'rfStartingMaterial',
  'rfOther',
  'stain',
  'technique',
  'outcome',
  'outcomeReason',
  'notes',
  'notebook',
  'yield',
  'columnDiameter',
  'cartridge',
  'silica',
  'sampleMass',
  'loadMethod',
  'fractionSize',
  'fractionsPooled',
  'date',
  'author',
  'recordId',
] as const;
export type ImportField = (typeof importFields)[number];

export const importFieldLabels: Record<ImportField, string> = {
  name: 'compound name',
  structure: 'structure (SMILES or molfile)',
  phase: 'stationary phase',
  eluent: 'eluent',
  additive: 'additive (% v/v)',
  rf: 'Rf of the target',
  rfStartingMaterial: 'Rf of the starting material',
  rfOther: 'Rf of a by-product',
  stain: 'visualisation',
  technique: 'technique',
  outcome: 'outcome',
  outcomeReason: 'outcome reason',
  notes: 'notes',
  notebook: 'notebook reference',
  yield: 'yield (%)',
  columnDiameter: 'column diameter (mm)',
  cartridge: 'cartridge size',
  silica: 'silica (g)',
  sampleMass: 'sample (mg)',
  loadMethod: 'load (dry / liquid)',
  fractionSize: 'fraction size (mL)',
  fractionsPooled: 'fractions pooled',
  date: "date (the record's date)",
  author: 'person (a member, else "recorded by")',
  recordId: "record id (from this app's export)",
};

/** Fields that several columns may feed (their texts are joined); every other field takes one column. */
export const repeatableImportFields: readonly ImportField[] = ['notes'];

export const IGNORE_COLUMN = 'ignore';

const solventKeySet = new Set<string>(solventKeys);
const fieldSet = new Set<string>(importFields);

/** True for a mapping target: a field, `solvent:<key>` or "ignore". */
function isImportTarget(target: string): boolean {
  if (target === IGNORE_COLUMN || fieldSet.has(target)) return true;
  return target.startsWith('solvent:') && solventKeySet.has(target.slice('solvent:'.length));
}

/** Header → target. Headers left out are detected automatically. */
export const importMappingSchema = z
  .record(z.string().max(200), z.string().refine(isImportTarget, { message: 'Not a field an import can fill.' }))
  .superRefine((mapping, context) => {
    const seen = new Map<string, string>();
    for (const [header, target] of Object.entries(mapping)) {
      if (target === IGNORE_COLUMN || repeatableImportFields.includes(target as ImportField)) continue;
      const other = seen.get(target);
      if (other !== undefined) {
        context.addIssue({
          code: 'custom',
          path: [header],
          message: `Columns "${other}" and "${header}" both map to ${target}.`,
        });
      }
      seen.set(target, header);
    }
  });

const importFormats = ['csv', 'sdf', 'open-tlc', 'xlsx'] as const;
const dateOrders = ['dmy', 'mdy'] as const;

/** Form fields of `POST /api/imports` beside the file and mapping: the sheet, header row and date order chosen. */
export const importChoiceSchema = z.object({
  sheet: z.string().max(200).optional(),
  headerRow: z.coerce.number().int().min(1).max(100_000).optional(),
  dateOrder: z.enum(dateOrders).optional(),
});
export type ImportChoice = z.infer<typeof importChoiceSchema>;
const importStatuses = ['running', 'completed', 'failed', 'undone'] as const;
const rowResults = ['accepted', 'rejected', 'duplicate'] as const;

/** Query of `POST /api/imports`: `dryRun=1` previews the first `previewRows` rows and writes nothing. */
export const importUploadQuerySchema = z.object({
  dryRun: z
    .enum(['0', '1', 'true', 'false'])
    .optional()
    .transform((value) => value === '1' || value === 'true'),
  previewRows: z.coerce.number().int().min(1).max(200).default(20),
  /** Milliseconds to wait for a short import to finish before answering 202 with its progress. */
  wait: z.coerce.number().int().min(0).max(10_000).default(3_000),
});

/** One row's outcome: accepted, rejected with a reason, or a duplicate of a stored record; `notes` say what was assumed or adjusted. */
const importRowResultSchema = z.object({
  row: z.number().int(),
  line: z.number().int(),
  result: z.enum(rowResults),
  reason: z.string().nullable(),
  notes: z.array(z.string()),
  /** What was only partly read (each names its column); the row still comes in. */
  warnings: z.array(z.string()).default([]),
  values: z.record(z.string(), z.string()),
  record: z
    .object({
      name: z.string().nullable(),
      smiles: z.string().nullable(),
      eluent: z.string(),
      rf: z.number().nullable(),
      phase: z.string(),
    })
    .nullable(),
});
export type ImportRowResult = z.infer<typeof importRowResultSchema>;

const countsShape = {
  total: z.number().int(),
  processed: z.number().int(),
  accepted: z.number().int(),
  rejected: z.number().int(),
  duplicates: z.number().int(),
  blankRows: z.number().int(),
};

/** A stored import: who, when, which file, how far it got and what it added. */
export const importDtoSchema = z.object({
  id: z.number().int(),
  fileName: z.string(),
  sha256: z.string(),
  byteSize: z.number().int(),
  format: z.enum(importFormats),
  status: z.enum(importStatuses),
  user: z.object({ id: z.number().int(), name: z.string() }),
  headers: z.array(z.string()),
  mapping: z.record(z.string(), z.string()),
  ...countsShape,
  newCompounds: z.number().int(),
  lastCommittedRow: z.number().int(),
  batchesCommitted: z.number().int(),
  error: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
  undoneAt: z.string().nullable(),
  retiredRecords: z.number().int().nullable(),
  /** Rows that came in with warnings (something only partly read). */
  warned: z.number().int().default(0),
  sheet: z.string().nullable().default(null),
  headerRow: z.number().int().nullable().default(null),
  dateOrder: z.enum(dateOrders).nullable().default(null),
  /** Set while the import runs: rows per second so far and seconds left at that pace. */
  rate: z.object({ rowsPerSecond: z.number(), secondsLeft: z.number().nullable() }).nullable().default(null),
  /** True when the import waits for its job to be picked up again (after a database restart or a crash). */
  waitingToResume: z.boolean().default(false),
});
export type ImportDto = z.infer<typeof importDtoSchema>;

export const importListSchema = z.object({ items: z.array(importDtoSchema) });

/** Answer of a dry run: the detected shape of the file, the mapping and the first rows' results. */
export const importPreviewSchema = z.object({
  dryRun: z.literal(true),
  fileName: z.string(),
  sha256: z.string(),
  format: z.enum(importFormats),
  delimiter: z.string().nullable(),
  headers: z.array(z.string()),
  mapping: z.record(z.string(), z.string()),
  total: z.number().int(),
  blankRows: z.number().int(),
  rows: z.array(importRowResultSchema),
  /** Counts over the first `checked` rows (every row of a file up to that size). */
  checked: z.number().int(),
  accepted: z.number().int(),
  rejected: z.number().int(),
  duplicates: z.number().int(),
  /** Accepted rows with warnings (they come in). */
  warned: z.number().int(),
  /** The workbook sheet read, every sheet, the header row's line or sheet row, and the filled rows above it. */
  sheet: z.string().nullable(),
  sheets: z.array(z.string()),
  headerRow: z.number().int(),
  titleRows: z.array(z.string()),
  /** The date column's day/month order: decided, chosen, or to be chosen (`needsChoice`). */
  dates: z.object({
    column: z.string().nullable(),
    order: z.enum(dateOrders).nullable(),
    needsChoice: z.boolean(),
    evidence: z.object({ dmy: z.number().int(), mdy: z.number().int(), ambiguous: z.number().int() }),
  }),
});
export type ImportPreview = z.infer<typeof importPreviewSchema>;

/** What undoing an import would do (GET /api/imports/:id/undo-plan), said before the curator confirms. */
export const undoPlanSchema = z.object({
  importId: z.number().int(),
  status: z.enum(importStatuses),
  retire: z.number().int(),
  edited: z.array(z.number().int()),
  keptSurvivors: z.array(z.object({ id: z.number().int(), absorbed: z.array(z.number().int()) })),
  mergedAway: z.array(z.object({ id: z.number().int(), into: z.number().int() })),
  alreadyRetired: z.number().int(),
  summary: z.string(),
});
export type UndoPlan = z.infer<typeof undoPlanSchema>;
