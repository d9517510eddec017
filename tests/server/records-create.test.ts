import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { exampleRecordBody, postRecord } from '../helpers/records';
import { recordDtoSchema } from '../../shared/schemas/record';

const { app, close } = createApp();
let member: Agent;
let viewer: Agent;

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
});
afterAll(close);

describe('POST /api/records', () => {
  it('when a member posts the example body of the brief, then 201 with the record, its id and status "active"', async () => {
    const res = await postRecord(member);
    expect(res.status).toBe(201);
    const record = recordDtoSchema.parse(res.body);
    expect(record.id).toBeGreaterThan(0);
    expect(record.status).toBe('active');
    expect(res.headers.location).toBe(`/api/records/${record.id}`);
    // Names and abbreviations are stored as catalogue keys.
    expect(record.eluent.components).toEqual([
      { solvent: 'ethyl-acetate', parts: 1 },
      { solvent: 'hexanes', parts: 4 },
    ]);
    expect(record.stationaryPhase).toBe('silica-gel');
    expect(record.visualisations.map((item) => item.method)).toEqual(['uv-254', 'kmno4']);
    // 1 part EtOAc in 5 parts = 20 % v/v; EtOAc is the stronger solvent on silica (Snyder ε° 0.48, Sadek p. 74, vs ~0.01 from memory).
    expect(record.eluentSummary.strongSolvent).toBe('ethyl-acetate');
    expect(record.eluentSummary.strongPercent).toBeCloseTo(20, 10);
    expect(record.targetRf).toBe(0.28);
    expect(record.author.id).toBe(member.user?.id);
    expect(record.contributors).toEqual([{ id: member.user?.id, name: member.user?.name, role: 'author' }]);
    expect(record.canEdit).toBe(true);
  });

  it('when the same compound is written another way, then both records share one compound (canonical identity)', async () => {
    const first = await postRecord(member, { structure: 'OCc1ccccc1' });
    const second = await postRecord(member, { structure: 'c1ccc(cc1)CO' });
    expect(first.status).toBe(201);
    expect(second.status).toBe(201);
    expect(second.body.compound.id).toBe(first.body.compound.id);
    // Benzyl alcohol, C7H8O (handbook formula; MW 108.14 g/mol from IUPAC CIAAW conventional atomic weights).
    expect(first.body.compound.formula).toBe('C7H8O');
    expect(first.body.compound.mw).toBeCloseTo(108.14, 1);
  });

  it('when a name is given, then the compound keeps it, and a later different name becomes a synonym', async () => {
    const structure = 'CCCCCCCCCCCCCCCCCCCCCCCO'; // tricosan-1-ol: unlikely to be named by another test file
    const first = await postRecord(member, { structure, name: 'tricosanol' });
    const second = await postRecord(member, { structure, name: 'tricosan-1-ol' });
    expect(first.status).toBe(201);
    expect(second.status).toBe(201);
    const compound = await member.get(`/api/compounds/${first.body.compound.id}`);
    expect(compound.body.name).toBe('tricosanol');
    expect(compound.body.synonyms).toContain('tricosan-1-ol');
  });

  it('when a compoundId is given instead of a structure, then the record joins that compound', async () => {
    const first = await postRecord(member);
    const res = await member
      .post('/api/records')
      .set('X-CSRF-Token', member.csrf)
      .send({ ...exampleRecordBody(), structure: undefined, compoundId: first.body.compound.id });
    expect(res.status).toBe(201);
    expect(res.body.compound.id).toBe(first.body.compound.id);
  });

  it('when the structure is a molfile with a blank title line, then it is read as drawn (not trimmed away)', async () => {
    // MDL CTfile format: line 1 is the title and may be empty (common practice in drawn molfiles).
    const molfile = [
      '',
      '  hand-written',
      '',
      '  3  2  0  0  0  0  0  0  0  0999 V2000',
      '    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      '    1.2990    0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      '    2.5981    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0',
      '  1  2  1  0  0  0  0',
      '  2  3  1  0  0  0  0',
      'M  END',
    ].join('\n');
    const res = await member
      .post('/api/records')
      .set('X-CSRF-Token', member.csrf)
      .send({ ...exampleRecordBody(), structure: molfile });
    expect(res.status).toBe(201);
    expect(res.body.compound.formula).toBe('C2H6O');
  });

  it('when the compoundId is unknown, then 422', async () => {
    const res = await member
      .post('/api/records')
      .set('X-CSRF-Token', member.csrf)
      .send({ ...exampleRecordBody(), structure: undefined, compoundId: 999_999_999 });
    expect(res.status).toBe(422);
  });

  it('when a solvent name is unknown, then 400 naming the word and suggesting the closest known name', async () => {
    const res = await postRecord(member, {
      eluent: {
        components: [
          { solvent: 'EtOAcc', parts: 1 },
          { solvent: 'hexanes', parts: 4 },
        ],
        additives: [],
      },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain('"EtOAcc"');
    expect(res.body.error.message).toMatch(/Did you mean "EtOAc"\?/);
    expect(res.body.error.details[0].path).toBe('body.eluent.components.0.solvent');
  });

  it('when a stain name is unknown, then 400 naming it with a suggestion', async () => {
    const res = await postRecord(member, { visualisation: ['UV 254', 'permanganat'] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain('"permanganat"');
    expect(res.body.error.message).toMatch(/Did you mean/);
  });

  it('when an additive is given by abbreviation, then it is stored by key with its % v/v', async () => {
    const res = await postRecord(member, {
      structure: 'NCc1ccccc1',
      eluent: {
        components: [
          { solvent: 'DCM', parts: 95 },
          { solvent: 'MeOH', parts: 5 },
        ],
        additives: [{ additive: 'Et3N', percent: 1 }],
      },
    });
    expect(res.status).toBe(201);
    expect(res.body.eluent.additives).toEqual([{ additive: 'triethylamine', percent: 1 }]);
    expect(res.body.eluentSummary.notation).toBe('DCM : MeOH 95 : 5 + 1% Et3N');
  });

  it('when the spot and front distances are given, then Rf = spot / front (the definition of Rf, common practice)', async () => {
    const res = await postRecord(member, { spots: [{ role: 'target', spotDistanceMm: 14, frontDistanceMm: 50 }] });
    expect(res.status).toBe(201);
    expect(res.body.spots[0]).toMatchObject({ rf: 0.28, spotDistanceMm: 14, frontDistanceMm: 50 });
  });

  it('when a spot lies beyond the solvent front, then 400 with a message saying so', async () => {
    const res = await postRecord(member, { spots: [{ role: 'target', spotDistanceMm: 55, frontDistanceMm: 50 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/beyond the solvent front/);
  });

  it.each([0, -0.1, 1.2])('when Rf is %s (outside (0, 1]), then 400', async (rf) => {
    const res = await postRecord(member, { spots: [{ role: 'target', rf }] });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('body.spots.0.rf');
  });

  it('when Rf is exactly 1 (the spot ran with the front), then it is accepted', async () => {
    const res = await postRecord(member, { spots: [{ role: 'target', rf: 1 }] });
    expect(res.status).toBe(201);
  });

  it('when the structure is not valid SMILES, then 400 with the chemistry engine’s message', async () => {
    const res = await postRecord(member, { structure: 'C1CC(' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toMatch(/^smiles_/);
  });

  it('when neither structure nor compoundId is given, then 400 on the structure field', async () => {
    const res = await postRecord(member, { structure: undefined });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('body.structure');
  });

  it('when a viewer posts, then 403', async () => {
    expect((await postRecord(viewer)).status).toBe(403);
  });

  it('when nobody is signed in, then 401', async () => {
    const anonymous = await agentFor(app);
    expect((await postRecord(anonymous)).status).toBe(401);
  });

  it('when the CSRF header is missing, then 403 and nothing is written', async () => {
    const res = await request.agent(app).post('/api/records').send(exampleRecordBody());
    expect(res.status).toBe(403);
  });
});
