/**
 * Balancing of a real matrix before the eigen-analysis: a diagonal similarity B = D^-1 A D,
 * with D made of powers of 2 (so no rounding is introduced), that makes each state's row and
 * column norms comparable (Parlett and Reinsch, Numer. Math. 13, 1969; the EISPACK `balanc`
 * procedure). Models mix ft, m and rad freely; without balancing the QR iteration loses
 * digits on small roots such as the spiral when state scales differ by orders of magnitude.
 * Eigenvectors map back as v_A = D v_B, left eigenvectors as w_A = w_B D^-1.
 */

const RADIX = 2;
/** Stop when a sweep improves the row plus column norm of every state by less than 5 %. */
const IMPROVEMENT = 0.95;

/**
 * Writes B = D^-1 A D into `out` (row-major n x n) and the diagonal of D into `scale`; both are
 * buffers of the caller, so a sweep over thousands of conditions allocates nothing here.
 */
export function balanceInto(A: readonly (readonly number[])[], out: Float64Array, scale: Float64Array): void {
  const n = A.length;
  for (let i = 0; i < n; i += 1) {
    const row = A[i]!;
    for (let j = 0; j < n; j += 1) out[i * n + j] = row[j]!;
    scale[i] = 1;
  }
  let done = false;
  while (!done) {
    done = true;
    for (let i = 0; i < n; i += 1) {
      let column = 0;
      let row = 0;
      for (let j = 0; j < n; j += 1) {
        if (j === i) continue;
        column += Math.abs(out[j * n + i]!);
        row += Math.abs(out[i * n + j]!);
      }
      if (column === 0 || row === 0) continue;
      const sum = column + row;
      let f = 1;
      let c = column;
      while (c < row / RADIX) {
        f *= RADIX;
        c *= RADIX * RADIX;
      }
      while (c > row * RADIX) {
        f /= RADIX;
        c /= RADIX * RADIX;
      }
      if ((c + row) / f < IMPROVEMENT * sum) {
        done = false;
        scale[i]! *= f;
        for (let j = 0; j < n; j += 1) out[i * n + j]! /= f;
        for (let j = 0; j < n; j += 1) out[j * n + i]! *= f;
      }
    }
  }
}
