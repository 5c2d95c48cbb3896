/**
 * parseModel: every dynamics form, US and SI input, notes. Published check values are named
 * beside each check; the Navion (Nelson, Flight Stability and Automatic Control, 2nd ed., 1998,
 * ch. 4 and 5; Teper, NASA CR-96008, 1969) appears here only as a test case.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseModel } from '../../src/load/model-file.js';
import type { FlightCondition, StateSpace } from '../../src/types.js';
import { eigenvalues, nearest, type Root } from '../model/eigenvalues.js';

const ft = 0.3048;

function only(text: string, file = 'model.yaml'): FlightCondition {
  const model = parseModel(text, file);
  expect(model.conditions).toHaveLength(1);
  return model.conditions[0]!;
}

/** A[row state][column state], by name. */
function entry(system: StateSpace, row: string, col: string): number {
  const i = system.states.indexOf(row);
  const j = system.states.indexOf(col);
  if (i < 0 || j < 0) throw new Error(`no state ${row} or ${col}`);
  return system.A[i]![j]!;
}

/** Same model by name: the same entry for every pair of state names, whatever the order. */
function expectSameSystem(a: StateSpace, b: StateSpace, digits = 9) {
  expect([...a.states].sort()).toEqual([...b.states].sort());
  for (const r of a.states) for (const c of a.states) expect(entry(a, r, c), `A[${r}][${c}]`).toBeCloseTo(entry(b, r, c), digits);
  expect([...a.inputs].sort()).toEqual([...b.inputs].sort());
  for (const s of a.states) {
    for (const u of a.inputs) {
      const ia = a.states.indexOf(s);
      const ib = b.states.indexOf(s);
      expect(a.B[ia]![a.inputs.indexOf(u)], `B[${s}][${u}]`).toBeCloseTo(b.B[ib]![b.inputs.indexOf(u)]!, digits);
    }
  }
}

const header = (units: 'US' | 'SI', extra = '') => `format: modalgate-model/1
aircraft: { name: Test Case, class: I }
units: ${units}
${extra}conditions:
`;

// Navion, sea level, u0 = 176 ft/s: Nelson 2nd ed. ch. 4 (rounded) longitudinal, CR-96008 lateral (beta form)
const navionUS = `${header('US', 'gravity: 32.2\n')}  - id: navion-sl
    phase: CR
    airspeed: 176
    altitude: 0
    longitudinal:
      derivatives: { Xu: -0.045, Xw: 0.036, Zu: -0.369, Zw: -2.02, Mu: 0, Mw: -0.05, Mwdot: -0.0051, Mq: -2.05, Zde: -28.17, Mde: -11.87 }
    lateral:
      Ixz: 0
      derivatives: { Ybeta: -44.76, Yp: 0, Yr: 0, Lbeta: -15.982, Lp: -8.402, Lr: 2.193, Nbeta: 4.495, Np: -0.3498, Nr: -0.7605, Lda: 28.64, Nda: -1.3 }
`;

describe('derivative forms (longitudinal + lateral)', () => {
  const c = only(navionUS);

  it('builds one block-diagonal model with named states and inputs, in SI', () => {
    expect(c.form).toBe('derivatives');
    expect(c.system.states).toEqual(['u', 'w', 'q', 'theta', 'beta', 'p', 'r', 'phi']);
    expect(c.system.inputs).toEqual(['de', 'da']);
    expect(c.airspeed).toBeCloseTo(176 * ft, 12);
    expect(c.altitude).toBe(0);
    expect(c.theta0).toBe(0);
    expect(entry(c.system, 'u', 'p')).toBe(0);
    expect(entry(c.system, 'beta', 'w')).toBe(0);
    // Nelson's printed A, u' per theta = -32.2 ft/s^2, in SI (2nd ed., ch. 4)
    expect(entry(c.system, 'u', 'theta')).toBeCloseTo(-32.2 * ft, 12);
    // w' per q = u0 = 176 ft/s
    expect(entry(c.system, 'w', 'q')).toBeCloseTo(176 * ft, 12);
  });

  it('keeps the published roots through the SI conversion (Nelson, 2nd ed., ch. 4 and 5)', () => {
    const roots = eigenvalues(c.system.A);
    const near = (t: Root) => nearest(roots, t);
    // rounded longitudinal set: about 1 % from -2.51 +/- 2.59i (from memory)
    expect(Math.abs(Math.hypot(near({ re: -2.51, im: 2.59 }).re, near({ re: -2.51, im: 2.59 }).im) / Math.hypot(2.51, 2.59) - 1)).toBeLessThan(0.01);
    // CR-96008 lateral set: Dutch roll -0.487 +/- 2.335i, roll -8.435 (seen)
    expect(near({ re: -0.487, im: 2.335 }).re).toBeCloseTo(-0.487, 3);
    expect(near({ re: -0.487, im: 2.335 }).im).toBeCloseTo(2.335, 3);
    expect(Math.abs(near({ re: -8.435, im: 0 }).re + 8.435)).toBeLessThan(6e-4);
  });

  it('records every default and conversion in the notes', () => {
    expect(c.notes).toEqual(
      expect.arrayContaining([
        'written in US units: airspeed ft/s and altitude ft converted to SI (1 ft = 0.3048 m)',
        'altitude is geometric',
        'theta0 not given: 0 rad used (trim pitch attitude)',
        'g = 32.2 ft/s^2 (given in the file) used in the kinematic terms',
        'Xq, Zwdot, Zq not given: taken as 0',
        'Ixz = 0: no inertia coupling applied to the L and N derivatives',
        'state(s) u, w converted from ft to m (x 0.3048); angles and rates unchanged',
      ]),
    );
  });

  it('uses g = 32.174 ft/s^2 for US input when the file gives none, and says so', () => {
    const d = only(navionUS.replace('gravity: 32.2\n', ''));
    expect(entry(d.system, 'u', 'theta')).toBeCloseTo(-32.174 * ft, 12);
    expect(d.notes).toContain('g = 32.174 ft/s^2 (default for US input) used in the kinematic terms');
  });

  it('records that no inertia coupling was applied when Ixz is absent', () => {
    const d = only(navionUS.replace('      Ixz: 0\n', ''));
    expect(d.notes).toContain('Ixz not given: no inertia coupling applied to the L and N derivatives');
  });
});

describe('US and SI input give the same SI model', () => {
  // The Navion above written in SI by hand, each derivative converted by its dimension:
  // Xu, Xw, Zu, Zw, Mq [1/s] unchanged; Mw [1/(length s)] and Mwdot [1/length] divided by 0.3048;
  // Zde [length/s^2] and Ybeta [length/s^2] times 0.3048; L and N [1/s, 1/s^2] unchanged.
  const navionSI = `${header('SI', `gravity: ${32.2 * ft}\n`)}  - id: navion-sl
    phase: CR
    airspeed: ${176 * ft}
    altitude: 0
    longitudinal:
      derivatives: { Xu: -0.045, Xw: 0.036, Zu: -0.369, Zw: -2.02, Mu: 0, Mw: ${-0.05 / ft}, Mwdot: ${-0.0051 / ft}, Mq: -2.05, Zde: ${-28.17 * ft}, Mde: -11.87 }
    lateral:
      Ixz: 0
      derivatives: { Ybeta: ${-44.76 * ft}, Yp: 0, Yr: 0, Lbeta: -15.982, Lp: -8.402, Lr: 2.193, Nbeta: 4.495, Np: -0.3498, Nr: -0.7605, Lda: 28.64, Nda: -1.3 }
`;

  it('derivative form', () => {
    expectSameSystem(only(navionUS).system, only(navionSI).system);
  });

  it('state-space form with position and height states', () => {
    // h' = u0 theta - w: 176 ft/s per rad of pitch is 53.6448 m/s per rad
    const us = `${header('US')}  - { id: a, phase: CR, airspeed: 176, stateSpace: { states: [u, w, theta, h], A: [[-0.045, 0.036, -32.2, 0], [-0.369, -2.02, 0, 0], [0, 0.001, 0, 0], [0, -1, 176, 0]], inputs: [dT], B: [[2.5], [0], [0], [0]] } }\n`;
    const si = `${header('SI')}  - { id: a, phase: CR, airspeed: ${176 * ft}, stateSpace: { states: [u, w, theta, h], A: [[-0.045, 0.036, ${-32.2 * ft}, 0], [-0.369, -2.02, 0, 0], [0, ${0.001 / ft}, 0, 0], [0, -1, ${176 * ft}, 0]], inputs: [dT], B: [[${2.5 * ft}], [0], [0], [0]] } }\n`;
    expectSameSystem(only(us).system, only(si).system, 12);
    expect(entry(only(us).system, 'h', 'theta')).toBeCloseTo(53.6448, 12);
  });

  it('nondimensional form', () => {
    const nd = (units: 'US' | 'SI') => {
      const L = units === 'US' ? 1 : ft;
      const M = units === 'US' ? 1 : 14.59390294;
      return `${header(units, `gravity: ${32.174 * L}\n`)}  - id: n
    phase: CR
    airspeed: ${176 * L}
    altitude: ${5000 * L}
    nondimensional:
      mass: ${85.4 * M}
      inertia: { Ix: ${1048 * M * L * L}, Iy: ${3000 * M * L * L}, Iz: ${3530 * M * L * L}, Ixz: ${50 * M * L * L} }
      geometry: { S: ${184 * L * L}, cbar: ${5.7 * L}, b: ${33.4 * L} }
      coefficients: { CD0: 0.05, CLalpha: 4.44, CDalpha: 0.33, Cmalpha: -0.683, Cmalphadot: -4.36, Cmq: -9.96, CYbeta: -0.564, Clbeta: -0.074, Clp: -0.41, Clr: 0.107, Cnbeta: 0.071, Cnp: -0.0575, Cnr: -0.125 }
`;
    };
    expectSameSystem(only(nd('US')).system, only(nd('SI')).system, 9);
  });
});

describe('state-space form', () => {
  const natural = {
    states: ['u', 'w', 'q', 'theta'],
    A: [[-0.045, 0.036, 0, -9.81], [-0.369, -2.02, 53.6, 0], [0.0062, -0.13, -2.948, 0], [0, 0, 1, 0]],
  };

  it('takes states in any order, by name', () => {
    const order = ['theta', 'q', 'u', 'w'];
    const idx = order.map((s) => natural.states.indexOf(s));
    const A = idx.map((i) => idx.map((j) => natural.A[i]![j]!));
    const shuffled = only(`${header('SI')}  - { id: a, phase: CR, airspeed: 53.6, stateSpace: { states: [${order.join(', ')}], A: ${JSON.stringify(A)} } }\n`);
    const straight = only(`${header('SI')}  - { id: a, phase: CR, airspeed: 53.6, stateSpace: { states: [u, w, q, theta], A: ${JSON.stringify(natural.A)} } }\n`);
    expect(shuffled.system.states).toEqual(order);
    expectSameSystem(shuffled.system, straight.system, 15);
    expect(shuffled.form).toBe('stateSpace');
    expect(shuffled.theta0).toBeNull();
  });

  it('reads the full 13-state sample with heading, position and an actuator state', () => {
    const file = 'test/fixtures/models/tarnwing-state-space-si.yaml';
    const c = only(readFileSync(file, 'utf8'), file);
    expect(c.system.states).toHaveLength(13);
    expect(c.system.inputs).toEqual(['de_cmd', 'da', 'dr']);
    expect(c.system.outputs).toEqual(['q_gyro', 'h_baro']);
    expect(c.system.D).toEqual([[0, 0, 0], [0, 0, 0]]);
    expect(c.notes).toContain('state(s) de_act are not known by name: taken as written, no unit check');
    const roots = eigenvalues(c.system.A);
    // heading and position states add zero roots (common practice): psi, xE, yE, h
    expect(roots.filter((r) => Math.abs(r.re) < 1e-9 && Math.abs(r.im) < 1e-9)).toHaveLength(4);
    // the actuator lag is a root at -20 rad/s
    expect(nearest(roots, { re: -20, im: 0 }).re).toBeCloseTo(-20, 9);
  });

  it('accepts a longitudinal-only and a lateral-only state-space, combined block-diagonally', () => {
    const c = only(`${header('SI')}  - id: a
    phase: CR
    airspeed: 50
    longitudinal: { theta0: 0.05, stateSpace: { states: [alpha, q], A: [[-1.2, 1], [-4, -1.5]] } }
    lateral: { stateSpace: { states: [beta, r], A: [[-0.2, -1], [3, -0.3]] } }
`);
    expect(c.system.states).toEqual(['alpha', 'q', 'beta', 'r']);
    expect(c.system.A[0]).toEqual([-1.2, 1, 0, 0]);
    expect(c.form).toBe('stateSpace');
    expect(c.theta0).toBe(0.05);
  });
});

describe('lateral inertia coupling', () => {
  const Ix = 1048;
  const Iz = 3530;
  const Ixz = 150; // invented product of inertia [slug ft^2]
  const un = { Lbeta: -15.982, Lp: -8.402, Lr: 2.193, Nbeta: 4.495, Np: -0.3498, Nr: -0.7605 };
  // primed by hand with L' = (L + (Ixz/Ix) N) / (1 - Ixz^2/(Ix Iz)), N' likewise (Etkin & Reid, 3rd ed., ch. 4)
  const den = 1 - (Ixz * Ixz) / (Ix * Iz);
  const pr = (L: number, N: number) => [(L + (Ixz / Ix) * N) / den, (N + (Ixz / Iz) * L) / den] as const;
  const [Lb, Nb] = pr(un.Lbeta, un.Nbeta);
  const [Lp, Np] = pr(un.Lp, un.Np);
  const [Lr, Nr] = pr(un.Lr, un.Nr);
  const lat = (fields: string, d: string) => `${header('US')}  - id: a
    phase: CR
    airspeed: 176
    lateral:
      ${fields}
      derivatives: { Ybeta: -44.76, Yp: 0, Yr: 0, ${d} }
`;
  const unprimed = only(lat(`primed: false\n      Ixz: ${Ixz}\n      Ix: ${Ix}\n      Iz: ${Iz}`, `Lbeta: ${un.Lbeta}, Lp: ${un.Lp}, Lr: ${un.Lr}, Nbeta: ${un.Nbeta}, Np: ${un.Np}, Nr: ${un.Nr}`));
  const primedText = `Lbeta: ${Lb}, Lp: ${Lp}, Lr: ${Lr}, Nbeta: ${Nb}, Np: ${Np}, Nr: ${Nr}`;
  const primedWithIxz = only(lat(`primed: true\n      Ixz: ${Ixz}`, primedText));
  const primedAlone = only(lat('primed: true', primedText));

  it('unprimed + Ixz is primed once, giving the hand-primed values', () => {
    expect(entry(unprimed.system, 'p', 'beta')).toBeCloseTo(Lb, 12);
    expect(entry(unprimed.system, 'r', 'p')).toBeCloseTo(Np, 12);
    expect(unprimed.notes.some((n) => n.startsWith('L and N derivatives primed here'))).toBe(true);
  });

  it('primed: true is taken as given, with or without Ixz (no second application)', () => {
    expectSameSystem(primedWithIxz.system, unprimed.system, 12);
    expectSameSystem(primedAlone.system, unprimed.system, 12);
    expect(entry(primedWithIxz.system, 'p', 'p')).toBe(Lp);
    expect(primedWithIxz.notes).toContain('L and N derivatives taken as primed (as stated); Ixz not applied again');
  });

  it('applying the coupling twice would have moved the roll root by more than a per cent (why it is refused)', () => {
    const twice = only(lat(`primed: false\n      Ixz: ${Ixz}\n      Ix: ${Ix}\n      Iz: ${Iz}`, primedText));
    const once = nearest(eigenvalues(unprimed.system.A), { re: -8.4, im: 0 }).re;
    const again = nearest(eigenvalues(twice.system.A), { re: -8.4, im: 0 }).re;
    expect(Math.abs(again / once - 1)).toBeGreaterThan(0.01);
  });
});

describe('trim pitch attitude', () => {
  it('theta0 from the longitudinal part is used in both parts', () => {
    const c = only(`${header('SI')}  - id: a
    phase: CL
    airspeed: 40
    longitudinal:
      theta0: 0.1
      derivatives: { Xu: -0.05, Xw: 0.1, Zu: -0.4, Zw: -2.1, Mu: 0, Mw: -0.15, Mwdot: -0.015, Mq: -2.2 }
    lateral:
      Ixz: 0
      derivatives: { Yv: -0.25, Yp: 0, Yr: 0, Lv: -0.3, Lp: -7, Lr: 1.8, Nv: 0.1, Np: -0.3, Nr: -0.7 }
`);
    expect(c.theta0).toBe(0.1);
    expect(entry(c.system, 'u', 'theta')).toBeCloseTo(-9.80665 * Math.cos(0.1), 12);
    expect(entry(c.system, 'w', 'theta')).toBeCloseTo(-9.80665 * Math.sin(0.1), 12);
    expect(entry(c.system, 'v', 'phi')).toBeCloseTo(9.80665 * Math.cos(0.1), 12);
    expect(entry(c.system, 'phi', 'r')).toBeCloseTo(Math.tan(0.1), 12);
  });
});

describe('nondimensional form', () => {
  // Navion, Nelson 2nd ed. appendix B coefficients (from memory), sea level, u0 = 176 ft/s
  const text = `${header('US')}  - id: n
    phase: CR
    airspeed: 176
    altitude: 0
    nondimensional:
      mass: 85.4
      inertia: { Ix: 1048, Iy: 3000, Iz: 3530, Ixz: 0 }
      geometry: { S: 184, cbar: 5.7, b: 33.4 }
      coefficients: { CL0: 0.41, CD0: 0.05, CLalpha: 4.44, CDalpha: 0.33, Cmalpha: -0.683, Cmalphadot: -4.36, Cmq: -9.96, CLq: 3.8, CYbeta: -0.564, Clbeta: -0.074, Clp: -0.41, Clr: 0.107, Cnbeta: 0.071, Cnp: -0.0575, Cnr: -0.125 }
`;
  const c = only(text);

  it('gives roots within 2 % of the published Navion roots (Nelson, 2nd ed., ch. 4 from memory; ch. 5 seen)', () => {
    const roots = eigenvalues(c.system.A);
    const mag = (t: Root) => Math.hypot(nearest(roots, t).re, nearest(roots, t).im) / Math.hypot(t.re, t.im);
    expect(Math.abs(mag({ re: -2.51, im: 2.59 }) - 1)).toBeLessThan(0.02);
    expect(Math.abs(mag({ re: -0.487, im: 2.335 }) - 1)).toBeLessThan(0.02);
    expect(Math.abs(mag({ re: -8.435, im: 0 }) - 1)).toBeLessThan(0.02);
  });

  it('keeps the lift data and notes the atmosphere', () => {
    expect(c.form).toBe('nondimensional');
    // q = 36.8 lbf/ft^2 = 1762 Pa at sea level, 176 ft/s (Nelson, 2nd ed., ch. 4)
    expect(Math.abs(c.liftData!.dynamicPressure / (36.8 * 47.880259) - 1)).toBeLessThan(0.002);
    expect(c.liftData!.wingArea).toBeCloseTo(184 * ft * ft, 12);
    expect(c.liftData!.liftCurveSlope).toBe(4.44);
    expect(c.notes.some((n) => n.startsWith('density 1.2250 kg/m^3 from the U.S. Standard Atmosphere 1976 at the geometric altitude'))).toBe(true);
  });
});

describe('sample models', () => {
  it.each(['tarnwing-derivatives-us.yaml', 'tarnwing-nondimensional-si.json', 'tarnwing-state-space-si.yaml'])('%s loads', (name) => {
    const file = `test/fixtures/models/${name}`;
    const model = parseModel(readFileSync(file, 'utf8'), file);
    expect(model.aircraft).toEqual({ name: 'Tarnwing TW-4', class: 'I' });
    for (const c of model.conditions) {
      expect(c.place.file).toBe(file);
      expect(c.place.line).toBeGreaterThan(0);
      expect(c.system.A).toHaveLength(c.system.states.length);
    }
  });
});
