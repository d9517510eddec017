import type { ReadingBand } from './plate-lanes';
import { components, fillHoles, morph, peaks, type FloatMap, type Mask } from './raster';

/** A mark found in the plate frame: its centre, size and strength; a streak also has its top and bottom. */
export type FrameSpot = {
  lane: number;
  x: number;
  y: number;
  radius: number;
  intensity: number;
  kind: 'spot' | 'circle' | 'streak';
  top?: number;
  bottom?: number;
  confidence: number;
};

type Part = { pixels: number[]; weight: (i: number) => number; circle: boolean };

/** Weighted centre, extent and strength of some pixels of the frame. */
function describe(pixels: number[], weight: (i: number) => number, width: number, data: Float32Array) {
  let sum = 0,
    sx = 0,
    sy = 0,
    peak = 0,
    minY = Infinity,
    maxY = -Infinity,
    minX = Infinity,
    maxX = -Infinity;
  for (const i of pixels) {
    const x = i % width,
      y = (i - x) / width,
      w = weight(i);
    sum += w;
    sx += w * (x + 0.5);
    sy += w * (y + 0.5);
    peak = Math.max(peak, data[i]);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
  }
  return { x: sx / (sum || 1), y: sy / (sum || 1), peak, minY, maxY, minX, maxX, weight: sum };
}

/** Splits a part into vertical pieces where its row profile dips between two clear peaks (two spots touching). */
function splitRows(part: Part, width: number, pitch: number): Part[] {
  const rows = new Map<number, number>();
  let minY = Infinity,
    maxY = -Infinity;
  for (const i of part.pixels) {
    const y = Math.floor(i / width);
    rows.set(y, (rows.get(y) ?? 0) + part.weight(i));
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
  }
  const profile = Float64Array.from({ length: maxY - minY + 1 }, (_, k) => rows.get(minY + k) ?? 0);
  const found = peaks(profile).filter((peak) => peak.prominence > 0.3 * Math.max(...profile));
  if (found.length < 2) return [part];
  const ordered = found
    .slice(0, 4)
    .map((peak) => peak.index)
    .sort((a, b) => a - b);
  const cuts: number[] = [];
  for (let j = 1; j < ordered.length; j++) {
    if (ordered[j] - ordered[j - 1] < pitch) continue;
    let dip = ordered[j - 1];
    for (let k = ordered[j - 1]; k <= ordered[j]; k++) if (profile[k] < profile[dip]) dip = k;
    if (profile[dip] < 0.7 * Math.min(profile[ordered[j - 1]], profile[ordered[j]])) cuts.push(minY + dip);
  }
  if (cuts.length === 0) return [part];
  const pieces: number[][] = cuts.map(() => []).concat([[]]);
  for (const i of part.pixels) {
    const y = Math.floor(i / width);
    pieces[cuts.filter((cut) => y > cut).length].push(i);
  }
  return pieces.filter((pixels) => pixels.length > 0).map((pixels) => ({ ...part, pixels }));
}

/**
 * Spots, pencil circles and streaks between the lines: pixels departing from the background beyond the noise
 * threshold, closed by one pixel and with holes filled, so a pencil ring becomes a disc whose centre is the spot's
 * centre; blobs too small or never clearly above the noise (hysteresis, as in Canny, IEEE TPAMI 1986) are dropped.
 * A blob spanning lanes is cut between them; within a lane, a blob whose row profile has two clear peaks is cut at
 * the dip between them; a blob much taller than wide is a streak.
 */
/** The ink between the lines (departure above the threshold) and the same closed by a pixel with holes filled. */
export type InkMasks = { ink: Mask; closed: Mask; filled: Mask; x0: number; top: number };

export function inkMasks(departure: FloatMap, band: ReadingBand): InkMasks | null {
  const { width, data } = departure;
  const top = Math.max(0, band.top),
    bottom = Math.min(departure.height, band.bottom);
  const subWidth = band.x1 - band.x0,
    subHeight = bottom - top;
  if (subWidth < 4 || subHeight < 4) return null;
  const ink: Mask = { width: subWidth, height: subHeight, data: new Uint8Array(subWidth * subHeight) };
  for (let sy = 0; sy < subHeight; sy++) {
    for (let sx = 0; sx < subWidth; sx++)
      ink.data[sy * subWidth + sx] = data[(sy + top) * width + sx + band.x0] > band.threshold ? 1 : 0;
  }
  const closed = morph(morph(ink, 1, true), 1, false);
  return { ink, closed, filled: fillHoles(closed), x0: band.x0, top };
}

export function findSpots(
  departure: FloatMap,
  band: ReadingBand,
  masks: InkMasks,
  lanes: number[],
  run: number,
): FrameSpot[] {
  const { width, data } = departure;
  const { closed, filled, x0, top } = masks;
  if (lanes.length === 0) return [];
  const subWidth = filled.width;
  const at = (sx: number, sy: number) => (sy + top) * width + sx + x0;
  const minArea = Math.max(10, (run * 0.012) ** 2 * Math.PI);
  const spots: FrameSpot[] = [];
  for (const blob of components(filled, minArea)) {
    // A thin blob along the band's side is the plate's edge bleeding in, not a spot.
    const atSide = blob.minX === 0 || blob.maxX === subWidth - 1;
    if (atSide && blob.maxX - blob.minX < 0.04 * width) continue;
    const pixels = Array.from(blob.pixels, (i) => at(i % subWidth, Math.floor(i / subWidth)));
    const holeCount = Array.from(blob.pixels).filter((i) => !closed.data[i]).length;
    const circle = holeCount > 0.12 * blob.area && blob.area > 2 * minArea;
    const weight = circle ? () => 1 : (i: number) => Math.max(0, data[i] - band.threshold);
    const byLane = new Map<number, number[]>();
    for (const i of pixels) {
      const x = i % width;
      let nearest = 0;
      for (let l = 1; l < lanes.length; l++) if (Math.abs(lanes[l] - x) < Math.abs(lanes[nearest] - x)) nearest = l;
      if (!byLane.has(nearest)) byLane.set(nearest, []);
      byLane.get(nearest)!.push(i);
    }
    const total = pixels.reduce((sum, i) => sum + weight(i), 0);
    for (const [lane, lanePixels] of byLane) {
      const laneWeight = lanePixels.reduce((sum, i) => sum + weight(i), 0);
      if (laneWeight < 0.2 * total && lanePixels.length < minArea) continue;
      for (const part of splitRows({ pixels: lanePixels, weight, circle }, width, run * 0.05)) {
        const shape = describe(part.pixels, weight, width, data);
        if (shape.peak < band.strong || part.pixels.length < minArea * 0.6) continue;
        const tall = shape.maxY - shape.minY + 1,
          wide = shape.maxX - shape.minX + 1;
        const streak = !circle && tall > 2.3 * wide && tall > run * 0.12;
        spots.push({
          lane,
          x: shape.x,
          y: shape.y,
          radius: Math.sqrt(part.pixels.length / Math.PI),
          intensity: shape.peak,
          kind: circle ? 'circle' : streak ? 'streak' : 'spot',
          ...(streak ? { top: shape.minY, bottom: shape.maxY + 1 } : {}),
          confidence: Math.min(1, (shape.peak - band.threshold) / (band.strong - band.threshold + 1e-6) / 2),
        });
      }
    }
  }
  return spots;
}
