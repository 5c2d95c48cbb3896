/**
 * The general-aviation worked example of Nelson, Flight Stability and Automatic Control,
 * 2nd ed. (1998), ch. 4 (longitudinal) and ch. 5 (lateral), with the unrounded derivatives of
 * Teper, NASA CR-96008 (1969), checked as a Class I aircraft against the shipped
 * MIL-F-8785C set in cruise (CR, Category B) and approach (PA, Category C), and in a
 * Category A phase where its Dutch-roll damping is marginal. The modes are built by hand from
 * the roots below (the modes module is checked on its own).
 */
import { describe, expect, it } from 'vitest';
import { evaluateCondition } from '../../src/criteria/evaluate.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import type { Finding, FlightCondition } from '../../src/types.js';
import { analysisOf, conditionOf, modeFromRoots, pairOf, share } from './build-inputs.js';

const mil = (await loadCriteriaSet('mil-f-8785c')).set;

// Roots (Nelson 2nd ed. ch. 4 and 5, reproduced exactly by the CR-96008 derivatives) [1/s]
const shortPeriod = modeFromRoots('short_period', pairOf(-2.5105, 2.5919));
const phugoid = modeFromRoots('phugoid', pairOf(-0.01713, 0.2131));
// |phi/beta| = 0.820: computed in this project from the CR-96008 lateral derivatives with a
// general eigen solver (not a published figure); omega^2 |phi/beta| = 4.66 < 20, so the
// 3.3.1.1 rise of the zeta omega_n minimum does not apply.
const dutchRoll = modeFromRoots('dutch_roll', pairOf(-0.4867, 2.3349), [share('beta', 1), share('phi', 0.82)]);
const roll = modeFromRoots('roll', [{ re: -8.4345, im: 0 }]);
const spiral = modeFromRoots('spiral', [{ re: -0.00876, im: 0 }]);
const analysis = analysisOf([shortPeriod, phugoid, dutchRoll, roll, spiral]);

// u0 = 176 ft/s = 53.6448 m/s; A[w,w] = Zw = -2.0244 1/s (CR-96008), the same in SI; only
// A[w,w] enters the criteria (n/alpha), the other rows are filled in for shape.
const u0 = 176 * 0.3048;
const system = {
  states: ['u', 'w', 'q', 'theta'],
  A: [
    [-0.0451, 0.03607, 0, -9.80665],
    [-0.3697, -2.0244, u0, 0],
    [0.0019, -0.0396, -2.948, 0],
    [0, 0, 1, 0],
  ],
  inputs: [],
  B: [],
  outputs: [],
  C: [],
  D: [],
};
const navion = (phase: string): FlightCondition => conditionOf({ id: `navion-${phase}`, phase, airspeed: u0, altitude: 0, system });

function byId(findings: Finding[]) {
  return Object.fromEntries(findings.map((f) => [f.criterion, f]));
}

describe('Navion (Nelson 2nd ed.), Class I', () => {
  // Hand arithmetic shared by both phases:
  // omega_sp = sqrt(2.5105^2 + 2.5919^2) = sqrt(13.0206) = 3.6084 rad/s; zeta_sp = 2.5105 / 3.6084 = 0.6957
  // n/alpha = 53.6448 x 2.0244 / 9.80665 = 11.074 g/rad (= 176 x 2.0244 / 32.174)
  // CAP = 13.0206 / 11.074 = 1.1758 1/(s^2 g)
  // phugoid: omega = sqrt(0.01713^2 + 0.2131^2) = 0.21379; zeta = 0.01713 / 0.21379 = 0.08013
  // Dutch roll: omega = sqrt(0.4867^2 + 2.3349^2) = 2.3851; zeta = 0.4867 / 2.3851 = 0.20406; zeta omega = 0.4867
  // roll: tau = 1 / 8.4345 = 0.11856 s; spiral: stable, time to double infinite

  it('cruise (CR, Category B): every criterion at Level 1', () => {
    const r = evaluateCondition({ aircraftClass: 'I', condition: navion('CR'), analysis, set: mil });
    expect(r.category).toBe('B');
    const f = byId(r.findings);
    // 3.2.2.1.2 Cat B: 0.30 <= 0.6957 <= 2.00; margin min(0.3957, 1.3043)
    expect(f['short-period-damping-cat-b']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['short-period-damping-cat-b']!.value).toBeCloseTo(0.6957, 4);
    expect(f['short-period-damping-cat-b']!.margin).toBeCloseTo(0.3957, 4);
    // 3.2.2.1.1 Cat B: 0.085 <= 1.1758 <= 3.6; margin min(1.0908, 2.4242)
    expect(f['short-period-cap-cat-b']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['short-period-cap-cat-b']!.value).toBeCloseTo(1.1758, 3);
    expect(f['short-period-cap-cat-b']!.margin).toBeCloseTo(1.0908, 3);
    expect(f['short-period-cap-cat-b']!.method).toContain('-V A[w,w] / g');
    // 3.2.1.2: 0.0801 >= 0.04, margin 0.0401 > band 0.004
    expect(f['phugoid-damping']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['phugoid-damping']!.value).toBeCloseTo(0.0801, 4);
    expect(f['phugoid-time-to-double']).toMatchObject({ level: 1, verdict: 'pass', value: null });
    // 3.3.1.2 Cat B: 0.1186 <= 1.4; margin 1.2814
    expect(f['roll-time-constant-cat-b']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['roll-time-constant-cat-b']!.value).toBeCloseTo(0.11856, 5);
    expect(f['roll-time-constant-cat-b']!.margin).toBeCloseTo(1.2814, 4);
    // 3.3.1.3 Class I Cat B: stable spiral meets the 20 s minimum
    expect(f['spiral-time-to-double-cat-b-light']).toMatchObject({ level: 1, verdict: 'pass' });
    // 3.3.1.1 Cat B: zeta 0.2041 >= 0.08; zeta omega 0.4867 >= 0.15; omega 2.385 >= 0.4
    expect(f['dutch-roll-damping-cat-b-c']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['dutch-roll-damping-cat-b-c']!.value).toBeCloseTo(0.2041, 4);
    expect(f['dutch-roll-damping-frequency-cat-b']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['dutch-roll-damping-frequency-cat-b']!.value).toBeCloseTo(0.4867, 4);
    expect(f['dutch-roll-frequency-cat-b']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['dutch-roll-frequency-cat-b']!.value).toBeCloseTo(2.3851, 4);
    // 3.3.1.4: no coupled roll-spiral oscillation, so the requirement does not apply
    expect(f['roll-spiral-coupling']).toBeUndefined();
    expect(r.notApplicable.map((n) => n.criterion)).toEqual(['roll-performance-class-i-cat-b', 'roll-spiral-coupling']);
    expect(r.findings).toHaveLength(9);
    expect(r.findings.every((x) => x.level === 1 && x.verdict === 'pass')).toBe(true);
  });

  it('approach (PA, Category C): every criterion at Level 1', () => {
    const r = evaluateCondition({ aircraftClass: 'I', condition: navion('PA'), analysis, set: mil });
    expect(r.category).toBe('C');
    const f = byId(r.findings);
    // 3.2.2.1.2 Cat C: 0.35 <= 0.6957 <= 1.30; margin min(0.3457, 0.6043)
    expect(f['short-period-damping-cat-a-c']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['short-period-damping-cat-a-c']!.margin).toBeCloseTo(0.3457, 4);
    // 3.2.2.1.1 Cat C: 0.16 <= 1.1758 <= 3.6; Class I omega_sp 3.608 >= 0.87
    expect(f['short-period-cap-cat-c']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['short-period-frequency-cat-c-light']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(f['short-period-frequency-cat-c-light']!.value).toBeCloseTo(3.6084, 4);
    // 3.3.1.2 Cat C Class I: 0.1186 <= 1.0; margin 0.8814
    expect(f['roll-time-constant-cat-c-light']!.margin).toBeCloseTo(0.8814, 4);
    // 3.3.1.1 Cat C Class I: omega 2.385 >= 1.0
    expect(f['dutch-roll-frequency-cat-c-light']).toMatchObject({ level: 1, verdict: 'pass' });
    expect(r.findings.every((x) => x.level === 1 && x.verdict === 'pass')).toBe(true);
    expect(r.notApplicable.map((n) => n.criterion)).toEqual(['roll-performance-class-i-cat-c', 'roll-spiral-coupling']);
    expect(r.findings).toHaveLength(10);
  });

  it('a Category A phase (TF): Dutch-roll damping 0.2041 is Level 1 but within 10 % of the 0.19 minimum', () => {
    const f = byId(evaluateCondition({ aircraftClass: 'I', condition: navion('TF'), analysis, set: mil }).findings);
    // 3.3.1.1 Cat A: margin 0.2041 - 0.19 = 0.0141 < band 0.019
    expect(f['dutch-roll-damping-cat-a']).toMatchObject({ level: 1, verdict: 'marginal' });
    expect(f['dutch-roll-damping-cat-a']!.margin).toBeCloseTo(0.0141, 4);
    // 3.3.1.1 Cat A: zeta omega 0.4867 >= 0.35, margin 0.1367 > band 0.035
    expect(f['dutch-roll-damping-frequency-cat-a']).toMatchObject({ level: 1, verdict: 'pass' });
    // 3.2.2.1.2 Cat A damping as Cat C; 3.2.2.1.1 Cat A CAP 0.28 <= 1.1758 <= 3.6
    expect(f['short-period-cap-cat-a']).toMatchObject({ level: 1, verdict: 'pass' });
    // 3.3.1.3 Class I Cat A: stable spiral meets 12 s
    expect(f['spiral-time-to-double-cat-a-light']).toMatchObject({ level: 1, verdict: 'pass' });
  });
});
