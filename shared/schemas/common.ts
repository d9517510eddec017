import { z } from 'zod';

/** The one error shape every API failure answers with. */
export const apiErrorSchema = z.object({
  error: z.object({ code: z.string(), message: z.string(), details: z.unknown().optional() }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

export const idParamSchema = z.object({ id: z.coerce.number().int().positive() });

export const paginationQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
});

export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({ items: z.array(item), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() });
}

export const healthSchema = z.object({ status: z.enum(['ok', 'degraded']), db: z.enum(['up', 'down']), version: z.string() });
export type Health = z.infer<typeof healthSchema>;
