import type { Point } from './geometry';
import type { RgbImage } from './segment';

type Line = { point: Point; direction: Point };

function sample(image: RgbImage, x: number, y: number, out: number[]) {
  const fx = Math.min(image.width - 1.001, Math.max(0, x)),
    fy = Math.min(image.height - 1.001, Math.max(0, y));
  const x0 = Math.floor(fx),
    y0 = Math.floor(fy),
    tx = fx - x0,
    ty = fy - y0;
  const a = (y0 * image.width + x0) * 3,
    b = a + 3,
    c = a + image.width * 3,
    d = c + 3;
  for (let k = 0; k < 3; k++)
    out[k] =
      (image.data[a + k] * (1 - tx) + image.data[b + k] * tx) * (1 - ty) +
      (image.data[c + k] * (1 - tx) + image.data[d + k] * tx) * ty;
}

/** Total least-squares line through points (principal direction about the centroid). */
function fitLine(points: Point[]): Line {
  const n = points.length;
  const cx = points.reduce((s, p) => s + p[0], 0) / n,
    cy = points.reduce((s, p) => s + p[1], 0) / n;
  let sxx = 0,
    sxy = 0,
    syy = 0;
  for (const [x, y] of points) {
    sxx += (x - cx) ** 2;
    sxy += (x - cx) * (y - cy);
    syy += (y - cy) ** 2;
  }
  const angle = 0.5 * Math.atan2(2 * sxy, sxx - syy);
  return { point: [cx, cy], direction: [Math.cos(angle), Math.sin(angle)] };
}

const residual = (line: Line, [x, y]: Point) =>
  Math.abs((x - line.point[0]) * line.direction[1] - (y - line.point[1]) * line.direction[0]);

function intersect(a: Line, b: Line): Point | null {
  const det = a.direction[0] * b.direction[1] - a.direction[1] * b.direction[0];
  if (Math.abs(det) < 1e-6) return null;
  const dx = b.point[0] - a.point[0],
    dy = b.point[1] - a.point[1];
  const t = (dx * b.direction[1] - dy * b.direction[0]) / det;
  return [a.point[0] + t * a.direction[0], a.point[1] + t * a.direction[1]];
}

/**
 * Refines a plate's corners on the full-size photo: along each side, at points between its ends, the strongest
 * step in colour across the side (mean of 3 px on each side, so a thin pencil line does not count) from like the
 * plate inside to unlike it outside, within a search window and favouring the coarse position, marks the edge; a
 * straight line is fitted to those points (twice, dropping outliers), and the
 * corners are where the four lines cross. A blur of glare or shadow that swelled the coarse mask gives a soft
 * slope, the plate's cut edge a sharp step. Falls back to the coarse corners when a side has too few edge points.
 */
export function refineCorners(image: RgbImage, corners: Point[]): Point[] {
  const lines: Line[] = [];
  const inside = [0, 0, 0],
    outside = [0, 0, 0],
    probe = [0, 0, 0];
  const centre: Point = [corners.reduce((s, p) => s + p[0], 0) / 4, corners.reduce((s, p) => s + p[1], 0) / 4];
  for (let side = 0; side < 4; side++) {
    const a = corners[side],
      b = corners[(side + 1) % 4];
    const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const across = Math.hypot(corners[(side + 2) % 4][0] - b[0], corners[(side + 2) % 4][1] - b[1]);
    let nx = -(b[1] - a[1]) / length,
      ny = (b[0] - a[0]) / length;
    const mid: Point = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
    if ((centre[0] - mid[0]) * nx + (centre[1] - mid[1]) * ny > 0) {
      nx = -nx;
      ny = -ny;
    }
    const reach = Math.max(5, Math.min(0.2 * across, 0.1 * length + 8));
    const count = Math.max(8, Math.min(40, Math.round(length / 6)));
    const along = Array.from({ length: count }, (_, j) => 0.12 + (0.76 * j) / (count - 1));
    const depth = Math.min(reach + 4, 0.3 * across);
    const plate = [0, 1, 2].map((c) => {
      const values = along.map((t) => {
        sample(image, a[0] + (b[0] - a[0]) * t - nx * depth, a[1] + (b[1] - a[1]) * t - ny * depth, probe);
        return probe[c];
      });
      return values.sort((x, y) => x - y)[values.length >> 1];
    });
    const found: Point[] = [];
    for (const t of along) {
      const px = a[0] + (b[0] - a[0]) * t,
        py = a[1] + (b[1] - a[1]) * t;
      let best = 0,
        bestAt = NaN;
      for (let s = -reach; s <= reach; s += 0.5) {
        for (let c = 0; c < 3; c++) {
          inside[c] = 0;
          outside[c] = 0;
        }
        for (let k = 1; k <= 3; k++) {
          sample(image, px + nx * (s + k), py + ny * (s + k), probe);
          for (let c = 0; c < 3; c++) outside[c] += probe[c] / 3;
          sample(image, px + nx * (s - k), py + ny * (s - k), probe);
          for (let c = 0; c < 3; c++) inside[c] += probe[c] / 3;
        }
        // Plate-like inside, unlike the plate outside: a neighbouring plate's edge has the opposite sense.
        const unlikeOutside = Math.hypot(outside[0] - plate[0], outside[1] - plate[1], outside[2] - plate[2]);
        const unlikeInside = Math.hypot(inside[0] - plate[0], inside[1] - plate[1], inside[2] - plate[2]);
        const step = (unlikeOutside - unlikeInside) * (1 - (0.3 * Math.abs(s)) / reach);
        if (step > best) {
          best = step;
          bestAt = s;
        }
      }
      if (best > 10) found.push([px + nx * bestAt, py + ny * bestAt]);
    }
    if (found.length < 4) return corners;
    let line = fitLine(found);
    for (let round = 0; round < 2; round++) {
      const residuals = found.map((p) => residual(line, p)).sort((x, y) => x - y);
      const limit = residuals[Math.floor(residuals.length / 2)] * 2.5 + 1;
      const kept = found.filter((p) => residual(line, p) <= limit);
      if (kept.length < 3) break;
      line = fitLine(kept);
    }
    lines.push(line);
  }
  const refined: Point[] = [];
  for (let corner = 0; corner < 4; corner++) {
    const point = intersect(lines[(corner + 3) % 4], lines[corner]);
    if (!point) return corners;
    const moved = Math.hypot(point[0] - corners[corner][0], point[1] - corners[corner][1]);
    const size = Math.hypot(corners[2][0] - corners[0][0], corners[2][1] - corners[0][1]);
    if (moved > 0.25 * size) return corners;
    refined.push(point);
  }
  return refined;
}
