/** One retention point of a compound in a pair: Snyder ε° of the eluent and RM = log10((1 − Rf)/Rf). */
export interface RetentionPoint {
  epsilon: number;
  rm: number;
}

/** A compound's retention line in one pair, RM = a + b·(ε° − centre), with the ε° span it was measured over. */
export interface RetentionLine {
  a: number;
  b: number;
  centre: number;
  span: [number, number];
  points: number;
}

/**
 * Pooled within-compound slope dRM/dε° over compounds with two or more strengths (least squares after removing
 * each compound's mean). Default −5 when nothing can be pooled: in the open TLC data (Xu et al., Chem 2022)
 * pooled slopes lie between −5.2 and −5.9 for EtOAc, MeOH and Et2O pairs, which through Snyder's equation
 * (α·n_b ≈ 3) is Soczewiński's slope n ≈ 1.7 (REFERENCE.md: n usually 1–2, from memory).
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

/**
 * Fits a compound's line in a pair by penalised least squares: Σ(RM − a − b·(ε° − centre))² + κ·(b − prior)²
 * — Soczewiński's linear relation written on Snyder's ε° scale, with a shared slope prior so a compound
 * measured at one strength still gets a line.
 */
export function fitLine(points: readonly RetentionPoint[], prior: number, centre: number): RetentionLine {
  let n = 0;
  let sx = 0;
  let sxx = 0;
  let sy = 0;
  let sxy = 0;
  for (const point of points) {
    const x = point.epsilon - centre;
    n += 1;
    sx += x;
    sxx += x * x;
    sy += point.rm;
    sxy += x * point.rm;
  }
  const b11 = sxx + slopePriorWeight;
  const r2 = sxy + slopePriorWeight * prior;
  const determinant = n * b11 - sx * sx;
  const a = (sy * b11 - sx * r2) / determinant;
  const b = (n * r2 - sx * sy) / determinant;
  const strengths = points.map((point) => point.epsilon);
  return { a, b, centre, span: [Math.min(...strengths), Math.max(...strengths)], points: n };
}

export const lineAt = (line: RetentionLine, epsilon: number) => line.a + line.b * (epsilon - line.centre);

/** Distance in ε° from a strength to the span a line was measured over (0 inside it). */
export const distanceToSpan = (line: RetentionLine, epsilon: number) => Math.max(line.span[0] - epsilon, epsilon - line.span[1], 0);
