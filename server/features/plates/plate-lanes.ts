import { lineAt, lineWindow, robustSpread, type FrameLine } from './plate-lines';
import { boxBlur, floatMap, peaks, type FloatMap } from './raster';

/** Where marks may be read: between the lines, minus a margin of a line window, and away from the plate's sides. */
export type ReadingBand = { x0: number; x1: number; top: number; bottom: number; threshold: number; strong: number; sigma: number };

export function readingBand(departure: FloatMap, origin: FrameLine, front: FrameLine): ReadingBand {
  const { width, height, data } = departure;
  const k = lineWindow(height);
  const x0 = Math.round(width * 0.02), x1 = Math.round(width * 0.98);
  const top = Math.round(Math.max(front.left, front.right) + 1.5 * k);
  const bottom = Math.round(Math.min(origin.left, origin.right) - 1.5 * k);
  const sample: number[] = [];
  for (let y = Math.max(0, top); y < Math.min(height, bottom); y += 2) for (let x = x0; x < x1; x += 2) sample.push(data[y * width + x]);
  const { level, sigma } = robustSpread(sample);
  return { x0, x1, top, bottom, threshold: Math.max(level + 5 * sigma, 5), strong: Math.max(level + 10 * sigma, 12), sigma };
}

/**
 * Lanes from the column profile: how much ink each column holds between the lines (departure above the noise
 * threshold, summed down the column) plus the application marks on the origin (the departure just around the
 * origin line above the line's own level). Peaks of the smoothed profile, by prominence and at least a small lane
 * pitch apart, are the lanes, left to right.
 */
export function findLanes(departure: FloatMap, origin: FrameLine, band: ReadingBand): number[] {
  const { width, height, data } = departure;
  const k = lineWindow(height);
  const ink = new Float64Array(width);
  for (let x = band.x0; x < band.x1; x++) {
    let sum = 0;
    for (let y = Math.max(0, band.top); y < Math.min(height, band.bottom); y++) {
      const over = data[y * width + x] - band.threshold;
      if (over > 0) sum += over;
    }
    ink[x] = sum;
  }
  const marks = new Float64Array(width);
  for (let x = band.x0; x < band.x1; x++) {
    const centre = Math.round(lineAt(origin, x, width));
    let strongest = 0;
    for (let y = Math.max(0, centre - 2 * k); y <= Math.min(height - 1, centre + 2 * k); y++) strongest = Math.max(strongest, data[y * width + x]);
    marks[x] = strongest;
  }
  const lineLevel = robustSpread(marks.subarray(band.x0, band.x1)).level;
  for (let x = 0; x < width; x++) marks[x] = Math.max(0, marks[x] - lineLevel - 4 * band.sigma);
  const inkMax = Math.max(...ink), markMax = Math.max(...marks);
  const profile = floatMap(width, 1);
  for (let x = 0; x < width; x++) {
    profile.data[x] = (inkMax > 0 ? ink[x] / inkMax : 0) + (markMax > 6 * band.sigma ? (0.8 * marks[x]) / markMax : 0);
  }
  const smooth = boxBlur(boxBlur(profile, Math.max(1, Math.round(width * 0.006))), Math.max(1, Math.round(width * 0.006)));
  const found = peaks(smooth.data);
  if (found.length === 0) return [];
  const strongest = found[0].prominence;
  const pitch = Math.max(4, width * 0.04);
  const lanes: number[] = [];
  for (const peak of found) {
    if (peak.prominence < 0.15 * strongest || peak.value < 0.08) continue;
    if (peak.index < band.x0 || peak.index > band.x1) continue;
    if (lanes.some((lane) => Math.abs(lane - peak.index) < pitch)) continue;
    lanes.push(peak.index);
  }
  return lanes.sort((a, b) => a - b);
}
