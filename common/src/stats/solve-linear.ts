/**
 * Solves the n×n system A·x = b (A row-major) by Gaussian elimination with partial pivoting
 * (Golub & Van Loan, Matrix Computations, §3.4). Works on copies. Returns null when a pivot is
 * below 1e-12 of the largest entry, i.e. the system is singular to working precision.
 */
export function solveLinear(matrix: ArrayLike<number>, rhs: ArrayLike<number>, n: number): Float64Array | null {
  const a = Float64Array.from(matrix);
  const x = Float64Array.from(rhs);
  let scale = 0;
  for (let i = 0; i < n * n; i++) scale = Math.max(scale, Math.abs(a[i]));
  if (scale === 0) return null;
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r * n + col]) > Math.abs(a[pivot * n + col])) pivot = r;
    if (Math.abs(a[pivot * n + col]) <= 1e-12 * scale) return null;
    if (pivot !== col) {
      for (let c = 0; c < n; c++) [a[col * n + c], a[pivot * n + c]] = [a[pivot * n + c], a[col * n + c]];
      [x[col], x[pivot]] = [x[pivot], x[col]];
    }
    for (let r = col + 1; r < n; r++) {
      const f = a[r * n + col] / a[col * n + col];
      if (f === 0) continue;
      for (let c = col; c < n; c++) a[r * n + c] -= f * a[col * n + c];
      x[r] -= f * x[col];
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = x[r];
    for (let c = r + 1; c < n; c++) s -= a[r * n + c] * x[c];
    x[r] = s / a[r * n + r];
  }
  return x;
}
