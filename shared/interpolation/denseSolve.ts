/**
 * LU factorisation with partial pivoting in place on a row-major n×n Float64Array (Golub & Van Loan 2013,
 * Matrix Computations, 4th ed., alg. 3.4.1). Own code rather than ml-matrix because the kriging loop solves
 * tens of thousands of 17×17 systems and must reuse preallocated buffers without creating objects.
 * Returns false when a pivot vanishes (the system is singular to working precision).
 * @example
 * const a = new Float64Array([0, 1, 2, 1]), piv = new Int32Array(2);
 * luFactor(a, 2, piv); // true; then luSolve(a, 2, piv, b) solves [0 1; 2 1]·x = b
 */
export function luFactor(a: Float64Array, n: number, pivots: Int32Array): boolean {
  let scale = 0;
  for (let i = 0; i < n * n; i++) {
    const v = Math.abs(a[i]);
    if (v > scale) scale = v;
  }
  const tiny = scale * 1e-14;
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = Math.abs(a[k * n + k]);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (!(best > tiny)) return false;
    pivots[k] = p;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j];
        a[k * n + j] = a[p * n + j];
        a[p * n + j] = t;
      }
    }
    const inv = 1 / a[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const f = (a[i * n + k] *= inv);
      if (f === 0) continue;
      for (let j = k + 1; j < n; j++) a[i * n + j] -= f * a[k * n + j];
    }
  }
  return true;
}

/**
 * Solves A·x = b in place in `b`, with A as factored by `luFactor`.
 * @example
 * const b = new Float64Array([1, 3]);
 * luSolve(a, 2, piv, b); // b = [1, 1] for A = [0 1; 2 1]
 */
export function luSolve(lu: Float64Array, n: number, pivots: Int32Array, b: Float64Array): void {
  for (let k = 0; k < n; k++) {
    const p = pivots[k];
    if (p !== k) {
      const t = b[k];
      b[k] = b[p];
      b[p] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    let s = b[i];
    for (let j = 0; j < i; j++) s -= lu[i * n + j] * b[j];
    b[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i];
    for (let j = i + 1; j < n; j++) s -= lu[i * n + j] * b[j];
    b[i] = s / lu[i * n + i];
  }
}
