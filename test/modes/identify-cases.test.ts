import { describe, expect, it } from 'vitest';
import { analyseModes } from '../../src/modes/analyse.js';
import type { Mode, ModeKind, StateSpace } from '../../src/types.js';
import {
  CR96008_LATERAL,
  CR96008_LONGITUDINAL,
  LAT_STATES,
  LON_STATES,
  U0,
  combine,
  lateralA,
  longitudinalA,
  navionLateral,
  navionLongitudinal,
  stateSpace,
} from './navion-fixture.js';

/** [m/s] 176 ft/s (Nelson, 2nd ed., ch. 4) */
const AIRSPEED = U0 * 0.3048;

const kinds = (modes: Mode[]): ModeKind[] => modes.map((m) => m.kind);
const ofKind = (modes: Mode[], kind: ModeKind): Mode[] => modes.filter((m) => m.kind === kind);

/**
 * Short-period approximation: lambda^2 - (Zw + Mq + u0 Mwdot) lambda + (Zw Mq - u0 Mw) = 0
 * (Nelson, 2nd ed., ch. 4, written with w instead of alpha: Z_alpha/u0 = Zw, M_alpha = u0 Mw,
 * M_alphadot = u0 Mwdot).
 */
function shortPeriodApproximation(d: typeof CR96008_LONGITUDINAL): [number, number] | null {
  const b = -(d.Zw + d.Mq + U0 * d.Mwdot);
  const c = d.Zw * d.Mq - U0 * d.Mw;
  const disc = b * b - 4 * c;
  if (disc < 0) return null;
  return [(-b + Math.sqrt(disc)) / 2, (-b - Math.sqrt(disc)) / 2];
}

describe('statically unstable airframe (positive Mw)', () => {
  // Invented variant of the Navion with Mw = +0.05 1/(ft s): negative static margin.
  const derivatives = { ...CR96008_LONGITUDINAL, Mw: 0.05 };
  const result = analyseModes(stateSpace(LON_STATES, longitudinalA(derivatives)), { airspeed: AIRSPEED });

  it('reports ONE short period with two real roots, one positive (contract 2)', () => {
    const [sp, ...more] = ofKind(result.modes, 'short_period');
    expect(more).toHaveLength(0);
    expect(sp!.eigenvalues).toHaveLength(2);
    expect(sp!.eigenvalues.every((z) => z.im === 0)).toBe(true);
    const [divergent, convergent] = sp!.eigenvalues;
    expect(divergent!.re).toBeGreaterThan(0);
    expect(convergent!.re).toBeLessThan(0);
    expect(sp!.timeToDouble).toBeCloseTo(Math.LN2 / divergent!.re, 12);
    expect(sp!.timeToHalf).toBeNull();
    expect(sp!.basis).toMatch(/two real roots \(split\)/);
    // The short-period approximation (Nelson ch. 4) gives +0.79 and -5.80; the full model
    // moves the divergent root by the speed coupling, so 15 % on it, 1 % on the fast root.
    const [up, down] = shortPeriodApproximation(derivatives)!;
    expect(Math.abs(divergent!.re - up) / up).toBeLessThan(0.15);
    expect(Math.abs(convergent!.re - down) / -down).toBeLessThan(0.01);
  });

  it('keeps the phugoid as the oscillatory pair', () => {
    const [ph] = ofKind(result.modes, 'phugoid');
    expect(ph!.eigenvalues[0]!.im).toBeGreaterThan(0);
    expect(result.modes).toHaveLength(2);
  });
});

describe('stable airframe with an overdamped short period (two stable real roots)', () => {
  // Invented variant: Mw = -0.01 1/(ft s), statically stable but with little pitch stiffness.
  const derivatives = { ...CR96008_LONGITUDINAL, Mw: -0.01 };
  const result = analyseModes(stateSpace(LON_STATES, longitudinalA(derivatives)), { airspeed: AIRSPEED });

  it('matches the short-period approximation within 1 % and gives zeta > 1', () => {
    const [sp] = ofKind(result.modes, 'short_period');
    const approx = shortPeriodApproximation(derivatives)!; // Nelson ch. 4
    const roots = sp!.eigenvalues.map((z) => z.re).sort((a, b) => b - a);
    expect(Math.abs(roots[0]! - approx[0]) / -approx[0]).toBeLessThan(0.01);
    expect(Math.abs(roots[1]! - approx[1]) / -approx[1]).toBeLessThan(0.01);
    expect(sp!.dampingRatio!).toBeGreaterThan(1);
    expect(sp!.ambiguous).toBe(false);
    expect(ofKind(result.modes, 'phugoid')[0]!.eigenvalues[0]!.im).toBeGreaterThan(0);
  });
});

describe('phugoid split into two real roots', () => {
  // Invented variant with strong speed damping Xu = -0.6 1/s. The phugoid approximation
  // omega = sqrt(-g Zu / u0), zeta = -Xu / (2 omega) (Nelson, 2nd ed., ch. 4) gives zeta = 1.15 > 1.
  const derivatives = { ...CR96008_LONGITUDINAL, Xu: -0.6 };
  const result = analyseModes(stateSpace(LON_STATES, longitudinalA(derivatives)), { airspeed: AIRSPEED });

  it('is one phugoid mode with two real roots, beside a short-period pair', () => {
    const omega = Math.sqrt((-32.2 * derivatives.Zu) / U0);
    expect(-derivatives.Xu / (2 * omega)).toBeGreaterThan(1);
    const phugoids = ofKind(result.modes, 'phugoid');
    expect(phugoids).toHaveLength(1);
    expect(phugoids[0]!.eigenvalues).toHaveLength(2);
    expect(phugoids[0]!.eigenvalues.every((z) => z.im === 0 && z.re < 0)).toBe(true);
    expect(phugoids[0]!.dampingRatio!).toBeGreaterThan(1);
    expect(ofKind(result.modes, 'short_period')[0]!.eigenvalues[0]!.im).toBeGreaterThan(0);
    expect(result.modes.every((m) => !m.ambiguous)).toBe(true);
  });
});

describe('third oscillatory mode near neutral static stability', () => {
  // Invented variant with Mw = +0.01 1/(ft s): one mixed oscillatory pair and two real roots,
  // the pattern described by McRuer, Ashkenas and Graham, Aircraft Dynamics and Automatic
  // Control (1973), ch. 5 (from memory).
  const result = analyseModes(
    stateSpace(LON_STATES, longitudinalA({ ...CR96008_LONGITUDINAL, Mw: 0.01 })),
    { airspeed: AIRSPEED },
  );

  it('assigns every root, marks the short period and phugoid ambiguous and says why', () => {
    const eigenvalueCount = result.modes.reduce((n, m) => n + m.eigenvalues.length, 0);
    expect(eigenvalueCount).toBe(4);
    expect(kinds(result.modes)).toEqual(['short_period', 'phugoid']);
    expect(result.modes.every((m) => m.ambiguous)).toBe(true);
    expect(result.warnings.some((w) => /third oscillatory mode/.test(w))).toBe(true);
  });
});

describe('12-state model with heading and position states', () => {
  // Navion (CR-96008) plus kinematics, linearised about level flight along xE (common practice):
  // psi' = r, xE' = u, yE' = u0 (beta + psi), h' = u0 theta - w.
  function twelveStates(): StateSpace {
    const base = combine(navionLongitudinal(), navionLateral());
    const states = [...base.states, 'psi', 'xE', 'yE', 'h'];
    const idx = (s: string) => states.indexOf(s);
    const A = states.map((_, i) => states.map((__, j) => (i < 8 && j < 8 ? base.A[i]![j]! : 0)));
    A[idx('psi')]![idx('r')] = 1;
    A[idx('xE')]![idx('u')] = 1;
    A[idx('yE')]![idx('beta')] = U0;
    A[idx('yE')]![idx('psi')] = U0;
    A[idx('h')]![idx('theta')] = U0;
    A[idx('h')]![idx('w')] = -1;
    return stateSpace(states, A);
  }
  const result = analyseModes(twelveStates(), { airspeed: AIRSPEED });

  it('calls the four zero roots kinematic, never spiral, and keeps the real spiral -0.00876', () => {
    const kinematic = ofKind(result.modes, 'kinematic');
    expect(kinematic).toHaveLength(4);
    expect(kinematic.every((m) => m.eigenvalues.length === 1 && m.eigenvalues[0]!.re === 0)).toBe(true);
    expect(kinematic.map((m) => m.referenceState).sort()).toEqual(['h', 'psi', 'xE', 'yE']);
    expect(kinematic.every((m) => m.basis.startsWith('real root at zero') && !m.ambiguous)).toBe(true);
    const spirals = ofKind(result.modes, 'spiral');
    expect(spirals).toHaveLength(1);
    // NASA CR-96008 set, spiral root (Nelson, 2nd ed., ch. 5 prints -0.0087)
    expect(Math.abs(spirals[0]!.eigenvalues[0]!.re + 0.00876)).toBeLessThan(0.000005);
    expect(kinds(result.modes).filter((k) => k !== 'kinematic')).toEqual([
      'short_period', 'phugoid', 'dutch_roll', 'roll', 'spiral',
    ]);
    expect(result.subsystems.kinematic).toEqual(['psi', 'xE', 'yE', 'h']);
    expect(result.warnings).toEqual([]);
  });
});

describe('actuator state', () => {
  // First-order elevator lag de' = -20 de + 20 de_cmd (20 rad/s: common practice for a servo).
  // Navion control derivatives Z_de = -28.17 ft/s^2, M_de = -11.87 1/s^2 (Nelson, 2nd ed., ch. 4,
  // from memory), with M_de + Mwdot Z_de in q'.
  function withActuator(pitchDamperGain: number): StateSpace {
    const lon = longitudinalA(CR96008_LONGITUDINAL);
    const Zde = -28.17;
    const Mde = -11.87 + CR96008_LONGITUDINAL.Mwdot * Zde;
    const A = [
      [...lon[0]!, 0],
      [...lon[1]!, Zde],
      [...lon[2]!, Mde],
      [...lon[3]!, 0],
      // open loop: nothing feeds the servo; closed loop: de_cmd = K q (pitch damper)
      [0, 0, 20 * pitchDamperGain, 0, -20],
    ];
    return stateSpace([...LON_STATES, 'de'], A);
  }

  it('open loop: the -20 rad/s servo root is other, the airframe modes are unchanged', () => {
    const result = analyseModes(withActuator(0), { airspeed: AIRSPEED });
    const [servo] = ofKind(result.modes, 'other');
    expect(servo!.eigenvalues).toEqual([{ re: -20, im: 0 }]);
    expect(servo!.ambiguous).toBe(false);
    expect(servo!.basis).toMatch(/100 % other-state participation/);
    expect(result.subsystems.other).toEqual(['de']);
    // unchanged from the Navion short period (NASA CR-96008 set)
    expect(Math.abs(ofKind(result.modes, 'short_period')[0]!.eigenvalues[0]!.re + 2.5105)).toBeLessThan(0.00005);
  });

  it('closed loop (pitch damper 0.2 rad per rad/s): the servo root stays other and the short period damps more', () => {
    const result = analyseModes(withActuator(0.2), { airspeed: AIRSPEED });
    const [servo] = ofKind(result.modes, 'other');
    expect(servo!.eigenvalues[0]!.re).toBeLessThan(-10);
    expect(servo!.shape[0]!.state).toBe('de');
    const [sp] = ofKind(result.modes, 'short_period');
    // more pitch damping -> higher short-period damping ratio than 0.696 (CR-96008 open loop)
    expect(sp!.dampingRatio!).toBeGreaterThan(0.696);
    expect(kinds(result.modes)).toEqual(['short_period', 'phugoid', 'other']);
  });
});

describe('coupled longitudinal and lateral blocks', () => {
  // Gyroscopic-style cross terms of our own: q' += k r and r' -= k q (e.g. a spinning rotor).
  function coupled(k: number): StateSpace {
    const base = combine(navionLongitudinal(), navionLateral());
    const A = base.A.map((row) => row.slice());
    const q = base.states.indexOf('q');
    const r = base.states.indexOf('r');
    A[q]![r] = k;
    A[r]![q] = -k;
    return stateSpace(base.states, A);
  }

  it('a small coupling beyond tolerance is reported, modes come from the full model with a warning', () => {
    const result = analyseModes(coupled(0.5), { airspeed: AIRSPEED });
    expect(result.decoupled).toBe(false);
    expect(result.coupling).toBeGreaterThan(0.01);
    expect(result.coupling).toBeLessThan(0.5);
    expect(result.warnings.some((w) => /coupled: zeroing the cross terms moves a root/.test(w))).toBe(true);
    expect(kinds(result.modes)).toEqual(['short_period', 'phugoid', 'dutch_roll', 'roll', 'spiral']);
  });

  it('a negligible coupling counts as decoupled, without a coupling warning', () => {
    const result = analyseModes(coupled(1e-4), { airspeed: AIRSPEED });
    expect(result.coupling).toBeGreaterThan(0);
    expect(result.decoupled).toBe(true);
    expect(result.warnings.filter((w) => /coupled/.test(w))).toEqual([]);
  });
});

describe('roll-spiral coupled oscillation', () => {
  // Invented lateral set of our own with weak roll damping and proverse yaw due to roll: the
  // roll and spiral roots coalesce into a pair dominated by p and phi (pattern: McRuer,
  // Ashkenas and Graham, Aircraft Dynamics and Automatic Control, ch. 6, from memory).
  const derivatives = { Ybeta: -44.3, Lbeta: -6.38, Lp: -0.419, Lr: 0.309, Nbeta: 4.86, Np: 0.614, Nr: -0.985 };
  const A = lateralA(derivatives);
  const result = analyseModes(stateSpace(LAT_STATES, A), { airspeed: AIRSPEED });

  it('reports roll_spiral and Dutch roll pairs and no separate roll or spiral', () => {
    expect(kinds(result.modes)).toEqual(['dutch_roll', 'roll_spiral']);
    const [rs] = ofKind(result.modes, 'roll_spiral');
    expect(rs!.eigenvalues[0]!.im).toBeGreaterThan(0);
    expect(['p', 'phi']).toContain(rs!.shape[0]!.state);
    expect(rs!.referenceState).toBe('phi');
    // sum of the eigenvalues equals the trace of A (linear algebra)
    const trace = A.reduce((t, row, i) => t + row[i]!, 0);
    const sum = result.modes.reduce((t, m) => t + m.eigenvalues.reduce((s, z) => s + z.re, 0), 0);
    expect(sum).toBeCloseTo(trace, 10);
  });
});

describe('the Dutch roll basis reports |phi/beta| whether the state is beta or v', () => {
  it('gives the same ratio for v = V beta (v in m/s, V = 53.6 m/s)', () => {
    const withBeta = analyseModes(navionLateral(CR96008_LATERAL), { airspeed: AIRSPEED });
    const V = AIRSPEED;
    // v = V beta: scale the beta row and column (a state scaling, T A T^-1)
    const A = lateralA(CR96008_LATERAL).map((row, i) => row.map((x, j) => x * (i === 0 ? V : 1) / (j === 0 ? V : 1)));
    const withV = analyseModes(stateSpace(['v', 'p', 'r', 'phi'], A), { airspeed: V });
    const ratio = (m: Mode[]) => /\|phi\/beta\| ([0-9.]+)/.exec(ofKind(m, 'dutch_roll')[0]!.basis)![1];
    expect(ratio(withV.modes)).toBe(ratio(withBeta.modes));
    expect(ofKind(withV.modes, 'dutch_roll')[0]!.referenceState).toBe('v');
  });
});

describe('other state names and reduced models', () => {
  it('a [vT, alpha, q, theta] model (alpha = w/u0, vT = u for small perturbations) gives the same modes', () => {
    // Nelson, 2nd ed., ch. 4: alpha = w/u0 for small perturbations; NASA CR-96008 derivatives.
    const A = longitudinalA(CR96008_LONGITUDINAL).map((row, i) => row.map((x, j) => (x * (i === 1 ? 1 / U0 : 1)) / (j === 1 ? 1 / U0 : 1)));
    const result = analyseModes(stateSpace(['vT', 'alpha', 'q', 'theta'], A), { airspeed: AIRSPEED });
    expect(kinds(result.modes)).toEqual(['short_period', 'phugoid']);
    expect(Math.abs(ofKind(result.modes, 'short_period')[0]!.eigenvalues[0]!.re + 2.5105)).toBeLessThan(0.00005);
    expect(ofKind(result.modes, 'phugoid')[0]!.referenceState).toBe('vT');
  });

  it('a short-period model with attitude [w, q, theta] has no phugoid: the attitude root is left over and reported', () => {
    // theta feeds nothing when theta0 = 0 (Nelson ch. 4 equations without the u equation)
    const lon = longitudinalA(CR96008_LONGITUDINAL);
    const A = [1, 2, 3].map((i) => [1, 2, 3].map((j) => lon[i]![j]!));
    const result = analyseModes(stateSpace(['w', 'q', 'theta'], A), { airspeed: AIRSPEED });
    expect(kinds(result.modes)).toEqual(['short_period', 'other']);
    const [left] = ofKind(result.modes, 'other');
    expect(left!.ambiguous).toBe(true);
    expect(left!.eigenvalues).toEqual([{ re: 0, im: 0 }]);
    expect(result.warnings).toContain('longitudinal root 0 fits none of the longitudinal modes; reported as other');
  });
});
