import type { Request, Response, NextFunction, RequestHandler } from 'express';
import type { z } from 'zod';
import { ValidationError } from '../errors';

export type Schemas = { body?: z.ZodType; query?: z.ZodType; params?: z.ZodType };
type Parsed<S extends Schemas> = { [K in keyof S]: S[K] extends z.ZodType ? z.output<S[K]> : never };

/** Parses body, query and params against zod schemas; the first problem names its field. */
function parseParts<S extends Schemas>(schemas: S, req: Request): Parsed<S> {
  const out: Record<string, unknown> = {};
  for (const part of ['params', 'query', 'body'] as const) {
    const schema = schemas[part];
    if (!schema) continue;
    const result = schema.safeParse(req[part] ?? {});
    if (!result.success) {
      const details = result.error.issues.map((i) => ({
        path: [part, ...i.path.map(String)].join('.'),
        message: i.message,
      }));
      throw new ValidationError(`${details[0].path}: ${details[0].message}`, details);
    }
    out[part] = result.data;
  }
  return out as Parsed<S>;
}

/**
 * A route handler whose input is validated once: `handle({ body: schema }, async ({ body }, req, res) => …)`.
 * Thrown errors (and rejected promises) reach the error middleware.
 */
export function handle<S extends Schemas>(
  schemas: S,
  fn: (input: Parsed<S>, req: Request, res: Response) => unknown,
): RequestHandler & { schemas: S } {
  const handler = async (req: Request, res: Response, next: NextFunction) => {
    try {
      await fn(parseParts(schemas, req), req, res);
    } catch (err) {
      next(err);
    }
  };
  // The schemas stay readable on the handler: the OpenAPI document (features/api-docs) is generated from them.
  return Object.assign(handler, { schemas });
}
