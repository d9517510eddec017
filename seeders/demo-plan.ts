import type { Eluent } from '../shared/schemas/eluent';
import type { Spot } from '../shared/schemas/record-parts';
import type { RecordContent } from '../server/core/record-columns';
import type { DemoCompound } from './demo-compounds';
import { demoColumn, demoVisualisations } from './demo-details';
import {
  closestStep,
  demoRf,
  demoSystems,
  fractionOf,
  randomSource,
  type DemoSystem,
  type Random,
} from './demo-rf-model';

/** One invented record to insert: which compound (index), which author (index), when, and what. */
export interface PlannedRecord {
  compound: number;
  author: number;
  createdAt: Date;
  content: Omit<RecordContent, 'compoundId'>;
}

type Step = readonly [number, number];
interface Context {
  compound: DemoCompound & { classes: string[] };
  system: DemoSystem;
  slope: number;
  random: Random;
}

const additiveFor = { base: 'triethylamine', acid: 'acetic-acid', ammonia: 'ammonia' } as const;

function eluentAt(
  system: DemoSystem,
  step: Step,
  random: Random,
  additive?: string,
  strongFirst = random.chance(0.5),
): Eluent {
  const weak = { solvent: system.weak, parts: step[0] };
  const strong = { solvent: system.strong, parts: step[1] };
  return {
    components: strongFirst ? [strong, weak] : [weak, strong],
    additives: additive ? [{ additive, percent: 1 }] : [],
    mode: 'isocratic',
    steps: [],
  };
}

/** Spots of a plate: the target, often the starting material, sometimes a by-product, at least 0.05 apart. */
function spotsAt(context: Context, x: number, shift = 1): Spot[] {
  const { compound, slope, random } = context;
  const target = Math.min(
    0.95,
    Math.round(demoRf(compound.x30, slope, x, random.between(-0.015, 0.015)) * shift * 100) / 100,
  );
  const spots: Spot[] = [
    {
      role: 'target',
      rf: Math.max(0.03, target),
      lane: 'mixture',
      spotDistanceMm: null,
      frontDistanceMm: null,
      label: null,
    },
  ];
  const others: [Spot['role'], number][] = [];
  if (random.chance(0.55))
    others.push(['starting_material', random.chance(0.6) ? random.between(0.3, 0.6) : random.between(1.8, 3)]);
  if (random.chance(0.25))
    others.push(['by_product', random.chance(0.5) ? random.between(0.25, 0.5) : random.between(2, 3.5)]);
  for (const [role, factor] of others) {
    const rf = demoRf(compound.x30 * factor, slope, x);
    if (spots.every((spot) => Math.abs(spot.rf - rf) >= 0.05)) {
      spots.push({
        role,
        rf,
        lane: role === 'starting_material' ? 'starting_material' : 'mixture',
        spotDistanceMm: null,
        frontDistanceMm: null,
        label: role === 'starting_material' ? 'SM' : null,
      });
    }
  }
  if (random.chance(0.15)) {
    const front = 45;
    spots[0] = {
      ...spots[0],
      spotDistanceMm: Math.max(1, Math.round(spots[0].rf * front * 2) / 2),
      frontDistanceMm: front,
    };
    spots[0].rf = (spots[0].spotDistanceMm as number) / front;
  }
  return spots;
}

function tlcRecord(
  context: Context,
  step: Step,
  extra: Partial<RecordContent> = {},
  additive?: string,
  shift = 1,
): Omit<RecordContent, 'compoundId'> {
  const { system, random, compound } = context;
  return {
    technique: 'tlc',
    stationaryPhase: system.phase === 'c18' ? 'c18' : 'silica-tlc-f254',
    stationaryPhaseOther: null,
    eluent: eluentAt(system, step, random, additive),
    spots: spotsAt(context, fractionOf(step), shift),
    visualisation: demoVisualisations(compound.classes, random),
    outcome: 'clean',
    outcomeReason: null,
    column: null,
    notebookRef: null,
    notes: null,
    ...extra,
  };
}

function flashRecord(context: Context, stepIndex: number, additive?: string): Omit<RecordContent, 'compoundId'> {
  const { system, random } = context;
  const columnIndex = Math.max(0, stepIndex - (random.chance(0.5) ? 1 : 0));
  const columnStep = system.ladder[columnIndex];
  const cartridge = random.chance(0.35);
  const base = tlcRecord(context, columnStep, {}, additive);
  const eluent: Eluent =
    cartridge && columnIndex >= 2
      ? {
          ...base.eluent,
          mode: 'gradient',
          steps: [system.ladder[columnIndex - 2], system.ladder[columnIndex - 1], columnStep].map((step, index) => ({
            components: [
              { solvent: system.weak, parts: step[0] },
              { solvent: system.strong, parts: step[1] },
            ],
            columnVolumes: [2, 5, 4][index],
          })),
        }
      : base.eluent;
  return {
    ...base,
    technique: 'flash',
    stationaryPhase: system.phase === 'c18' ? 'c18' : 'silica-gel',
    eluent,
    column: demoColumn(random, cartridge),
  };
}

/**
 * The invented group's records for each compound, in a fixed order from a fixed seed: a TLC at the ratio
 * giving Rf ≈ 0.3, failed first attempts where the compound needs an additive or a gentler phase, extra
 * ratios for about a third of the compounds, flash columns for about a third, a few preparative plates,
 * and four near-duplicates on purpose for the curation queue.
 */
export function planDemoRecords(
  compounds: readonly (DemoCompound & { classes: string[] })[],
  authorCount: number,
): PlannedRecord[] {
  const random = randomSource(20_261_202);
  const plan: PlannedRecord[] = [];
  const start = Date.UTC(2025, 4, 1);
  compounds.forEach((compound, index) => {
    const system = demoSystems[compound.system];
    const context: Context = { compound, system, slope: random.between(1.1, 1.9), random };
    const author = Math.floor(random.next() * authorCount);
    let day = index * 3 + Math.floor(random.between(0, 3));
    const add = (content: Omit<RecordContent, 'compoundId'>, by = author) => {
      plan.push({
        compound: index,
        author: by,
        createdAt: new Date(start + day * 86_400_000 + random.between(8, 18) * 3_600_000),
        content,
      });
      day += 1;
    };
    const main = closestStep(system, compound.x30);
    const additive = compound.needs && compound.needs !== 'gentle' ? additiveFor[compound.needs] : undefined;
    if (additive) {
      const reason =
        compound.needs === 'acid'
          ? 'Tailed from the origin over half the lane; repeat with 1% AcOH.'
          : 'Streaked from the baseline; no distinct spot. Repeat with a basic additive.';
      add(tlcRecord(context, system.ladder[main], { outcome: 'failed', outcomeReason: reason }, undefined, 0.55));
    }
    if (compound.needs === 'gentle') {
      add(
        tlcRecord(context, system.ladder[main], {
          outcome: 'failed',
          outcomeReason: 'New baseline spot grew on standing: decomposes on silica. Switched to neutral alumina.',
        }),
      );
      add({ ...tlcRecord(context, system.ladder[main]), stationaryPhase: 'alumina-neutral' });
    } else {
      add(tlcRecord(context, system.ladder[main], {}, additive));
    }
    if (random.chance(0.36)) {
      for (const offset of [-1, 1, 2]) {
        const step = system.ladder[main + offset];
        if (!step || (offset === 2 && random.chance(0.5))) continue;
        const tooFast = fractionOf(step) > fractionOf(system.ladder[main]) && random.chance(0.4);
        add(
          tlcRecord(
            context,
            step,
            tooFast ? { outcome: 'partial', outcomeReason: 'Runs too fast here: target and SM barely resolved.' } : {},
            additive,
          ),
        );
      }
    }
    if (random.chance(0.33) && compound.needs !== 'gentle') add(flashRecord(context, main, additive));
    if (compound.system === 'DM' && random.chance(0.2))
      add({
        ...tlcRecord(context, system.ladder[main], {}, additive),
        technique: 'prep_tlc',
        stationaryPhase: 'silica-tlc-f254',
      });
  });
  return [...plan, ...nearDuplicates(compounds, plan, random, authorCount)];
}

/** Second entries of four compounds' first clean TLC by another author: the same ratio written differently, or within 5 %. */
function nearDuplicates(
  compounds: readonly DemoCompound[],
  plan: PlannedRecord[],
  random: Random,
  authorCount: number,
): PlannedRecord[] {
  const names = ['acetophenone', 'benzyl alcohol', 'indole', 'ethyl benzoate'];
  return names.flatMap((name, index) => {
    const original = plan.find(
      (item) =>
        compounds[item.compound].name === name && item.content.outcome === 'clean' && item.content.technique === 'tlc',
    );
    if (!original) return [];
    const components = original.content.eluent.components.map((part) => ({
      ...part,
      parts: part.parts * (index < 2 ? 20 : 1) * (index >= 2 && part.solvent === demoSystems.EH.weak ? 1.04 : 1),
    }));
    const target = original.content.spots[0].rf + (index % 2 === 0 ? 0.02 : -0.01);
    return [
      {
        compound: original.compound,
        author: (original.author + 1 + index) % authorCount,
        createdAt: new Date(original.createdAt.getTime() + (20 + index) * 86_400_000),
        content: {
          ...original.content,
          eluent: { ...original.content.eluent, components },
          spots: [
            {
              role: 'target',
              rf: Math.round(target * 100) / 100,
              lane: 'mixture',
              spotDistanceMm: null,
              frontDistanceMm: null,
              label: null,
            },
          ],
          notes: random.pick([
            'Repeated before scale-up.',
            'Checked again on a fresh plate.',
            'Same conditions as a colleague’s run.',
          ]),
        },
      },
    ];
  });
}
