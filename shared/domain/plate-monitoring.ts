import { deltaColumnVolumes } from './rf';

/** What a lane of a monitoring plate holds (named by the chemist on the overlay). */
type MonitorLaneRole = 'starting_material' | 'co_spot' | 'mixture';
export type MonitorLane = { role: MonitorLaneRole; rfs: number[] };

/** Two spots closer than this in Rf are taken for one substance (common practice: about the reading error of a plate). */
const SAME_SPOT_RF = 0.03;

export type MonitoringReadout = {
  startingMaterialRf: number | null;
  /** The mixture lane still shows a spot at the starting material's Rf; null without both lanes. */
  startingMaterialRemains: boolean | null;
  /** Mixture spots not at the starting material's Rf. */
  newSpots: number[];
  /** The co-spot lane shows two spots (starting material and another) rather than one; null without a co-spot lane. */
  coSpotResolves: boolean | null;
  /** The target (the strongest new spot when not chosen: here the new spot nearest Rf 0.3) and its nearest neighbour. */
  targetRf: number | null;
  nearestRf: number | null;
  deltaRf: number | null;
  /** ΔCV = |1/Rf₁ − 1/Rf₂| (CV ≈ 1/Rf; separation on a column follows ΔCV rather than ΔRf). */
  deltaCv: number | null;
  /** Inputs for the column planner (rfTarget, rfImpurity). */
  columnPlan: { rfTarget: number; rfImpurity: number | null } | null;
  sentences: string[];
};

const near = (a: number, b: number, tolerance = SAME_SPOT_RF) => Math.abs(a - b) <= tolerance;
const fmt = (rf: number) => rf.toFixed(2);

/**
 * Reads a starting material / co-spot / reaction mixture plate: is starting material left in the mixture, which
 * mixture spots are new, does the co-spot lane resolve into two spots, and ΔRf and ΔCV from the target to its
 * nearest neighbour in the mixture lane. `targetRf` picks the target; without it, the new spot nearest Rf 0.3 (the
 * band flash chromatography aims for; Still, Kahn & Mitra, J. Org. Chem. 1978, 43, 2923) is taken.
 */
export function readMonitoringPlate(lanes: MonitorLane[], targetRf?: number | null): MonitoringReadout {
  const sm = lanes.find((lane) => lane.role === 'starting_material');
  const co = lanes.find((lane) => lane.role === 'co_spot');
  const mixture = lanes.find((lane) => lane.role === 'mixture');
  const smRf = sm && sm.rfs.length > 0 ? [...sm.rfs].sort((a, b) => a - b)[0] : null;
  const mixtureRfs = mixture ? [...mixture.rfs].sort((a, b) => a - b) : [];
  const remains = smRf !== null && mixture ? mixtureRfs.some((rf) => near(rf, smRf)) : null;
  const newSpots = mixtureRfs.filter((rf) => smRf === null || !near(rf, smRf));
  const coResolves = co ? co.rfs.length >= 2 && co.rfs.some((a) => co.rfs.some((b) => !near(a, b))) : null;
  const target =
    targetRf ??
    (newSpots.length ? newSpots.reduce((best, rf) => (Math.abs(rf - 0.3) < Math.abs(best - 0.3) ? rf : best)) : null);
  const others = target === null ? [] : mixtureRfs.filter((rf) => !near(rf, target, 1e-9));
  const nearest =
    others.length && target !== null
      ? others.reduce((best, rf) => (Math.abs(rf - target) < Math.abs(best - target) ? rf : best))
      : null;
  const deltaRf = target !== null && nearest !== null ? Math.abs(target - nearest) : null;
  const deltaCv =
    target !== null && nearest !== null && target > 0 && nearest > 0 ? deltaColumnVolumes(target, nearest) : null;
  const sentences: string[] = [];
  if (remains === true) sentences.push(`Starting material remains in the mixture (spot at Rf ${fmt(smRf!)}).`);
  if (remains === false) sentences.push(`No starting material is seen in the mixture (nothing at Rf ${fmt(smRf!)}).`);
  if (mixture)
    sentences.push(
      newSpots.length
        ? `New spot${newSpots.length > 1 ? 's' : ''} at Rf ${newSpots.map(fmt).join(', ')}.`
        : 'No new spot in the mixture.',
    );
  if (coResolves === true)
    sentences.push('The co-spot lane resolves into two spots: the product runs apart from the starting material.');
  if (coResolves === false)
    sentences.push('The co-spot lane shows one spot: product and starting material may co-elute in this eluent.');
  if (deltaRf !== null && deltaCv !== null)
    sentences.push(
      `Target Rf ${fmt(target!)}, nearest spot Rf ${fmt(nearest!)}: ΔRf ${deltaRf.toFixed(2)}, ΔCV ${deltaCv.toFixed(1)}.`,
    );
  return {
    startingMaterialRf: smRf,
    startingMaterialRemains: remains,
    newSpots,
    coSpotResolves: coResolves,
    targetRf: target,
    nearestRf: nearest,
    deltaRf,
    deltaCv,
    columnPlan: target !== null && target > 0 ? { rfTarget: target, rfImpurity: nearest } : null,
    sentences,
  };
}
