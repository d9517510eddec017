import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { recordPageSchema } from '../../shared/schemas/record';

const { app, close } = createApp();
let author: Agent;
let viewer: Agent;
const ids: Record<string, number> = {};

/** Four records by one fresh author, so every query below filters on that author and sees only these. */
beforeAll(async () => {
  author = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  const bodies = {
    alcohol: {},
    ketone: {
      structure: 'CC(=O)c1ccccc1',
      name: 'acetophenone',
      spots: [{ role: 'target', rf: 0.45 }],
      visualisation: ['UV 254', '2,4-DNP'],
      eluent: {
        components: [
          { solvent: 'EtOAc', parts: 1 },
          { solvent: 'hexanes', parts: 9 },
        ],
      },
      notebookRef: 'ZX-LIST-7 p. 12',
    },
    amine: {
      structure: 'NCc1ccccc1',
      spots: [{ role: 'target', rf: 0.2 }],
      visualisation: ['ninhydrin'],
      outcome: 'failed',
      outcomeReason: 'Streaked from the origin.',
      eluent: {
        components: [
          { solvent: 'DCM', parts: 9 },
          { solvent: 'MeOH', parts: 1 },
        ],
        additives: [{ additive: 'Et3N', percent: 1 }],
      },
    },
    flash: {
      technique: 'flash',
      stationaryPhase: 'alumina',
      spots: [{ role: 'target', rf: 0.31 }],
      column: { diameterMm: 30, silicaG: 40, yieldPercent: 82 },
    },
  };
  for (const [key, body] of Object.entries(bodies)) {
    const res = await postRecord(author, body);
    expect(res.status).toBe(201);
    ids[key] = res.body.id;
  }
});
afterAll(close);

async function list(query: string) {
  const res = await viewer.get(`/api/records?author=${author.user?.id}&${query}`);
  expect(res.status).toBe(200);
  return recordPageSchema.parse(res.body);
}

describe('GET /api/records', () => {
  it('when sorted by target Rf ascending, then the rows come in Rf order', async () => {
    const page = await list('sort=targetRf&order=asc');
    expect(page.items.map((item) => item.targetRf)).toEqual([0.2, 0.28, 0.31, 0.45]);
    expect(page.total).toBe(4);
  });

  it('when paginated, then each page holds pageSize rows and the total counts all matches', async () => {
    const first = await list('sort=targetRf&order=asc&page=1&pageSize=3');
    const second = await list('sort=targetRf&order=asc&page=2&pageSize=3');
    expect(first.items).toHaveLength(3);
    expect(second.items.map((item) => item.targetRf)).toEqual([0.45]);
    expect(second.total).toBe(4);
  });

  it('when filtered by solvent abbreviation, then only records whose eluent uses it', async () => {
    expect((await list('solvent=MeOH')).items.map((item) => item.id)).toEqual([ids.amine]);
    expect((await list('solvent=EtOAc,hexanes')).total).toBe(3);
  });

  it('when filtered by stain, phase, technique or outcome, then only matching records', async () => {
    expect((await list('stain=ninhydrin')).items.map((item) => item.id)).toEqual([ids.amine]);
    expect((await list('phase=Al2O3')).items.map((item) => item.id)).toEqual([ids.flash]);
    expect((await list('technique=flash')).items.map((item) => item.id)).toEqual([ids.flash]);
    expect((await list('outcome=failed')).items.map((item) => item.id)).toEqual([ids.amine]);
    expect((await list('outcome=clean,partial')).total).toBe(3);
  });

  it('when searched by text, then names, notebook references and reasons match', async () => {
    expect((await list('q=acetophen')).items.map((item) => item.id)).toEqual([ids.ketone]);
    expect((await list('q=ZX-LIST-7')).items.map((item) => item.id)).toEqual([ids.ketone]);
    expect((await list('q=streaked')).items.map((item) => item.id)).toEqual([ids.amine]);
  });

  it('when the text holds LIKE wildcards, then they match literally', async () => {
    expect((await list('q=%25')).total).toBe(0);
  });

  it('when filtered by compound class, then only compounds of that class (OpenChemLib classes)', async () => {
    const page = await list('class=ketone');
    expect(page.items.map((item) => item.id)).toEqual([ids.ketone]);
  });

  it('when filtered by compoundId, then only that compound’s records', async () => {
    const ketone = (await viewer.get(`/api/records/${ids.ketone}`)).body;
    expect((await list(`compoundId=${ketone.compound.id}`)).items.map((item) => item.id)).toEqual([ids.ketone]);
  });

  it('when filtered by a date range that excludes today, then nothing', async () => {
    expect((await list('to=2000-01-01')).total).toBe(0);
    const today = new Date().toISOString().slice(0, 10);
    expect((await list(`from=${today}&to=${today}`)).total).toBe(4);
  });

  it('when a filter names an unknown solvent, then 400 with a suggestion', async () => {
    const res = await viewer.get('/api/records?solvent=methanoll');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/Unknown solvent "methanoll"\. Did you mean/);
  });

  it('when a sort key is unknown, then 400', async () => {
    expect((await viewer.get('/api/records?sort=password')).status).toBe(400);
  });

  it('when rows are listed, then each carries its spots, eluent notation with % strong solvent and visualisations', async () => {
    const [amine] = (await list('solvent=MeOH')).items;
    expect(amine.eluentSummary).toEqual({
      notation: 'DCM : MeOH 9 : 1 + 1% Et3N',
      strongSolvent: 'methanol',
      strongPercent: 10,
    });
    expect(amine.spots).toHaveLength(1);
    expect(amine.visualisations[0]).toMatchObject({ method: 'ninhydrin', label: 'ninhydrin' });
  });

  it('when nobody is signed in, then 401', async () => {
    const anonymous = await agentFor(app);
    expect((await anonymous.get('/api/records')).status).toBe(401);
  });
});
