import { describe, expect, it } from 'vitest';
import { modalFigures } from '../../src/modes/modal-figures.js';
import { InternalError } from '../../src/errors.js';

// Formulas: common practice for second- and first-order modes (e.g. Nelson, Flight Stability
// and Automatic Control, 2nd ed., ch. 4: omega_n, zeta, period, time and cycles to half).
const LN2 = Math.log(2);

describe('modalFigures', () => {
  const cases = [
    {
      name: 'convergent pair -1 +/- 1i',
      roots: [{ re: -1, im: 1 }, { re: -1, im: -1 }],
      expected: {
        naturalFrequency: Math.SQRT2,
        dampingRatio: 1 / Math.SQRT2,
        dampedFrequency: 1,
        period: 2 * Math.PI,
        timeConstant: null,
        timeToHalf: LN2,
        timeToDouble: null,
        cyclesToHalf: LN2 / (2 * Math.PI),
      },
    },
    {
      name: 'divergent pair 0.1 +/- 2i',
      roots: [{ re: 0.1, im: 2 }, { re: 0.1, im: -2 }],
      expected: {
        naturalFrequency: Math.hypot(0.1, 2),
        dampingRatio: -0.1 / Math.hypot(0.1, 2),
        dampedFrequency: 2,
        period: Math.PI,
        timeConstant: null,
        timeToHalf: null,
        timeToDouble: LN2 / 0.1,
        cyclesToHalf: null,
      },
    },
    {
      name: 'neutral pair 0 +/- 3i',
      roots: [{ re: 0, im: 3 }, { re: 0, im: -3 }],
      expected: {
        naturalFrequency: 3, dampingRatio: 0, dampedFrequency: 3, period: (2 * Math.PI) / 3,
        timeConstant: null, timeToHalf: null, timeToDouble: null, cyclesToHalf: null,
      },
    },
    {
      name: 'convergent real root -2',
      roots: [{ re: -2, im: 0 }],
      expected: {
        naturalFrequency: 2, dampingRatio: 1, dampedFrequency: null, period: null,
        timeConstant: 0.5, timeToHalf: LN2 / 2, timeToDouble: null, cyclesToHalf: null,
      },
    },
    {
      name: 'divergent real root 0.5 (negative time constant)',
      roots: [{ re: 0.5, im: 0 }],
      expected: {
        naturalFrequency: 0.5, dampingRatio: -1, dampedFrequency: null, period: null,
        timeConstant: -2, timeToHalf: null, timeToDouble: LN2 / 0.5, cyclesToHalf: null,
      },
    },
    {
      name: 'zero root',
      roots: [{ re: 0, im: 0 }],
      expected: {
        naturalFrequency: 0, dampingRatio: null, dampedFrequency: null, period: null,
        timeConstant: null, timeToHalf: null, timeToDouble: null, cyclesToHalf: null,
      },
    },
    {
      // (s + 1)(s + 4) = s^2 + 5 s + 4: omega_n = 2, zeta = 5/4; slowest root -1 governs.
      name: 'split pair -1, -4',
      roots: [{ re: -1, im: 0 }, { re: -4, im: 0 }],
      expected: {
        naturalFrequency: 2, dampingRatio: 1.25, dampedFrequency: null, period: null,
        timeConstant: 1, timeToHalf: LN2, timeToDouble: null, cyclesToHalf: null,
      },
    },
    {
      name: 'split pair with one divergent root 0.8, -5',
      roots: [{ re: 0.8, im: 0 }, { re: -5, im: 0 }],
      expected: {
        naturalFrequency: null, dampingRatio: null, dampedFrequency: null, period: null,
        timeConstant: -1 / 0.8, timeToHalf: null, timeToDouble: LN2 / 0.8, cyclesToHalf: null,
      },
    },
    {
      name: 'split pair, both divergent 0.5, 2',
      roots: [{ re: 0.5, im: 0 }, { re: 2, im: 0 }],
      expected: {
        naturalFrequency: 1, dampingRatio: null, dampedFrequency: null, period: null,
        timeConstant: -0.5, timeToHalf: null, timeToDouble: LN2 / 2, cyclesToHalf: null,
      },
    },
  ];

  it.each(cases)('$name', ({ roots, expected }) => {
    const figures = modalFigures(roots);
    for (const [key, value] of Object.entries(expected)) {
      const got = figures[key as keyof typeof figures];
      if (value === null) expect(got, key).toBeNull();
      else expect(got, key).toBeCloseTo(value, 12);
    }
  });

  it('rejects a mode with no or three roots (a bug upstream)', () => {
    expect(() => modalFigures([])).toThrow(InternalError);
    expect(() => modalFigures([{ re: -1, im: 0 }, { re: -2, im: 0 }, { re: -3, im: 0 }])).toThrow(InternalError);
  });
});
