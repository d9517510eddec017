/**
 * Dense symmetric positive-definite algebra for the Scout regression: Cholesky factor, triangular solves and
 * the diagonal of the inverse (textbook algorithms, e.g. Golub & Van Loan, Matrix Computations, ch. 4).
 * Matrices are row-major Float64Arrays of n × n.
 */

/** Lower-triangular L with A = L·Lᵀ; throws when A is not positive definite. */
export function cholesky(matrix: Float64Array, n: number): Float64Array {
  const lower = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = matrix[i * n + j];
      const rowI = i * n;
      const rowJ = j * n;
      for (let k = 0; k < j; k++) sum -= lower[rowI + k] * lower[rowJ + k];
      if (i === j) {
        if (!(sum > 0)) throw new RangeError('The kernel matrix is not positive definite.');
        lower[rowI + i] = Math.sqrt(sum);
      } else {
        lower[rowI + j] = sum / lower[rowJ + j];
      }
    }
  }
  return lower;
}

/** Solves L·x = b for lower-triangular L. */
export function solveLower(lower: Float64Array, n: number, b: ArrayLike<number>): Float64Array {
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let sum = b[i];
    const row = i * n;
    for (let k = 0; k < i; k++) sum -= lower[row + k] * x[k];
    x[i] = sum / lower[row + i];
  }
  return x;
}

/** Solves Lᵀ·x = b for lower-triangular L. */
function solveUpper(lower: Float64Array, n: number, b: ArrayLike<number>): Float64Array {
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let sum = b[i];
    for (let k = i + 1; k < n; k++) sum -= lower[k * n + i] * x[k];
    x[i] = sum / lower[i * n + i];
  }
  return x;
}

/** Solves A·x = b given A's Cholesky factor. */
export function solveCholesky(lower: Float64Array, n: number, b: ArrayLike<number>): Float64Array {
  return solveUpper(lower, n, solveLower(lower, n, b));
}

/** diag(A⁻¹) from A's Cholesky factor: A⁻¹ = L⁻ᵀL⁻¹, so (A⁻¹)_ii = Σ_k (L⁻¹)_ki². */
export function inverseDiagonal(lower: Float64Array, n: number): Float64Array {
  const inverse = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    inverse[j * n + j] = 1 / lower[j * n + j];
    for (let i = j + 1; i < n; i++) {
      let sum = 0;
      const row = i * n;
      for (let k = j; k < i; k++) sum -= lower[row + k] * inverse[k * n + j];
      inverse[row + j] = sum / lower[row + i];
    }
  }
  const diagonal = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let sum = 0;
    for (let k = i; k < n; k++) sum += inverse[k * n + i] ** 2;
    diagonal[i] = sum;
  }
  return diagonal;
}

export function dot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let sum = 0;
  for (let i = 0; i < a.length; i++) sum += a[i] * b[i];
  return sum;
}
