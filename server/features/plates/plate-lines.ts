import { median, type FloatMap } from './raster';

/** A pencil line across the plate frame: its height at the frame's left (x = 0) and right (x = width) edges. */
export type FrameLine = { left: number; right: number; strength: number };

export function lineAt(line: FrameLine, x: number, width: number): number {
  return line.left + ((line.right - line.left) * x) / width;
}

/** Robust level and spread (median, 1.4826 × median absolute deviation) of some values. */
export function robustSpread(values: ArrayLike<number>): { level: number; sigma: number } {
  const level = median(values);
  const deviations = Float64Array.from(values, (value) => Math.abs(value - level));
  return { level, sigma: Math.max(1e-6, 1.4826 * median(deviations)) };
}

/** The scale, in frame pixels, of thin pencil marks: used as the half-window of the line filter. */
export function lineWindow(frameHeight: number): number {
  return Math.max(3, Math.round(frameHeight * 0.012));
}

/**
 * Finds the origin (lower part) and the solvent front (upper part) as thin horizontal lines in the two edge strips of
 * the plate, where neither lanes nor labels lie, so a front marked only by ticks at the edges is found like a full
 * line. A thin-line response (the departure minus the mean of the rows k above and below; a 1-D top-hat, Serra,
 * Image Analysis and Mathematical Morphology, 1982) is averaged along each strip; a row that is a line in both strips
 * is a line, and each strip's own peak (refined to a fraction of a pixel by a parabola) gives its end heights.
 */
export function findLines(departure: FloatMap): { origin: FrameLine | null; front: FrameLine | null } {
  const { width, height, data } = departure;
  const k = lineWindow(height);
  const strips = [
    [Math.round(width * 0.02), Math.max(Math.round(width * 0.09), Math.round(width * 0.02) + 3)],
    [Math.min(Math.round(width * 0.91), Math.round(width * 0.98) - 3), Math.round(width * 0.98)],
  ];
  const profiles = strips.map(([x0, x1]) => {
    const profile = new Float64Array(height);
    for (let y = k; y < height - k; y++) {
      let sum = 0;
      for (let x = x0; x < x1; x++) {
        const response = data[y * width + x] - 0.5 * (data[(y - k) * width + x] + data[(y + k) * width + x]);
        if (response > 0) sum += response;
      }
      profile[y] = sum / Math.max(1, x1 - x0);
    }
    return profile;
  });
  const both = Float64Array.from({ length: height }, (_, y) => Math.min(profiles[0][y], profiles[1][y]));
  const { level, sigma } = robustSpread(both.subarray(k, height - k));
  const needed = Math.max(level + 8 * sigma, 2.5);
  const strips0 = strips.map(([x0, x1]) => (x0 + x1) / 2);
  const best = (from: number, to: number): FrameLine | null => {
    let at = -1;
    for (let y = Math.max(from, k); y < Math.min(to, height - k); y++) if (at < 0 || both[y] > both[at]) at = y;
    if (at < 0 || both[at] < needed) return null;
    const ends = profiles.map((profile) => {
      let peak = at;
      for (let y = Math.max(k, at - 2 * k); y <= Math.min(height - k - 1, at + 2 * k); y++)
        if (profile[y] > profile[peak]) peak = y;
      const a = profile[peak - 1] ?? 0,
        b = profile[peak],
        c = profile[peak + 1] ?? 0;
      const curvature = a - 2 * b + c;
      return peak + (curvature < 0 ? (0.5 * (a - c)) / curvature : 0);
    });
    const slope = (ends[1] - ends[0]) / (strips0[1] - strips0[0]);
    return {
      left: ends[0] - slope * strips0[0],
      right: ends[0] + slope * (width - strips0[0]),
      strength: both[at] / needed,
    };
  };
  return {
    front: best(Math.max(Math.round(height * 0.02), 3 * k), Math.round(height * 0.45)),
    origin: best(Math.round(height * 0.55), Math.min(Math.round(height * 0.97), height - 3 * k)),
  };
}
