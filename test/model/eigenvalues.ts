/** Test helper: eigenvalues of a square matrix, sorted by real part then imaginary part. */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

export interface Root {
  re: number;
  im: number;
}

export function eigenvalues(A: number[][]): Root[] {
  const e = new EigenvalueDecomposition(new Matrix(A));
  return e.realEigenvalues
    .map((re, i) => ({ re, im: e.imaginaryEigenvalues[i]! }))
    .sort((a, b) => a.re - b.re || a.im - b.im);
}

/** The root nearest to a target value. */
export function nearest(roots: Root[], target: Root): Root {
  let best = roots[0]!;
  for (const r of roots) if (Math.hypot(r.re - target.re, r.im - target.im) < Math.hypot(best.re - target.re, best.im - target.im)) best = r;
  return best;
}
