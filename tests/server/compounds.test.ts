import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import initRDKitModule from '@rdkit/rdkit';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { compoundDetailSchema, compoundPageSchema, structureParseResultSchema } from '../../shared/schemas/compound';
import { compoundEvents } from '../../server/core/compounds';

const { app, close } = createApp();
let member: Agent;
let viewer: Agent;
type RDKitModule = { get_mol: (smiles: string) => { get_descriptors: () => string; delete: () => void } };
let rdkit: RDKitModule;

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  rdkit = await (initRDKitModule as unknown as () => Promise<RDKitModule>)();
});
afterAll(close);

const parse = (agent: Agent, structure: string) =>
  agent.post('/api/structures/parse').set('X-CSRF-Token', agent.csrf).send({ structure });

describe('POST /api/structures/parse', () => {
  it.each([
    ['benzyl alcohol', 'OCc1ccccc1'],
    ['acetophenone', 'CC(=O)c1ccccc1'],
    ['indole', 'c1ccc2[nH]ccc2c1'],
    ['N-Boc-glycine', 'CC(C)(C)OC(=O)NCC(=O)O'],
    ['4-bromoanisole', 'COc1ccc(Br)cc1'],
  ])(
    'when a viewer parses %s, then MW, exact mass and TPSA agree with RDKit MinimalLib (independent implementation)',
    async (_name, smiles) => {
      const res = await parse(viewer, smiles);
      expect(res.status).toBe(200);
      const result = structureParseResultSchema.parse(res.body);
      const mol = rdkit.get_mol(smiles);
      const reference = JSON.parse(mol.get_descriptors()) as { amw: number; exactmw: number; tpsa: number };
      mol.delete();
      expect(result.mw).toBeCloseTo(reference.amw, 1);
      expect(result.exactMass).toBeCloseTo(reference.exactmw, 3);
      expect(Math.abs(result.tpsa - reference.tpsa)).toBeLessThan(0.5);
      expect(result.svg).toMatch(/^<svg/);
    },
  );

  it('when benzyl alcohol is parsed, then its formula is C7H8O (handbook) and it carries the alcohol class', async () => {
    const result = (await parse(viewer, 'OCc1ccccc1')).body;
    expect(result.formula).toBe('C7H8O');
    expect(result.classes).toContain('alcohol');
  });

  it('when the SMILES is broken, then 400 with the chemistry engine’s code and message', async () => {
    const res = await parse(viewer, 'c1ccccc1C(');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toMatch(/^smiles_/);
    expect(res.body.error.message.length).toBeGreaterThan(10);
  });

  it('when the text is larger than the engine’s limit, then 413', async () => {
    expect((await parse(viewer, 'C'.repeat(25_000))).status).toBe(413);
  });

  it('when a valence is impossible, then 422', async () => {
    expect((await parse(viewer, 'C(C)(C)(C)(C)C')).status).toBe(422);
  });

  it('when the compound exists, then existingCompoundId points to it', async () => {
    const record = await postRecord(member, { structure: 'CC(=O)c1ccccc1' });
    expect((await parse(viewer, 'O=C(C)c1ccccc1')).body.existingCompoundId).toBe(record.body.compound.id);
  });

  it('when nobody is signed in, then 401', async () => {
    expect((await parse(await agentFor(app), 'C')).status).toBe(401);
  });
});

describe('GET /api/compounds and /api/compounds/:id', () => {
  it('when a record is created for a new compound, then an upsert event announces the compound for the search index', async () => {
    const seen: number[] = [];
    const listener = (id: number) => seen.push(id);
    compoundEvents.on('upsert', listener);
    const res = await postRecord(member, { structure: 'CCCCCCCCCCCCCCCCCCCCCCCCCCO', name: 'heptacosanol' });
    compoundEvents.off('upsert', listener);
    expect(seen).toContain(res.body.compound.id);
  });

  it('when a compound is opened, then its descriptors, classes and active records come with it', async () => {
    const record = await postRecord(member, { structure: 'O=C(OCC)c1ccccc1', name: 'ethyl benzoate' });
    const res = await viewer.get(`/api/compounds/${record.body.compound.id}`);
    expect(res.status).toBe(200);
    const compound = compoundDetailSchema.parse(res.body);
    expect(compound.descriptors.formula).toBe('C9H10O2');
    expect(compound.classes).toContain('ester');
    expect(compound.records.map((item) => item.id)).toContain(record.body.id);
  });

  it('when the list is searched by name, then the compound is found with its record count', async () => {
    await postRecord(member, { structure: 'CCCCCCCCCCCCCCCCCCCCCCCCCCCCO', name: 'nonacosanol-zq' });
    const page = compoundPageSchema.parse((await viewer.get('/api/compounds?q=nonacosanol-zq')).body);
    expect(page.items).toHaveLength(1);
    expect(page.items[0].recordCount).toBeGreaterThanOrEqual(1);
  });

  it('when the depiction is fetched, then SVG with an ETag and Cache-Control, and 304 on revalidation', async () => {
    const record = await postRecord(member, { structure: 'c1ccc2[nH]ccc2c1' });
    const res = await viewer.get(`/api/compounds/${record.body.compound.id}/svg`).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^image\/svg\+xml/);
    expect(String(res.body)).toMatch(/<svg/);
    expect(res.headers['cache-control']).toMatch(/max-age/);
    const again = await viewer
      .get(`/api/compounds/${record.body.compound.id}/svg`)
      .set('If-None-Match', res.headers.etag);
    expect(again.status).toBe(304);
  });

  it('when the compound does not exist, then 404', async () => {
    expect((await viewer.get('/api/compounds/999999999')).status).toBe(404);
  });
});
