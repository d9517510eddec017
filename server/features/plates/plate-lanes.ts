import { lineAt, lineWindow, robustSpread, type FrameLine } from './plate-lines';
import { boxBlur, floatMap, peaks, type FloatMap, type Mask } from './raster';

/** Where marks may be read: between the lines, minus a margin of a line window, and away from the plate's sides. */
export type ReadingBand = {
  x0: number;
  x1: number;
  top: number;
  bottom: number;
  threshold: number;
  strong: number;
  sigma: number;
};

/** `edge`: frame pixels at each side where the bench may bleed in (a photo pixel or two of corner error, resampled). */
export function readingBand(departure: FloatMap, origin: FrameLine, front: FrameLine, edge = 0): ReadingBand {
  const { width, height, data } = departure;
  const k = lineWindow(height);
  const x0 = Math.round(Math.max(width * 0.02, edge)),
    x1 = Math.round(Math.min(width * 0.98, width - edge));
  const top = Math.round(Math.max(front.left, front.right) + 1.5 * k);
  const bottom = Math.round(Math.min(origin.left, origin.right) - 1.5 * k);
  const sample: number[] = [];
  for (let y = Math.max(0, top); y < Math.min(height, bottom); y += 2)
    for (let x = x0; x < x1; x += 2) sample.push(data[y * width + x]);
  const { level, sigma } = robustSpread(sample);
  return {
    x0,
    x1,
    top,
    bottom,
    threshold: Math.max(level + 5 * sigma, 5),
    strong: Math.max(level + 10 * sigma, 12),
    sigma,
  };
}

/**
 * Lanes from column profiles: the application marks on the origin (the strongest departure just around the origin
 * line, above the line's own level), and how much ink each column holds between the lines (pixels of marks, pencil
 * rings filled, counted down the column). Peaks of each smoothed profile, by prominence and at least a small lane
 * pitch apart, are lane candidates; marked lanes come first (an empty fraction has only its mark), and ink away from
 * every mark (a lane spotted without a mark) adds a lane. Left to right.
 */
export function findLanes(departure: FloatMap, origin: FrameLine, band: ReadingBand, filled: Mask): number[] {
  const { width, height, data } = departure;
  const k = lineWindow(height);
  const ink = new Float64Array(width);
  for (let sx = 0; sx < filled.width; sx++) {
    let sum = 0;
    for (let sy = 0; sy < filled.height; sy++) sum += filled.data[sy * filled.width + sx];
    ink[sx + band.x0] = sum;
  }
  const marks = new Float64Array(width);
  for (let x = band.x0; x < band.x1; x++) {
    const centre = Math.round(lineAt(origin, x, width));
    let strongest = 0;
    for (let y = Math.max(0, centre - 2 * k); y <= Math.min(height - 1, centre + 2 * k); y++)
      strongest = Math.max(strongest, data[y * width + x]);
    marks[x] = strongest;
  }
  const lineLevel = robustSpread(marks.subarray(band.x0, band.x1)).level;
  for (let x = 0; x < width; x++) marks[x] = Math.max(0, marks[x] - lineLevel - 4 * band.sigma);
  const from = Math.max(Math.round(width * 0.04), band.x0 + 2),
    to = Math.min(Math.round(width * 0.96), band.x1 - 2);
  const pitch = Math.max(4, width * 0.04);
  const pick = (values: Float64Array, share: number, floor: number) => {
    const profile = floatMap(width, 1);
    for (let x = from; x < to; x++) profile.data[x] = values[x];
    const radius = Math.max(1, Math.round(width * 0.006));
    const found = peaks(boxBlur(boxBlur(profile, radius), radius).data);
    const chosen: number[] = [];
    if (found.length === 0) return chosen;
    for (const peak of found) {
      if (peak.prominence < share * found[0].prominence || peak.value <= floor) continue;
      if (peak.index < from || peak.index >= to || chosen.some((lane) => Math.abs(lane - peak.index) < pitch)) continue;
      chosen.push(peak.index);
    }
    return chosen.sort((a, b) => a - b);
  };
  const marked = pick(marks, 0.3, 4 * band.sigma);
  const inked = pick(ink, 0.15, 0);
  if (marked.length === 0) return inked;
  const gaps = marked
    .slice(1)
    .map((x, i) => x - marked[i])
    .sort((a, b) => a - b);
  const near = gaps.length ? 0.5 * gaps[gaps.length >> 1] : 0.15 * width;
  const lanes = [...marked, ...inked.filter((x) => marked.every((lane) => Math.abs(lane - x) > near))];
  return lanes.sort((a, b) => a - b);
}
