/**
 * One input to one output of a linear model: x' = A x + b u, y = c x + d u, with an optional
 * pure time delay of the output, y(t) = y0(t - delay). The flat row-major form keeps the
 * frequency and time responses free of per-call allocation.
 */
import { InternalError } from '../errors.js';

export interface LinearChannel {
  /** number of states */
  n: number;
  /** n x n, row-major */
  A: Float64Array;
  /** input column (n) [state unit per input unit] */
  b: Float64Array;
  /** output row (n) [output unit per state unit] */
  c: Float64Array;
  /** feedthrough [output unit per input unit] */
  d: number;
  /** [s] pure time delay, 0 for none */
  delay: number;
}

/** A channel from plain arrays (A as rows). */
export function linearChannel(A: readonly (readonly number[])[], b: readonly number[], c: readonly number[], d = 0, delay = 0): LinearChannel {
  const n = A.length;
  if (b.length !== n || c.length !== n || A.some((row) => row.length !== n)) {
    throw new InternalError(`linear channel shapes: A ${n} x ${A[0]?.length ?? 0}, b ${b.length}, c ${c.length}`);
  }
  if (!(delay >= 0)) throw new InternalError(`linear channel delay must be >= 0 s, got ${delay}`);
  const flat = new Float64Array(n * n);
  for (let i = 0; i < n; i += 1) for (let j = 0; j < n; j += 1) flat[i * n + j] = A[i]![j]!;
  return { n, A: flat, b: Float64Array.from(b), c: Float64Array.from(c), d, delay };
}

/** The channel restricted to the states `keep` (indices, ascending). */
export function restrictChannel(channel: LinearChannel, keep: readonly number[]): LinearChannel {
  const k = keep.length;
  const A = new Float64Array(k * k);
  const b = new Float64Array(k);
  const c = new Float64Array(k);
  keep.forEach((i, r) => {
    b[r] = channel.b[i]!;
    c[r] = channel.c[i]!;
    keep.forEach((j, s) => (A[r * k + s] = channel.A[i * channel.n + j]!));
  });
  return { n: k, A, b, c, d: channel.d, delay: channel.delay };
}

/** Rows of the n x n row-major matrix, for the eigen-analysis of src/modes. */
export function rowsOf(flat: Float64Array, n: number): number[][] {
  const rows: number[][] = [];
  for (let i = 0; i < n; i += 1) rows.push(Array.from(flat.subarray(i * n, i * n + n)));
  return rows;
}
