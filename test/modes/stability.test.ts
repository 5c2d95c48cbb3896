/** Stability and real-root classification of a mode (closed form: the sign of the largest real part). */
import { describe, expect, it } from 'vitest';
import { isRealMode, modeStability } from '../../src/modes/stability.js';

describe('modeStability', () => {
  it.each([
    [[{ re: -2.5, im: 2.6 }, { re: -2.5, im: -2.6 }], 'convergent', false],
    [[{ re: 0.002, im: 0.18 }, { re: 0.002, im: -0.18 }], 'divergent', false],
    [[{ re: 0.0041, im: 0 }], 'divergent', true],
    [[{ re: -7.4, im: 0 }], 'convergent', true],
    [[{ re: -3, im: 0 }, { re: 0.5, im: 0 }], 'divergent', true],
    [[{ re: 0, im: 0 }], 'neutral', true],
  ] as const)('%j is %s', (eigenvalues, stability, real) => {
    expect(modeStability({ eigenvalues: [...eigenvalues] })).toBe(stability);
    expect(isRealMode({ eigenvalues: [...eigenvalues] })).toBe(real);
  });
});
