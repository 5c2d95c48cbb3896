/**
 * The response of a linear model to a step of one input held from t = 0, sampled every dt:
 * exact at the samples (zero-order hold is exact for a step), from the exponential of the
 * augmented matrix [[A, b], [0, 0]] dt = [[Phi, Gamma], [0, 1]], then x_(k+1) = Phi x_k + Gamma u
 * (Franklin, Powell and Workman, Digital Control of Dynamic Systems, 3rd ed., 4.3). Only the
 * states the input reaches are simulated (the others stay at trim). Each output also gets its
 * rate y' = c (A x + b u), for accurate crossing times and peaks between samples.
 */
import { matrixExponential } from './matrix-exponential.js';

export interface StepOutput {
  /** per state of the model */
  c: readonly number[];
  d: number;
}

export interface StepResponse {
  /** [s] */
  times: Float64Array;
  /** per output, its value at each time [output unit] */
  values: Float64Array[];
  /** per output, its rate at each time [output unit / s] */
  rates: Float64Array[];
}

/**
 * @param A      n x n (rows)
 * @param b      input column (n)
 * @param size   [input unit] step size
 * @param dt     [s] sample interval
 * @param steps  number of intervals (times 0 .. steps dt)
 */
export function stepResponse(A: readonly (readonly number[])[], b: readonly number[], outputs: readonly StepOutput[], size: number, dt: number, steps: number): StepResponse {
  const reached = reachedStates(A, b);
  const k = reached.length;
  const m = k + 1;
  const M = new Float64Array(m * m);
  reached.forEach((i, r) => {
    reached.forEach((j, s) => (M[r * m + s] = A[i]![j]! * dt));
    M[r * m + k] = b[i]! * dt;
  });
  const E = matrixExponential(M, m);
  const Ak = new Float64Array(k * k);
  reached.forEach((i, r) => reached.forEach((j, s) => (Ak[r * k + s] = A[i]![j]!)));
  const bk = reached.map((i) => b[i]! * size);
  const cs = outputs.map((o) => reached.map((i) => o.c[i]!));

  const times = new Float64Array(steps + 1);
  const values = outputs.map(() => new Float64Array(steps + 1));
  const rates = outputs.map(() => new Float64Array(steps + 1));
  let x = new Float64Array(k);
  let next = new Float64Array(k);
  const xdot = new Float64Array(k);
  for (let t = 0; t <= steps; t += 1) {
    times[t] = t * dt;
    for (let r = 0; r < k; r += 1) {
      let s = bk[r]!;
      for (let q = 0; q < k; q += 1) s += Ak[r * k + q]! * x[q]!;
      xdot[r] = s;
    }
    outputs.forEach((o, j) => {
      const c = cs[j]!;
      let y = o.d * size;
      let ydot = 0;
      for (let r = 0; r < k; r += 1) {
        y += c[r]! * x[r]!;
        ydot += c[r]! * xdot[r]!;
      }
      values[j]![t] = y;
      rates[j]![t] = ydot;
    });
    if (t === steps) break;
    for (let r = 0; r < k; r += 1) {
      let s = E[r * m + k]! * size;
      for (let q = 0; q < k; q += 1) s += E[r * m + q]! * x[q]!;
      next[r] = s;
    }
    [x, next] = [next, x];
  }
  return { times, values, rates };
}

/** States the input reaches through the nonzero entries of b and A (ascending). */
function reachedStates(A: readonly (readonly number[])[], b: readonly number[]): number[] {
  const n = b.length;
  const reached = new Array<boolean>(n).fill(false);
  const stack: number[] = [];
  b.forEach((v, i) => {
    if (v !== 0) {
      reached[i] = true;
      stack.push(i);
    }
  });
  while (stack.length > 0) {
    const j = stack.pop()!;
    for (let i = 0; i < n; i += 1) if (!reached[i] && A[i]![j] !== 0) {
      reached[i] = true;
      stack.push(i);
    }
  }
  return reached.flatMap((r, i) => (r ? [i] : []));
}

/**
 * The first time in [t0, t1] where the cubic Hermite interpolant of (y0, r0) and (y1, r1)
 * reaches `level` (y0 < level <= y1), by bisection: accurate to O(dt^4) of the response.
 */
export function hermiteCrossing(t0: number, t1: number, y0: number, y1: number, r0: number, r1: number, level: number): number {
  const h = t1 - t0;
  const at = (s: number) => {
    const s2 = s * s;
    const s3 = s2 * s;
    return (2 * s3 - 3 * s2 + 1) * y0 + (s3 - 2 * s2 + s) * h * r0 + (-2 * s3 + 3 * s2) * y1 + (s3 - s2) * h * r1;
  };
  let lo = 0;
  let hi = 1;
  for (let k = 0; k < 50; k += 1) {
    const mid = (lo + hi) / 2;
    if (at(mid) >= level) hi = mid;
    else lo = mid;
  }
  return t0 + h * hi;
}
