import { cholesky, dot, inverseDiagonal, solveCholesky, solveLower } from './linear-algebra';

/**
 * Gaussian-process (kernel ridge) regression with per-point noise: y = f(x) + e, Cov f = K, Var e_i = λ / w_i
 * (Rasmussen & Williams, Gaussian Processes for Machine Learning, 2006, ch. 2 and §5.4.2 for the
 * leave-one-out identities). The weighted mean of y is taken out first.
 */
export interface GpFit {
  /** Positions of the training compounds in the model's compound list. */
  indices: Int32Array;
  mean: number;
  lower: Float64Array;
  alpha: Float64Array;
  noise: number;
  /**
   * Multiplies predictive variances so that ±1.645·sd holds 90 % of the leave-one-out residuals of the measured
   * points: (90th percentile of |residual| / sd, over 1.645)². Residuals have heavier tails than a normal, so the
   * mean of squared z (used before) left intervals covering only ~80 % (tests/bench/eval-scout.ts).
   */
  calibration: number;
}

/** z of a two-sided 90 % normal interval. */
const z90 = 1.645;
/** Share of measured points the calibrated ±1.645·sd interval must hold in leave-one-out (the "90 %" of the interval). */
const calibrationLevel = 0.9;

/** The q-quantile of values (linear between order statistics). */
function quantile(values: number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  const position = q * (sorted.length - 1);
  const low = Math.floor(position);
  const high = Math.min(sorted.length - 1, low + 1);
  return sorted[low] + (position - low) * (sorted[high] - sorted[low]);
}

/** Fits the process; `kernel(i, j)` is evaluated on positions in `indices`. */
export function fitGp(
  indices: Int32Array,
  y: Float64Array,
  weights: Float64Array,
  noise: number,
  kernel: (i: number, j: number) => number,
): GpFit {
  const n = indices.length;
  let weightSum = 0;
  let mean = 0;
  for (let i = 0; i < n; i++) {
    weightSum += weights[i];
    mean += weights[i] * y[i];
  }
  mean /= weightSum;
  const matrix = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      const value = kernel(indices[i], indices[j]);
      matrix[i * n + j] = value;
      matrix[j * n + i] = value;
    }
    matrix[i * n + i] += noise / weights[i];
  }
  const lower = cholesky(matrix, n);
  const alpha = solveCholesky(
    lower,
    n,
    Float64Array.from(y, (value) => value - mean),
  );
  const inverse = inverseDiagonal(lower, n);
  const squared: number[] = [];
  for (let i = 0; i < n; i++) if (weights[i] >= 1) squared.push(alpha[i] ** 2 / inverse[i]);
  const calibration =
    squared.length >= 5 ? Math.min(6, Math.max(0.01, quantile(squared, calibrationLevel) / z90 ** 2)) : 1;
  return { indices, mean, lower, alpha, noise, calibration };
}

export interface GpPrediction {
  mean: number;
  /** Variance of a new measurement at the query (latent variance + noise), calibrated. */
  variance: number;
}

/** Prediction at a query with kernel values `kq` to the training points (in fit order) and `kqq` to itself. */
export function predictGp(fit: GpFit, kq: Float64Array, kqq: number): GpPrediction {
  const n = fit.indices.length;
  const v = solveLower(fit.lower, n, kq);
  const latent = Math.max(kqq - dot(v, v), 0);
  return { mean: fit.mean + dot(kq, fit.alpha), variance: fit.calibration * (latent + fit.noise) };
}

/** The prediction as a weighted sum of the training values: weights A⁻¹·kq (the equivalent kernel). */
export function smootherWeights(fit: GpFit, kq: Float64Array): Float64Array {
  return solveCholesky(fit.lower, fit.indices.length, kq);
}
