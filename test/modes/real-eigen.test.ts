import fc from 'fast-check';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { realEigen, realEigenvalues } from '../../src/modes/real-eigen.js';
import { eigenDecompose, eigenvalues } from '../../src/modes/eigen.js';

// The flat-array Hessenberg-QR solver against the general-purpose library it was translated
// from (ml-matrix 6, npm registry; its non-symmetric path is the JAMA port of EISPACK orthes
// and hqr2). Same arithmetic in the same order, so a non-symmetric matrix must give the very
// same numbers; ml-matrix sends symmetric matrices down another algorithm (tred2/tql2), where
// only agreement to rounding is expected.

function reference(rows: number[][]) {
  const evd = new EigenvalueDecomposition(new Matrix(rows));
  return { d: evd.realEigenvalues, e: evd.imaginaryEigenvalues, V: evd.eigenvectorMatrix.to2DArray() };
}

function flat(rows: number[][]): Float64Array {
  return Float64Array.from(rows.flat());
}

function ours(rows: number[][]) {
  const n = rows.length;
  const { d, e, V } = realEigen(flat(rows), n);
  const out: number[][] = [];
  for (let i = 0; i < n; i += 1) out.push(Array.from(V.subarray(i * n, (i + 1) * n)));
  return { d: Array.from(d), e: Array.from(e), V: out };
}

function isSymmetric(rows: number[][]): boolean {
  return rows.every((row, i) => row.every((x, j) => x === rows[j]![i]));
}

// Entries of a state matrix: zeros and values from 0.001 to 50 in size. Arbitrary doubles
// (subnormals beside 50) make the JAMA iteration, ml-matrix's as much as ours, cycle without
// converging; ours then stops with an error (tested below), ml-matrix's runs for ever.
const entry = fc.oneof(fc.constant(0), fc.integer({ min: -50_000, max: 50_000 }).map((k) => k / 1000));
const square = fc
  .integer({ min: 1, max: 9 })
  .chain((n) => fc.array(fc.array(entry, { minLength: n, maxLength: n }), { minLength: n, maxLength: n }));

describe('realEigen (flat Hessenberg-QR) against ml-matrix EigenvalueDecomposition', () => {
  it('gives the same eigenvalues and eigenvectors, number for number, on non-symmetric matrices', () => {
    fc.assert(
      fc.property(square, (rows) => {
        fc.pre(!isSymmetric(rows));
        // Ours first: the two iterate alike, so a matrix ours gives up on would keep ml-matrix
        // (which has no limit) looping for ever. Such a matrix is left out, not compared.
        let got: ReturnType<typeof ours>;
        try {
          got = ours(rows);
        } catch (err) {
          fc.pre(!/did not converge/.test(String(err)));
          throw err;
        }
        expect(got).toEqual(reference(rows));
      }),
      { numRuns: 400, seed: 20261202 },
    );
  });

  it('gives the same result for an aircraft-like 4 x 4 longitudinal block (oscillatory pairs)', () => {
    // Dimensional longitudinal derivatives of an invented light aeroplane at 55 m/s (u, w, q, theta).
    const rows = [
      [-0.045, 0.036, 0, -9.80665],
      [-0.37, -2.0, 55, 0],
      [0.0063, -0.126, -3.035, 0],
      [0, 0, 1, 0],
    ];
    const got = ours(rows);
    expect(got).toEqual(reference(rows));
    // two complex pairs, positive imaginary part first
    expect(got.e[0]).toBeGreaterThan(0);
    expect(got.e[1]).toBe(-got.e[0]!);
    expect(got.e[2]).toBeGreaterThan(0);
    expect(got.e[3]).toBe(-got.e[2]!);
  });

  it('agrees to rounding on symmetric matrices, where ml-matrix uses another algorithm', () => {
    const rows = [
      [4, 1, 0.5],
      [1, 3, 0.25],
      [0.5, 0.25, 2],
    ];
    const got = ours(rows).d.sort((a, b) => a - b);
    const want = reference(rows).d.sort((a, b) => a - b);
    for (let k = 0; k < 3; k += 1) expect(got[k]).toBeCloseTo(want[k]!, 12);
  });

  it('stops with an error instead of iterating for ever on a matrix it cannot reduce', () => {
    // found by the property above with unrestricted doubles
    expect(() =>
      realEigen(
        flat([
          [0, 0, 0, 0, 0, 0, 0, 0],
          [-2.7237220007459685e-7, 0, 0, 0, 0, 0, 0, 0],
          [0, 0, -2.7904965607477417e-104, 0, 0, -5.425880932339896e-237, 0, 0],
          [0, 0, 0, 0, 0, 0, 0, 0],
          [0, 0, 0, 0, 0, 0, -1.239345288296982e-70, -49.99999999999983],
          [0, 0, 0, 0, 0, 0, 0, 0],
          [0, -4.3695007762096455e-204, 0, 0, 0, 0, 0, 0],
          [-5e-324, -4.300495787140673e-267, 0, -3.552713678800501e-15, 49.99999988004209, 0, 0, 0],
        ]),
        8,
      ),
    ).toThrow(/did not converge in 100 QR steps/);
  });

  it('leaves its input unchanged and reuses its buffers only per size', () => {
    const A = flat([
      [0, 1],
      [-4, -0.4],
    ]);
    const copy = Float64Array.from(A);
    const first = realEigen(A, 2);
    expect(A).toEqual(copy);
    expect(first.d[0]).toBeCloseTo(-0.2, 14);
    expect(Math.abs(first.e[0]!)).toBeCloseTo(Math.sqrt(4 - 0.04), 14);
    const other = realEigen(flat([[3]]), 1);
    expect(other.d[0]).toBe(3);
    expect(first.d[0]).toBeCloseTo(-0.2, 14);
  });
});

describe('realEigenvalues and eigenvalues (no eigenvectors)', () => {
  it('give the eigenvalues of the full decomposition bit for bit', () => {
    fc.assert(
      fc.property(square, (rows) => {
        let full: { d: number[]; e: number[] };
        try {
          const r = realEigen(flat(rows), rows.length);
          full = { d: Array.from(r.d), e: Array.from(r.e) };
        } catch (err) {
          fc.pre(!/did not converge/.test(String(err)));
          throw err;
        }
        const only = realEigenvalues(flat(rows), rows.length);
        expect({ d: Array.from(only.d), e: Array.from(only.e) }).toEqual(full);
        // and through balancing, as the coupling check takes them
        let decomposed: ReturnType<typeof eigenDecompose> | undefined;
        try {
          decomposed = eigenDecompose(rows);
        } catch (err) {
          fc.pre(!/did not converge/.test(String(err)));
          throw err;
        }
        expect(eigenvalues(rows)).toEqual(decomposed.values);
      }),
      { numRuns: 400, seed: 20261203 },
    );
  });
});
