import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord, recordHits, searchFor, uniqueWord } from '../helpers/search';

const { app, close } = createApp();
let member: Agent;
let otherMember: Agent;
let curator: Agent;
let viewer: Agent;
const word = uniqueWord();
const made: Record<string, number> = {};

const today = new Date().toISOString().slice(0, 10);
const yesterday = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10);

beforeAll(async () => {
  member = await agentFor(app, 'member');
  otherMember = await agentFor(app, 'member');
  curator = await agentFor(app, 'curator');
  viewer = await agentFor(app, 'viewer');
  const notes = `filter set ${word}`;
  made.silicaClean = (await createRecord(member, { structure: 'OCc1ccc(Cl)cc1', notes })).id;
  made.aluminaPartial = (
    await createRecord(member, {
      structure: 'OCc1ccc(Cl)cc1',
      notes,
      stationaryPhase: 'alumina-neutral',
      outcome: 'partial',
      visualisation: ['KMnO4'],
    })
  ).id;
  made.dcmMethanolFailed = (
    await createRecord(otherMember, {
      structure: 'NCc1ccccc1',
      notes,
      outcome: 'failed',
      visualisation: ['ninhydrin'],
      eluent: {
        components: [
          { solvent: 'MeOH', parts: 1 },
          { solvent: 'DCM', parts: 19 },
        ],
        additives: [],
      },
    })
  ).id;
  made.flash = (await createRecord(otherMember, { structure: 'OCc1ccc(Cl)cc1', notes, technique: 'flash' })).id;
  made.toRetire = (await createRecord(member, { structure: 'OCc1ccc(Br)cc1', notes })).id;
  made.survivor = (await createRecord(member, { structure: 'OCc1ccc(F)cc1', notes })).id;
  made.toMerge = (await createRecord(member, { structure: 'OCc1ccc(F)cc1', notes, notebookRef: 'dup' })).id;
});
afterAll(close);

const ids = async (params: Record<string, string | number> = {}) =>
  recordHits(await searchFor(viewer, { q: `filter set ${word}`, pageSize: 200, ...params }))
    .map((hit) => hit.recordId)
    .sort();
const sorted = (...list: number[]) => [...list].sort();

describe('GET /api/search filters', () => {
  it('when filtered by stationary phase, then only records on that phase come back', async () => {
    expect(await ids({ phase: 'alumina-neutral' })).toEqual([made.aluminaPartial]);
  });

  it('when filtered by solvent, then only eluents containing it come back', async () => {
    expect(await ids({ solvent: 'MeOH' })).toEqual([made.dcmMethanolFailed]);
  });

  it('when filtered by stain, then only records visualised with it come back', async () => {
    expect(await ids({ stain: 'ninhydrin' })).toEqual([made.dcmMethanolFailed]);
  });

  it('when filtered by outcomes, then only those outcomes come back', async () => {
    expect(await ids({ outcome: 'partial,failed' })).toEqual(sorted(made.aluminaPartial, made.dcmMethanolFailed));
  });

  it('when filtered by technique, then only flash columns come back', async () => {
    expect(await ids({ technique: 'flash' })).toEqual([made.flash]);
  });

  it('when filtered by contributor, then only that person’s records come back', async () => {
    expect(await ids({ contributor: otherMember.user!.id })).toEqual(sorted(made.dcmMethanolFailed, made.flash));
  });

  it('when filtered by compound class, then only compounds of the class come back (primary amine)', async () => {
    expect(await ids({ class: 'primary-amine' })).toEqual([made.dcmMethanolFailed]);
  });

  it('when the date range ends yesterday, then today’s records are left out; from today, they are in', async () => {
    expect(await ids({ to: yesterday })).toEqual([]);
    expect((await ids({ from: today })).length).toBe(7);
  });

  it('when an unknown solvent is given, then 400 with a suggestion', async () => {
    const res = await viewer.get('/api/search').query({ q: word, solvent: 'EtOAcc' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Did you mean/);
  });

  it('when filters are combined with a substructure, then both apply', async () => {
    const hits = recordHits(
      await searchFor(viewer, {
        mode: 'substructure',
        structure: 'OCc1ccc(Cl)cc1',
        q: `filter set ${word}`,
        outcome: 'clean',
        pageSize: 200,
      }),
    );
    expect(hits.map((hit) => hit.recordId).sort()).toEqual(sorted(made.silicaClean, made.flash));
  });
});

describe('GET /api/search and curation', () => {
  it('when a record is retired, then no search returns it', async () => {
    const retire = await member
      .post(`/api/records/${made.toRetire}/retire`)
      .set('X-CSRF-Token', member.csrf)
      .send({ reason: 'wrong compound drawn' });
    expect(retire.status).toBe(200);
    expect(await ids()).not.toContain(made.toRetire);
    const bySubstructure = recordHits(
      await searchFor(viewer, { mode: 'substructure', structure: 'OCc1ccc(Br)cc1', pageSize: 200 }),
    );
    expect(bySubstructure.map((hit) => hit.recordId)).not.toContain(made.toRetire);
  });

  it('when a record is merged into another, then only the survivor is found', async () => {
    const merge = await curator
      .post('/api/curation/merge')
      .set('X-CSRF-Token', curator.csrf)
      .send({ survivorId: made.survivor, mergedIds: [made.toMerge] });
    expect(merge.status, JSON.stringify(merge.body)).toBe(201);
    const found = await ids();
    expect(found).toContain(made.survivor);
    expect(found).not.toContain(made.toMerge);
  });
});
