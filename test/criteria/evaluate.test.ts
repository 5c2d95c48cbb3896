/**
 * evaluateCondition: phase -> category, selectors, unstable and missing modes, altitude
 * selection, and the rules of the evaluators. Boundaries from the shipped sets (MIL-F-8785C
 * paragraphs named per check; 14 CFR 23.181 / 25.181).
 */
import { describe, expect, it } from 'vitest';
import { evaluateCondition } from '../../src/criteria/evaluate.js';
import { InputError } from '../../src/errors.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import type { AircraftClass, Finding, FlightCondition, Mode } from '../../src/types.js';
import { analysisOf, conditionOf, modeFromRoots, pairFrom, pairOf, share } from './build-inputs.js';

const mil = (await loadCriteriaSet('mil-f-8785c')).set;
const part23 = (await loadCriteriaSet('test/fixtures/criteria/part23-programme.yaml')).set;
const part25 = (await loadCriteriaSet('test/fixtures/criteria/part25-programme.yaml')).set;

/** A well-behaved set of modes (values chosen inside every Level 1 boundary of MIL-F-8785C). */
function healthyModes(): Mode[] {
  return [
    modeFromRoots('short_period', pairFrom(0.6, 3)),
    modeFromRoots('phugoid', pairFrom(0.1, 0.2)),
    modeFromRoots('dutch_roll', pairFrom(0.3, 2), [share('beta', 1), share('phi', 1.5)]),
    modeFromRoots('roll', [{ re: -4, im: 0 }]),
    modeFromRoots('spiral', [{ re: -0.01, im: 0 }]),
  ];
}

function evaluate(modes: Mode[], fields: Partial<FlightCondition> & { phase: string }, aircraftClass: AircraftClass = 'I', set = mil) {
  return evaluateCondition({ aircraftClass, condition: conditionOf({ nAlpha: 10, ...fields }), analysis: analysisOf(modes), set });
}

function finding(findings: Finding[], id: string): Finding {
  const f = findings.find((x) => x.criterion === id);
  if (!f) throw new Error(`no finding for ${id}: ${findings.map((x) => x.criterion).join(', ')}`);
  return f;
}

function replace(modes: Mode[], mode: Mode): Mode[] {
  return [...modes.filter((m) => m.kind !== mode.kind), mode];
}

describe('evaluateCondition: phases, categories and selectors', () => {
  it('maps the phase to its category and applies only the matching criteria', () => {
    const cr = evaluate(healthyModes(), { phase: 'CR' });
    expect(cr.category).toBe('B');
    expect(cr.findings.map((f) => f.criterion).sort()).toEqual(
      [
        'short-period-damping-cat-b',
        'short-period-cap-cat-b',
        'phugoid-damping',
        'phugoid-time-to-double',
        'roll-time-constant-cat-b',
        'spiral-time-to-double-cat-b-light',
        'dutch-roll-damping-cat-b-c',
        'dutch-roll-damping-frequency-cat-b',
        'dutch-roll-frequency-cat-b',
      ].sort(),
    );
    expect(cr.findings.filter((f) => f.verdict !== 'pass')).toEqual([]);
    // no cockpit controls: the roll performance (3.3.4) is said not to apply, with the reason
    expect(cr.notApplicable.map((n) => n.criterion)).toEqual(['roll-performance-class-i-cat-b', 'roll-spiral-coupling']);
    expect(evaluate(healthyModes(), { phase: 'PA' }).category).toBe('C');
    expect(evaluate(healthyModes(), { phase: 'CO' }, 'IV').findings.map((f) => f.criterion)).toContain('dutch-roll-damping-cat-a-co-ga-class-iv');
    expect(evaluate(healthyModes(), { phase: 'TF' }, 'IV').findings.map((f) => f.criterion)).not.toContain('dutch-roll-damping-cat-a-co-ga-class-iv');
  });

  it('an unknown phase code is an input error at the condition, never a guess', () => {
    expect(() => evaluate(healthyModes(), { phase: 'XX' })).toThrow(InputError);
    expect(() => evaluate(healthyModes(), { phase: 'XX' })).toThrow(
      /^test-model\.yaml:3:5: phase: condition 'c1': flight phase 'XX' has no category in criteria set 'mil-f-8785c' \(expected CO \| GA .* found "XX"\) \[unknown_phase\]$/,
    );
  });

  it('takes the required level from the model, else the set default', () => {
    expect(evaluate(healthyModes(), { phase: 'CR' })).toMatchObject({ requiredLevel: 1, requiredLevelFrom: 'criteria default' });
    expect(evaluate(healthyModes(), { phase: 'CR', requiredLevel: 2 })).toMatchObject({ requiredLevel: 2, requiredLevelFrom: 'model' });
  });
});

describe('evaluateCondition: unstable modes fail the damping criteria', () => {
  it('a divergent Dutch roll gives its negative damping ratio and fails (3.3.1.1)', () => {
    const modes = replace(healthyModes(), modeFromRoots('dutch_roll', pairOf(0.1, 2), [share('beta', 1), share('phi', 1)]));
    const r = evaluate(modes, { phase: 'CR', requiredLevel: 3 });
    const zeta = finding(r.findings, 'dutch-roll-damping-cat-b-c');
    expect(zeta.value).toBeCloseTo(-0.1 / Math.hypot(0.1, 2), 12);
    expect(zeta).toMatchObject({ level: null, verdict: 'fail' });
    expect(zeta.reason).toMatch(/divergent/);
    expect(finding(r.findings, 'dutch-roll-damping-frequency-cat-b')).toMatchObject({ level: null, verdict: 'fail', value: -0.1 });
  });

  it('a split short period with a positive root has no damping ratio and fails, not "not evaluated"', () => {
    const modes = replace(healthyModes(), modeFromRoots('short_period', [{ re: 0.8, im: 0 }, { re: -3, im: 0 }]));
    const r = evaluate(modes, { phase: 'CR', requiredLevel: 3 });
    expect(finding(r.findings, 'short-period-damping-cat-b')).toMatchObject({ value: null, level: null, verdict: 'fail' });
    expect(finding(r.findings, 'short-period-cap-cat-b')).toMatchObject({ value: null, verdict: 'not_evaluated' });
  });

  it('a divergent roll root fails the time-constant maximum although -1/lambda is negative (3.3.1.2)', () => {
    const modes = replace(healthyModes(), modeFromRoots('roll', [{ re: 0.5, im: 0 }]));
    const f = finding(evaluate(modes, { phase: 'CR', requiredLevel: 3 }).findings, 'roll-time-constant-cat-b');
    expect(f).toMatchObject({ value: -2, level: null, verdict: 'fail' });
  });

  it('a divergent spiral is judged by its time to double: ln 2 / 0.05 = 13.9 s is Level 2 for Class I, Cat B (3.3.1.3)', () => {
    const modes = replace(healthyModes(), modeFromRoots('spiral', [{ re: 0.05, im: 0 }]));
    const f = finding(evaluate(modes, { phase: 'CR' }).findings, 'spiral-time-to-double-cat-b-light');
    expect(f.value).toBeCloseTo(Math.LN2 / 0.05, 12);
    expect(f).toMatchObject({ level: 2, verdict: 'fail' });
    expect(f.margin).toBeCloseTo(Math.LN2 / 0.05 - 20, 12);
  });

  it('a divergent phugoid reaches at most Level 3, where its time to double governs (3.2.1.2)', () => {
    // Re = ln 2 / 80 s: time to double 80 s >= 55 s
    const modes = replace(healthyModes(), modeFromRoots('phugoid', pairOf(Math.LN2 / 80, 0.2)));
    const r = evaluate(modes, { phase: 'CR', requiredLevel: 3 });
    expect(finding(r.findings, 'phugoid-damping')).toMatchObject({ level: 3, verdict: 'pass' });
    expect(finding(r.findings, 'phugoid-time-to-double')).toMatchObject({ verdict: 'pass' });
    expect(finding(r.findings, 'phugoid-time-to-double').value).toBeCloseTo(80, 9);
    const r1 = evaluate(modes, { phase: 'CR' });
    expect(finding(r1.findings, 'phugoid-damping')).toMatchObject({ level: 3, verdict: 'fail' });
    // 30 s to double is below the 55 s floor
    const fast = replace(healthyModes(), modeFromRoots('phugoid', pairOf(Math.LN2 / 30, 0.2)));
    expect(finding(evaluate(fast, { phase: 'CR', requiredLevel: 3 }).findings, 'phugoid-time-to-double')).toMatchObject({ level: null, verdict: 'fail' });
  });
});

describe('evaluateCondition: missing modes and figures are not evaluated, with the reason', () => {
  it('a missing Dutch roll', () => {
    const modes = healthyModes().filter((m) => m.kind !== 'dutch_roll');
    const f = finding(evaluate(modes, { phase: 'CR' }).findings, 'dutch-roll-damping-cat-b-c');
    expect(f).toMatchObject({ verdict: 'not_evaluated', value: null, level: null, reason: 'no dutch_roll mode identified in this condition' });
  });

  it('no coupled roll-spiral oscillation: the requirement is not applicable (3.3.1.4)', () => {
    const r = evaluate(healthyModes(), { phase: 'PA' });
    expect(r.findings.map((f) => f.criterion)).not.toContain('roll-spiral-coupling');
    expect(r.notApplicable.filter((n) => n.criterion !== 'roll-performance-class-i-cat-c')).toEqual([
      {
        criterion: 'roll-spiral-coupling',
        set: 'mil-f-8785c',
        title: 'Coupled roll-spiral oscillation, minimum ζ·ωn, Categories B and C',
        source: 'MIL-F-8785C 3.3.1.4',
        reason: 'no coupled roll-spiral oscillation identified in this condition',
      },
    ]);
  });

  it('a coupled roll-spiral oscillation in Cat B is judged by zeta omega_n (3.3.1.4, from memory)', () => {
    const modes = [...healthyModes().filter((m) => m.kind !== 'roll' && m.kind !== 'spiral'), modeFromRoots('roll_spiral', pairFrom(0.5, 0.8))];
    const r = evaluate(modes, { phase: 'CR' });
    // zeta omega = 0.4: Level 2 (>= 0.3), not Level 1 (>= 0.5)
    expect(finding(r.findings, 'roll-spiral-coupling')).toMatchObject({ level: 2, verdict: 'fail' });
    expect(finding(r.findings, 'roll-time-constant-cat-b').reason).toMatch(/coupled roll-spiral oscillation/);
  });

  it('a coupled roll-spiral oscillation in Cat A is not covered: roll and spiral not evaluated, and a warning', () => {
    const modes = [...healthyModes().filter((m) => m.kind !== 'roll' && m.kind !== 'spiral'), modeFromRoots('roll_spiral', pairFrom(0.5, 0.8))];
    const r = evaluate(modes, { phase: 'TF' });
    expect(r.findings.map((f) => f.criterion)).not.toContain('roll-spiral-coupling');
    expect(finding(r.findings, 'roll-time-constant-cat-a-light').verdict).toBe('not_evaluated');
    expect(finding(r.findings, 'spiral-time-to-double-cat-a-light').verdict).toBe('not_evaluated');
    expect(r.warnings).toContain("no criterion of set 'mil-f-8785c' applies to the roll_spiral mode in Category A (phase TF): it is not checked");
  });

  it('CAP without any way to n/alpha', () => {
    const f = finding(evaluate(healthyModes(), { phase: 'CR', nAlpha: null }).findings, 'short-period-cap-cat-b');
    expect(f).toMatchObject({ verdict: 'not_evaluated', value: null });
    expect(f.reason).toMatch(/^n\/alpha unknown/);
  });

  it('the |phi/beta| rule without a phi state in the mode shape', () => {
    const modes = replace(healthyModes(), modeFromRoots('dutch_roll', pairFrom(0.3, 2), [share('beta', 1)]));
    const f = finding(evaluate(modes, { phase: 'CR' }).findings, 'dutch-roll-damping-frequency-cat-b');
    expect(f).toMatchObject({ verdict: 'not_evaluated', value: null });
    expect(f.reason).toMatch(/no phi state/);
  });
});

describe('evaluators: derived figures and rules', () => {
  it('n/alpha from a w state: -V A[w,w] / g; CAP = omega_sp^2 / (n/alpha)', () => {
    const system = { states: ['u', 'w', 'q', 'theta'], A: [[0, 0, 0, 0], [0, -2, 0, 0], [0, 0, 0, 0], [0, 0, 1, 0]], inputs: [], B: [], outputs: [], C: [], D: [] };
    const f = finding(evaluate(healthyModes(), { phase: 'CR', nAlpha: null, airspeed: 98.0665, system }).findings, 'short-period-cap-cat-b');
    // n/alpha = 98.0665 x 2 / 9.80665 = 20 g/rad; CAP = 9 / 20 = 0.45
    expect(f.value).toBeCloseTo(0.45, 12);
    expect(f.method).toContain('n/alpha = -V A[w,w] / g from the model');
  });

  it('n/alpha from lift data: q S CL_alpha / W', () => {
    const liftData = { dynamicPressure: 5000, wingArea: 20, liftCurveSlope: 5, weight: 50000 };
    const f = finding(evaluate(healthyModes(), { phase: 'CR', nAlpha: null, liftData }).findings, 'short-period-cap-cat-b');
    // 5000 x 20 x 5 / 50000 = 10 g/rad; CAP = 0.9
    expect(f.value).toBeCloseTo(0.9, 12);
    expect(f.method).toContain('q S CL_alpha / W');
  });

  it('beta from v: |phi/beta| = |phi| V / |v|, and the minimum zeta omega_n rises past omega^2 |phi/beta| = 20 (3.3.1.1, from memory)', () => {
    // omega = 2, |phi/v| = 0.1 at V = 100 m/s: |phi/beta| = 10, omega^2 |phi/beta| = 40, excess 20.
    // Minima: Level 1 0.15 + 0.014 x 20 = 0.43, Level 2 0.05 + 0.009 x 20 = 0.23, Level 3
    // 0 + 0.005 x 20 = 0.10. zeta omega = 0.2 x 2 = 0.4: Level 2.
    const shape = [share('v', 1), share('phi', 0.1)];
    const modes = replace(healthyModes(), modeFromRoots('dutch_roll', pairFrom(0.2, 2), shape));
    const f = finding(evaluate(modes, { phase: 'CR', airspeed: 100 }).findings, 'dutch-roll-damping-frequency-cat-b');
    expect(f.value).toBeCloseTo(0.4, 12);
    expect(f.bounds['1']?.min).toBeCloseTo(0.43, 12);
    expect(f.bounds['2']?.min).toBeCloseTo(0.23, 12);
    expect(f.bounds['3']?.min).toBeCloseTo(0.1, 12);
    expect(f).toMatchObject({ level: 2, verdict: 'fail' });
    expect(f.method).toContain('beta = v / V');
    // The Level 1 minimum 0.15 is secondary, the rise is from memory: the bound used is as weak as the rise.
    expect(f.evidence).toEqual({ class: 'memory', sources: ['tu144-flight-data-report', 'simulator-validation-notes'] });
  });

  it('Category C, Classes II-L and III: the Level 1 zeta omega_n minimum is 0.10 rad/s, 0.15 for the light classes (3.3.1.1)', () => {
    // MIL-STD-1797A recommended value, as quoted in Curry's NASA contractor report on the Tu-144
    // flight data, Table 7(b), Class III Category C: "1 / 0.08 / 0.10 / 0.4"; 0.15 for Classes
    // I, II-C, IV (textbook reprint, Table 10.2). zeta 0.1 at omega 1.2 rad/s: zeta omega = 0.12.
    const modes = replace(healthyModes(), modeFromRoots('dutch_roll', pairFrom(0.1, 1.2), [share('beta', 1), share('phi', 1)]));
    const heavy = finding(evaluate(modes, { phase: 'PA' }, 'III').findings, 'dutch-roll-damping-frequency-cat-c-heavy');
    expect(heavy.value).toBeCloseTo(0.12, 12);
    expect(heavy.bounds['1']?.min).toBe(0.1);
    expect(heavy).toMatchObject({ level: 1, verdict: 'pass', evidence: { class: 'secondary', sources: ['tu144-flight-data-report'] } });
    const light = finding(evaluate(modes, { phase: 'PA' }, 'I').findings, 'dutch-roll-damping-frequency-cat-c-light');
    expect(light.bounds['1']?.min).toBe(0.15);
    expect(light).toMatchObject({ level: 2, verdict: 'fail' });
  });

  it('Class III need not exceed zeta = 0.7: the zeta omega_n minimum is capped at 0.7 omega_n (3.3.1.1, from memory)', () => {
    // omega = 0.2: 0.7 x 0.2 = 0.14 < 0.15, so the Level 1 minimum becomes 0.14
    const modes = replace(healthyModes(), modeFromRoots('dutch_roll', pairFrom(0.72, 0.2), [share('beta', 1), share('phi', 1)]));
    const heavy = finding(evaluate(modes, { phase: 'CR' }, 'III').findings, 'dutch-roll-damping-frequency-cat-b');
    expect(heavy.bounds['1']?.min).toBeCloseTo(0.14, 12);
    expect(heavy.level).toBe(1);
    const light = finding(evaluate(modes, { phase: 'CR' }, 'I').findings, 'dutch-roll-damping-frequency-cat-b');
    expect(light.bounds['1']?.min).toBe(0.15);
    expect(light.level).toBe(2);
    // unmoved bound: the evidence of the Level 1 minimum alone
    expect(light.evidence.class).toBe('secondary');
    expect(heavy.evidence.class).toBe('memory');
  });
});

describe('civil sets: one level, altitude selection (14 CFR 23.181, 25.181)', () => {
  const dutchRoll = (zeta: number) => [modeFromRoots('dutch_roll', pairFrom(zeta, 2))];

  it('below 18,000 ft the 7-cycle threshold applies, at or above it the 13-cycle one', () => {
    const low = evaluate(dutchRoll(0.04), { phase: 'CR', altitude: 3000 }, 'I', part23);
    expect(low.findings.map((f) => [f.criterion, f.level, f.verdict])).toEqual([['part23-dutch-roll-below-18000-ft', null, 'fail']]);
    const high = evaluate(dutchRoll(0.04), { phase: 'CR', altitude: 18000 * 0.3048 }, 'I', part23);
    expect(high.findings.map((f) => [f.criterion, f.level, f.verdict])).toEqual([['part23-dutch-roll-at-or-above-18000-ft', 1, 'pass']]);
  });

  it('a condition without altitude is not evaluated against altitude rules', () => {
    const r = evaluate(dutchRoll(0.04), { phase: 'CR', altitude: null }, 'I', part23);
    expect(r.findings.map((f) => f.verdict)).toEqual(['not_evaluated', 'not_evaluated']);
    expect(r.findings[0]!.reason).toBe("the criterion applies by altitude and condition 'c1' gives no altitude");
  });

  it('Part 25: zeta = 0 is not positively damped; the programme threshold governs the short period', () => {
    const modes = [modeFromRoots('dutch_roll', pairFrom(0, 2)), modeFromRoots('short_period', pairFrom(0.45, 3))];
    const r = evaluate(modes, { phase: 'CR' }, 'III', part25);
    expect(finding(r.findings, 'part25-dutch-roll-positively-damped')).toMatchObject({ level: null, verdict: 'fail' });
    expect(finding(r.findings, 'part25-short-period-heavily-damped')).toMatchObject({ level: null, verdict: 'fail' });
  });
});
