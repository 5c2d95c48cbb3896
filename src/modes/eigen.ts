/**
 * Eigenvalues with right and left eigenvectors of a real state matrix.
 *
 * The matrix is balanced first (balance.ts) so mixed state units cost no accuracy.
 * The real Schur route (real-eigen.ts: Hessenberg reduction and shifted QR) returns real
 * eigenvectors V: for a complex pair in columns j, j+1 (imaginary part of eigenvalue j
 * positive) the eigenvector of lambda_j is V[:,j] + i V[:,j+1] and that of its conjugate
 * V[:,j] - i V[:,j+1]. Writing the complex eigenvector matrix as Vc = V P with
 * P = [[1, 1], [i, -i]] on each pair gives the left eigenvectors Wc = Vc^-1 = P^-1 V^-1 with
 * P^-1 = 1/2 [[1, -i], [1, i]]: only the real inverse of V is needed (Golub and Van Loan,
 * Matrix Computations, 4th ed., ch. 7; the row-j relation Wc A = Lambda Wc defines the
 * left eigenvectors, normalised so that w_j v_j = 1).
 */
import type { Complex } from '../types.js';
import { InternalError } from '../errors.js';
import { balanceInto } from './balance.js';
import { realEigen, realEigenvalues } from './real-eigen.js';
import { invertInPlace, oneNorm } from './real-inverse.js';

export interface ComplexVector {
  re: number[];
  im: number[];
}

export interface Eigensystem {
  /** number of states */
  n: number;
  /** [1/s] eigenvalues; a complex pair is adjacent with the positive imaginary part first */
  values: Complex[];
  /** right eigenvector of each eigenvalue (components in the units of the states) */
  right: ComplexVector[];
  /** left eigenvector of each eigenvalue (row of V^-1, so w_j v_j = 1); null when V is singular */
  left: ComplexVector[] | null;
  /**
   * 1-norm condition number of the eigenvector matrix after row and column equilibration:
   * about 1 for well separated modes, large when two roots nearly coalesce (defective matrix),
   * Infinity when V is numerically singular.
   */
  conditioning: number;
  /**
   * [1/s] first-order bound on the rounding error of each eigenvalue: n eps ||B||_F kappa_j,
   * with B the scaled and balanced matrix actually reduced and kappa_j = ||w_j|| ||v_j|| the
   * eigenvalue's condition number (Golub and Van Loan, 4th ed., 7.2.2); sqrt(eps) ||B||_F for
   * every root when V is singular (a defective root moves by about the square root).
   */
  errorBound: number[];
}

/**
 * A matrix whose largest entry lies outside [2^-40, 2^40] is first multiplied by a power of 2
 * that brings it to about 1 (exact: only the exponent changes), and the eigenvalues divided by
 * it afterwards: the QR iteration squares entries, which underflow near 1e-300 (complex pairs
 * then split and damping ratios become infinite) and overflow near 1e200 (it stops). Ordinary
 * models (entries of 1e-6 to 1e4) are left as they are, digit for digit.
 */
const SCALE_ABOVE = 2 ** 40;
const SCALE_BELOW = 2 ** -40;

/** Below this pivot the equilibrated eigenvector matrix is treated as singular. */
const SINGULAR_PIVOT = 1e-12;
/** Largest ratio of state scales that equilibration undoes. */
const ROW_SCALE_RANGE = 1e6;

/**
 * Work buffers, reused from call to call: a sweep analyses thousands of small blocks and
 * typed-array allocation would cost more than the arithmetic. Nothing is kept between calls.
 */
let work = emptyBuffers(0);

function emptyBuffers(n: number) {
  const m = n * n;
  return {
    size: n,
    balanced: new Float64Array(m),
    scale: new Float64Array(n),
    v: new Float64Array(m),
    scaled: new Float64Array(m),
    inverse: new Float64Array(m),
    row: new Float64Array(n),
    col: new Float64Array(n),
  };
}

function buffers(n: number): typeof work {
  if (work.size < n) work = emptyBuffers(n);
  return work;
}

export function eigenDecompose(A: readonly (readonly number[])[]): Eigensystem {
  const n = A.length;
  if (n === 1) return scalarSystem(A[0]![0]!);

  const { balanced, scale, v, scaled, inverse, row: rowScale, col: colScale } = buffers(n);
  const factor = rangeFactor(A);
  balanceInto(factor === 1 ? A : A.map((r) => r.map((x) => x * factor)), balanced, scale);
  const normB = frobenius(balanced, n);
  const { d: re, e: im, V } = realEigen(balanced, n);
  if (factor !== 1) {
    for (let j = 0; j < n; j += 1) {
      re[j]! /= factor;
      im[j]! /= factor;
    }
  }

  // Equilibrate V (rows by state, then columns by mode) so the singularity test and the
  // conditioning do not depend on state units or on the arbitrary eigenvector scaling.
  let largestRow = 0;
  for (let i = 0; i < n; i += 1) {
    let big = 0;
    for (let j = 0; j < n; j += 1) {
      const x = scale[i]! * V[i * n + j]!; // back to the states of A: v_A = D v_B
      v[i * n + j] = x;
      if (Math.abs(x) > big) big = Math.abs(x);
    }
    rowScale[i] = big;
    if (big > largestRow) largestRow = big;
  }
  // Row scales are capped at ROW_SCALE_RANGE below the largest row: state units rarely differ
  // by more, while a row that is only rounding noise (the second vector of a Jordan block)
  // must not be blown up into a well-conditioned one.
  for (let i = 0; i < n; i += 1) {
    const big = Math.max(rowScale[i]!, largestRow / ROW_SCALE_RANGE);
    rowScale[i] = big > 0 ? 1 / big : 1;
  }
  for (let j = 0; j < n; j += 1) {
    let big = 0;
    for (let i = 0; i < n; i += 1) {
      const x = Math.abs(v[i * n + j]! * rowScale[i]!);
      if (x > big) big = x;
    }
    colScale[j] = big > 0 ? 1 / big : 1;
  }
  for (let i = 0; i < n; i += 1) {
    for (let j = 0; j < n; j += 1) scaled[i * n + j] = rowScale[i]! * v[i * n + j]! * colScale[j]!;
  }
  const norm = oneNorm(scaled, n);
  const invertible = invertInPlace(scaled, inverse, n, SINGULAR_PIVOT);
  let conditioning = Infinity;
  if (invertible) {
    conditioning = norm * oneNorm(inverse, n);
    // V = Dr^-1 S Dc^-1, so V^-1 = Dc S^-1 Dr.
    for (let i = 0; i < n; i += 1) {
      for (let j = 0; j < n; j += 1) inverse[i * n + j] = colScale[i]! * inverse[i * n + j]! * rowScale[j]!;
    }
  }

  const values: Complex[] = new Array(n);
  const right: ComplexVector[] = new Array(n);
  const left: ComplexVector[] | null = invertible ? new Array(n) : null;
  for (let j = 0; j < n; j += 1) {
    const imag = im[j]!;
    if (imag === 0) {
      values[j] = { re: re[j]!, im: 0 };
      right[j] = { re: column(v, n, j, 1), im: zeros(n) };
      if (left !== null) left[j] = { re: row(inverse, n, j, 1), im: zeros(n) };
      continue;
    }
    if (!(imag > 0) || j + 1 >= n || im[j + 1] !== -imag) {
      throw new InternalError(`eigenvalue solver returned an unpaired complex eigenvalue at ${j}`);
    }
    values[j] = { re: re[j]!, im: imag };
    values[j + 1] = { re: re[j + 1]!, im: -imag };
    const x = column(v, n, j, 1);
    right[j] = { re: x, im: column(v, n, j + 1, 1) };
    right[j + 1] = { re: x, im: column(v, n, j + 1, -1) };
    if (left !== null) {
      const half = row(inverse, n, j, 0.5);
      left[j] = { re: half, im: row(inverse, n, j + 1, -0.5) };
      left[j + 1] = { re: half, im: row(inverse, n, j + 1, 0.5) };
    }
    j += 1;
  }
  const errorBound = new Array<number>(n);
  for (let j = 0; j < n; j += 1) {
    if (left === null) {
      errorBound[j] = (Math.sqrt(Number.EPSILON) * normB) / factor;
      continue;
    }
    // kappa of B's eigenvalue: B's vectors are v_B = D^-1 v_A and w_B = w_A D
    let vv = 0;
    let ww = 0;
    for (let k = 0; k < n; k += 1) {
      const d = scale[k]!;
      vv += (right[j]!.re[k]! / d) ** 2 + (right[j]!.im[k]! / d) ** 2;
      ww += (left[j]!.re[k]! * d) ** 2 + (left[j]!.im[k]! * d) ** 2;
    }
    errorBound[j] = (n * Number.EPSILON * normB * Math.sqrt(vv * ww)) / factor;
  }
  return { n, values, right, left, conditioning, errorBound };
}

/** The power of 2 that brings the largest entry of A to about 1, or 1 when it is in range. */
function rangeFactor(A: readonly (readonly number[])[]): number {
  let big = 0;
  for (const row of A) for (const x of row) if (Math.abs(x) > big) big = Math.abs(x);
  if (big === 0 || (big <= SCALE_ABOVE && big >= SCALE_BELOW)) return 1;
  return 2 ** -Math.round(Math.log2(big));
}

function frobenius(m: Float64Array, n: number): number {
  let sum = 0;
  for (let k = 0; k < n * n; k += 1) sum += m[k]! * m[k]!;
  return Math.sqrt(sum);
}

/**
 * Eigenvalues only, balanced as in eigenDecompose and in the same order, equal to its
 * `values` bit for bit; no eigenvectors, no inverse (about a third of the work).
 */
export function eigenvalues(A: readonly (readonly number[])[]): Complex[] {
  const n = A.length;
  if (n === 1) return [{ re: A[0]![0]!, im: 0 }];
  const { balanced, scale } = buffers(n);
  balanceInto(A, balanced, scale);
  const { d: re, e: im } = realEigenvalues(balanced, n);
  const values: Complex[] = new Array(n);
  for (let j = 0; j < n; j += 1) {
    const imag = im[j]!;
    if (imag === 0) {
      values[j] = { re: re[j]!, im: 0 };
      continue;
    }
    if (!(imag > 0) || j + 1 >= n || im[j + 1] !== -imag) {
      throw new InternalError(`eigenvalue solver returned an unpaired complex eigenvalue at ${j}`);
    }
    values[j] = { re: re[j]!, im: imag };
    values[j + 1] = { re: re[j + 1]!, im: -imag };
    j += 1;
  }
  return values;
}

/**
 * Participation of each state in eigenvalue j: p_k = |w_jk v_kj| normalised to sum 1
 * (Perez-Arriaga, Verghese and Schweppe, IEEE Trans. PAS-101, 1982). Invariant to state
 * scaling and ordering. When V is singular (a defective root) the left eigenvectors do not
 * exist; the fallback is the right-eigenvector magnitude per state, each state scaled by its
 * largest component over all modes, which is still free of state units.
 */
export function participation(system: Eigensystem, j: number): number[] {
  const n = system.n;
  const out: number[] = new Array(n);
  const v = system.right[j]!;
  let sum = 0;
  if (system.left !== null) {
    const w = system.left[j]!;
    for (let k = 0; k < n; k += 1) {
      const pr = w.re[k]! * v.re[k]! - w.im[k]! * v.im[k]!;
      const pi = w.re[k]! * v.im[k]! + w.im[k]! * v.re[k]!;
      out[k] = Math.hypot(pr, pi);
      sum += out[k]!;
    }
  } else {
    for (let k = 0; k < n; k += 1) {
      let big = 0;
      for (const other of system.right) big = Math.max(big, Math.hypot(other.re[k]!, other.im[k]!));
      out[k] = big > 0 ? Math.hypot(v.re[k]!, v.im[k]!) / big : 0;
      sum += out[k]!;
    }
  }
  if (sum > 0) for (let k = 0; k < n; k += 1) out[k]! /= sum;
  return out;
}

function scalarSystem(a: number): Eigensystem {
  const one = (): ComplexVector => ({ re: [1], im: [0] });
  return { n: 1, values: [{ re: a, im: 0 }], right: [one()], left: [one()], conditioning: 1, errorBound: [0] };
}

function zeros(n: number): number[] {
  return new Array<number>(n).fill(0);
}

function column(m: Float64Array, n: number, j: number, factor: number): number[] {
  const out: number[] = new Array(n);
  for (let i = 0; i < n; i += 1) out[i] = factor * m[i * n + j]!;
  return out;
}

function row(m: Float64Array, n: number, i: number, factor: number): number[] {
  const out: number[] = new Array(n);
  for (let j = 0; j < n; j += 1) out[j] = factor * m[i * n + j]!;
  return out;
}
