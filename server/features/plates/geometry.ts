/**
 * Plane geometry for the plate reader: the homography between a plate's own rectangle and its quadrilateral in the
 * photo (the four-point direct linear transform; Hartley & Zisserman, Multiple View Geometry, 2nd ed. 2004, §4.1),
 * the convex hull (Andrew's monotone chain, 1979) and the minimum-area enclosing rectangle by rotating the frame onto
 * each hull edge (Freeman & Shapira, Commun. ACM 1975: the best rectangle has a side on a hull edge).
 */
export type Point = [number, number];
/** Row-major 3×3 matrix with h[8] = 1. */
export type Homography = number[];

/** Solves A·x = b by Gaussian elimination with partial pivoting; null when A is singular. */
function solveLinear(a: number[][], b: number[]): number[] | null {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let row = col + 1; row < n; row++) if (Math.abs(m[row][col]) > Math.abs(m[pivot][col])) pivot = row;
    if (Math.abs(m[pivot][col]) < 1e-12) return null;
    [m[col], m[pivot]] = [m[pivot], m[col]];
    for (let row = 0; row < n; row++) {
      if (row === col) continue;
      const factor = m[row][col] / m[col][col];
      for (let k = col; k <= n; k++) m[row][k] -= factor * m[col][k];
    }
  }
  return m.map((row, i) => row[n] / row[i]);
}

/** The homography taking each `from[i]` to `to[i]` (four points, no three collinear); null when degenerate. */
export function homographyFrom(from: Point[], to: Point[]): Homography | null {
  const a: number[][] = [];
  const b: number[] = [];
  for (let i = 0; i < 4; i++) {
    const [x, y] = from[i];
    const [u, v] = to[i];
    a.push([x, y, 1, 0, 0, 0, -u * x, -u * y]);
    b.push(u);
    a.push([0, 0, 0, x, y, 1, -v * x, -v * y]);
    b.push(v);
  }
  const h = solveLinear(a, b);
  return h ? [...h, 1] : null;
}

export function applyHomography(h: Homography, [x, y]: Point): Point {
  const w = h[6] * x + h[7] * y + h[8];
  return [(h[0] * x + h[1] * y + h[2]) / w, (h[3] * x + h[4] * y + h[5]) / w];
}

/** Convex hull, counter-clockwise in image axes (y down), without collinear points. */
export function convexHull(points: Point[]): Point[] {
  const sorted = [...points].sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  if (sorted.length < 3) return sorted;
  const cross = (o: Point, a: Point, b: Point) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const lower: Point[] = [];
  for (const p of sorted) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], p) <= 0) lower.pop();
    lower.push(p);
  }
  const upper: Point[] = [];
  for (let i = sorted.length - 1; i >= 0; i--) {
    const p = sorted[i];
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], p) <= 0) upper.pop();
    upper.push(p);
  }
  return [...lower.slice(0, -1), ...upper.slice(0, -1)];
}

/** Shoelace area of a polygon. */
export function polygonArea(points: Point[]): number {
  let twice = 0;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[(i + 1) % points.length];
    twice += x0 * y1 - x1 * y0;
  }
  return Math.abs(twice) / 2;
}

/** The angle (radians, in (−π/4, π/4]) of the minimum-area rectangle around a convex hull, with its area. */
export function minAreaRectangleAngle(hull: Point[]): { angle: number; area: number } {
  let best = { angle: 0, area: Infinity };
  for (let i = 0; i < hull.length; i++) {
    const [x0, y0] = hull[i];
    const [x1, y1] = hull[(i + 1) % hull.length];
    let angle = Math.atan2(y1 - y0, x1 - x0);
    while (angle > Math.PI / 4) angle -= Math.PI / 2;
    while (angle <= -Math.PI / 4) angle += Math.PI / 2;
    const c = Math.cos(angle),
      s = Math.sin(angle);
    let minU = Infinity,
      maxU = -Infinity,
      minV = Infinity,
      maxV = -Infinity;
    for (const [x, y] of hull) {
      const u = c * x + s * y,
        v = -s * x + c * y;
      minU = Math.min(minU, u);
      maxU = Math.max(maxU, u);
      minV = Math.min(minV, v);
      maxV = Math.max(maxV, v);
    }
    const area = (maxU - minU) * (maxV - minV);
    if (area < best.area) best = { angle, area };
  }
  return best;
}

/**
 * The four corners of a near-rectangular hull (top-left, top-right, bottom-right, bottom-left): in the frame turned by
 * `angle`, each corner is the hull point farthest along its diagonal direction, which lies inside the corner's cone of
 * outward normals for any rectangle and stays there under a slight perspective.
 */
export function quadCorners(hull: Point[], angle: number): Point[] {
  const c = Math.cos(angle),
    s = Math.sin(angle);
  const directions: Point[] = [
    [-1, -1],
    [1, -1],
    [1, 1],
    [-1, 1],
  ];
  return directions.map(([du, dv]) => {
    let best = hull[0],
      bestScore = -Infinity;
    for (const p of hull) {
      const u = c * p[0] + s * p[1],
        v = -s * p[0] + c * p[1];
      const score = du * u + dv * v;
      if (score > bestScore) {
        bestScore = score;
        best = p;
      }
    }
    return best;
  });
}
