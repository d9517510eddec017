/** One retention point of a compound in a pair: Snyder ε° of the eluent and RM = log10((1 − Rf)/Rf). */
export interface RetentionPoint {
  epsilon: number;
  rm: number;
}

/**
 * A compound's retention curve in one pair, RM = a + b·x + c·x² with x = ε° − centre, and the ε° span it was
 * measured over. c = 0 (a straight line) unless the compound was measured at three or more strengths.
 */
export interface RetentionLine {
  a: number;
  b: number;
  c: number;
  centre: number;
  span: [number, number];
  points: number;
}

/**
 * Pooled within-compound slope dRM/dε° over compounds with two or more strengths (least squares after removing
 * each compound's mean). Default −5 when nothing can be pooled: in the open TLC data (Xu et al., Chem 2022)
 * pooled slopes lie between −5.2 and −5.9 for EtOAc, MeOH and Et2O pairs, which through Snyder's equation
 * (α·n_b ≈ 3) is Soczewiński's slope n ≈ 1.7 (Soczewiński, Anal. Chem. 1969, 41, 179: n usually 1–2; from memory).
 */
export function pooledSlope(groups: Iterable<readonly RetentionPoint[]>): number {
  let sxy = 0;
  let sxx = 0;
  for (const points of groups) {
    if (points.length < 2) continue;
    const meanX = points.reduce((sum, point) => sum + point.epsilon, 0) / points.length;
    const meanY = points.reduce((sum, point) => sum + point.rm, 0) / points.length;
    for (const point of points) {
      sxy += (point.epsilon - meanX) * (point.rm - meanY);
      sxx += (point.epsilon - meanX) ** 2;
    }
  }
  if (sxx < 1e-4) return -5;
  return Math.min(-1, Math.max(-12, sxy / sxx));
}

/** Strength of the slope prior: worth one extra point at Δε° ≈ 0.45 (the span of a hexane–EtOAc ladder). */
const slopePriorWeight = 0.2;
/** With three or more strengths the data carry the slope: the prior is kept only as a weak tie-breaker. */
const bentSlopePriorWeight = 0.002;
/**
 * Ridge on the curvature c (RM per ε°²), tiny: ε° steps of a pair are ~0.02–0.1, so x⁴ terms are ~1e-6 and a real bend
 * needs c of order 10–1000.
 */
const curvaturePenalty = 1e-7;

/** Solves a 3 × 3 linear system by Cramer's rule (null when singular). */
function solve3(m: number[][], r: number[]): [number, number, number] | null {
  const det = (a: number[][]) =>
    a[0][0] * (a[1][1] * a[2][2] - a[1][2] * a[2][1]) -
    a[0][1] * (a[1][0] * a[2][2] - a[1][2] * a[2][0]) +
    a[0][2] * (a[1][0] * a[2][1] - a[1][1] * a[2][0]);
  const d = det(m);
  if (Math.abs(d) < 1e-12) return null;
  const column = (k: number) => m.map((row, i) => row.map((value, j) => (j === k ? r[i] : value)));
  return [det(column(0)) / d, det(column(1)) / d, det(column(2)) / d];
}

/**
 * Fits a compound's curve in a pair by penalised least squares: Σ(RM − a − b·x − c·x²)² + κ·(b − prior)² + λ·c²,
 * x = ε° − centre. The straight part is Soczewiński's linear relation written on Snyder's ε° scale (E.
 * Soczewiński, Anal. Chem. 1969, 41, 179–182; L. R. Snyder, Principles of Adsorption Chromatography, 1968 —
 * both from memory), with a shared slope prior so a compound measured at one strength still gets a line. With
 * three or more distinct strengths the quadratic term lets it bend — the second-order retention model familiar
 * from Schoenmakers, Billiet & de Galan, J. Chromatogr. 1979, 185, 179–195 (ln k quadratic in composition; from
 * memory) — because over a wide range RM against strength is not straight (a spot at Rf 0.16, 0.41 and 0.70 in
 * 1 : 5, 1 : 1 and 5 : 1 Et2O : hexane, a fact of the trade: any two points miss the third by 0.10–0.15).
 */
export function fitLine(points: readonly RetentionPoint[], prior: number, centre: number): RetentionLine {
  let n = 0;
  let sx = 0;
  let sxx = 0;
  let sx3 = 0;
  let sx4 = 0;
  let sy = 0;
  let sxy = 0;
  let sxxy = 0;
  for (const point of points) {
    const x = point.epsilon - centre;
    n += 1;
    sx += x;
    sxx += x * x;
    sx3 += x ** 3;
    sx4 += x ** 4;
    sy += point.rm;
    sxy += x * point.rm;
    sxxy += x * x * point.rm;
  }
  const strengths = points.map((point) => point.epsilon);
  const span: [number, number] = [Math.min(...strengths), Math.max(...strengths)];
  const distinct = new Set(strengths.map((value) => Math.round(value * 1e4))).size;
  if (distinct >= 3) {
    const solved = solve3(
      [
        [n, sx, sxx],
        [sx, sxx + bentSlopePriorWeight, sx3],
        [sxx, sx3, sx4 + curvaturePenalty],
      ],
      [sy, sxy + bentSlopePriorWeight * prior, sxxy],
    );
    if (solved) return { a: solved[0], b: solved[1], c: solved[2], centre, span, points: n };
  }
  const b11 = sxx + slopePriorWeight;
  const r2 = sxy + slopePriorWeight * prior;
  const determinant = n * b11 - sx * sx;
  const a = (sy * b11 - sx * r2) / determinant;
  const b = (n * r2 - sx * sy) / determinant;
  return { a, b, c: 0, centre, span, points: n };
}

/** RM on the curve at a strength; beyond the measured span a bent curve continues along its tangent at the end. */
export function lineAt(line: RetentionLine, epsilon: number): number {
  const quadratic = (e: number) => line.a + line.b * (e - line.centre) + line.c * (e - line.centre) ** 2;
  if (line.c === 0 || (epsilon >= line.span[0] && epsilon <= line.span[1])) return quadratic(epsilon);
  const end = epsilon < line.span[0] ? line.span[0] : line.span[1];
  return quadratic(end) + (line.b + 2 * line.c * (end - line.centre)) * (epsilon - end);
}

/** Distance in ε° from a strength to the span a line was measured over (0 inside it). */
export const distanceToSpan = (line: RetentionLine, epsilon: number) =>
  Math.max(line.span[0] - epsilon, epsilon - line.span[1], 0);
