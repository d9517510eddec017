import { z } from 'zod';

/** What an operation answers on success: a JSON body (zod schema), another media type, or nothing (204). */
export type Answer = {
  status: number;
  description: string;
  json?: z.ZodType;
  media?: { type: string; format?: 'binary' };
};

/** The words and answers of one operation; its inputs and role are read from the mounted route itself. */
export type OperationText = {
  tag: string;
  summary: string;
  description?: string;
  answers: Answer[];
  /** Inputs a route reads outside `handle()` (a multipart upload, a query checked by hand). */
  extra?: { query?: z.ZodObject; multipart?: z.ZodObject };
};

export const ok = (json: z.ZodType, description = 'Done.'): Answer => ({ status: 200, description, json });
export const created = (json: z.ZodType, description = 'Created.'): Answer => ({ status: 201, description, json });
export const noContent = (description = 'Done; no body.'): Answer => ({ status: 204, description });

/** A file in a multipart body. */
export const fileField = (description: string) => z.string().meta({ format: 'binary', description });
