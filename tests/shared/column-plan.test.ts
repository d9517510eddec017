import { describe, expect, it } from 'vitest';
import { planColumn, stillTable } from '../../shared/domain/column-plan';

// Still, Kahn & Mitra, "Rapid chromatographic technique for preparative separations with moderate resolution",
// J. Org. Chem. 1978, 43, 2923 — the sizing table
const published = [
  { diameterMm: 10, eluentMl: 100, loadAt02: 100, loadAt01: 40, fractionMl: 5 },
  { diameterMm: 20, eluentMl: 200, loadAt02: 400, loadAt01: 160, fractionMl: 10 },
  { diameterMm: 30, eluentMl: 400, loadAt02: 900, loadAt01: 360, fractionMl: 20 },
  { diameterMm: 40, eluentMl: 600, loadAt02: 1600, loadAt01: 600, fractionMl: 30 },
  { diameterMm: 50, eluentMl: 1000, loadAt02: 2500, loadAt01: 1000, fractionMl: 50 },
];

describe('column plan after Still, Kahn & Mitra (J. Org. Chem. 1978, 43, 2923)', () => {
  it('holds the published table row for row', () => {
    expect(
      stillTable.map((row) => [
        row.diameterMm,
        row.eluentMl,
        row.loadMgAtDeltaRf02,
        row.loadMgAtDeltaRf01,
        row.fractionMl,
      ]),
    ).toEqual(published.map((row) => [row.diameterMm, row.eluentMl, row.loadAt02, row.loadAt01, row.fractionMl]));
  });

  it.each(published)('reproduces the $diameterMm mm row for its load at ΔRf ≥ 0.2', (row) => {
    const plan = planColumn({ sampleMg: row.loadAt02, rfTarget: 0.3, rfImpurity: 0.55 });
    expect(plan).toMatchObject({
      diameterMm: row.diameterMm,
      eluentMl: row.eluentMl,
      fractionMl: row.fractionMl,
      loadColumn: 'deltaRf02',
      tableDiameterMm: row.diameterMm,
    });
    expect(plan.sources.diameterMm).toMatch(/Still, Kahn & Mitra.*row/);
  });

  it.each(published)('reproduces the $diameterMm mm row for its load at ΔRf ≥ 0.1', (row) => {
    const plan = planColumn({ sampleMg: row.loadAt01, rfTarget: 0.3, rfImpurity: 0.42 });
    expect(plan).toMatchObject({
      diameterMm: row.diameterMm,
      eluentMl: row.eluentMl,
      fractionMl: row.fractionMl,
      loadColumn: 'deltaRf01',
    });
  });

  it('interpolates linearly between rows: 650 mg at ΔRf 0.25 sits halfway between the 20 and 30 mm rows', () => {
    const plan = planColumn({ sampleMg: 650, rfTarget: 0.3, rfImpurity: 0.55 });
    expect(plan.diameterMm).toBeCloseTo(25, 9);
    expect(plan.eluentMl).toBeCloseTo(300, 9);
    expect(plan.fractionMl).toBeCloseTo(15, 9);
    expect(plan.tableDiameterMm).toBe(30);
    expect(plan.sources.eluentMl).toMatch(/interpolated/);
  });

  it('grows monotonically with the sample across the whole table', () => {
    let previous = 0;
    for (let sampleMg = 40; sampleMg <= 2500; sampleMg += 10) {
      const { diameterMm } = planColumn({ sampleMg, rfTarget: 0.3, rfImpurity: 0.6 });
      expect(diameterMm).toBeGreaterThanOrEqual(previous);
      previous = diameterMm;
    }
  });

  it('flags a sample smaller than the table and keeps the 10 mm column', () => {
    const plan = planColumn({ sampleMg: 20, rfTarget: 0.3, rfImpurity: 0.55 });
    expect(plan.diameterMm).toBe(10);
    expect(plan.flags.map((flag) => flag.code)).toContain('below-table');
  });

  it('flags a sample larger than the table and scales the last row by cross-section (common practice)', () => {
    const plan = planColumn({ sampleMg: 10_000, rfTarget: 0.3, rfImpurity: 0.55 });
    expect(plan.flags.map((flag) => flag.code)).toContain('above-table');
    expect(plan.diameterMm).toBeCloseTo(100, 9);
    expect(plan.eluentMl).toBeCloseTo(4000, 9);
    expect(plan.tableDiameterMm).toBeNull();
  });

  it('flags ΔRf below 0.1 and sizes it from the ΔRf ≥ 0.1 column', () => {
    const plan = planColumn({ sampleMg: 360, rfTarget: 0.3, rfImpurity: 0.35 });
    expect(plan.flags.map((flag) => flag.code)).toContain('delta-rf-below-0.1');
    expect(plan.diameterMm).toBe(30);
  });

  it('sizes conservatively and says so when no neighbouring spot is given', () => {
    const plan = planColumn({ sampleMg: 360, rfTarget: 0.3 });
    expect(plan).toMatchObject({ loadColumn: 'deltaRf01', diameterMm: 30, deltaRf: null, deltaCv: null });
    expect(plan.flags.map((flag) => flag.code)).toContain('no-impurity-rf');
  });

  it('flags a target outside Rf 0.2–0.35 (common practice) and suggests a step gradient for a slow target', () => {
    const slow = planColumn({ sampleMg: 500, rfTarget: 0.12, rfImpurity: 0.4 });
    expect(slow.flags.map((flag) => flag.code)).toContain('rf-target-outside-0.2-0.35');
    expect(slow.gradient.mode).toBe('step-gradient');
    const good = planColumn({ sampleMg: 500, rfTarget: 0.3, rfImpurity: 0.5 });
    expect(good.flags).toEqual([]);
    expect(good.gradient.mode).toBe('isocratic');
  });

  it('reports column volumes CV = 1/Rf and ΔCV (textbook definitions, common practice)', () => {
    const plan = planColumn({ sampleMg: 500, rfTarget: 0.25, rfImpurity: 0.5 });
    expect(plan.cvTarget).toBeCloseTo(4, 12);
    expect(plan.deltaCv).toBeCloseTo(2, 12);
    expect(plan.deltaRf).toBeCloseTo(0.25, 12);
  });

  it('weighs silica for a 15 cm bed (from memory), so it scales with the column’s cross-section', () => {
    const narrow = planColumn({ sampleMg: 100, rfTarget: 0.3, rfImpurity: 0.55 });
    const wide = planColumn({ sampleMg: 2500, rfTarget: 0.3, rfImpurity: 0.55 });
    expect(wide.silicaG / narrow.silicaG).toBeCloseTo(25, 9);
    expect(narrow.silicaG).toBeCloseTo(Math.PI * 0.5 ** 2 * 15 * 0.5, 9);
    expect(narrow.sources.silicaG).toMatch(/from memory/);
  });

  it('advises a dry load for close spots and a liquid load otherwise (common practice)', () => {
    expect(planColumn({ sampleMg: 300, rfTarget: 0.3, rfImpurity: 0.42 }).load.method).toBe('dry');
    expect(planColumn({ sampleMg: 300, rfTarget: 0.3, rfImpurity: 0.6 }).load.method).toBe('liquid');
  });

  it('refuses impossible input', () => {
    expect(() => planColumn({ sampleMg: 0, rfTarget: 0.3 })).toThrow(RangeError);
    expect(() => planColumn({ sampleMg: 100, rfTarget: 1.3 })).toThrow(RangeError);
  });
});
