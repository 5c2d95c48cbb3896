/**
 * e^M of a small real matrix by scaling and squaring with the diagonal (8, 8) Pade approximant
 * (Moler and Van Loan, "Nineteen dubious ways to compute the exponential of a matrix,
 * twenty-five years later", SIAM Review 45(1), 2003, method 3): M is scaled by 2^-s so that
 * its 1-norm is at most 1/2, where the (8, 8) approximant is accurate to far below double
 * precision, and the result squared s times.
 */
import { InternalError } from '../errors.js';

const Q = 8;
/** c_k = (2q - k)! q! / ((2q)! k! (q - k)!) */
const PADE: number[] = (() => {
  const out = [1];
  for (let k = 1; k <= Q; k += 1) out.push((out[k - 1]! * (Q - k + 1)) / (k * (2 * Q - k + 1)));
  return out;
})();

/** e^M for the n x n row-major M; a new array. */
export function matrixExponential(M: Float64Array, n: number): Float64Array {
  let norm = 0;
  for (let j = 0; j < n; j += 1) {
    let col = 0;
    for (let i = 0; i < n; i += 1) col += Math.abs(M[i * n + j]!);
    norm = Math.max(norm, col);
  }
  if (!Number.isFinite(norm)) throw new InternalError('matrix exponential of a matrix with a non-finite entry');
  const s = norm > 0.5 ? Math.ceil(Math.log2(norm / 0.5)) : 0;
  const scale = 2 ** -s;
  const X = new Float64Array(n * n);
  for (let k = 0; k < n * n; k += 1) X[k] = M[k]! * scale;

  const N = identity(n);
  const D = identity(n);
  let power = identity(n);
  for (let k = 1; k <= Q; k += 1) {
    power = multiply(power, X, n);
    const c = PADE[k]!;
    const sign = k % 2 === 0 ? 1 : -1;
    for (let i = 0; i < n * n; i += 1) {
      N[i] = N[i]! + c * power[i]!;
      D[i] = D[i]! + sign * c * power[i]!;
    }
  }
  let E = solve(D, N, n);
  for (let k = 0; k < s; k += 1) E = multiply(E, E, n);
  return E;
}

function identity(n: number): Float64Array {
  const I = new Float64Array(n * n);
  for (let i = 0; i < n; i += 1) I[i * n + i] = 1;
  return I;
}

export function multiply(A: Float64Array, B: Float64Array, n: number): Float64Array {
  const C = new Float64Array(n * n);
  for (let i = 0; i < n; i += 1) {
    for (let k = 0; k < n; k += 1) {
      const a = A[i * n + k]!;
      if (a === 0) continue;
      for (let j = 0; j < n; j += 1) C[i * n + j] = C[i * n + j]! + a * B[k * n + j]!;
    }
  }
  return C;
}

/** D^-1 N by Gaussian elimination with partial pivoting (D is well conditioned for ||X|| <= 1/2). */
function solve(Din: Float64Array, Nin: Float64Array, n: number): Float64Array {
  const D = Float64Array.from(Din);
  const X = Float64Array.from(Nin);
  for (let k = 0; k < n; k += 1) {
    let p = k;
    for (let i = k + 1; i < n; i += 1) if (Math.abs(D[i * n + k]!) > Math.abs(D[p * n + k]!)) p = i;
    if (p !== k) {
      for (let j = 0; j < n; j += 1) {
        [D[k * n + j], D[p * n + j]] = [D[p * n + j]!, D[k * n + j]!];
        [X[k * n + j], X[p * n + j]] = [X[p * n + j]!, X[k * n + j]!];
      }
    }
    const pivot = D[k * n + k]!;
    for (let i = k + 1; i < n; i += 1) {
      const f = D[i * n + k]! / pivot;
      if (f === 0) continue;
      for (let j = k; j < n; j += 1) D[i * n + j] = D[i * n + j]! - f * D[k * n + j]!;
      for (let j = 0; j < n; j += 1) X[i * n + j] = X[i * n + j]! - f * X[k * n + j]!;
    }
  }
  for (let i = n - 1; i >= 0; i -= 1) {
    const pivot = D[i * n + i]!;
    for (let j = 0; j < n; j += 1) {
      let s = X[i * n + j]!;
      for (let k = i + 1; k < n; k += 1) s -= D[i * n + k]! * X[k * n + j]!;
      X[i * n + j] = s / pivot;
    }
  }
  return X;
}
