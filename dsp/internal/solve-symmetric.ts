/**
 * Solves A·x = b for a symmetric positive-definite n × n matrix A (row-major) by the Cholesky factorisation
 * A = L·Lᵀ (common practice; any numerical-analysis text). Returns null when A is not positive definite.
 * @example solveSymmetricPositive(Float64Array.of(4, 0, 0, 1), Float64Array.of(8, 1), 2) // [2, 1]
 */
export function solveSymmetricPositive(a: Float64Array, b: Float64Array, n: number): Float64Array | null {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i * n + j] as number;
      for (let k = 0; k < j; k++) s -= (l[i * n + k] as number) * (l[j * n + k] as number);
      if (i === j) {
        if (!(s > 0)) return null;
        l[i * n + i] = Math.sqrt(s);
      } else {
        l[i * n + j] = s / (l[j * n + j] as number);
      }
    }
  }
  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[i] as number;
    for (let k = 0; k < i; k++) s -= (l[i * n + k] as number) * (y[k] as number);
    y[i] = s / (l[i * n + i] as number);
  }
  const x = new Float64Array(n);
  for (let i = n - 1; i >= 0; i--) {
    let s = y[i] as number;
    for (let k = i + 1; k < n; k++) s -= (l[k * n + i] as number) * (x[k] as number);
    x[i] = s / (l[i * n + i] as number);
  }
  return x;
}
