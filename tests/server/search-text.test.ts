import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord, recordHits, searchFor, uniqueWord } from '../helpers/search';

const { app, close } = createApp();
let member: Agent;
let viewer: Agent;
const word = uniqueWord();
let ester: { id: number; compound: { id: number } };
let noted: { id: number };
let nitrile: { id: number };

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  ester = await createRecord(member, {
    structure: 'CCCCCCCCCCCCCCCC(=O)OCCc1ccccc1',
    name: `phenethyl zephyranoate ${word}`,
    notes: null,
  });
  noted = await createRecord(member, {
    structure: 'CCCCCCCCCCCCCCCCCCCCO',
    name: `icosanol ${word}`,
    notes: `Loaded dry on celite; the ${word} spot only showed after anisaldehyde and strong heating.`,
    notebookRef: `QX-${word} p. 42`,
  });
  nitrile = await createRecord(member, { structure: 'CCCCCCCCCCCCCCC#N', name: `compound ${word}-b`, notes: null });
});
afterAll(close);

const ids = async (params: Record<string, string | number>) =>
  recordHits(await searchFor(viewer, { pageSize: 200, ...params })).map((hit) => hit.recordId);

describe('GET /api/search (text)', () => {
  it('when the name is typed with two typos and words swapped, then the record is still found', async () => {
    expect(await ids({ q: `zephyranaote phenetyl ${word}` })).toContain(ester.id);
  });

  it('when part of a name is typed, then the record is found', async () => {
    expect(await ids({ q: `zephyran ${word}` })).toContain(ester.id);
  });

  it('when a word from the notes is typed with a typo, then the record is found by its notes', async () => {
    expect(await ids({ q: `anisaldehide ${word}` })).toContain(noted.id);
  });

  it('when the notebook reference is typed, then its record is found', async () => {
    expect(await ids({ q: `QX-${word} p. 42` })).toContain(noted.id);
  });

  it('when a class name is typed, then records of compounds in that class are found (nitrile, from the class catalogue)', async () => {
    const found = await ids({ q: `nitrile ${word}` });
    expect(found).toContain(nitrile.id);
    expect(found).not.toContain(ester.id);
  });

  it('when results are ranked, then each carries a relevance between 0 and 1, best first', async () => {
    const hits = recordHits(await searchFor(viewer, { q: `zephyranoate ${word}` }));
    const relevance = hits.map((hit) => hit.relevance as number);
    expect(hits[0].recordId).toBe(ester.id);
    expect(relevance.length).toBeGreaterThan(0);
    expect(relevance.every((value) => value > 0 && value <= 1)).toBe(true);
    expect(relevance).toEqual([...relevance].sort((a, b) => b - a));
  });

  it('when nothing is like the words, then the answer is empty, not everything', async () => {
    const result = await searchFor(viewer, { q: `xqzvwk${word}jjj` });
    expect(result.total).toBe(0);
    expect(result.items).toEqual([]);
  });

  it('when a record’s notes are edited, then the next search finds the new words (the index follows writes)', async () => {
    const fresh = uniqueWord();
    const res = await member
      .patch(`/api/records/${noted.id}`)
      .set('X-CSRF-Token', member.csrf)
      .send({ notes: `Re-run: ${fresh} ran clean.` });
    expect(res.status).toBe(200);
    expect(await ids({ q: fresh })).toEqual([noted.id]);
  });

  it('when the compounds view is asked, then one item per compound carries the compound id and record count', async () => {
    const result = await searchFor(viewer, { q: `zephyranoate ${word}`, view: 'compounds' });
    const item = result.items.find((hit) => hit.kind === 'compound' && hit.id === ester.compound.id);
    expect(item).toMatchObject({ kind: 'compound', recordCount: 1, outcomes: { clean: 1, partial: 0, failed: 0 } });
  });

  it('when pages are asked, then they split the results without overlap', async () => {
    const all = await ids({ q: word });
    const first = recordHits(await searchFor(viewer, { q: word, pageSize: 2, page: 1 })).map((hit) => hit.recordId);
    const second = recordHits(await searchFor(viewer, { q: word, pageSize: 2, page: 2 })).map((hit) => hit.recordId);
    expect([...first, ...second]).toEqual(all.slice(0, 4));
  });

  it('when a stain or a solvent of the conditions is typed, then the record is found (Dragendorff, KMnO4, DCM)', async () => {
    const other = uniqueWord();
    const stained = await createRecord(member, {
      structure: 'CCCCCCCCCCCCN(C)C',
      name: `dodecyldimethylamine ${other}`,
      notes: `batch ${other}`,
      eluent: {
        mode: 'isocratic',
        components: [
          { solvent: 'dichloromethane', parts: 95 },
          { solvent: 'methanol', parts: 5 },
        ],
        additives: [],
        steps: [],
      },
      visualisation: ['Dragendorff', 'KMnO4'],
    });
    expect(await ids({ q: `Dragendorff ${other}` })).toContain(stained.id);
    expect(await ids({ q: `KMnO4 ${other}` })).toContain(stained.id);
    expect(await ids({ q: `dichloromethane ${other}` })).toContain(stained.id);
    expect(await ids({ q: `ninhydrin ${other}` })).not.toContain(stained.id);
  });

  it('when nobody is signed in, then 401', async () => {
    expect((await (await agentFor(app)).get('/api/search').query({ q: 'benzyl' })).status).toBe(401);
  });
});
