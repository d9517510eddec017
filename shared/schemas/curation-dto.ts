import { z } from 'zod';
import { outcomes, recordStatuses, spotRoles, techniques } from './record-parts';
import { mergeableFields } from './curation-fields';

/** A record as the curation screens show it: enough to judge whether two records say the same thing. */
const curationRecordSchema = z.object({
  id: z.number().int(),
  status: z.enum(recordStatuses),
  mergedIntoId: z.number().int().nullable(),
  compound: z.object({
    id: z.number().int(),
    name: z.string().nullable(),
    synonyms: z.array(z.string()),
    canonicalSmiles: z.string(),
  }),
  author: z.object({ id: z.number().int(), name: z.string() }),
  technique: z.enum(techniques),
  stationaryPhase: z.string(),
  stationaryPhaseLabel: z.string(),
  eluentNotation: z.string(),
  strongSolvent: z.string().nullable(),
  /** % v/v of the strong solvent (shared/domain/eluent-summary). */
  strongPercent: z.number().nullable(),
  targetRf: z.number().nullable(),
  outcome: z.enum(outcomes),
  notebookRef: z.string().nullable(),
  revision: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type CurationRecord = z.infer<typeof curationRecordSchema>;

/** How one pair of records in a same-conditions group compares (shared/domain/duplicate-conditions). */
const duplicatePairSchema = z.object({
  a: z.number().int(),
  b: z.number().int(),
  score: z.number(),
  rfDifference: z.number(),
  ratioBasis: z.enum(['strong-solvent', 'every-component']),
  /** Volume fractions (0–1) compared, with their relative difference. */
  fractions: z.array(z.object({ solvent: z.string(), a: z.number(), b: z.number(), relative: z.number() })),
  sameTechnique: z.boolean(),
  sameAdditives: z.boolean(),
  sameNotebookRef: z.boolean(),
});
export type DuplicatePair = z.infer<typeof duplicatePairSchema>;

const duplicateKinds = ['same-conditions', 'same-structure'] as const;

/** A structure entered as more than one compound: the entries, and whether each has its stereo defined. */
const structureEntrySchema = z.object({
  compoundId: z.number().int(),
  name: z.string().nullable(),
  synonyms: z.array(z.string()),
  canonicalSmiles: z.string(),
  /** Stereocentres and stereo double bonds, and how many of them were left undefined. */
  stereoElements: z.number().int(),
  undefinedStereoElements: z.number().int(),
  activeRecords: z.number().int(),
});

/** A suspected duplicate: the records, why (the criteria met and the measured differences) and how sure (0–1). */
const duplicateGroupSchema = z.object({
  kind: z.enum(duplicateKinds),
  signature: z.string(),
  recordIds: z.array(z.number().int()),
  score: z.number(),
  reasons: z.array(z.string()),
  pairs: z.array(duplicatePairSchema),
  structures: z.array(structureEntrySchema),
  records: z.array(curationRecordSchema),
});
export type DuplicateGroup = z.infer<typeof duplicateGroupSchema>;

/** `GET /api/curation/duplicates`: open groups, most certain first; `rules` names the tolerances used. */
export const duplicatesResponseSchema = z.object({
  groups: z.array(duplicateGroupSchema),
  dismissedCount: z.number().int(),
  rules: z.object({ rfTolerance: z.number(), ratioRelativeTolerance: z.number() }),
});
export type DuplicatesResponse = z.infer<typeof duplicatesResponseSchema>;

/** One choosable field on the merge screen: each record's value as shown, and whether they differ. */
const mergeFieldSchema = z.object({
  field: z.enum(mergeableFields),
  label: z.string(),
  values: z.array(z.object({ recordId: z.number().int(), display: z.string() })),
  differs: z.boolean(),
});

const countsSchema = z.object({
  spots: z.number().int(),
  photos: z.number().int(),
  visualisations: z.number().int(),
  bookmarks: z.number().int(),
  contributors: z.number().int(),
});
export type UnitedCounts = z.infer<typeof countsSchema>;

/** `GET /api/curation/merge-preview?ids=…`: side-by-side values, per-record and united counts, and blockers. */
export const mergePreviewSchema = z.object({
  records: z.array(
    curationRecordSchema.extend({
      notes: z.string().nullable(),
      counts: countsSchema,
      /** Each spot of the record's plate, in plate order, and each visualisation, so the merge screen shows values, not counts. */
      spots: z.array(z.object({ role: z.enum(spotRoles), rf: z.number(), label: z.string().nullable() })),
      stains: z.array(z.object({ method: z.string(), note: z.string().nullable(), label: z.string() })),
    }),
  ),
  fields: z.array(mergeFieldSchema),
  /** After the merge: spots, photos and visualisations summed; bookmarks counted once per user; contributors once per person. */
  united: countsSchema,
  problems: z.array(z.string()),
});
export type MergePreview = z.infer<typeof mergePreviewSchema>;

export const mergeResultSchema = z.object({
  mergeId: z.number().int(),
  survivor: curationRecordSchema,
  merged: z.array(curationRecordSchema),
});
export type MergeResult = z.infer<typeof mergeResultSchema>;

export const unmergeResultSchema = z.object({ mergeId: z.number().int(), restored: z.array(curationRecordSchema) });
export type UnmergeResult = z.infer<typeof unmergeResultSchema>;

/** One merge in the history list; `blockedReason` says why an Unmerge would be refused now. */
const mergeHistoryItemSchema = z.object({
  id: z.number().int(),
  survivorId: z.number().int(),
  mergedIds: z.array(z.number().int()),
  fields: z.record(z.string(), z.number().int()),
  actor: z.object({ id: z.number().int(), name: z.string() }),
  at: z.string(),
  undoneAt: z.string().nullable(),
  undoneBy: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  blockedReason: z.string().nullable(),
});
export const mergeHistorySchema = z.object({ items: z.array(mergeHistoryItemSchema) });
export type MergeHistoryItem = z.infer<typeof mergeHistoryItemSchema>;

export const statusChangeResultSchema = z.object({
  id: z.number().int(),
  status: z.enum(recordStatuses),
  retiredReason: z.string().nullable(),
  retiredAt: z.string().nullable(),
  revision: z.number().int(),
});
export type StatusChangeResult = z.infer<typeof statusChangeResultSchema>;
