import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { eigenDecompose, participation, type ComplexVector } from '../../src/modes/eigen.js';
import { NELSON_PRINTED_LONGITUDINAL_A } from './navion-fixture.js';

// Definitions checked: A v = lambda v, w A = lambda w, w v = 1 (Golub and Van Loan, Matrix
// Computations, 4th ed., 7.1); participation sums to 1 (Perez-Arriaga, Verghese and Schweppe,
// IEEE Trans. PAS-101, 1982).

function residuals(A: number[][], lambda: { re: number; im: number }, v: ComplexVector, w: ComplexVector) {
  const n = A.length;
  let right = 0;
  let left = 0;
  let scale = 0;
  let dotRe = 0;
  let dotIm = 0;
  for (let i = 0; i < n; i += 1) {
    let avRe = 0;
    let avIm = 0;
    let waRe = 0;
    let waIm = 0;
    for (let k = 0; k < n; k += 1) {
      avRe += A[i]![k]! * v.re[k]!;
      avIm += A[i]![k]! * v.im[k]!;
      waRe += w.re[k]! * A[k]![i]!;
      waIm += w.im[k]! * A[k]![i]!;
      scale = Math.max(scale, Math.abs(A[i]![k]!));
    }
    right = Math.max(right, Math.hypot(avRe - (lambda.re * v.re[i]! - lambda.im * v.im[i]!), avIm - (lambda.re * v.im[i]! + lambda.im * v.re[i]!)));
    left = Math.max(left, Math.hypot(waRe - (lambda.re * w.re[i]! - lambda.im * w.im[i]!), waIm - (lambda.re * w.im[i]! + lambda.im * w.re[i]!)));
    dotRe += w.re[i]! * v.re[i]! - w.im[i]! * v.im[i]!;
    dotIm += w.re[i]! * v.im[i]! + w.im[i]! * v.re[i]!;
  }
  const vSize = Math.max(...Array.from(v.re, (x, i) => Math.hypot(x, v.im[i]!)));
  const wSize = Math.max(...Array.from(w.re, (x, i) => Math.hypot(x, w.im[i]!)));
  return { right: right / (scale * vSize), left: left / (scale * wSize), dotRe, dotIm };
}

describe('eigenDecompose', () => {
  it('gives right and left eigenvectors of the Navion longitudinal matrix (Nelson, 2nd ed., ch. 4)', () => {
    const A = NELSON_PRINTED_LONGITUDINAL_A;
    const system = eigenDecompose(A);
    expect(system.left).not.toBeNull();
    for (let j = 0; j < system.n; j += 1) {
      const r = residuals(A, system.values[j]!, system.right[j]!, system.left![j]!);
      expect(r.right).toBeLessThan(1e-10);
      expect(r.left).toBeLessThan(1e-10);
      expect(r.dotRe).toBeCloseTo(1, 10);
      expect(r.dotIm).toBeCloseTo(0, 10);
    }
    // complex pairs adjacent, positive imaginary part first
    for (let j = 0; j < system.n; j += 2) {
      expect(system.values[j]!.im).toBeGreaterThan(0);
      expect(system.values[j + 1]!.im).toBe(-system.values[j]!.im);
    }
  });

  it('satisfies the eigen relations for random matrices', () => {
    const matrix = fc.integer({ min: 2, max: 7 }).chain((n) =>
      fc.array(fc.array(fc.integer({ min: -80, max: 80 }).map((k) => k / 8), { minLength: n, maxLength: n }), { minLength: n, maxLength: n }),
    );
    fc.assert(
      fc.property(matrix, (A) => {
        const system = eigenDecompose(A);
        if (system.left === null || system.conditioning > 1e6) return; // nearly defective: relations ill-posed
        let trace = 0;
        let sum = 0;
        for (let i = 0; i < A.length; i += 1) trace += A[i]![i]!;
        for (let j = 0; j < system.n; j += 1) {
          const r = residuals(A, system.values[j]!, system.right[j]!, system.left[j]!);
          expect(r.right).toBeLessThan(1e-8);
          expect(r.left).toBeLessThan(1e-6);
          expect(r.dotRe).toBeCloseTo(1, 6);
          expect(r.dotIm).toBeCloseTo(0, 6);
          const p = participation(system, j);
          expect(p.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
          sum += system.values[j]!.re;
        }
        // sum of eigenvalues = trace (linear algebra)
        expect(sum).toBeCloseTo(trace, 6);
      }),
      { numRuns: 150, seed: 20261202 },
    );
  });

  it('flags a defective matrix (Jordan block): its eigenvectors are parallel', () => {
    const system = eigenDecompose([
      [0, 1],
      [0, 0],
    ]);
    expect(system.conditioning).toBeGreaterThan(1e6);
    const p = participation(system, 0);
    expect(p[0]! + p[1]!).toBeCloseTo(1, 12);
  });

  it('handles a single state', () => {
    const system = eigenDecompose([[-20]]);
    expect(system.values).toEqual([{ re: -20, im: 0 }]);
    expect(Array.from(participation(system, 0))).toEqual([1]);
  });
});
