import { rfToRm, rmToRf } from '../../shared/domain/rf';
import { ladderSteps } from '../../server/features/scout/engine/ratio-ladder';
import type { KnowledgeSet, ScoutMeasurement } from '../../server/features/scout/engine/types';
import { clampedRm, eluentKey, hitWindow, measuredRfAt } from './scout-scoring';

/**
 * A yardstick for the evaluation, not part of Scout: how well could anyone do who *had measured* the held-out
 * compound once? For a reference eluent R, each other eluent E gets a straight line RM_E = a + b·RM_R fitted
 * over the other compounds (least squares), and the held-out compound's measured RM in R is carried through it.
 * Its MAE over the compound's other measurements and its hit rate (the ladder ratio of hexane/EtOAc whose
 * carried RM is nearest the target, judged on the measured curve exactly as Scout's) show how much of the error
 * is the data's own scatter and the eluents' different selectivities rather than a lack of structure knowledge.
 */

const hexaneEtOAc = (components: ScoutMeasurement['components']) =>
  components.every((part) => part.solvent === 'hexanes' || part.solvent === 'ethyl-acetate');
const etoacFraction = (components: ScoutMeasurement['components']) =>
  (components.find((part) => part.solvent === 'ethyl-acetate')?.parts ?? 0) /
  components.reduce((sum, part) => sum + part.parts, 0);

export interface TransferCeiling {
  reference: string;
  compounds: number;
  mae: number;
  hit: number;
  hitCompounds: number;
}

/** Leave-one-compound-out transfer from each reference eluent measured for at least `minShare` of the compounds. */
export function transferCeilings(knowledge: KnowledgeSet, targetRf = 0.3, minShare = 0.5): TransferCeiling[] {
  const rm = new Map<number, Map<string, number[]>>();
  const componentsOf = new Map<string, ScoutMeasurement['components']>();
  for (const measurement of knowledge.measurements) {
    if (measurement.rf === null) continue;
    const key = eluentKey(measurement.components);
    componentsOf.set(key, measurement.components);
    const byEluent = rm.get(measurement.compoundId) ?? new Map<string, number[]>();
    byEluent.set(key, [...(byEluent.get(key) ?? []), clampedRm(measurement.rf)]);
    rm.set(measurement.compoundId, byEluent);
  }
  const mean = (values: number[]) => values.reduce((sum, value) => sum + value, 0) / values.length;
  const meanRm = (compound: number, key: string) => {
    const values = rm.get(compound)?.get(key);
    return values ? mean(values) : null;
  };
  const compounds = [...rm.keys()];
  const eluents = [...componentsOf.keys()];
  const results: TransferCeiling[] = [];
  for (const reference of eluents) {
    const measuredIn = compounds.filter((compound) => meanRm(compound, reference) !== null);
    if (measuredIn.length < minShare * compounds.length) continue;
    const errors: number[] = [];
    const hits: boolean[] = [];
    for (const heldOut of measuredIn) {
      const known = meanRm(heldOut, reference)!;
      const carried = new Map<string, number>([[reference, known]]);
      for (const eluent of eluents) {
        if (eluent === reference) continue;
        const pairs = measuredIn
          .filter((other) => other !== heldOut && meanRm(other, eluent) !== null)
          .map((other) => [meanRm(other, reference)!, meanRm(other, eluent)!]);
        if (pairs.length < 3) continue;
        const mx = mean(pairs.map(([x]) => x));
        const my = mean(pairs.map(([, y]) => y));
        const sxx = pairs.reduce((sum, [x]) => sum + (x - mx) ** 2, 0);
        const slope = sxx > 0 ? pairs.reduce((sum, [x, y]) => sum + (x - mx) * (y - my), 0) / sxx : 0;
        carried.set(eluent, my + slope * (known - mx));
      }
      for (const measurement of knowledge.measurements) {
        if (measurement.compoundId !== heldOut || measurement.rf === null) continue;
        const key = eluentKey(measurement.components);
        if (key === reference || !carried.has(key)) continue;
        errors.push(Math.abs(rmToRf(carried.get(key)!) - measurement.rf));
      }
      // The carried hexane/EtOAc curve, read like Scout's measured-curve check: RM linear in log10 of the EtOAc fraction.
      const curve = [...carried]
        .filter(([key]) => hexaneEtOAc(componentsOf.get(key)!))
        .map(([key, value]) => ({ fraction: etoacFraction(componentsOf.get(key)!), rm: value }));
      const asMeasurements = curve.map((point): ScoutMeasurement => ({
        recordId: null,
        compoundId: heldOut,
        phase: 'silica',
        mode: 'isocratic',
        additives: [],
        outcome: 'clean',
        outcomeReason: null,
        visualisations: [],
        components: [
          { solvent: 'hexanes', parts: 1 - point.fraction },
          { solvent: 'ethyl-acetate', parts: point.fraction },
        ],
        rf: rmToRf(point.rm),
      }));
      const target = rfToRm(targetRf);
      const best = ladderSteps()
        .map((step) => ({ step, rf: measuredRfAt(asMeasurements, step.strongFraction) }))
        .filter((item) => item.rf !== null)
        .sort((a, b) => Math.abs(clampedRm(a.rf!) - target) - Math.abs(clampedRm(b.rf!) - target))[0];
      const own = knowledge.measurements.filter((item) => item.compoundId === heldOut);
      const rf = best ? measuredRfAt(own, best.step.strongFraction) : null;
      if (rf !== null) hits.push(rf >= hitWindow[0] && rf <= hitWindow[1]);
    }
    results.push({
      reference,
      compounds: measuredIn.length,
      mae: mean(errors),
      hit: hits.filter(Boolean).length / Math.max(hits.length, 1),
      hitCompounds: hits.length,
    });
  }
  return results.sort((a, b) => a.mae - b.mae);
}
