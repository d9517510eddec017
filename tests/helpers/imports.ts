import { randomUUID } from 'node:crypto';
import { parse } from 'csv-parse/sync';
import { expect } from 'vitest';
import type { ImportDto } from '../../shared/schemas/import';
import type { Agent } from './agent';

/** Uploads a file to POST /api/imports (multipart field `file`); `query` e.g. "dryRun=1". */
export function upload(
  agent: Agent,
  content: string | Buffer,
  options: { name?: string; query?: string; mapping?: Record<string, string> } = {},
) {
  const request = agent
    .post(`/api/imports${options.query ? `?${options.query}` : ''}`)
    .set('X-CSRF-Token', agent.csrf)
    .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), options.name ?? 'history.csv');
  return options.mapping ? request.field('mapping', JSON.stringify(options.mapping)) : request;
}

/** Polls GET /api/imports/:id until the import leaves "running" (or the time is up) and returns it. */
export async function settled(agent: Agent, id: number, timeoutMs = 60_000): Promise<ImportDto> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await agent.get(`/api/imports/${id}`);
    if (res.status === 200 && res.body.status !== 'running') return res.body as ImportDto;
    if (Date.now() > deadline)
      throw new Error(`import ${id} still ${res.status === 200 ? res.body.status : res.status} after ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** Uploads, waits for the end and checks that no row went unaccounted for. */
export async function importFile(
  agent: Agent,
  content: string | Buffer,
  options: { name?: string; mapping?: Record<string, string> } = {},
): Promise<ImportDto> {
  const res = await upload(agent, content, options);
  if (![201, 202].includes(res.status)) throw new Error(`upload failed: ${res.status} ${JSON.stringify(res.body)}`);
  const done = await settled(agent, res.body.id);
  expect(done.accepted + done.rejected + done.duplicates).toBe(done.processed);
  return done;
}

/** A tag unique to one test run, to keep a file's rows (notes, notebook refs) apart from other files' rows. */
export const runTag = () => randomUUID().slice(0, 8);

/** Parses CSV text written by the server into rows of cells (byte-order mark dropped). */
export function csvRows(text: string, delimiter = ','): string[][] {
  return parse(text, { bom: true, delimiter, relax_column_count: true }) as string[][];
}
