import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';

/** The parts of an OpenAPI 3.1 document the reference page reads; the rest passes through untouched. */
const schemaObject = z.record(z.string(), z.unknown());
const operationSchema = z.looseObject({
  operationId: z.string().optional(),
  summary: z.string().optional(),
  description: z.string().optional(),
  tags: z.array(z.string()).optional(),
  'x-rfolio-access': z.string().optional(),
  parameters: z
    .array(
      z.looseObject({
        name: z.string(),
        in: z.string(),
        required: z.boolean().optional(),
        schema: schemaObject.optional(),
        description: z.string().optional(),
      }),
    )
    .optional(),
  requestBody: z
    .looseObject({ content: z.record(z.string(), z.looseObject({ schema: schemaObject.optional() })) })
    .optional(),
  responses: z.record(
    z.string(),
    z.looseObject({
      description: z.string().optional(),
      content: z.record(z.string(), z.looseObject({ schema: schemaObject.optional() })).optional(),
    }),
  ),
});
export type Operation = z.infer<typeof operationSchema>;

const openApiDocumentSchema = z.looseObject({
  openapi: z.string(),
  info: z.looseObject({ title: z.string(), version: z.string(), description: z.string().optional() }),
  paths: z.record(z.string(), z.record(z.string(), operationSchema)),
  components: z.looseObject({ schemas: z.record(z.string(), schemaObject).optional() }).optional(),
});
export type OpenApiDocument = z.infer<typeof openApiDocumentSchema>;

const openApiQueryOptions = queryOptions({
  queryKey: ['api-docs', 'openapi'] as const,
  queryFn: () => api('/api/openapi.json', {}, openApiDocumentSchema),
  staleTime: Infinity,
});

export const useOpenApiDocument = () => useQuery(openApiQueryOptions);
