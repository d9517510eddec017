import { z } from 'zod';

/**
 * One problem behind an API failure: where it is (`body.spots.0.rf`, `query.structure`; empty when it concerns the
 * request as a whole), what is wrong, and any facts that locate or explain it (an atom number, a record id, a wait).
 */
const errorDetailSchema = z.object({ path: z.string(), message: z.string() }).catchall(z.unknown());
export type ErrorDetail = z.infer<typeof errorDetailSchema>;

/** The one error shape every API failure answers with; `details`, when present, is always a list of problems. */
export const apiErrorSchema = z.object({
  error: z.object({ code: z.string(), message: z.string(), details: z.array(errorDetailSchema).optional() }),
});

/** Puts any error details into the one shape: a list stays a list; an object of facts becomes one problem. */
export function errorDetailsOf(message: string, details: unknown): ErrorDetail[] | undefined {
  if (details === undefined || details === null) return undefined;
  const asDetail = (item: unknown): ErrorDetail => {
    if (item && typeof item === 'object' && !Array.isArray(item)) {
      const facts = item as Record<string, unknown>;
      return {
        ...facts,
        path: typeof facts.path === 'string' ? facts.path : '',
        message: typeof facts.message === 'string' ? facts.message : message,
      };
    }
    return { path: '', message, value: item };
  };
  return Array.isArray(details) ? details.map(asDetail) : [asDetail(details)];
}

export const idParamSchema = z.object({ id: z.coerce.number().int().positive() });

export const paginationQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(25),
});

export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int(),
    page: z.number().int(),
    pageSize: z.number().int(),
  });
}

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  db: z.enum(['up', 'down']),
  version: z.string(),
});
export type Health = z.infer<typeof healthSchema>;
