import { z } from 'zod';
import { paginationQuerySchema } from './common';
import { recordCompoundSchema, recordListItemSchema } from './record-dto';
import { outcomes, techniques } from './record-parts';
import { recordListQuerySchema } from './record';

const searchModes = ['text', 'similar', 'substructure'] as const;
export type SearchMode = (typeof searchModes)[number];
const searchViews = ['records', 'compounds'] as const;
export type SearchView = (typeof searchViews)[number];
const searchSorts = ['relevance', 'newest', 'oldest', 'compound', 'rf'] as const;
export type SearchSort = (typeof searchSorts)[number];

/** Default Tanimoto cut-off of a similarity search (OpenChemLib fingerprints); common practice puts "similar" near 0.4–0.7. */
export const DEFAULT_SIMILARITY_THRESHOLD = 0.4;

const recordFilters = recordListQuerySchema.shape;

/**
 * The filters every search, export and class link shares (lists are comma-separated or repeated). Only
 * active records are ever searched: merged and retired records never appear.
 */
export const searchFiltersSchema = z.object({
  class: recordFilters.class,
  phase: recordFilters.phase,
  solvent: recordFilters.solvent,
  stain: recordFilters.stain,
  outcome: recordFilters.outcome,
  technique: recordFilters.technique,
  /** A user who wrote or edited the record (author or contributor). */
  contributor: z.coerce.number().int().positive().optional(),
  from: recordFilters.from,
  to: recordFilters.to,
});

const structureSearchFields = {
  mode: z.enum(searchModes).default('text'),
  /** Words to find in names, synonyms, class names, notes, notebook references (typos tolerated). */
  q: z
    .string()
    .trim()
    .max(200)
    .optional()
    .transform((value) => value || undefined),
  /** SMILES or molfile for `similar` and `substructure` (the chemistry engine checks it). */
  structure: z
    .string()
    .max(20_000)
    .optional()
    .transform((value) => (value?.trim() ? value : undefined)),
  /** Least Tanimoto similarity (0–1) of a similarity search. */
  threshold: z.coerce.number().min(0).max(1).default(DEFAULT_SIMILARITY_THRESHOLD),
  /** Most compounds a structure search considers (the best by similarity; the first found by substructure). */
  limit: z.coerce.number().int().min(1).max(5_000).default(500),
  sort: z.enum(searchSorts).default('relevance'),
};

function needsStructure(query: { mode: SearchMode; structure?: string }, context: z.RefinementCtx) {
  if (query.mode !== 'text' && !query.structure) {
    context.addIssue({
      code: 'custom',
      path: ['structure'],
      message: `Give a structure (SMILES or molfile) for a ${query.mode === 'similar' ? 'similarity' : 'substructure'} search.`,
    });
  }
}

/** Query of `GET /api/search`. */
export const searchQuerySchema = paginationQuerySchema
  .extend({ ...searchFiltersSchema.shape, ...structureSearchFields, view: z.enum(searchViews).default('records') })
  .superRefine(needsStructure);
export type SearchQueryParsed = z.output<typeof searchQuerySchema>;

/** Query of `GET /api/export.csv` and `GET /api/export.sdf`: the search without pages (every matching record). */
export const exportQuerySchema = z
  .object({ ...searchFiltersSchema.shape, ...structureSearchFields })
  .superRefine(needsStructure);
export type ExportQueryParsed = z.output<typeof exportQuerySchema>;

/** One set of conditions as a result shows it: the eluent, the target's Rf, how it was seen, how it went. */
const conditionSummarySchema = z.object({
  recordId: z.number().int(),
  technique: z.enum(techniques),
  stationaryPhaseLabel: z.string(),
  /** Eluent notation, e.g. "EtOAc : hexanes 1 : 4 + 1% Et3N". */
  eluent: z.string(),
  strongSolvent: z.string().nullable(),
  /** % v/v of the strong solvent. */
  strongPercent: z.number().nullable(),
  targetRf: z.number().nullable(),
  stains: z.array(z.string()),
  additives: z.array(z.string()),
  outcome: z.enum(outcomes),
});
export type ConditionSummary = z.infer<typeof conditionSummarySchema>;

/** A record found: `similarity` (Tanimoto 0–1) in structure searches, `relevance` (0–1) in text searches. */
const searchRecordHitSchema = z.object({
  kind: z.literal('record'),
  recordId: z.number().int(),
  compoundId: z.number().int(),
  similarity: z.number().nullable(),
  relevance: z.number().nullable(),
  record: recordListItemSchema,
});
export type SearchRecordHit = z.infer<typeof searchRecordHitSchema>;

/** A compound found, with how its matching records went and the best of their conditions (clean first). */
const searchCompoundHitSchema = z.object({
  kind: z.literal('compound'),
  id: z.number().int(),
  compound: recordCompoundSchema,
  similarity: z.number().nullable(),
  relevance: z.number().nullable(),
  recordCount: z.number().int(),
  outcomes: z.object({ clean: z.number().int(), partial: z.number().int(), failed: z.number().int() }),
  conditions: z.array(conditionSummarySchema),
});
export type SearchCompoundHit = z.infer<typeof searchCompoundHitSchema>;

export const searchResponseSchema = z.object({
  mode: z.enum(searchModes),
  view: z.enum(searchViews),
  items: z.array(z.discriminatedUnion('kind', [searchRecordHitSchema, searchCompoundHitSchema])),
  /** Records (view records) or compounds (view compounds) matching. */
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
  /** The structure search stopped at `limit` compounds: narrow the query or raise the limit. */
  truncated: z.boolean(),
  /** The structure as the server understood it (parent SMILES), for structure searches. */
  structureSmiles: z.string().nullable(),
  /** Server time spent, in milliseconds. */
  tookMs: z.number(),
});
export type SearchResponse = z.infer<typeof searchResponseSchema>;

/** `GET /api/search/contributors`: people who wrote active records (for the contributor filter). */
export const searchContributorsSchema = z.object({
  items: z.array(z.object({ id: z.number().int(), name: z.string(), records: z.number().int() })),
});
export type SearchContributors = z.infer<typeof searchContributorsSchema>;
