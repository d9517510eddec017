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
   * Ratio of squared leave-one-out residuals to their predicted variance on measured points (ideal 1);
   * multiplies predictive variances so intervals match how wrong the model really was on the knowledge set.
   */
  calibration: number;
}

/** Fits the process; `kernel(i, j)` is evaluated on positions in `indices`. */
export function fitGp(indices: Int32Array, y: Float64Array, weights: Float64Array, noise: number, kernel: (i: number, j: number) => number): GpFit {
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
  const alpha = solveCholesky(lower, n, Float64Array.from(y, (value) => value - mean));
  const inverse = inverseDiagonal(lower, n);
  let squared = 0;
  let counted = 0;
  for (let i = 0; i < n; i++) {
    if (weights[i] < 1) continue;
    squared += alpha[i] ** 2 / inverse[i];
    counted += 1;
  }
  const calibration = counted >= 5 ? Math.min(4, Math.max(0.25, squared / counted)) : 1;
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
