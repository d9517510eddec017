import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { columnPlanResultSchema, translateEluentResultSchema } from '../../shared/schemas/tools';

const { app, close } = createApp();
let viewer: Agent;

beforeAll(async () => {
  viewer = await agentFor(app, 'viewer');
});
afterAll(close);

const post = (path: string, body: object) => viewer.post(path).set('X-CSRF-Token', viewer.csrf).send(body);

/** Still, Kahn & Mitra, J. Org. Chem. 1978, 43, 2923, sizing table: diameter, eluent, load ΔRf ≥ 0.2, load ΔRf ≥ 0.1, fraction. */
const stillRows = [
  [10, 100, 100, 40, 5],
  [20, 200, 400, 160, 10],
  [30, 400, 900, 360, 20],
  [40, 600, 1600, 600, 30],
  [50, 1000, 2500, 1000, 50],
] as const;

describe('POST /api/tools/column-plan', () => {
  it.each(stillRows)(
    'when the sample is the ΔRf ≥ 0.2 load of the %i mm row, then that row comes back (Still 1978)',
    async (diameterMm, eluentMl, load02, _load01, fractionMl) => {
      const res = await post('/api/tools/column-plan', { sampleMg: load02, rfTarget: 0.3, rfImpurity: 0.55 });
      expect(res.status).toBe(200);
      const plan = columnPlanResultSchema.parse(res.body);
      expect([plan.diameterMm, plan.eluentMl, plan.fractionMl]).toEqual([diameterMm, eluentMl, fractionMl]);
      expect(plan.loadColumn).toBe('deltaRf02');
      expect(plan.sources.diameterMm).toContain('Still, Kahn & Mitra');
    },
  );

  it.each(stillRows)(
    'when the sample is the ΔRf ≥ 0.1 load of the %i mm row and the spots are 0.12 apart, then that row comes back (Still 1978)',
    async (diameterMm, eluentMl, _load02, load01, fractionMl) => {
      const plan = columnPlanResultSchema.parse(
        (await post('/api/tools/column-plan', { sampleMg: load01, rfTarget: 0.3, rfImpurity: 0.42 })).body,
      );
      expect([plan.diameterMm, plan.eluentMl, plan.fractionMl]).toEqual([diameterMm, eluentMl, fractionMl]);
      expect(plan.loadColumn).toBe('deltaRf01');
    },
  );

  it(
    'when Rf values are given, then CV = 1/Rf and ΔCV = |1/Rf₁ − 1/Rf₂| (textbook definitions, common ' +
      'practice), and a pressurised-glass caution is attached',
    async () => {
      const plan = columnPlanResultSchema.parse(
        (await post('/api/tools/column-plan', { sampleMg: 250, rfTarget: 0.25, rfImpurity: 0.5 })).body,
      );
      expect(plan.cvTarget).toBeCloseTo(4, 12);
      expect(plan.deltaCv).toBeCloseTo(2, 12);
      expect(plan.sources.diameterMm).toMatch(/interpolated linearly between the 10 and 20 mm rows/);
      expect(plan.cautions.map((caution) => caution.key)).toEqual(
        expect.arrayContaining(['pressurised-glass', 'silica-dust']),
      );
    },
  );

  it('when more sample than the table holds is given, then the plan is flagged above the table', async () => {
    const plan = columnPlanResultSchema.parse(
      (await post('/api/tools/column-plan', { sampleMg: 5000, rfTarget: 0.3, rfImpurity: 0.6 })).body,
    );
    expect(plan.flags.map((flag) => flag.code)).toContain('above-table');
    expect(plan.tableDiameterMm).toBeNull();
  });

  it('when the target Rf is 0 or the mass is missing, then 400 naming the field', async () => {
    const res = await post('/api/tools/column-plan', { sampleMg: 100, rfTarget: 0 });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('body.rfTarget');
    expect((await post('/api/tools/column-plan', { rfTarget: 0.3 })).body.error.details[0].path).toBe('body.sampleMg');
  });
});

describe('POST /api/tools/translate-eluent', () => {
  it('when hexanes/EtOAc 4 : 1 goes to heptane/EtOAc and back, then 20 % EtOAc returns (round trip at equal Snyder ε°)', async () => {
    const there = translateEluentResultSchema.parse(
      (
        await post('/api/tools/translate-eluent', {
          from: 'hexanes/EtOAc 4:1',
          to: { weak: 'heptane', strong: 'EtOAc' },
        })
      ).body,
    );
    expect(there.target.epsilon).toBeCloseTo(there.source.epsilon, 9);
    const back = translateEluentResultSchema.parse(
      (
        await post('/api/tools/translate-eluent', {
          from: { components: there.target.components },
          to: { weak: 'hexanes', strong: 'EtOAc' },
        })
      ).body,
    );
    const ethylAcetate = back.target.components.find((part) => part.solvent === 'ethyl-acetate')!.parts;
    expect(ethylAcetate / back.target.components.reduce((sum, part) => sum + part.parts, 0)).toBeCloseTo(0.2, 6);
  });

  it(
    'when DCM/MeOH 19 : 1 + 1 % Et3N goes to EtOAc/EtOH 3 : 1 in heptane, then hazards of both sides, ' +
      'greener swaps and the additive come back',
    async () => {
      const res = await post('/api/tools/translate-eluent', {
        from: 'DCM/MeOH 19:1 + 1% Et3N',
        to: {
          weak: 'heptane',
          strong: [
            { solvent: 'EtOAc', parts: 3 },
            { solvent: 'EtOH', parts: 1 },
          ],
        },
      });
      expect(res.status).toBe(200);
      const result = translateEluentResultSchema.parse(res.body);
      expect(result.hazards.source.map((item) => item.solvent)).toEqual(['dichloromethane', 'methanol']);
      expect(result.hazards.source[0].hazards).toContain('carcinogen-suspect');
      expect(result.hazards.target.map((item) => item.solvent)).toEqual(
        expect.arrayContaining(['heptane', 'ethyl-acetate', 'ethanol']),
      );
      expect(result.greener.map((item) => item.solvent)).toContain('dichloromethane');
      expect(result.additives).toEqual([{ additive: 'triethylamine', percent: 1 }]);
    },
  );

  it('when a solvent has no ε° (water), then 422; when a name is misspelt, then 400 with a suggestion', async () => {
    const missing = await post('/api/tools/translate-eluent', {
      from: 'MeCN/water 1:1',
      to: { weak: 'hexanes', strong: 'EtOAc' },
    });
    expect(missing.status).toBe(422);
    const misspelt = await post('/api/tools/translate-eluent', {
      from: 'hexanes/EtOAc 4:1',
      to: { weak: 'heptan', strong: 'EtOAc' },
    });
    expect(misspelt.status).toBe(400);
    expect(misspelt.body.error.message).toMatch(/Did you mean/);
  });
});
