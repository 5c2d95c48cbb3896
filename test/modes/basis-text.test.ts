import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatNumber, formatRoot, frequencyRank, pct } from '../../src/modes/basis-text.js';

// Three significant digits, trailing zeros dropped (common practice for engineering tables).
describe('formatNumber', () => {
  it.each([
    [3.608378, '3.61'], [0.00876, '0.00876'], [-0.0087612, '-0.00876'], [114.15, '114'], [2.5, '2.5'],
    [1, '1'], [0.1, '0.1'], [999.6, '1000'], [0.09996, '0.1'], [23456, '23500'], [-8.4345, '-8.43'],
    [1e-20, '1e-20'], [0, '0'],
  ])('%s -> %s', (x, text) => {
    expect(formatNumber(x)).toBe(text);
  });

  it('agrees with toPrecision(3) for any finite number', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (x) => {
        expect(Number(formatNumber(x))).toBe(Number(x.toPrecision(3)));
      }),
      { numRuns: 2000, seed: 20261202 },
    );
  });

  it('formats roots and shares', () => {
    // plain ASCII '+/-': a basis string stays a one-byte string (half the memory in a sweep)
    expect(formatRoot({ re: -2.5105, im: 2.5919 })).toBe('-2.51 +/- 2.59i');
    expect(formatRoot({ re: -8.4345, im: 0 })).toBe('-8.43');
    expect(pct(0.923)).toBe('92 %');
  });

  it('ranks a mode by frequency among its axis', () => {
    expect(frequencyRank([8.4, 2.4, 0.009], 0, 'lateral-directional')).toBe('fastest of 3 lateral-directional modes');
    expect(frequencyRank([8.4, 2.4, 0.009], 1, 'lateral-directional')).toBe('2nd fastest of 3 lateral-directional modes');
    expect(frequencyRank([8.4, 2.4, 0.009], 2, 'lateral-directional')).toBe('slowest of 3 lateral-directional modes');
    expect(frequencyRank([3.6], 0, 'longitudinal')).toBe('the only longitudinal mode found');
  });
});
