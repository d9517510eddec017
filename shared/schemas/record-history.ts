import { z } from 'zod';

/** What a revision did to a record. Curation and import write the last four. */
const revisionActions = [
  'create',
  'update',
  'photo-add',
  'photo-remove',
  'retire',
  'restore',
  'merge',
  'unmerge',
  'import',
] as const;
export type RevisionAction = (typeof revisionActions)[number];

/** One field's change: its name in the record DTO (dotted for column details) and the values before and after. */
const fieldChangeSchema = z.object({ field: z.string(), from: z.unknown(), to: z.unknown() });
export type FieldChange = z.infer<typeof fieldChangeSchema>;

const revisionDtoSchema = z.object({
  number: z.number().int(),
  action: z.enum(revisionActions),
  at: z.string(),
  author: z.object({ id: z.number().int(), name: z.string() }).nullable(),
  changes: z.array(fieldChangeSchema),
});

/** `GET /api/records/:id/history`: newest first. */
export const recordHistorySchema = z.object({ recordId: z.number().int(), revisions: z.array(revisionDtoSchema) });
export type RecordHistory = z.infer<typeof recordHistorySchema>;
