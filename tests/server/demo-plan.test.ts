import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { demoCompounds } from '../../seeders/demo-compounds';
import { planDemoRecords, type PlannedRecord } from '../../seeders/demo-plan';
import { analyseStructure } from '../../server/core/compound-analysis';
import { recordInputSchema } from '../../shared/schemas/record';
import { strongPercentOf } from '../../shared/domain/eluent-summary';

let plan: PlannedRecord[];
let classes: string[][];
let idcodes: string[];

beforeAll(() => {
  const analyses = demoCompounds.map((compound) => analyseStructure(compound.smiles));
  classes = analyses.map((analysis) => analysis.classes);
  idcodes = analyses.map((analysis) => analysis.idcode);
  plan = planDemoRecords(
    demoCompounds.map((compound, index) => ({ ...compound, classes: classes[index] })),
    8,
  );
});

/** Spearman rank correlation (ties get their mean rank). */
function spearman(a: number[], b: number[]): number {
  const rank = (values: number[]) =>
    values.map(
      (value) =>
        values.filter((other) => other < value).length + (values.filter((other) => other === value).length - 1) / 2,
    );
  const [ra, rb] = [rank(a), rank(b)];
  const mean = (values: number[]) => values.reduce((sum, value) => sum + value, 0) / values.length;
  const [ma, mb] = [mean(ra), mean(rb)];
  const cov = ra.reduce((sum, value, index) => sum + (value - ma) * (rb[index] - mb), 0);
  return (
    cov /
    Math.sqrt(
      ra.reduce((sum, value) => sum + (value - ma) ** 2, 0) * rb.reduce((sum, value) => sum + (value - mb) ** 2, 0),
    )
  );
}

const targetOf = (item: PlannedRecord) => item.content.spots.find((spot) => spot.role === 'target')?.rf as number;

describe('the demo plan (invented records over real compounds)', () => {
  it('when planned, then at least 150 records over at least 100 distinct compounds covering at least 20 classes', () => {
    expect(plan.length).toBeGreaterThanOrEqual(150);
    expect(new Set(idcodes).size).toBe(demoCompounds.length);
    expect(new Set(plan.map((item) => item.compound)).size).toBeGreaterThanOrEqual(100);
    expect(new Set(classes.flat()).size).toBeGreaterThanOrEqual(20);
  });

  it('when every planned record is put through the API’s input schema, then each one is valid', () => {
    for (const item of plan) {
      const body = {
        ...item.content,
        structure: demoCompounds[item.compound].smiles,
        visualisation: item.content.visualisation,
      };
      const result = recordInputSchema.safeParse(body);
      expect(result.success, JSON.stringify(result.error?.issues)).toBe(true);
    }
  });

  it(
    'when a compound has several ratios of one pair on one phase, then more strong solvent never ' +
      'lowers the target Rf (Soczewiński 1969: RM falls as log x rises)',
    () => {
      const series = new Map<string, { percent: number; rf: number }[]>();
      for (const item of plan.filter(
        (entry) =>
          entry.content.technique === 'tlc' &&
          entry.content.outcome !== 'failed' &&
          entry.content.eluent.mode === 'isocratic',
      )) {
        const key = `${item.compound}|${item.content.stationaryPhase}|${item.content.eluent.components
          .map((part) => part.solvent)
          .sort()
          .join('/')}|${item.content.eluent.additives.length}`;
        const percent = strongPercentOf(item.content.eluent.components, item.content.stationaryPhase) as number;
        series.set(key, [...(series.get(key) ?? []), { percent, rf: targetOf(item) }]);
      }
      const curves = [...series.values()].filter((points) => new Set(points.map((point) => point.percent)).size >= 2);
      expect(curves.length).toBeGreaterThanOrEqual(20);
      for (const points of curves) {
        const sorted = [...points].sort((a, b) => a.percent - b.percent);
        for (let index = 1; index < sorted.length; index++) {
          if (sorted[index].percent - sorted[index - 1].percent < 1) continue; // near-duplicates differ by noise only
          expect(sorted[index].rf).toBeGreaterThanOrEqual(sorted[index - 1].rf - 0.03);
        }
      }
    },
  );

  it(
    'when the demo’s invented polarity (x30) is set against measured Rf in hexane/EtOAc 5:1 for ' +
      'compounds both share, then more polar means lower Rf (open dataset, Xu et al., Chem 2022, Apache-2.0)',
    () => {
      const rows = parse(readFileSync(new URL('../fixtures/open-tlc/tlc-rf.csv', import.meta.url), 'utf8'), {
        columns: true,
      }) as Record<string, string>[];
      const measured = new Map<string, number>();
      for (const row of rows) {
        if (Math.abs(Number(row.hexane) - 5 / 6) > 1e-3 || Math.abs(Number(row.ethyl_acetate) - 1 / 6) > 1e-3) continue;
        try {
          measured.set(analyseStructure(row.smiles).idcode, Number(row.rf));
        } catch {
          // a structure the engine refuses cannot be matched; skip it
        }
      }
      const shared = demoCompounds
        .map((compound, index) => ({ compound, rf: measured.get(idcodes[index]) }))
        .filter(
          (entry): entry is { compound: (typeof demoCompounds)[number]; rf: number } =>
            entry.rf !== undefined && entry.compound.system === 'EH',
        );
      expect(shared.length).toBeGreaterThanOrEqual(5);
      expect(
        spearman(
          shared.map((entry) => entry.compound.x30),
          shared.map((entry) => entry.rf),
        ),
      ).toBeLessThan(-0.5);
    },
  );

  it(
    'when the invented polarity (x30) is set against TPSA computed by OpenChemLib, then they rise ' +
      'together (Spearman ρ positive and significant at p < 0.001)',
    () => {
      const eh = demoCompounds
        .map((compound, index) => ({ compound, index }))
        .filter(({ compound }) => compound.system === 'EH');
      const tpsa = eh.map(({ compound }) => analyseStructure(compound.smiles).tpsa);
      // Critical ρ from the t approximation, t = ρ·√(n − 2)/√(1 − ρ²), with t ≈ 3.39 for p = 0.001 two-sided (large n;
      // statistics tables, from memory).
      const critical = 3.39 / Math.sqrt(eh.length - 2 + 3.39 ** 2);
      expect(
        spearman(
          eh.map(({ compound }) => compound.x30),
          tpsa,
        ),
      ).toBeGreaterThan(critical);
    },
  );

  it('when planned, then failures carry reasons, amines use Et3N or ammonia, acids use AcOH, and some flash columns have details', () => {
    const failed = plan.filter((item) => item.content.outcome === 'failed');
    expect(failed.length).toBeGreaterThanOrEqual(10);
    expect(failed.every((item) => (item.content.outcomeReason ?? '').length > 10)).toBe(true);
    const additives = plan.flatMap((item) => item.content.eluent.additives.map((entry) => entry.additive));
    expect(additives).toContain('triethylamine');
    expect(additives).toContain('acetic-acid');
    const flash = plan.filter((item) => item.content.technique === 'flash');
    expect(flash.length).toBeGreaterThanOrEqual(20);
    expect(flash.every((item) => item.content.column?.sampleMg && item.content.column.yieldPercent !== null)).toBe(
      true,
    );
    expect(flash.some((item) => item.content.eluent.mode === 'gradient')).toBe(true);
  });

  it(
    'when planned, then at least four near-duplicate pairs exist (same compound and phase, ratio ' +
      'within 5 %, target Rf within 0.05)',
    () => {
      const tlc = plan.filter((item) => item.content.technique === 'tlc' && item.content.outcome === 'clean');
      let pairs = 0;
      tlc.forEach((a, i) =>
        tlc.slice(i + 1).forEach((b) => {
          if (a.compound !== b.compound || a.content.stationaryPhase !== b.content.stationaryPhase) return;
          const pa = strongPercentOf(a.content.eluent.components) as number;
          const pb = strongPercentOf(b.content.eluent.components) as number;
          if (Math.abs(pa - pb) / Math.max(pa, pb) <= 0.05 && Math.abs(targetOf(a) - targetOf(b)) <= 0.05) pairs += 1;
        }),
      );
      expect(pairs).toBeGreaterThanOrEqual(4);
    },
  );

  it('when planned twice, then the plan is the same (fixed seed)', () => {
    const again = planDemoRecords(
      demoCompounds.map((compound, index) => ({ ...compound, classes: classes[index] })),
      8,
    );
    expect(JSON.stringify(again)).toBe(JSON.stringify(plan));
  });
});
