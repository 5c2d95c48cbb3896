import { describe, expect, it } from 'vitest';
import { FOOT, POUND_FORCE, SLUG, STANDARD_GRAVITY, US_INPUT_GRAVITY, defaultGravity, stateDimension, stateFactor } from '../src/units.js';

describe('unit factors', () => {
  it('1 ft = 0.3048 m exactly (international foot, 1959; NIST SP 811, appendix B.8, section from memory)', () => {
    expect(FOOT).toBe(0.3048);
  });
  it('1 lbf = 0.45359237 kg x 9.80665 m/s^2 (NIST SP 811, appendix B.8, section from memory: 4.448222 N)', () => {
    expect(POUND_FORCE).toBeCloseTo(0.45359237 * 9.80665, 12);
    expect(POUND_FORCE).toBeCloseTo(4.448222, 6);
  });
  it('1 slug = 1 lbf s^2/ft = 14.59390 kg (NIST SP 811, appendix B.8, section from memory)', () => {
    expect(SLUG).toBeCloseTo(POUND_FORCE / FOOT, 7);
    expect(SLUG).toBeCloseTo(14.5939, 4);
  });
  it('g0 = 9.80665 m/s^2 (3rd CGPM, 1901); 32.174 ft/s^2 is g0 to five figures (common practice)', () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expect(US_INPUT_GRAVITY).toBeCloseTo(STANDARD_GRAVITY / FOOT, 3);
    expect(defaultGravity('US')).toBe(32.174);
    expect(defaultGravity('SI')).toBe(9.80665);
  });
});

describe('per-state dimensions (model contract state names)', () => {
  it.each([
    ['u', 'velocity', FOOT], ['w', 'velocity', FOOT], ['vT', 'velocity', FOOT], ['v', 'velocity', FOOT],
    ['xE', 'length', FOOT], ['yE', 'length', FOOT], ['h', 'length', FOOT],
    ['alpha', 'angle', 1], ['beta', 'angle', 1], ['theta', 'angle', 1], ['phi', 'angle', 1], ['psi', 'angle', 1],
    ['q', 'angular_rate', 1], ['p', 'angular_rate', 1], ['r', 'angular_rate', 1],
    ['de_act', 'other', 1], ['toString', 'other', 1],
  ] as const)('%s is a %s state, US factor %d', (state, dimension, factor) => {
    expect(stateDimension(state)).toBe(dimension);
    expect(stateFactor(state, 'US')).toBe(factor);
    expect(stateFactor(state, 'SI')).toBe(1);
  });
});
