import fc from 'fast-check';
import type { Response, Test } from 'supertest';
import type { Agent } from '../agent';
import type { RouteEntry } from '../route-table';
import { exampleRecordBody } from '../records';
import type { FuzzContext } from './context';
import type { Answer } from './verdict';

/** One hostile request: the route it aims at (for the counts), a short description of the input, and how to send it. */
export interface FuzzCase {
  endpoint: string;
  input: string;
  send: (agent: Agent) => Test;
}

export const answerOf = (res: Response): Answer => ({
  status: res.status,
  body: res.body,
  type: res.headers['content-type'],
});

const show = (value: unknown) => {
  if (Buffer.isBuffer(value)) return `<${value.length} bytes>`;
  const text = typeof value === 'string' ? value : (JSON.stringify(value) ?? String(value));
  return text.length > 200 ? `${text.slice(0, 200)}… (${text.length} chars)` : text;
};

/** Percent-encodes text for a URL; a lone surrogate (which no URL can carry) becomes U+FFFD as a browser would send it. */
export const uri = (text: string) =>
  encodeURIComponent(text.replace(/[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g, '\ufffd'));

/** A write with the session's CSRF token. */
export const write = (agent: Agent, method: 'post' | 'patch' | 'delete', url: string) =>
  agent[method](url).set('X-CSRF-Token', agent.csrf);

export function jsonCase(endpoint: string, method: 'post' | 'patch', url: string, body: unknown): FuzzCase {
  // Sent as JSON text, so bare numbers, booleans and null go out as they are (superagent sends objects only).
  return {
    endpoint,
    input: `${url} ${show(body)}`,
    send: (agent) => write(agent, method, url).set('Content-Type', 'application/json').send(JSON.stringify(body)),
  };
}

export function getCase(endpoint: string, url: string): FuzzCase {
  return { endpoint, input: url, send: (agent) => agent.get(url) };
}

/** A multipart upload: file bytes, the name the client claims, the content type it declares, and the field it uses. */
export function uploadCase(
  endpoint: string,
  url: string,
  file: { bytes: Buffer; name: string; type?: string; field: string },
): FuzzCase {
  return {
    endpoint,
    input: `${url} field=${file.field} name=${show(file.name)} type=${file.type ?? '-'} ${show(file.bytes)}`,
    send: (agent) =>
      write(agent, 'post', url).attach(file.field, file.bytes, {
        filename: file.name,
        contentType: file.type ?? 'application/octet-stream',
      }),
  };
}

const hostileSegments = [
  '0',
  '-1',
  'abc',
  '1e309',
  '99999999999999999999',
  '1.5',
  '\u0000',
  '../../etc/passwd',
  'null',
  '🧪',
  ' 1',
  "1'; DROP TABLE users; --",
  '%',
  'x'.repeat(3000),
];

/** Values for a path parameter: the context's own row for that resource (so deep code runs), or hostile text. */
export function paramValues(ctx: FuzzContext, path: string): fc.Arbitrary<string> {
  const own: Record<string, number[]> = {
    '/api/records/': ctx.recordIds,
    '/api/photos/': [ctx.photoId],
    '/api/compounds/': [ctx.compoundId],
    '/api/bookmarks/': [ctx.bookmarkId],
    '/api/imports/': [ctx.importId],
    '/api/admin/users/': [ctx.victimUserId],
  };
  const ids = Object.entries(own).find(([prefix]) => path.startsWith(prefix))?.[1] ?? [];
  const hostile = fc.constantFrom(...hostileSegments).map(uri);
  return ids.length > 0
    ? fc.oneof(fc.constantFrom(...ids.map(String)), hostile)
    : fc.oneof(hostile, fc.constantFrom('aromatic', 'phenol', 'x'));
}

/** A concrete URL for a route, each parameter filled from `paramValues`. */
export function urlFor(ctx: FuzzContext, route: RouteEntry): fc.Arbitrary<string> {
  const names = [...route.path.matchAll(/:(\w+)/g)].map((match) => match[1]);
  if (names.length === 0) return fc.constant(route.path);
  return fc
    .tuple(...names.map(() => paramValues(ctx, route.path)))
    .map((values) => values.reduce((url, value, i) => url.replace(`:${names[i]}`, value), route.path));
}

/** A valid record body with some fields replaced, for POST /api/records. */
export const recordBody = (overrides: Record<string, unknown>) => exampleRecordBody({ notes: 'fuzz', ...overrides });
