import { rfToRm, rmToRf } from './rf';

/** One measured Rf at a fraction (0, 1] of the strong solvent. */
export interface FractionRf {
  fraction: number;
  rf: number;
}

/**
 * Measured Rf values are clamped into this range before RM is taken, so a spot on the origin or at the
 * front does not give an infinite RM (project choice; the open dataset's README also asks for clamping).
 */
export const rfClampRange = [0.01, 0.99] as const;

export interface SoczewinskiFit {
  /** d RM / d log10(x); negative when more strong solvent moves the spot further. */
  slope: number;
  /** RM at x = 1 (pure strong solvent). */
  intercept: number;
  /** Coefficient of determination of RM on log10(x); 1 by construction for two points. */
  r2: number;
  n: number;
  /** Smallest and largest fraction fitted; predictions outside are extrapolations. */
  fractionRange: [number, number];
  /** Points whose Rf had to be clamped into rfClampRange. */
  clampedPoints: number;
  equation: string;
}

const clampRf = (rf: number) => Math.min(Math.max(rf, rfClampRange[0]), rfClampRange[1]);

/**
 * Least-squares fit of RM = intercept + slope·log10(x) for one compound in one solvent pair, x the fraction of
 * the strong solvent (E. Soczewiński, Anal. Chem. 1969, 41, 179; journal details from memory). Needs two or more
 * distinct fractions.
 */
export function fitSoczewinski(points: readonly FractionRf[]): SoczewinskiFit {
  for (const { fraction, rf } of points) {
    if (!(fraction > 0 && fraction <= 1)) throw new RangeError(`Fractions must lie in (0, 1]; got ${fraction}.`);
    if (!Number.isFinite(rf)) throw new RangeError(`Rf must be a number; got ${rf}.`);
  }
  const xs = points.map((point) => Math.log10(point.fraction));
  const ys = points.map((point) => rfToRm(clampRf(point.rf)));
  const n = points.length;
  const meanX = xs.reduce((sum, value) => sum + value, 0) / n;
  const meanY = ys.reduce((sum, value) => sum + value, 0) / n;
  const sxx = xs.reduce((sum, value) => sum + (value - meanX) ** 2, 0);
  if (n < 2 || sxx < 1e-12) throw new RangeError('The fit needs Rf values at two or more different fractions.');
  const sxy = xs.reduce((sum, value, index) => sum + (value - meanX) * (ys[index] - meanY), 0);
  const slope = sxy / sxx;
  const intercept = meanY - slope * meanX;
  const ssTotal = ys.reduce((sum, value) => sum + (value - meanY) ** 2, 0);
  const ssResidual = ys.reduce((sum, value, index) => sum + (value - intercept - slope * xs[index]) ** 2, 0);
  const fractions = points.map((point) => point.fraction);
  return {
    slope,
    intercept,
    r2: ssTotal === 0 ? 1 : 1 - ssResidual / ssTotal,
    n,
    fractionRange: [Math.min(...fractions), Math.max(...fractions)],
    clampedPoints: points.filter((point) => clampRf(point.rf) !== point.rf).length,
    equation: 'Soczewiński: RM = a + b·log10(x), RM = log10((1 − Rf)/Rf), x the strong solvent’s fraction',
  };
}

const outside = (fit: SoczewinskiFit, fraction: number) =>
  fraction < fit.fractionRange[0] * (1 - 1e-9) || fraction > fit.fractionRange[1] * (1 + 1e-9);

/** Rf predicted by a fit at strong-solvent fraction x, flagged when x lies outside the fitted fractions. */
export function predictRf(fit: SoczewinskiFit, fraction: number): { rf: number; extrapolated: boolean } {
  if (!(fraction > 0 && fraction <= 1)) throw new RangeError(`Fractions must lie in (0, 1]; got ${fraction}.`);
  return { rf: rmToRf(fit.intercept + fit.slope * Math.log10(fraction)), extrapolated: outside(fit, fraction) };
}

export interface FractionForRf {
  /** Strong-solvent fraction giving the target Rf, clamped to (0, 1]. */
  fraction: number;
  extrapolated: boolean;
  /** False when even the pure strong solvent (x = 1) cannot move the spot that far, or the slope is not negative. */
  reachable: boolean;
  /** Rf the model gives at the returned fraction. */
  rf: number;
}

/** Strong-solvent fraction that the fit says gives a target Rf (inverse of predictRf). */
export function fractionForRf(fit: SoczewinskiFit, targetRf: number): FractionForRf {
  if (!(targetRf > 0 && targetRf < 1)) throw new RangeError(`Target Rf must lie in (0, 1); got ${targetRf}.`);
  if (fit.slope >= 0) {
    const fraction = fit.fractionRange[1];
    return { fraction, extrapolated: false, reachable: false, rf: predictRf(fit, fraction).rf };
  }
  const logFraction = (rfToRm(targetRf) - fit.intercept) / fit.slope;
  const fraction = Math.min(10 ** logFraction, 1);
  return {
    fraction,
    extrapolated: outside(fit, fraction),
    reachable: logFraction <= 1e-9,
    rf: predictRf(fit, fraction).rf,
  };
}
