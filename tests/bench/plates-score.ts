/**
 * Scores a plate reading against a generated photo's truth: plates matched by their centres, lanes matched one to
 * one within 40 % of the lane pitch, spots matched one to one within 0.1 Rf in matched lanes (nearest first).
 */
import type { PlateReading } from '../../shared/schemas/plates';
import type { TruthPlate } from './plates-photo';

export type PhotoScore = {
  plates: number;
  platesFound: number;
  lanes: number;
  lanesRight: number;
  spots: number;
  spotsWithin: number;
  detected: number;
  extra: number;
  errors: number[];
  kindRight: number;
  kindChecked: number;
};

const centre = (corners: number[][]) => [
  corners.reduce((s, p) => s + p[0], 0) / 4,
  corners.reduce((s, p) => s + p[1], 0) / 4,
];

export function scoreReading(truth: TruthPlate[], reading: PlateReading | null): PhotoScore {
  const score: PhotoScore = {
    plates: truth.length,
    platesFound: 0,
    lanes: 0,
    lanesRight: 0,
    spots: 0,
    spotsWithin: 0,
    detected: 0,
    extra: 0,
    errors: [],
    kindRight: 0,
    kindChecked: 0,
  };
  const read = reading?.plates ?? [];
  for (const plate of read) score.detected += plate.lanes.reduce((sum, lane) => sum + lane.spots.length, 0);
  const usedPlates = new Set<number>();
  let matchedSpots = 0;
  for (const plate of truth) {
    score.lanes += plate.lanes.length;
    score.spots += plate.lanes.reduce((sum, lane) => sum + lane.spots.length, 0);
    const [cx, cy] = centre(plate.corners);
    const plateWidth = Math.hypot(plate.corners[1][0] - plate.corners[0][0], plate.corners[1][1] - plate.corners[0][1]);
    let best = -1,
      bestDistance = Infinity;
    read.forEach((candidate, index) => {
      if (usedPlates.has(index)) return;
      const [x, y] = centre(candidate.corners);
      const distance = Math.hypot(x - cx, y - cy);
      if (distance < bestDistance) {
        bestDistance = distance;
        best = index;
      }
    });
    if (best < 0 || bestDistance > Math.max(10, plateWidth * 0.35)) continue;
    usedPlates.add(best);
    score.platesFound++;
    const found = read[best];
    const pitch = plate.lanes.length > 1 ? Math.abs(plate.lanes[1].x - plate.lanes[0].x) : plateWidth;
    const usedLanes = new Set<number>();
    for (const lane of plate.lanes) {
      let match = -1,
        distance = Infinity;
      found.lanes.forEach((candidate, index) => {
        const d = Math.abs(candidate.x - lane.x);
        if (!usedLanes.has(index) && d < distance) {
          distance = d;
          match = index;
        }
      });
      if (match < 0 || distance > 0.4 * pitch) continue;
      usedLanes.add(match);
      score.lanesRight++;
      const pairs: { t: number; d: number; error: number }[] = [];
      lane.spots.forEach((spot, t) =>
        found.lanes[match].spots.forEach((candidate, d) => {
          const error = Math.abs(candidate.rf - spot.rf);
          const inStreak =
            spot.kind === 'streak' &&
            candidate.rf >= (spot.rfLow ?? 0) - 0.03 &&
            candidate.rf <= (spot.rfHigh ?? 1) + 0.03;
          if (error <= 0.1 || inStreak) pairs.push({ t, d, error: inStreak ? Math.min(error, 0.03) : error });
        }),
      );
      pairs.sort((a, b) => a.error - b.error);
      const usedTruth = new Set<number>(),
        usedFound = new Set<number>();
      for (const pair of pairs) {
        if (usedTruth.has(pair.t) || usedFound.has(pair.d)) continue;
        usedTruth.add(pair.t);
        usedFound.add(pair.d);
        matchedSpots++;
        const truthSpot = lane.spots[pair.t];
        if (truthSpot.kind !== 'streak') score.errors.push(pair.error);
        if (pair.error <= 0.03) score.spotsWithin++;
        score.kindChecked++;
        if (found.lanes[match].spots[pair.d].kind === truthSpot.kind) score.kindRight++;
      }
    }
  }
  score.extra = score.detected - matchedSpots;
  return score;
}
