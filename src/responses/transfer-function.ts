/**
 * Zeros, poles and gain of one channel: G(s) = gain prod(s - z_i) / prod(s - p_j), e^(-delay s).
 *
 * - poles: every eigenvalue of A (nothing cancelled), given by the caller or computed here;
 * - zeros: the finite invariant zeros, i.e. the finite generalised eigenvalues of the Rosenbrock
 *   pencil ([[A, b], [c, d]], [[I, 0], [0, 0]]). With d != 0 they are the eigenvalues of
 *   A - b c / d. With d = 0 and relative degree r (the first nonzero Markov parameter is
 *   c A^(r-1) b) they are the eigenvalues of the zero dynamics: A_z = A - b (c A^(r-1) b)^-1 c A^r
 *   restricted to the null space of [c; c A; ..; c A^(r-1)], which A_z leaves invariant
 *   (Isidori, Nonlinear Control Systems, 3rd ed., 4.3, linear case; Sannuti and Saberi 1987);
 * - gain: d when d != 0, else c A^(r-1) b (the leading coefficient of the numerator);
 * - the states the channel cannot see (structural-reduction.ts) add their eigenvalues to the
 *   zeros exactly, and the work is done on the rest.
 */
import type { Complex } from '../types.js';
import { spectrum } from '../modes/spectrum.js';
import type { LinearChannel } from './linear-channel.js';
import { restrictChannel, rowsOf } from './linear-channel.js';
import { channelStates, type ChannelStates } from './structural-reduction.js';

export interface ZeroPoleGain {
  /** [output unit per input unit, times (rad/s)^(relative degree)] */
  gain: number;
  /** [rad/s] finite zeros */
  zeros: Complex[];
  /** [rad/s] poles */
  poles: Complex[];
  /** [s] pure delay */
  delay: number;
}

export interface ChannelTransfer {
  /** the whole channel: all poles of A, all invariant zeros */
  full: ZeroPoleGain;
  /** the same transfer function with the exactly cancelling pairs of the unseen states left out (cheaper to evaluate) */
  reduced: ZeroPoleGain;
  /** relative degree (number of poles minus zeros); null when the channel is identically zero */
  relativeDegree: number | null;
  states: ChannelStates;
}

/** Markov parameters below this fraction of |c| |A|^k |b| count as zero. */
const MARKOV_TOLERANCE = 1e-10;

/**
 * Eigenvalues of A restricted to some states, by the set of states: the channels of one
 * condition share A, and most share their blocks too. Give one cache per A.
 */
export type BlockSpectra = Map<string, Complex[]>;

export function channelTransfer(channel: LinearChannel, allPoles?: readonly Complex[], spectra: BlockSpectra = new Map()): ChannelTransfer {
  const states = channelStates(channel);
  const reducedChannel = restrictChannel(channel, states.kept);
  const reduced = reducedTransfer(reducedChannel, blockSpectrum(channel, states.kept, spectra));
  const leftOut = [...states.unreached, ...states.unseen];
  const cancelled = leftOut.length > 0 ? blockEigenvalues(channel, states, spectra) : [];
  const poles = allPoles ? [...allPoles] : spectrum(rowsOf(channel.A, channel.n));
  const identicallyZero = reduced.gain === 0;
  const full: ZeroPoleGain = {
    gain: reduced.gain,
    zeros: identicallyZero ? [] : sortRoots([...reduced.zeros, ...cancelled]),
    poles: sortRoots(poles),
    delay: channel.delay,
  };
  return {
    full,
    reduced,
    relativeDegree: identicallyZero ? null : reduced.poles.length - reduced.zeros.length,
    states,
  };
}

/** Eigenvalues of the unreached block and of the reached-unseen block. */
function blockEigenvalues(channel: LinearChannel, states: ChannelStates, spectra: BlockSpectra): Complex[] {
  const out: Complex[] = [];
  for (const block of [states.unreached, states.unseen]) if (block.length > 0) out.push(...blockSpectrum(channel, block, spectra));
  return out;
}

function blockSpectrum(channel: LinearChannel, block: readonly number[], spectra: BlockSpectra): Complex[] {
  if (block.length === 0) return [];
  const key = block.join(',');
  let values = spectra.get(key);
  if (values === undefined) {
    const sub = restrictChannel(channel, block);
    values = spectrum(rowsOf(sub.A, sub.n));
    spectra.set(key, values);
  }
  return values;
}

function reducedTransfer(channel: LinearChannel, poles: Complex[]): ZeroPoleGain {
  const { n, A, b, c, d, delay } = channel;
  if (d !== 0) {
    const Az = new Float64Array(n * n);
    for (let i = 0; i < n; i += 1) for (let j = 0; j < n; j += 1) Az[i * n + j] = A[i * n + j]! - (b[i]! * c[j]!) / d;
    return { gain: d, zeros: n > 0 ? spectrum(rowsOf(Az, n)) : [], poles, delay };
  }
  // rows c A^k, k = 0..n, and the Markov parameters c A^k b
  const rows: Float64Array[] = [Float64Array.from(c)];
  const normA = frobenius(A);
  const normB = norm(b);
  let r = 0;
  let markov = 0;
  for (let k = 0; k < n; k += 1) {
    const row = rows[k]!;
    const m = dot(row, b);
    const scale = norm(c) * normA ** k * normB;
    if (Math.abs(m) > MARKOV_TOLERANCE * scale) {
      r = k + 1;
      markov = m;
      break;
    }
    rows.push(times(row, A, n));
  }
  if (r === 0) return { gain: 0, zeros: [], poles, delay };
  if (r === n) return { gain: markov, zeros: [], poles, delay };
  const cAr = times(rows[r - 1]!, A, n);
  // A_z = A - b (c A^(r-1) b)^-1 c A^r
  const Az = new Float64Array(n * n);
  for (let i = 0; i < n; i += 1) for (let j = 0; j < n; j += 1) Az[i * n + j] = A[i * n + j]! - (b[i]! * cAr[j]!) / markov;
  const N = nullSpace(rows.slice(0, r), n);
  const k = n - r;
  // M = N^T A_z N
  const AzN = new Float64Array(n * k);
  for (let i = 0; i < n; i += 1) for (let j = 0; j < k; j += 1) {
    let s = 0;
    for (let l = 0; l < n; l += 1) s += Az[i * n + l]! * N[l * k + j]!;
    AzN[i * k + j] = s;
  }
  const M: number[][] = [];
  for (let i = 0; i < k; i += 1) {
    const row: number[] = [];
    for (let j = 0; j < k; j += 1) {
      let s = 0;
      for (let l = 0; l < n; l += 1) s += N[l * k + i]! * AzN[l * k + j]!;
      row.push(s);
    }
    M.push(row);
  }
  return { gain: markov, zeros: spectrum(M), poles, delay };
}

/**
 * An orthonormal basis (n x (n - r), row-major) of the null space of the r x n matrix whose
 * rows are given (full row rank), from the Householder QR of its transpose: the last n - r
 * columns of Q (Golub and Van Loan, 5.2).
 */
function nullSpace(rows: readonly Float64Array[], n: number): Float64Array {
  const r = rows.length;
  // M = rows^T, n x r, column j = rows[j]
  const M = new Float64Array(n * r);
  for (let j = 0; j < r; j += 1) for (let i = 0; i < n; i += 1) M[i * r + j] = rows[j]![i]!;
  const Q = new Float64Array(n * n);
  for (let i = 0; i < n; i += 1) Q[i * n + i] = 1;
  const v = new Float64Array(n);
  for (let j = 0; j < r; j += 1) {
    let alpha = 0;
    for (let i = j; i < n; i += 1) alpha += M[i * r + j]! ** 2;
    alpha = Math.sqrt(alpha);
    if (alpha === 0) continue;
    const x0 = M[j * r + j]!;
    const s = x0 >= 0 ? -alpha : alpha;
    v.fill(0);
    v[j] = x0 - s;
    for (let i = j + 1; i < n; i += 1) v[i] = M[i * r + j]!;
    let vv = 0;
    for (let i = j; i < n; i += 1) vv += v[i]! ** 2;
    if (vv === 0) continue;
    // M <- (I - 2 v v^T / vv) M ; Q <- Q (I - 2 v v^T / vv)
    for (let col = j; col < r; col += 1) {
      let t = 0;
      for (let i = j; i < n; i += 1) t += v[i]! * M[i * r + col]!;
      t = (2 * t) / vv;
      for (let i = j; i < n; i += 1) M[i * r + col] = M[i * r + col]! - t * v[i]!;
    }
    for (let row = 0; row < n; row += 1) {
      let t = 0;
      for (let i = j; i < n; i += 1) t += Q[row * n + i]! * v[i]!;
      t = (2 * t) / vv;
      for (let i = j; i < n; i += 1) Q[row * n + i] = Q[row * n + i]! - t * v[i]!;
    }
  }
  const k = n - r;
  const N = new Float64Array(n * k);
  for (let i = 0; i < n; i += 1) for (let j = 0; j < k; j += 1) N[i * k + j] = Q[i * n + r + j]!;
  return N;
}

function times(row: Float64Array, A: Float64Array, n: number): Float64Array {
  const out = new Float64Array(n);
  for (let j = 0; j < n; j += 1) {
    let s = 0;
    for (let i = 0; i < n; i += 1) s += row[i]! * A[i * n + j]!;
    out[j] = s;
  }
  return out;
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i += 1) s += a[i]! * b[i]!;
  return s;
}

function norm(a: Float64Array): number {
  return Math.sqrt(dot(a, a));
}

function frobenius(A: Float64Array): number {
  return Math.max(norm(A), Number.MIN_VALUE);
}

/** Real roots first by real part, then pairs with the positive imaginary part first; stable order for the results. */
export function sortRoots(roots: readonly Complex[]): Complex[] {
  return [...roots].sort((a, b) => a.re - b.re || Math.abs(a.im) - Math.abs(b.im) || b.im - a.im);
}
