/**
 * LU factorisation with partial pivoting, in place, of a dense n x n matrix stored row-major.
 * Returns false when a pivot is exactly zero (singular matrix); the caller shrinks its step.
 */
export function luFactorInPlace(a: Float64Array, n: number, pivots: Int32Array): boolean {
  for (let k = 0; k < n; k++) {
    let pivotRow = k;
    let pivotAbs = Math.abs(a[k * n + k]!);
    for (let i = k + 1; i < n; i++) {
      const v = Math.abs(a[i * n + k]!);
      if (v > pivotAbs) {
        pivotAbs = v;
        pivotRow = i;
      }
    }
    pivots[k] = pivotRow;
    if (pivotAbs === 0) return false;
    if (pivotRow !== k) {
      for (let j = 0; j < n; j++) {
        const t = a[k * n + j]!;
        a[k * n + j] = a[pivotRow * n + j]!;
        a[pivotRow * n + j] = t;
      }
    }
    const inversePivot = 1 / a[k * n + k]!;
    for (let i = k + 1; i < n; i++) {
      const factor = a[i * n + k]! * inversePivot;
      if (factor === 0) continue;
      a[i * n + k] = factor;
      for (let j = k + 1; j < n; j++) a[i * n + j] = a[i * n + j]! - factor * a[k * n + j]!;
    }
  }
  return true;
}

/** Solves A x = b in place (b becomes x) with the factors from luFactorInPlace. */
export function luSolveInPlace(lu: Float64Array, n: number, pivots: Int32Array, b: Float64Array): void {
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) {
      const t = b[k]!;
      b[k] = b[p]!;
      b[p] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    let s = b[i]!;
    for (let j = 0; j < i; j++) s -= lu[i * n + j]! * b[j]!;
    b[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= lu[i * n + j]! * b[j]!;
    b[i] = s / lu[i * n + i]!;
  }
}
