import { describe, expect, it } from 'vitest';
import { balanceInto } from '../../src/modes/balance.js';
import { NELSON_PRINTED_LONGITUDINAL_A } from './navion-fixture.js';

// Parlett and Reinsch, Numer. Math. 13 (1969): B = D^-1 A D with D a diagonal of powers of 2.
describe('balanceInto', () => {
  const n = 4;
  const balanced = new Float64Array(n * n);
  const scale = new Float64Array(n);
  balanceInto(NELSON_PRINTED_LONGITUDINAL_A, balanced, scale);

  it('is a diagonal similarity with power-of-2 scales (exact, no rounding)', () => {
    for (let i = 0; i < n; i += 1) {
      expect(Number.isInteger(Math.log2(scale[i]!))).toBe(true);
      for (let j = 0; j < n; j += 1) {
        expect(balanced[i * n + j]).toBe((NELSON_PRINTED_LONGITUDINAL_A[i]![j]! / scale[i]!) * scale[j]!);
      }
    }
  });

  it('evens out row and column norms that the units made unequal (the 176 ft/s entry)', () => {
    const offDiagonal = (m: (i: number, j: number) => number, i: number, byRow: boolean) => {
      let sum = 0;
      for (let k = 0; k < n; k += 1) if (k !== i) sum += Math.abs(byRow ? m(i, k) : m(k, i));
      return sum;
    };
    const before = (i: number, j: number) => NELSON_PRINTED_LONGITUDINAL_A[i]![j]!;
    const after = (i: number, j: number) => balanced[i * n + j]!;
    const spread = (m: typeof before) =>
      Math.max(...[0, 1, 2, 3].map((i) => Math.abs(Math.log2(offDiagonal(m, i, true) / offDiagonal(m, i, false)))));
    expect(spread(after)).toBeLessThan(spread(before));
    expect(spread(after)).toBeLessThanOrEqual(2.5);
  });
});
