import { describe, expect, it } from 'vitest';
import { dropbackFigures } from '../../src/equivalent/dropback.js';

describe('Gibson dropback figures of a pitch equivalent system', () => {
  it('the reference vector: 1/Ttheta2 1.25, zeta 0.7, w 3.0', () => {
    // computed vector of the reference: DB/q_ss = Ttheta2 - 2 zeta/w = 0.8 - 0.4667 = 0.333 s
    // (steady-state form, memory high); q_pk/q_ss 1.573 (computed)
    const f = dropbackFigures(1.25, 0.7, 3.0);
    expect(f.dropbackRatio).toBeCloseTo(0.8 - 1.4 / 3, 12);
    expect(f.dropbackRatio).toBeCloseTo(0.333, 3);
    expect(f.peakRatio).toBeCloseTo(1.573, 3);
    expect(f.definition).toMatch(/steady-state definition/);
  });

  it('a zero far to the left leaves the second-order step: peak 1 + exp(-pi zeta / sqrt(1 - zeta^2))', () => {
    // closed form of the second-order overshoot (common practice), zeta 0.5: 1.1630
    const f = dropbackFigures(1e4, 0.5, 2);
    expect(f.peakRatio).toBeCloseTo(1 + Math.exp((-Math.PI * 0.5) / Math.sqrt(0.75)), 3);
  });
});
