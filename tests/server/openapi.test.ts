import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import express, { Router } from 'express';
import request from 'supertest';
import { Validator } from '@seriousme/openapi-schema-validator';
import { Ajv2020 } from 'ajv/dist/2020.js';
import addFormats from 'ajv-formats';
import { createApp } from '../../server/http/app';
import { allow } from '../../server/http/middleware/access';
import { handle } from '../../server/http/middleware/validate';
import { apiRouter } from '../../server/http/routes';
import { buildOpenApiDocument, openApiPath } from '../../server/features/api-docs/document';
import { operations } from '../../server/features/api-docs/operations';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord } from '../helpers/search';
import { routeTable } from '../helpers/route-table';

/**
 * The OpenAPI document (GET /api/openapi.json) against things outside it: the OpenAPI 3.1 JSON Schema (through
 * @seriousme/openapi-schema-validator), the routes Express really mounts (tests/helpers/route-table.ts walks the
 * router stack on its own) and real answers of the running app (validated with Ajv, JSON Schema 2020-12, the
 * dialect of OpenAPI 3.1).
 */
const { app, close } = createApp();
afterAll(close);

type Operation = {
  'x-rfolio-access': string;
  responses: Record<string, { content?: Record<string, { schema: object }> }>;
  parameters?: { in: string; name: string }[];
  requestBody?: object;
};
type Doc = { openapi: string; paths: Record<string, Record<string, Operation>>; components: Record<string, unknown> };
let doc: Doc;
let viewer: Agent;
let member: Agent;

beforeAll(async () => {
  const res = await request(app).get('/api/openapi.json');
  expect(res.status).toBe(200);
  doc = res.body as Doc;
  viewer = await agentFor(app, 'viewer');
  member = await agentFor(app, 'member');
});

const operationsOf = (d: Doc) =>
  Object.entries(d.paths).flatMap(([path, item]) =>
    Object.entries(item).map(([method, op]) => ({ key: `${method.toUpperCase()} ${path}`, op })),
  );
const mounted = () => routeTable(app).filter((r) => r.path.startsWith('/api/'));

describe('the OpenAPI document', () => {
  it('validates as OpenAPI 3.1 (@seriousme/openapi-schema-validator)', async () => {
    expect(doc.openapi).toBe('3.1.0');
    const result = await new Validator().validate(doc as never);
    expect(result.errors).toBeUndefined();
    expect(result.valid).toBe(true);
  });

  it('documents every route Express mounts under /api, and nothing it does not mount', () => {
    const routes = mounted()
      .map((r) => `${r.method} ${openApiPath(r.path)}`)
      .sort();
    const documented = operationsOf(doc)
      .map((o) => o.key)
      .sort();
    expect(routes.length).toBeGreaterThan(60);
    expect(routes.filter((key) => !documented.includes(key))).toEqual([]);
    expect(documented.filter((key) => !routes.includes(key))).toEqual([]);
    console.log(`OpenAPI: ${documented.length} operations documented on ${Object.keys(doc.paths).length} paths`);
  });

  it('describes no operation that Express does not mount (no stale text for a removed route)', () => {
    const routes = new Set(mounted().map((r) => `${r.method} ${openApiPath(r.path)}`));
    const described = Object.keys(operations);
    expect(described.length).toBeGreaterThan(60);
    expect(described.filter((key) => !routes.has(key))).toEqual([]);
  });

  it('states for each operation the role its allow() declares, with the error shape on its failures', () => {
    const access = new Map(mounted().map((r) => [`${r.method} ${openApiPath(r.path)}`, r.access]));
    const ops = operationsOf(doc);
    expect(ops.length).toBeGreaterThan(60);
    for (const { key, op } of ops) {
      expect(op['x-rfolio-access'], key).toBe(access.get(key));
      const failure = op.responses.default?.content?.['application/json']?.schema;
      expect(failure, key).toEqual({ $ref: '#/components/schemas/Error' });
      if (op['x-rfolio-access'] !== 'public')
        expect(Object.keys(op.responses), key).toEqual(expect.arrayContaining(['401', '403']));
      expect(
        Object.keys(op.responses).some((status) => /^2\d\d$/.test(status)),
        key,
      ).toBe(true);
    }
  });

  it('documents inputs from the zod schemas handle() validates with: path, query and body', () => {
    const get = doc.paths['/api/records/{id}'].get;
    expect(get.parameters).toEqual(expect.arrayContaining([expect.objectContaining({ in: 'path', name: 'id' })]));
    const list = doc.paths['/api/records'].get;
    expect(list.parameters?.map((p) => p.name)).toEqual(expect.arrayContaining(['page', 'pageSize']));
    expect(doc.paths['/api/records'].post.requestBody).toMatchObject({ content: { 'application/json': {} } });
    expect(JSON.stringify(doc.paths['/api/tokens'].post.requestBody)).toContain('"name"');
    expect(doc.paths['/api/imports'].post.requestBody).toMatchObject({ content: { 'multipart/form-data': {} } });
  });

  it('declares every {parameter} of every path as a path parameter of each of its operations', () => {
    const ops = Object.entries(doc.paths).flatMap(([path, item]) => Object.values(item).map((op) => ({ path, op })));
    const templated = ops.filter(({ path }) => path.includes('{'));
    expect(templated.length).toBeGreaterThan(20);
    for (const { path, op } of templated) {
      const names = [...path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]).sort();
      const declared = (op.parameters ?? [])
        .filter((p) => p.in === 'path')
        .map((p) => p.name)
        .sort();
      expect(declared, path).toEqual(names);
    }
  });

  it('leaves out a route that has no description, so the coverage check above would fail on it', () => {
    const fresh = express();
    const extra = Router();
    extra.get(
      '/undocumented',
      allow('viewer'),
      handle({}, (_input, _req, res) => void res.json({})),
    );
    const api = apiRouter();
    api.use('/extra', extra);
    fresh.use('/api', api);
    const built = buildOpenApiDocument(fresh) as unknown as Doc;
    expect(Object.keys(built.paths)).not.toContain('/api/extra/undocumented');
    expect(Object.keys(built.paths)).toContain('/api/records');
  });
});

describe('documented GETs answer as documented (real answers validated against the document with Ajv)', () => {
  const ajv = new Ajv2020({ strict: false, allErrors: true });
  addFormats.default(ajv);
  ajv.addFormat('binary', true);
  const validatorFor = (path: string, status = '200') => {
    const schema = doc.paths[path].get.responses[status].content!['application/json'].schema;
    return ajv.compile({ ...schema, components: doc.components });
  };
  const check = (path: string, body: unknown) => {
    const validate = validatorFor(path);
    const ok = validate(body);
    expect(ok, `${path}: ${JSON.stringify(validate.errors?.slice(0, 3))}`).toBe(true);
  };

  it(
    'when records exist, then GET /api/records, /api/records/{id}, /api/overview, /api/classes, ' +
      '/api/search and /api/tokens match their schemas',
    async () => {
      const { id } = await createRecord(member, { notes: 'openapi check' });
      await member.post('/api/tokens').set('X-CSRF-Token', member.csrf).send({ name: 'doc check', readOnly: true });
      const answers: [string, string][] = [
        ['/api/records', '/api/records'],
        ['/api/records/{id}', `/api/records/${id}`],
        ['/api/records/{id}/history', `/api/records/${id}/history`],
        ['/api/overview', '/api/overview'],
        ['/api/classes', '/api/classes'],
        ['/api/search', '/api/search?q=openapi'],
        ['/api/auth/me', '/api/auth/me'],
        ['/api/health', '/api/health'],
      ];
      for (const [path, url] of answers) {
        const res = await viewer.get(url);
        expect(res.status, url).toBe(200);
        check(path, res.body);
      }
      const tokens = await member.get('/api/tokens');
      expect(tokens.body.items.length).toBe(1);
      check('/api/tokens', tokens.body);
    },
  );

  it('when an answer drifts from the document (a required field missing, a wrong type), then the check fails', async () => {
    const res = await viewer.get('/api/overview');
    const validate = validatorFor('/api/overview');
    expect(validate(res.body)).toBe(true);
    const key = Object.keys(res.body)[0];
    const { [key]: _dropped, ...missing } = res.body as Record<string, unknown>;
    expect(validate(missing)).toBe(false);
    const me = validatorFor('/api/auth/me');
    expect(me({ user: { id: 'seven', email: 'a@b.c', name: 'A', role: 'viewer' } })).toBe(false);
  });

  it('when an error is answered, then it matches the documented error shape', async () => {
    const res = await viewer.get('/api/records/999999999');
    expect(res.status).toBe(404);
    const validate = ajv.compile({
      ...(doc.components.schemas as Record<string, object>).Error,
      components: doc.components,
    });
    expect(validate(res.body)).toBe(true);
    expect(validate({ error: { message: 'no code' } })).toBe(false);
  });
});
