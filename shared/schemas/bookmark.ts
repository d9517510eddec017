import { z } from 'zod';
import { recordCompoundSchema, recordListItemSchema } from './record-dto';

const id = z.number().int().positive();
const note = z
  .string()
  .trim()
  .max(1000)
  .nullish()
  .transform((value) => (value ? value : null));

function exactlyOneTarget(target: { recordId?: number; compoundId?: number }, context: z.RefinementCtx) {
  if ((target.recordId === undefined) === (target.compoundId === undefined)) {
    context.addIssue({
      code: 'custom',
      path: ['recordId'],
      message: 'Give either a recordId or a compoundId (exactly one).',
    });
  }
}

/** Body of `POST /api/bookmarks`: a record or a compound (exactly one), with an optional note. */
export const bookmarkInputSchema = z
  .object({ recordId: id.optional(), compoundId: id.optional(), note })
  .superRefine(exactlyOneTarget);
export type BookmarkInput = z.input<typeof bookmarkInputSchema>;

/** Query (or body) of `DELETE /api/bookmarks`: the bookmarked record or compound. */
export const bookmarkTargetSchema = z
  .object({
    recordId: z.coerce.number().int().positive().optional(),
    compoundId: z.coerce.number().int().positive().optional(),
  })
  .superRefine(exactlyOneTarget);

/** Body of `PATCH /api/bookmarks/:id`. */
export const bookmarkUpdateSchema = z.object({ note });

/** A bookmarked compound as the bookmarks page lists it. */
const bookmarkedCompoundSchema = recordCompoundSchema.extend({
  /** Active records of the compound. */
  recordCount: z.number().int(),
});

/** A bookmark with what it points to (the record as a list row, or the compound). */
export const bookmarkDtoSchema = z.object({
  id: z.number().int(),
  recordId: z.number().int().nullable(),
  compoundId: z.number().int().nullable(),
  note: z.string().nullable(),
  createdAt: z.string(),
  record: recordListItemSchema.nullable(),
  compound: bookmarkedCompoundSchema.nullable(),
});
export type BookmarkDto = z.infer<typeof bookmarkDtoSchema>;

export const bookmarkListSchema = z.object({ items: z.array(bookmarkDtoSchema) });
