/**
 * Inverse of a small dense real matrix (row-major, n x n) by Gauss-Jordan elimination with
 * partial pivoting, in place: `a` is destroyed and `inv` receives the inverse. Returns false
 * when a pivot falls below `singularPivot`, which the caller chooses for an equilibrated
 * matrix (entries of order 1). Buffers come from the caller so that a sweep of thousands of
 * conditions allocates nothing here.
 */
export function invertInPlace(a: Float64Array, inv: Float64Array, n: number, singularPivot: number): boolean {
  inv.fill(0, 0, n * n);
  for (let i = 0; i < n; i += 1) inv[i * n + i] = 1;

  for (let col = 0; col < n; col += 1) {
    let pivotRow = col;
    let pivotSize = Math.abs(a[col * n + col]!);
    for (let r = col + 1; r < n; r += 1) {
      const size = Math.abs(a[r * n + col]!);
      if (size > pivotSize) {
        pivotSize = size;
        pivotRow = r;
      }
    }
    if (!(pivotSize > singularPivot)) return false;
    if (pivotRow !== col) {
      swapRows(a, n, col, pivotRow);
      swapRows(inv, n, col, pivotRow);
    }
    const scale = 1 / a[col * n + col]!;
    for (let j = 0; j < n; j += 1) {
      a[col * n + j]! *= scale;
      inv[col * n + j]! *= scale;
    }
    for (let r = 0; r < n; r += 1) {
      if (r === col) continue;
      const factor = a[r * n + col]!;
      if (factor === 0) continue;
      for (let j = 0; j < n; j += 1) {
        a[r * n + j]! -= factor * a[col * n + j]!;
        inv[r * n + j]! -= factor * inv[col * n + j]!;
      }
    }
  }
  return true;
}

function swapRows(m: Float64Array, n: number, r1: number, r2: number): void {
  for (let j = 0; j < n; j += 1) {
    const t = m[r1 * n + j]!;
    m[r1 * n + j] = m[r2 * n + j]!;
    m[r2 * n + j] = t;
  }
}

/** Induced 1-norm (largest absolute column sum) of a row-major n x n matrix. */
export function oneNorm(m: Float64Array, n: number): number {
  let best = 0;
  for (let j = 0; j < n; j += 1) {
    let sum = 0;
    for (let i = 0; i < n; i += 1) sum += Math.abs(m[i * n + j]!);
    if (sum > best) best = sum;
  }
  return best;
}
