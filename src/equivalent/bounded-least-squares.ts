/**
 * Levenberg-Marquardt for small bounded least-squares problems: minimise sum r_i(x)^2 with
 * lo <= x <= hi. Steps solve (J'J + lambda diag(J'J)) dx = -J'r (Marquardt's scaling) over the
 * free parameters (a parameter on a bound whose gradient points outward is held there for the
 * step), then are clipped into the box. Deterministic: no randomness, a fixed iteration cap.
 */

export interface LeastSquaresProblem {
  /** residuals r(x) and their Jacobian, J[i n + k] = d r_i / d x_k at x (n parameters), fresh arrays each call */
  evaluate(x: readonly number[]): { residuals: Float64Array; jacobian: Float64Array };
  lower: readonly number[];
  upper: readonly number[];
}

export interface LeastSquaresResult {
  x: number[];
  /** sum of squared residuals at x */
  cost: number;
  iterations: number;
  converged: boolean;
}

export interface LeastSquaresOptions {
  maxIterations?: number;
  /** stop when a step improves the cost by less than this fraction */
  relativeTolerance?: number;
}

export function boundedLeastSquares(
  problem: LeastSquaresProblem,
  start: readonly number[],
  options: LeastSquaresOptions = {},
): LeastSquaresResult {
  const maxIterations = options.maxIterations ?? 200;
  const tol = options.relativeTolerance ?? 1e-10;
  const n = start.length;
  const { lower, upper } = problem;
  let x = start.map((v, k) => clamp(v, lower[k]!, upper[k]!));
  let current = problem.evaluate(x);
  let cost = sumSquares(current.residuals);
  let lambda = 1e-3;
  let iterations = 0;
  let converged = false;

  while (iterations < maxIterations) {
    iterations++;
    const { residuals, jacobian } = current;
    // gradient g = J'r and normal matrix N = J'J
    const g = new Array<number>(n).fill(0);
    const N: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    for (let i = 0; i < residuals.length; i++) {
      const base = i * n;
      const r = residuals[i]!;
      for (let a = 0; a < n; a++) {
        const ja = jacobian[base + a]!;
        if (ja === 0) continue;
        g[a]! += ja * r;
        const row = N[a]!;
        for (let b = a; b < n; b++) row[b]! += ja * jacobian[base + b]!;
      }
    }
    for (let a = 0; a < n; a++) for (let b = 0; b < a; b++) N[a]![b] = N[b]![a]!;

    // free set: not pinned on a bound by a gradient pointing out of the box
    const free: number[] = [];
    for (let k = 0; k < n; k++) {
      const atLower = x[k]! <= lower[k]! && g[k]! > 0;
      const atUpper = x[k]! >= upper[k]! && g[k]! < 0;
      if (!atLower && !atUpper && upper[k]! > lower[k]!) free.push(k);
    }
    if (free.length === 0) {
      converged = true;
      break;
    }
    const gradientNorm = Math.sqrt(free.reduce((s, k) => s + g[k]! * g[k]!, 0));
    if (gradientNorm <= 1e-14 * Math.max(1, cost)) {
      converged = true;
      break;
    }

    let improved = false;
    for (let attempt = 0; attempt < 30; attempt++) {
      const M = free.map((a) => free.map((b) => N[a]![b]! + (a === b ? lambda * Math.max(N[a]![a]!, 1e-12) : 0)));
      const step = solveSymmetric(M, free.map((a) => -g[a]!));
      if (step === null) {
        lambda *= 10;
        continue;
      }
      const trial = [...x];
      free.forEach((k, i) => {
        trial[k] = clamp(x[k]! + step[i]!, lower[k]!, upper[k]!);
      });
      const next = problem.evaluate(trial);
      const nextCost = sumSquares(next.residuals);
      if (Number.isFinite(nextCost) && nextCost < cost) {
        const gain = (cost - nextCost) / Math.max(cost, 1e-300);
        const moved = trial.reduce((m, v, k) => Math.max(m, Math.abs(v - x[k]!) / (Math.abs(x[k]!) + 1e-8)), 0);
        x = trial;
        current = next;
        cost = nextCost;
        lambda = Math.max(lambda / 3, 1e-12);
        improved = true;
        if (gain < tol || moved < 1e-10 || nextCost < 1e-20) converged = true;
        break;
      }
      lambda *= 4;
      if (lambda > 1e12) break;
    }
    if (!improved) {
      converged = true;
      break;
    }
    if (converged) break;
  }
  return { x, cost, iterations, converged };
}

function sumSquares(r: Float64Array): number {
  let s = 0;
  for (const v of r) s += v * v;
  return s;
}

function clamp(v: number, lo: number, hi: number): number {
  return v < lo ? lo : v > hi ? hi : v;
}

/** Gaussian elimination with partial pivoting; null when singular. */
function solveSymmetric(M: number[][], rhs: number[]): number[] | null {
  const n = rhs.length;
  const a = M.map((row, i) => [...row, rhs[i]!]);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r]![c]!) > Math.abs(a[p]![c]!)) p = r;
    if (!(Math.abs(a[p]![c]!) > 1e-300)) return null;
    [a[c], a[p]] = [a[p]!, a[c]!];
    const pivot = a[c]![c]!;
    for (let r = c + 1; r < n; r++) {
      const f = a[r]![c]! / pivot;
      if (f === 0) continue;
      for (let k = c; k <= n; k++) a[r]![k]! -= f * a[c]![k]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = a[r]![n]!;
    for (let k = r + 1; k < n; k++) s -= a[r]![k]! * x[k]!;
    x[r] = s / a[r]![r]!;
  }
  return x.every(Number.isFinite) ? x : null;
}
