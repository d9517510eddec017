import type { Application } from 'express';
import { z } from 'zod';
import {
  createDocument,
  type ZodOpenApiOperationObject,
  type ZodOpenApiPathsObject,
  type ZodOpenApiResponseObject,
  type ZodOpenApiResponsesObject,
} from 'zod-openapi';
import { roles, type AccessLevel } from '../../../shared/schemas/auth';
import {
  recordCompoundSchema,
  recordDtoSchema,
  recordListItemSchema,
  spotDtoSchema,
} from '../../../shared/schemas/record-dto';
import { eluentSchema } from '../../../shared/schemas/eluent';
import { importDtoSchema } from '../../../shared/schemas/import';
import { adminUserSchema, invitationSchema } from '../../../shared/schemas/accounts';
import { apiTokenSchema } from '../../../shared/schemas/tokens';
import { sessionUserSchema } from '../../../shared/schemas/auth';
import { apiErrorSchema, operations, type OperationText } from './operations';
import { mountedApiRoutes, type MountedRoute } from './mounted-routes';
import { appVersion } from '../../http/version';

/** An Express path as an OpenAPI path: `/records/:id` → `/records/{id}`. */
export function openApiPath(expressPath: string): string {
  return expressPath.replace(/:(\w+)/g, '{$1}');
}

const WRITES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

function whoMay(access: AccessLevel): string {
  if (access === 'public') return 'Anyone (no sign-in).';
  const above = roles.slice(roles.indexOf(access));
  return `Role ${access} or above (${above.join(', ')}).`;
}

const errorContent = { 'application/json': { schema: apiErrorSchema } };
const failure = (description: string) => ({ description, content: errorContent });

function responsesOf(route: MountedRoute, text: OperationText): ZodOpenApiResponsesObject {
  const out: Record<string, ZodOpenApiResponseObject> = {};
  for (const answer of text.answers) {
    const content = answer.json
      ? { 'application/json': { schema: answer.json } }
      : answer.media
        ? {
            [answer.media.type]: {
              schema: z.string().meta(answer.media.format ? { format: answer.media.format } : {}),
            },
          }
        : undefined;
    out[String(answer.status)] = content
      ? { description: answer.description, content }
      : { description: answer.description };
  }
  const hasInput = Object.keys(route.schemas).length > 0 || text.extra !== undefined;
  if (hasInput) out['400'] ??= failure('The input was refused; `details` lists each problem with its path.');
  if (route.access !== 'public') {
    out['401'] ??= failure('Not signed in, or the API token is unknown, expired or revoked.');
    out['403'] ??= failure(
      'Your role does not allow this, a read-only token tried to write, or the CSRF token is missing.',
    );
  } else if (WRITES.has(route.method)) {
    out['403'] ??= failure('The CSRF token is missing (cookie sessions only), or a read-only token tried to write.');
  }
  if (route.schemas.params) out['404'] ??= failure('Not found.');
  out['429'] ??= failure('Too many refused credentials from this address; wait and try again.');
  out.default = failure('Any other failure, in the one error shape.');
  return out as ZodOpenApiResponsesObject;
}

function securityOf(route: MountedRoute) {
  if (route.access === 'public') return undefined;
  return WRITES.has(route.method)
    ? [{ bearerToken: [] }, { sessionCookie: [], csrfHeader: [] }]
    : [{ bearerToken: [] }, { sessionCookie: [] }];
}

function operationOf(route: MountedRoute, text: OperationText): ZodOpenApiOperationObject {
  const { params, query, body } = route.schemas;
  const requestParams: NonNullable<ZodOpenApiOperationObject['requestParams']> = {};
  if (params) requestParams.path = params as z.ZodObject;
  if (query ?? text.extra?.query) requestParams.query = (query ?? text.extra?.query) as z.ZodObject;
  const requestBody = text.extra?.multipart
    ? { required: true, content: { 'multipart/form-data': { schema: text.extra.multipart } } }
    : body
      ? { required: true, content: { 'application/json': { schema: body } } }
      : undefined;
  const access = route.access ?? 'admin';
  return {
    operationId: `${route.method.toLowerCase()}${openApiPath(route.path)
      .replace(/^\/api/, '')
      .replace(/[{}]/g, '')
      .replace(/[^A-Za-z0-9]+(.)?/g, (_m, c: string | undefined) => (c ?? '').toUpperCase())}`,
    tags: [text.tag],
    summary: text.summary,
    description: [text.description, `**Who may call:** ${whoMay(access)}`].filter(Boolean).join('\n\n'),
    'x-rfolio-access': access,
    ...(Object.keys(requestParams).length ? { requestParams } : {}),
    ...(requestBody ? { requestBody } : {}),
    responses: responsesOf(route, text),
    ...(securityOf(route) ? { security: securityOf(route) } : {}),
  } as ZodOpenApiOperationObject;
}

/** Schemas used in many answers, shown once under a name (the rest are written inline where used). */
const namedSchemas = {
  Error: apiErrorSchema,
  RecordListItem: recordListItemSchema,
  Record: recordDtoSchema,
  Eluent: eluentSchema,
  Spot: spotDtoSchema,
  Compound: recordCompoundSchema,
  Import: importDtoSchema,
  Invitation: invitationSchema,
  AdminUser: adminUserSchema,
  ApiToken: apiTokenSchema,
  SessionUser: sessionUserSchema,
};

const DESCRIPTION = `The JSON API of Rfolio, generated from the same zod schemas the server validates with.

Scripts authenticate with a personal API token (create one on the profile page) sent as
\`Authorization: Bearer <token>\`: no cookie and no CSRF token are needed. A token acts with its owner's current
role, or only reads (GET, HEAD) when it is read-only. The browser app uses a cookie session instead, and sends
\`X-CSRF-Token\` on every write.

Every failure answers \`{ "error": { "code", "message", "details"? } }\`.`;

/** The OpenAPI 3.1 document of the routes `app` has mounted that are described in operations.ts. */
export function buildOpenApiDocument(app: Application) {
  const paths: ZodOpenApiPathsObject = {};
  for (const route of mountedApiRoutes(app)) {
    const key = `${route.method} ${openApiPath(route.path)}`;
    const text = operations[key];
    if (!text) continue; // undocumented: tests/server/openapi.test.ts fails on it
    const path = openApiPath(route.path);
    paths[path] = { ...paths[path], [route.method.toLowerCase()]: operationOf(route, text) };
  }
  return createDocument(
    {
      openapi: '3.1.0',
      info: { title: 'Rfolio JSON API', version: appVersion, description: DESCRIPTION },
      servers: [{ url: '/' }],
      paths,
      components: {
        schemas: namedSchemas,
        securitySchemes: {
          bearerToken: {
            type: 'http',
            scheme: 'bearer',
            description: 'A personal API token (`rfo_…`) from the profile page.',
          },
          sessionCookie: {
            type: 'apiKey',
            in: 'cookie',
            name: 'rfolio.sid',
            description: 'The browser session after POST /api/auth/login.',
          },
          csrfHeader: {
            type: 'apiKey',
            in: 'header',
            name: 'X-CSRF-Token',
            description: 'From GET /api/auth/csrf; needed on writes with a cookie session.',
          },
        },
      },
    },
    { allowEmptySchema: { custom: true } },
  );
}
