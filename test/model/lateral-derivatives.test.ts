/**
 * Lateral-directional equations from dimensional derivatives. Check values: the Navion
 * of Nelson, Flight Stability and Automatic Control, 2nd ed. (1998), ch. 5, sea level,
 * u0 = 176 ft/s, g = 32.2 ft/s^2, theta0 = 0, Ixz = 0, US units; unrounded derivatives from
 * Teper, NASA CR-96008 (1969). Published roots (seen in a reproduction quoting the book):
 * Dutch roll -0.487 +/- 2.335i, roll -8.435, spiral -0.0087.
 */
import { describe, expect, it } from 'vitest';
import { lateralFromDerivatives, readLateralDerivatives, type LateralDerivatives } from '../../src/model/lateral-derivatives.js';
import { eigenvalues, nearest } from './eigenvalues.js';

const u0 = 176;
const trim = { u0, g: 32.2, theta0: 0 };
// Teper, NASA CR-96008 (1969), Navion: Ybeta = u0 Yv with Yv = -0.2543 1/s
const teperBeta = { Ybeta: -44.76, Yp: 0, Yr: 0, Lbeta: -15.982, Lp: -8.402, Lr: 2.193, Nbeta: 4.495, Np: -0.3498, Nr: -0.7605 };
// Nelson, 2nd ed., ch. 5, Navion as commonly quoted
const nelsonBeta = { Ybeta: -45.72, Yp: 0, Yr: 0, Lbeta: -15.97, Lp: -8.395, Lr: 2.19, Nbeta: 4.549, Np: -0.349, Nr: -0.76 };

function read(d: Record<string, number>): LateralDerivatives {
  const r = readLateralDerivatives(d, []);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.value;
}

describe('lateralFromDerivatives, beta form', () => {
  it('gives the published Navion roots from the CR-96008 set (Nelson, 2nd ed., ch. 5; seen)', () => {
    const { system } = lateralFromDerivatives(read(teperBeta), new Map(), trim, null);
    expect(system.states).toEqual(['beta', 'p', 'r', 'phi']);
    const roots = eigenvalues(system.A);
    const dutch = nearest(roots, { re: -0.487, im: 2.335 });
    // half a unit of the printed third decimal
    expect(Math.abs(dutch.re + 0.487)).toBeLessThan(0.0005);
    expect(Math.abs(dutch.im - 2.335)).toBeLessThan(0.0005);
    // the roll root computes to -8.4345, on the rounding edge of the printed -8.435
    expect(Math.abs(nearest(roots, { re: -8.435, im: 0 }).re + 8.435)).toBeLessThan(0.0006);
    // the spiral root is a small difference of large products: 2 % here
    expect(Math.abs(nearest(roots, { re: -0.0087, im: 0 }).re / -0.0087 - 1)).toBeLessThan(0.02);
  });

  it('the commonly quoted set agrees to about 1 % (spiral 10 %) (Nelson, 2nd ed., ch. 5; seen)', () => {
    const roots = eigenvalues(lateralFromDerivatives(read(nelsonBeta), new Map(), trim, null).system.A);
    const dutch = nearest(roots, { re: -0.487, im: 2.335 });
    expect(Math.abs(Math.hypot(dutch.re, dutch.im) / Math.hypot(0.487, 2.335) - 1)).toBeLessThan(0.01);
    expect(Math.abs(nearest(roots, { re: -8.435, im: 0 }).re / -8.435 - 1)).toBeLessThan(0.01);
    expect(Math.abs(nearest(roots, { re: -0.0087, im: 0 }).re / -0.0087 - 1)).toBeLessThan(0.1);
  });

  it('writes the beta row as Nelson does: Ybeta/u0, Yp/u0, -(1 - Yr/u0), g cos(theta0)/u0 (2nd ed., ch. 5)', () => {
    const d = { ...teperBeta, Yp: 1.5, Yr: 9 };
    const theta0 = 0.1;
    const { A } = lateralFromDerivatives(read(d), new Map(), { ...trim, theta0 }, null).system;
    expect(A[0]).toEqual([-44.76 / u0, 1.5 / u0, -(1 - 9 / u0), (32.2 * Math.cos(theta0)) / u0]);
    // phi' = p + tan(theta0) r (Euler angle kinematics, linearised about wings level)
    expect(A[3]).toEqual([0, 1, Math.tan(theta0), 0]);
  });
});

describe('lateralFromDerivatives, v form', () => {
  // The same Navion in the v form: Yv = -0.2543 1/s (CR-96008), Lv = Lbeta/u0, Nv = Nbeta/u0
  const teperV = { Yv: -44.76 / u0, Yp: 0, Yr: 0, Lv: -15.982 / u0, Lp: -8.402, Lr: 2.193, Nv: 4.495 / u0, Np: -0.3498, Nr: -0.7605 };

  it('has states [v, p, r, phi] and the same roots as the beta form (v = u0 beta is a change of scale)', () => {
    const v = lateralFromDerivatives(read(teperV), new Map(), trim, null).system;
    const beta = lateralFromDerivatives(read(teperBeta), new Map(), trim, null).system;
    expect(v.states).toEqual(['v', 'p', 'r', 'phi']);
    expect(-44.76 / u0).toBeCloseTo(-0.2543, 4); // CR-96008 Yv
    const rv = eigenvalues(v.A);
    const rb = eigenvalues(beta.A);
    rv.forEach((r, i) => {
      expect(r.re).toBeCloseTo(rb[i]!.re, 9);
      expect(r.im).toBeCloseTo(rb[i]!.im, 9);
    });
    // v' = Yv v + Yp p + (Yr - u0) r + g cos(theta0) phi (Etkin & Reid, 3rd ed., ch. 4)
    expect(v.A[0]).toEqual([-44.76 / u0, 0, -u0, 32.2]);
  });

  it('refuses a set that mixes v and beta derivatives', () => {
    const r = readLateralDerivatives({ ...teperV, Lbeta: -15.982, Lv: undefined as unknown as number }, ['d']);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.code).toBe('mixed_forms');
  });

  it('names the missing derivatives', () => {
    const r = readLateralDerivatives({ Yv: -0.25, Yp: 0, Lv: -0.09, Lp: -8, Lr: 2, Nv: 0.025, Np: -0.35 }, ['d']);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]!.message).toBe('missing derivatives Yr, Nr (needed for the lateral-directional v form)');
  });
});

describe('control derivatives', () => {
  it('become B columns; Y is divided by u0 in the beta form', () => {
    const controls = new Map<string, Record<string, number>>([['da', { L: 28.64, N: -1.3 }], ['dr', { Y: 12.5, L: 2.5, N: -4.6 }]]);
    const { system, notes } = lateralFromDerivatives(read(teperBeta), controls, trim, null);
    expect(system.inputs).toEqual(['da', 'dr']);
    expect(system.B.map((r) => r[1])).toEqual([12.5 / u0, 2.5, -4.6, 0]);
    expect(system.B.map((r) => r[0])).toEqual([0, 28.64, -1.3, 0]);
    expect(notes).toContain('Yda not given: taken as 0');
  });
});
