import type { Adsorbent } from '../../../../shared/catalogue/types';
import { rfClampRange } from '../../../../shared/domain/soczewinski';
import { rfToRm } from '../../../../shared/domain/rf';
import { fitLine, pooledSlope, type RetentionLine, type RetentionPoint } from './curves';
import { pairEpsilon, pairKey, positionOf, type EluentPosition } from './eluent-position';
import type { ScoutMeasurement, SolventPair } from './types';

/** A measured Rf placed on the strength scale. */
export interface PlacedMeasurement {
  compound: number;
  position: EluentPosition;
  rm: number;
}

/** A strength at which the model is fitted: a recorded composition of the pair (strong volume fraction φ). */
export interface Anchor {
  fraction: number;
  epsilon: number;
  /** Compounds measured at exactly this composition. */
  compounds: number;
}

interface PairPoint extends RetentionPoint {
  fraction: number;
}

/** Everything recorded in one pair on one adsorbent, with each compound's retention line. */
export interface PairData {
  pair: SolventPair;
  key: string;
  adsorbent: Adsorbent;
  /** Points by compound position; pure-solvent plates count as φ = 0 or 1. */
  points: Map<number, PairPoint[]>;
  anchors: Anchor[];
  centre: number;
  slope: number;
  lines: Map<number, RetentionLine>;
}

/** RM of a recorded Rf, clamped into rfClampRange first so spots on the origin or front stay finite. */
const rmOfRf = (rf: number) => rfToRm(Math.min(Math.max(rf, rfClampRange[0]), rfClampRange[1]));

/** Isocratic measurements with a target Rf, placed on the adsorbent's ε° scale (others have no place). */
export function placeMeasurements(
  measurements: readonly { compound: number; measurement: ScoutMeasurement }[],
  adsorbent: Adsorbent,
  adsorbentOf: (phase: string) => Adsorbent | null,
): PlacedMeasurement[] {
  const placed: PlacedMeasurement[] = [];
  for (const { compound, measurement } of measurements) {
    if (measurement.rf === null || measurement.mode !== 'isocratic' || adsorbentOf(measurement.phase) !== adsorbent)
      continue;
    const position = positionOf(measurement.components, adsorbent);
    if (position) placed.push({ compound, position, rm: rmOfRf(measurement.rf) });
  }
  return placed;
}

const fractionKey = (fraction: number) => Math.round(fraction * 1000);
const maxAnchors = 12;

/** Collects a pair's points, picks its anchors (the compositions most compounds were run in) and fits lines. */
export function buildPairData(pair: SolventPair, adsorbent: Adsorbent, placed: readonly PlacedMeasurement[]): PairData {
  const key = pairKey(pair);
  const points = new Map<number, PairPoint[]>();
  for (const item of placed) {
    const { position } = item;
    let fraction: number | null = null;
    if (position.kind === 'pair' && position.key === key) fraction = position.strongFraction;
    if (position.kind === 'pure' && position.solvent === pair.weak) fraction = 0;
    if (position.kind === 'pure' && position.solvent === pair.strong) fraction = 1;
    if (fraction === null) continue;
    const list = points.get(item.compound) ?? [];
    list.push({ fraction, epsilon: position.epsilon, rm: item.rm });
    points.set(item.compound, list);
  }
  const byFraction = new Map<number, Set<number>>();
  for (const [compound, list] of points)
    for (const point of list) {
      const set = byFraction.get(fractionKey(point.fraction)) ?? new Set<number>();
      set.add(compound);
      byFraction.set(fractionKey(point.fraction), set);
    }
  const ranked = [...byFraction]
    .map(([fraction, set]) => ({ fraction: fraction / 1000, compounds: set.size }))
    .sort((a, b) => b.compounds - a.compounds || a.fraction - b.fraction);
  const anchors = ranked
    .filter((anchor, index) => index === 0 || anchor.compounds >= 2)
    .slice(0, maxAnchors)
    .map((anchor) => ({ ...anchor, epsilon: pairEpsilon(pair, anchor.fraction, adsorbent) }))
    .sort((a, b) => a.epsilon - b.epsilon);
  const centre =
    anchors.length > 0
      ? anchors.reduce((sum, anchor) => sum + anchor.epsilon, 0) / anchors.length
      : pairEpsilon(pair, 0.2, adsorbent);
  const slope = pooledSlope(points.values());
  const lines = new Map<number, RetentionLine>();
  for (const [compound, list] of points) lines.set(compound, fitLine(list, slope, centre));
  return { pair, key, adsorbent, points, anchors, centre, slope, lines };
}

/** The compound's mean RM measured at an anchor's composition, or null. */
export function measuredAt(data: PairData, compound: number, anchor: Anchor): number | null {
  const list = data.points
    .get(compound)
    ?.filter((point) => fractionKey(point.fraction) === fractionKey(anchor.fraction));
  if (!list || list.length === 0) return null;
  return list.reduce((sum, point) => sum + point.rm, 0) / list.length;
}
