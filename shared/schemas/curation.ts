import { z } from 'zod';
import { mergeableFields } from './curation-fields';

const id = z.number().int().positive();
const ids = z
  .array(id)
  .min(1)
  .max(20)
  .refine((list) => new Set(list).size === list.length, { message: 'Each record may appear only once.' });

/** Body of `POST /api/curation/duplicates/dismiss`: the group's records and why they are not duplicates. */
export const dismissInputSchema = z.object({
  recordIds: ids.refine((list) => list.length >= 2, { message: 'A candidate group has at least two records.' }),
  reason: z.string().trim().min(3, 'Say why these are not duplicates (at least 3 characters).').max(500),
});
export type DismissInput = z.input<typeof dismissInputSchema>;

/** Body of `POST /api/curation/merge`; `fields` maps a field to the id of the record to take it from (default: the survivor). */
export const mergeInputSchema = z
  .object({ survivorId: id, mergedIds: ids, fields: z.partialRecord(z.enum(mergeableFields), id).default({}) })
  .superRefine((input, context) => {
    if (input.mergedIds.includes(input.survivorId)) {
      context.addIssue({
        code: 'custom',
        path: ['mergedIds'],
        message: 'The survivor cannot also be merged into itself.',
      });
    }
    const involved = new Set([input.survivorId, ...input.mergedIds]);
    for (const [field, source] of Object.entries(input.fields)) {
      if (!involved.has(source as number)) {
        context.addIssue({
          code: 'custom',
          path: ['fields', field],
          message: `Record ${source} is not one of the records being merged.`,
        });
      }
    }
  });
export type MergeInput = z.input<typeof mergeInputSchema>;

/** Body of `POST /api/records/:id/retire`. */
export const retireInputSchema = z.object({
  reason: z.string().trim().min(3, 'Say why the record is retired (at least 3 characters).').max(1000),
});

export const mergePreviewQuerySchema = z.object({
  ids: z.preprocess(
    (value) => (typeof value === 'string' ? value.split(',').filter(Boolean).map(Number) : value),
    z.array(id).min(2).max(21),
  ),
});

export * from './curation-fields';
export * from './curation-dto';

/** Query of `GET /api/curation/merges`: one record's merges, newest first. */
export const mergeHistoryQuerySchema = z.object({
  recordId: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

/** Path of `POST /api/curation/unmerge/:mergeId`. */
export const mergeIdParamSchema = z.object({ mergeId: z.coerce.number().int().positive() });
