import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { requireSolvent } from '../../shared/catalogue/solvents';
import { classDetailSchema, classIndexSchema } from '../../shared/schemas/classes';
import { agentFor, type Agent } from '../helpers/agent';
import { createRecord } from '../helpers/search';

const { app, close } = createApp();
let member: Agent;
let viewer: Agent;
let before: ReturnType<typeof classIndexSchema.parse>;
const made: Record<string, number> = {};

const eluent = (strong: number, weak: number, additives: unknown[] = []) => ({
  components: [
    { solvent: 'EtOAc', parts: strong },
    { solvent: 'hexanes', parts: weak },
  ],
  additives,
});

beforeAll(async () => {
  member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  before = classIndexSchema.parse((await viewer.get('/api/classes')).body);
  made.lean = (
    await createRecord(member, {
      structure: 'N#CCCCCCCCCCCCCCCCCCCCC',
      eluent: eluent(1, 4),
      spots: [{ role: 'target', rf: 0.2 }],
    })
  ).id;
  made.rich = (
    await createRecord(member, {
      structure: 'N#CCCCCCCCCCCCCCCCCCCCC',
      eluent: eluent(1, 1),
      spots: [{ role: 'target', rf: 0.45 }],
    })
  ).id;
  made.basic = (
    await createRecord(member, {
      structure: 'N#CCCCCCCCCCCCCCCCCCCCCN',
      eluent: eluent(1, 1, [{ additive: 'Et3N', percent: 1 }]),
      visualisation: ['ninhydrin'],
      outcome: 'partial',
    })
  ).id;
  made.failed = (
    await createRecord(member, {
      structure: 'N#CCCCCCCCCCCCCCCCCCCCCN',
      eluent: eluent(1, 1),
      visualisation: ['ninhydrin'],
      outcome: 'failed',
    })
  ).id;
});
afterAll(close);

describe('GET /api/classes', () => {
  it('when records of a class are added, then its compound and record counts and outcomes grow by exactly those', async () => {
    const after = classIndexSchema.parse((await viewer.get('/api/classes')).body);
    const was = before.items.find((item) => item.key === 'nitrile')!;
    const now = after.items.find((item) => item.key === 'nitrile')!;
    expect(now.recordCount - was.recordCount).toBe(4);
    expect(now.compoundCount - was.compoundCount).toBe(2);
    expect(now.outcomes.clean - was.outcomes.clean).toBe(2);
    expect(now.outcomes.failed - was.outcomes.failed).toBe(1);
    expect(after.items.length).toBeGreaterThanOrEqual(30);
  });
});

describe('GET /api/classes/:key', () => {
  let detail: ReturnType<typeof classDetailSchema.parse>;
  beforeAll(async () => {
    const res = await viewer.get('/api/classes/nitrile');
    expect(res.status).toBe(200);
    detail = classDetailSchema.parse(res.body);
  });

  it('when a class is opened, then the solvent pair used lists its records and % strong solvent span (20–50 % EtOAc)', () => {
    const pair = detail.solventPairs.find(
      (item) => item.solvents.join() === ['ethyl-acetate', 'hexanes'].sort().join(),
    );
    expect(pair?.records).toBeGreaterThanOrEqual(4);
    expect(pair?.strongPercent?.[0]).toBeLessThanOrEqual(20);
    expect(pair?.strongPercent?.[1]).toBeGreaterThanOrEqual(50);
  });

  it(
    'when eluent strengths are shown, then each lies between the pure solvents’ ε° on silica and the ' +
      'richer mixture is stronger (Snyder’s mixing rule)',
    () => {
      const epsilon = (id: number) => detail.strength.points.find((point) => point.recordId === id)!.epsilon;
      const weak = requireSolvent('hexanes').strength.silica!.value;
      const strong = requireSolvent('ethyl-acetate').strength.silica!.value;
      for (const id of [made.lean, made.rich]) {
        expect(epsilon(id)).toBeGreaterThan(weak);
        expect(epsilon(id)).toBeLessThan(strong);
      }
      expect(epsilon(made.rich)).toBeGreaterThan(epsilon(made.lean));
      expect(detail.strength.source).toMatch(/Snyder/);
    },
  );

  it('when Rf is plotted against % strong solvent, then the richer eluent’s record is there with its Rf', () => {
    expect(detail.rf?.points).toEqual(
      expect.arrayContaining([expect.objectContaining({ recordId: made.rich, rf: 0.45, strongPercent: 50 })]),
    );
  });

  it('when stains and additives are counted, then failed records do not count as worked', () => {
    const ninhydrin = detail.stains.find((item) => item.key === 'ninhydrin');
    expect(ninhydrin).toMatchObject({ label: 'ninhydrin' });
    expect(ninhydrin!.records - ninhydrin!.worked).toBeGreaterThanOrEqual(1);
    expect(detail.additives.find((item) => item.key === 'triethylamine')?.worked).toBeGreaterThanOrEqual(1);
  });

  it('when the class has records, then the newest are listed with links by id', () => {
    expect(detail.records.map((record) => record.id)).toEqual(expect.arrayContaining([made.failed, made.basic]));
  });

  it('when the key is not a class, then 404', async () => {
    expect((await viewer.get('/api/classes/not-a-class')).status).toBe(404);
  });

  it('when nobody is signed in, then 401', async () => {
    expect((await (await agentFor(app)).get('/api/classes')).status).toBe(401);
  });
});
