import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { addBookmarkRow, addPhotoRow, dumpAffected, post, recordId, type Dump } from '../helpers/curation';
import { mergeableFields } from '../../shared/schemas/curation';

const { app, close } = createApp();
let authors: Agent[];
let readers: Agent[];
let curator: Agent;

// 2-Phenylethanol: a compound this file keeps to itself.
const structure = 'OCCc1ccccc1';

beforeAll(async () => {
  authors = await Promise.all([agentFor(app, 'member'), agentFor(app, 'member')]);
  readers = await Promise.all([agentFor(app, 'viewer'), agentFor(app, 'viewer'), agentFor(app, 'viewer')]);
  curator = await agentFor(app, 'curator');
});
afterAll(close);

const text = fc.stringMatching(/^[A-Za-z0-9]([A-Za-z0-9 ,.;:%()-]{0,29}[A-Za-z0-9.])?$/);
const recordArb = fc.record({
  author: fc.integer({ min: 0, max: 1 }),
  targetRf: fc.integer({ min: 5, max: 95 }).map((n) => n / 100),
  otherSpots: fc.array(
    fc.record({
      role: fc.constantFrom('starting_material', 'by_product', 'unknown'),
      rf: fc.integer({ min: 5, max: 100 }).map((n) => n / 100),
    }),
    { maxLength: 3 },
  ),
  visualisation: fc.subarray(['UV 254', 'KMnO4', 'CAM', 'iodine', 'vanillin']),
  outcome: fc.constantFrom('clean', 'partial', 'failed'),
  notes: fc.option(text, { nil: null }),
  diameterMm: fc.option(fc.constantFrom(10, 20, 40), { nil: null }),
  photos: fc.integer({ min: 0, max: 2 }),
  bookmarks: fc.uniqueArray(
    fc.record({ reader: fc.integer({ min: 0, max: 2 }), note: fc.option(text, { nil: null }) }),
    { maxLength: 3, selector: (item) => item.reader },
  ),
  edits: fc.array(fc.record({ by: fc.constantFrom('author', 'curator'), notebookRef: text }), { maxLength: 2 }),
});
const scenarioArb = fc.record({
  records: fc.array(recordArb, { minLength: 2, maxLength: 4 }),
  survivor: fc.nat(),
  choices: fc.array(fc.tuple(fc.constantFrom(...mergeableFields.filter((field) => field !== 'compound')), fc.nat()), {
    maxLength: 5,
  }),
});
type Scenario = typeof scenarioArb extends fc.Arbitrary<infer T> ? T : never;

async function build(scenario: Scenario): Promise<number[]> {
  const ids: number[] = [];
  for (const spec of scenario.records) {
    const author = authors[spec.author];
    const id = await recordId(author, {
      structure,
      outcome: spec.outcome,
      notes: spec.notes,
      visualisation: spec.visualisation,
      spots: [{ role: 'target', rf: spec.targetRf }, ...spec.otherSpots],
      column: spec.diameterMm ? { diameterMm: spec.diameterMm } : null,
    });
    for (let n = 0; n < spec.photos; n++) await addPhotoRow(id, author.user!.id, `plate ${n + 1}`);
    for (const bookmark of spec.bookmarks) await addBookmarkRow(readers[bookmark.reader].user!.id, id, bookmark.note);
    for (const edit of spec.edits) {
      const editor = edit.by === 'author' ? author : curator;
      const res = await editor
        .patch(`/api/records/${id}`)
        .set('X-CSRF-Token', editor.csrf)
        .send({ notebookRef: edit.notebookRef });
      expect(res.status).toBe(200);
    }
    ids.push(id);
  }
  return ids;
}

const omit = (rows: Record<string, unknown>[], keys: string[]) =>
  rows.map((row) => Object.fromEntries(Object.entries(row).filter(([key]) => !keys.includes(key))));
const rowsOf = (dump: Dump, table: string, recordId: number) => dump[table].filter((row) => row.record_id === recordId);
const users = (rows: Record<string, unknown>[]) => new Set(rows.map((row) => row.user_id));

/**
 * Nothing a merge unites may shrink: photos, revisions, bookmarking users, credited people and notes all end on
 * the survivor; every spot and visualisation is still there (on the survivor, or left on its merged record when
 * the survivor already has a target spot or that stain), and the survivor names each stain once with one target.
 */
function expectNothingDropped(before: Dump, during: Dump, survivorId: number, ids: number[]) {
  expect(rowsOf(during, 'record_photos', survivorId).length).toBe(before.record_photos.length);
  for (const table of ['record_spots', 'record_visualisations']) {
    expect(during[table].filter((row) => ids.includes(Number(row.record_id))).length).toBe(before[table].length);
  }
  const stains = rowsOf(during, 'record_visualisations', survivorId).map((row) => `${row.method}|${row.note ?? ''}`);
  expect(new Set(stains).size).toBe(stains.length);
  expect(new Set(before.record_visualisations.map((row) => `${row.method}|${row.note ?? ''}`)).size).toBe(
    stains.length,
  );
  const targets = rowsOf(during, 'record_spots', survivorId).filter((row) => row.role === 'target').length;
  expect(targets).toBe(before.record_spots.some((row) => row.role === 'target') ? 1 : 0);
  expect(during.record_revisions.length).toBe(before.record_revisions.length + ids.length);
  expect(users(rowsOf(during, 'bookmarks', survivorId))).toEqual(users(before.bookmarks));
  for (const bookmark of before.bookmarks.filter((row) => row.note)) {
    const kept = rowsOf(during, 'bookmarks', survivorId).find((row) => row.user_id === bookmark.user_id);
    expect(String(kept?.note)).toContain(String(bookmark.note));
  }
  expect([...users(rowsOf(during, 'record_contributors', survivorId))].sort()).toEqual(
    [...users(before.record_contributors)].sort(),
  );
  const survivor = during.condition_records.find((row) => row.id === survivorId)!;
  for (const record of before.condition_records.filter((row) => row.notes))
    expect(String(survivor.notes)).toContain(String(record.notes));
  for (const record of during.condition_records.filter((row) => row.id !== survivorId)) {
    expect(record).toMatchObject({ status: 'merged', merged_into_id: survivorId });
  }
}

/** Every row as it was; the only differences are history moving on (revision +2, updated_at, two new revisions each). */
function expectRestored(before: Dump, after: Dump, ids: number[]) {
  expect(omit(after.condition_records, ['revision', 'updated_at'])).toEqual(
    omit(before.condition_records, ['revision', 'updated_at']),
  );
  after.condition_records.forEach((row, index) =>
    expect(row.revision).toBe((before.condition_records[index].revision as number) + 2),
  );
  for (const table of ['record_spots', 'record_visualisations', 'record_photos', 'record_contributors', 'bookmarks']) {
    expect(after[table]).toEqual(before[table]);
  }
  expect(after.record_revisions.slice(0, before.record_revisions.length)).toEqual(before.record_revisions);
  const added = after.record_revisions.slice(before.record_revisions.length);
  expect(added.map((row) => row.action).sort()).toEqual([...ids.map(() => 'merge'), ...ids.map(() => 'unmerge')]);
}

describe('merge then unmerge over random sets of records (fast-check)', () => {
  it(
    'when random records are merged and the merge undone, then nothing is dropped in between and ' +
      'every row comes back as it was',
    async () => {
      await fc.assert(
        fc.asyncProperty(scenarioArb, async (scenario) => {
          const ids = await build(scenario);
          const survivorId = ids[scenario.survivor % ids.length];
          const mergedIds = ids.filter((id) => id !== survivorId);
          const fields = Object.fromEntries(scenario.choices.map(([field, pick]) => [field, ids[pick % ids.length]]));
          const before = await dumpAffected(ids);

          const merged = await post(curator, '/api/curation/merge', { survivorId, mergedIds, fields });
          expect(merged.status, JSON.stringify(merged.body)).toBe(201);
          expectNothingDropped(before, await dumpAffected(ids), survivorId, ids);

          const undone = await post(curator, `/api/curation/unmerge/${merged.body.mergeId}`);
          expect(undone.status, JSON.stringify(undone.body)).toBe(200);
          expectRestored(before, await dumpAffected(ids), ids);
        }),
        { numRuns: 15 },
      );
    },
    240_000,
  );
});
