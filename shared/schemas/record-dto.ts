import { z } from 'zod';
import { pageOf } from './common';
import { eluentSchema } from './eluent';
import { loadMethods, outcomes, recordStatuses, spotLanes, spotRoles, techniques } from './record-parts';

export const spotDtoSchema = z.object({
  id: z.number().int(),
  role: z.enum(spotRoles),
  rf: z.number(),
  lane: z.enum(spotLanes).nullable(),
  spotDistanceMm: z.number().nullable(),
  frontDistanceMm: z.number().nullable(),
  label: z.string().nullable(),
});
export type SpotDto = z.infer<typeof spotDtoSchema>;

const visualisationDtoSchema = z.object({ method: z.string(), label: z.string(), note: z.string().nullable() });

export const photoDtoSchema = z.object({
  id: z.number().int(),
  contentType: z.string(),
  byteSize: z.number().int(),
  width: z.number().int(),
  height: z.number().int(),
  url: z.string(),
  thumbUrl: z.string(),
  caption: z.string().nullable(),
  uploadedBy: z.object({ id: z.number().int(), name: z.string() }),
  createdAt: z.string(),
});
export type PhotoDto = z.infer<typeof photoDtoSchema>;

const columnDetailsDtoSchema = z.object({
  diameterMm: z.number().nullable(),
  cartridgeSize: z.string().nullable(),
  silicaG: z.number().nullable(),
  sampleMg: z.number().nullable(),
  loadMethod: z.enum(loadMethods).nullable(),
  fractionMl: z.number().nullable(),
  fractionsPooled: z.string().nullable(),
  yieldPercent: z.number().nullable(),
  purityNote: z.string().nullable(),
});

/** Eluent summary computed by the server: notation, the strong solvent and its % v/v (see shared/domain/eluent-summary). */
const eluentSummarySchema = z.object({
  notation: z.string(),
  strongSolvent: z.string().nullable(),
  strongPercent: z.number().nullable(),
});

const personSchema = z.object({ id: z.number().int(), name: z.string() });

export const recordCompoundSchema = z.object({
  id: z.number().int(),
  name: z.string().nullable(),
  canonicalSmiles: z.string(),
  formula: z.string(),
  mw: z.number(),
  classes: z.array(z.string()),
});

/** One row of the records table. */
export const recordListItemSchema = z.object({
  id: z.number().int(),
  status: z.enum(recordStatuses),
  compound: recordCompoundSchema,
  author: personSchema,
  technique: z.enum(techniques),
  stationaryPhase: z.string(),
  stationaryPhaseLabel: z.string(),
  eluent: eluentSchema,
  eluentSummary: eluentSummarySchema,
  spots: z.array(spotDtoSchema),
  targetRf: z.number().nullable(),
  visualisations: z.array(visualisationDtoSchema),
  outcome: z.enum(outcomes),
  yieldPercent: z.number().nullable(),
  notebookRef: z.string().nullable(),
  runOn: z.string().nullable().optional(),
  photoCount: z.number().int(),
  demo: z.boolean(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type RecordListItem = z.infer<typeof recordListItemSchema>;

export const recordPageSchema = pageOf(recordListItemSchema);

/** A record with every field, as `GET /api/records/:id` and `POST /api/records` answer. */
export const recordDtoSchema = recordListItemSchema.extend({
  stationaryPhaseOther: z.string().nullable(),
  outcomeReason: z.string().nullable(),
  column: columnDetailsDtoSchema.nullable(),
  notes: z.string().nullable(),
  photos: z.array(photoDtoSchema),
  contributors: z.array(
    z.object({ id: z.number().int(), name: z.string(), role: z.enum(['author', 'editor', 'merged-from']) }),
  ),
  mergedIntoId: z.number().int().nullable(),
  retiredReason: z.string().nullable(),
  retiredAt: z.string().nullable(),
  importId: z.number().int().nullable(),
  /** Who an imported sheet said recorded it, when no member matched. */
  recordedBy: z.string().nullable().default(null),
  /** Texts an import only partly recognised, as the sheet wrote them (field → text). */
  sourceTexts: z.record(z.string(), z.string()).nullable().default(null),
  revision: z.number().int(),
  /** Whether the signed-in user may edit this record (owner, curator or admin). */
  canEdit: z.boolean(),
});
export type RecordDto = z.infer<typeof recordDtoSchema>;
