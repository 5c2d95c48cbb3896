/**
 * Right and left eigenvectors of one eigenvalue of the whole state matrix, for first-order
 * eigenvalue sensitivities d lambda = y^T (dA) x / (y^T x), with A x = lambda x and
 * A^T y = lambda y (Wilkinson, The Algebraic Eigenvalue Problem, 1965, ch. 2; the same
 * formula with y^H for the conjugate-transposed left vector).
 *
 * The vectors come from inverse iteration on A - mu I (Golub and Van Loan, Matrix
 * Computations, 4th ed., 7.6.1) with mu a hair off the eigenvalue, so that the vectors span
 * the whole model (a lateral root's right vector has a heading part, its left vector none),
 * not only the structural block the eigenvalue was found in. Pure.
 */
import type { Complex } from '../types.js';

export interface RootVectors {
  /** right eigenvector, real and imaginary parts */
  xr: Float64Array;
  xi: Float64Array;
  /** left eigenvector (A^T y = lambda y) */
  yr: Float64Array;
  yi: Float64Array;
  /** y^T x */
  dot: Complex;
  /** ||y|| ||x|| / |y^T x|: 1 for a normal matrix, unbounded as the root becomes defective */
  conditionNumber: number;
}

/** Relative offset of the inverse-iteration shift from the eigenvalue. */
const SHIFT = 1e-10;
/** Inverse-iteration steps: each multiplies the error by |mu - lambda| / gap (about 1e-10). */
const STEPS = 2;

export function rootVectors(A: readonly (readonly number[])[], lambda: Complex): RootVectors {
  const n = A.length;
  let scale = Math.hypot(lambda.re, lambda.im);
  for (const row of A) for (const a of row) scale = Math.max(scale, Math.abs(a));
  const mu = { re: lambda.re + SHIFT * scale, im: lambda.im + SHIFT * scale };
  const [xr, xi] = nullVector(A, mu, false);
  const [yr, yi] = nullVector(A, mu, true);
  let dr = 0;
  let di = 0;
  let nx = 0;
  let ny = 0;
  for (let k = 0; k < n; k += 1) {
    dr += yr[k]! * xr[k]! - yi[k]! * xi[k]!;
    di += yr[k]! * xi[k]! + yi[k]! * xr[k]!;
    nx += xr[k]! ** 2 + xi[k]! ** 2;
    ny += yr[k]! ** 2 + yi[k]! ** 2;
  }
  const size = Math.hypot(dr, di);
  const conditionNumber = size > 0 ? Math.sqrt(nx * ny) / size : Infinity;
  return { xr, xi, yr, yi, dot: { re: dr, im: di }, conditionNumber };
}

/** One entry of a real change of the state matrix: dA[i][j] = d. */
export interface SparseEntry {
  i: number;
  j: number;
  d: number;
}

/** d lambda = y^T dA x / (y^T x) for a real change dA of the state matrix, given by its entries that are not 0. */
export function eigenvalueChange(vectors: RootVectors, dA: readonly SparseEntry[]): Complex {
  const { xr, xi, yr, yi, dot } = vectors;
  let sr = 0;
  let si = 0;
  for (const { i, j, d } of dA) {
    // y_i d x_j
    sr += d * (yr[i]! * xr[j]! - yi[i]! * xi[j]!);
    si += d * (yr[i]! * xi[j]! + yi[i]! * xr[j]!);
  }
  const q = dot.re * dot.re + dot.im * dot.im;
  return { re: (sr * dot.re + si * dot.im) / q, im: (si * dot.re - sr * dot.im) / q };
}

/** A vector of the near-null space of (A - mu I), or of its transpose, by inverse iteration. */
function nullVector(A: readonly (readonly number[])[], mu: Complex, transpose: boolean): [Float64Array, Float64Array] {
  const n = A.length;
  const mr = new Float64Array(n * n);
  const mi = new Float64Array(n * n);
  for (let i = 0; i < n; i += 1) {
    for (let j = 0; j < n; j += 1) mr[i * n + j] = transpose ? A[j]![i]! : A[i]![j]!;
    mr[i * n + i]! -= mu.re;
    mi[i * n + i] = -mu.im;
  }
  const pivots = luInPlace(mr, mi, n);
  let br: Float64Array = new Float64Array(n);
  let bi: Float64Array = new Float64Array(n);
  // a start with a part along every eigenvector (no component is special)
  for (let k = 0; k < n; k += 1) br[k] = 1 + k / (n + 1);
  for (let step = 0; step < STEPS; step += 1) {
    [br, bi] = luSolve(mr, mi, pivots, n, br, bi);
    let big = 0;
    for (let k = 0; k < n; k += 1) big = Math.max(big, Math.hypot(br[k]!, bi[k]!));
    for (let k = 0; k < n; k += 1) {
      br[k]! /= big;
      bi[k]! /= big;
    }
  }
  return [br, bi];
}

/** Complex LU with partial pivoting, in place; a zero pivot is replaced by a tiny one (inverse iteration wants it near singular). */
function luInPlace(mr: Float64Array, mi: Float64Array, n: number): Int32Array {
  const pivots = new Int32Array(n);
  let norm = 0;
  for (let k = 0; k < n * n; k += 1) norm = Math.max(norm, Math.hypot(mr[k]!, mi[k]!));
  const tiny = Number.EPSILON * (norm > 0 ? norm : 1);
  for (let k = 0; k < n; k += 1) {
    let p = k;
    let best = -1;
    for (let i = k; i < n; i += 1) {
      const size = Math.hypot(mr[i * n + k]!, mi[i * n + k]!);
      if (size > best) {
        best = size;
        p = i;
      }
    }
    pivots[k] = p;
    if (p !== k) {
      for (let j = 0; j < n; j += 1) {
        swap(mr, k * n + j, p * n + j);
        swap(mi, k * n + j, p * n + j);
      }
    }
    if (best < tiny) {
      mr[k * n + k] = tiny;
      mi[k * n + k] = 0;
    }
    const pr = mr[k * n + k]!;
    const pi = mi[k * n + k]!;
    const pq = pr * pr + pi * pi;
    for (let i = k + 1; i < n; i += 1) {
      const ar = mr[i * n + k]!;
      const ai = mi[i * n + k]!;
      // l = a / pivot
      const lr = (ar * pr + ai * pi) / pq;
      const li = (ai * pr - ar * pi) / pq;
      mr[i * n + k] = lr;
      mi[i * n + k] = li;
      for (let j = k + 1; j < n; j += 1) {
        const ur = mr[k * n + j]!;
        const ui = mi[k * n + j]!;
        mr[i * n + j]! -= lr * ur - li * ui;
        mi[i * n + j]! -= lr * ui + li * ur;
      }
    }
  }
  return pivots;
}

function luSolve(mr: Float64Array, mi: Float64Array, pivots: Int32Array, n: number, br: Float64Array, bi: Float64Array): [Float64Array, Float64Array] {
  const xr = Float64Array.from(br);
  const xi = Float64Array.from(bi);
  for (let k = 0; k < n; k += 1) {
    const p = pivots[k]!;
    if (p !== k) {
      swap(xr, k, p);
      swap(xi, k, p);
    }
  }
  for (let i = 0; i < n; i += 1) {
    for (let j = 0; j < i; j += 1) {
      const lr = mr[i * n + j]!;
      const li = mi[i * n + j]!;
      xr[i]! -= lr * xr[j]! - li * xi[j]!;
      xi[i]! -= lr * xi[j]! + li * xr[j]!;
    }
  }
  for (let i = n - 1; i >= 0; i -= 1) {
    for (let j = i + 1; j < n; j += 1) {
      const ur = mr[i * n + j]!;
      const ui = mi[i * n + j]!;
      xr[i]! -= ur * xr[j]! - ui * xi[j]!;
      xi[i]! -= ur * xi[j]! + ui * xr[j]!;
    }
    const pr = mr[i * n + i]!;
    const pi = mi[i * n + i]!;
    const pq = pr * pr + pi * pi;
    const r = xr[i]!;
    const m = xi[i]!;
    xr[i] = (r * pr + m * pi) / pq;
    xi[i] = (m * pr - r * pi) / pq;
  }
  return [xr, xi];
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i]!;
  a[i] = a[j]!;
  a[j] = t;
}
