import { expect } from 'vitest';
import { searchResponseSchema, type SearchRecordHit } from '../../shared/schemas/search';
import type { Agent } from './agent';
import { exampleRecordBody } from './records';

/** Posts a record with overrides and returns its body; fails the test on anything but 201. */
export async function createRecord(agent: Agent, overrides: Record<string, unknown>) {
  const res = await agent.post('/api/records').set('X-CSRF-Token', agent.csrf).send(exampleRecordBody(overrides));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; compound: { id: number; name: string | null; canonicalSmiles: string } };
}

/** GET /api/search with the query parameters, parsed with the shared response schema. */
export async function searchFor(agent: Agent, params: Record<string, string | number>) {
  const res = await agent.get('/api/search').query(params);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return searchResponseSchema.parse(res.body);
}

/** The record hits of a response (records view). */
export function recordHits(response: { items: { kind: string }[] }): SearchRecordHit[] {
  return response.items.filter((item): item is SearchRecordHit => item.kind === 'record');
}

/** A short random suffix so each test file's names and notes are its own. */
export const uniqueWord = () => `q${Math.random().toString(36).slice(2, 8)}`;
