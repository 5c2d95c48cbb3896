/**
 * Roll performance, MIL-F-8785C 3.3.4 (time to bank after a full roll-control step), in the
 * shipped military set. Bounds as shipped (recalled, flagged memory in the file; the table of
 * the project's reference notes): Class I Category B 60 deg in 1.7 / 2.5 / 3.4 s; Class II-C
 * Category C 25 deg in 1.0 / 1.5 / 2.0 s; Class IV Category A outside CO and GA 90 deg.
 */
import { describe, expect, it } from 'vitest';
import { evaluateCondition } from '../../src/criteria/evaluate.js';
import { bankAnglesOf } from '../../src/criteria/bank-angles.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import type { AircraftClass, ConditionResponses, Finding, Mode } from '../../src/types.js';
import { analysisOf, conditionOf, modeFromRoots, pairFrom } from './build-inputs.js';

const mil = (await loadCriteriaSet('mil-f-8785c')).set;
const DEG = Math.PI / 180;

const modes: Mode[] = [modeFromRoots('dutch_roll', pairFrom(0.3, 2)), modeFromRoots('roll', [{ re: -4, im: 0 }])];

function responsesWith(times: Record<number, number | null>, max: number | null = 0.3): ConditionResponses {
  const none = { value: null, reason: 'not in this test' } as const;
  return {
    controls: [{ axis: 'roll', input: 'da', unit: 'rad', max, signReversed: false }],
    transferFunctions: [],
    figures: { inverseTtheta2: none, omegaPhi: none, zetaPhi: none, omegaPhiOverOmegaD: none },
    pitch: null,
    pitchReason: 'no pitch control',
    timeToBank: Object.entries(times).map(([deg, time]) => ({ angle: Number(deg) * DEG, time })),
    timeToBankReason: null,
    simulatedTime: 10,
    roll: null,
    curves: '',
    notes: [],
  };
}

function rollFindings(responses: ConditionResponses | null, phase: string, aircraftClass: AircraftClass = 'I', m = modes): Finding[] {
  const r = evaluateCondition({ aircraftClass, condition: conditionOf({ phase, requiredLevel: 1 }), analysis: analysisOf(m), set: mil, responses });
  return r.findings.filter((f) => f.quantity === 'time_to_bank');
}

describe('MIL-F-8785C 3.3.4 roll performance', () => {
  it.each([
    [1.4, 1, 'pass'],
    [1.6, 1, 'marginal'],
    [2.0, 2, 'fail'],
    [3.0, 3, 'fail'],
    [3.5, null, 'fail'],
  ] as const)('Class I Category B (CR): 60 deg in %s s is Level %s, %s', (time, level, verdict) => {
    const [f] = rollFindings(responsesWith({ 30: 0.8, 60: time }), 'CR');
    expect(f!.criterion).toBe('roll-performance-class-i-cat-b');
    expect(f!.value).toBe(time);
    expect(f!.level).toBe(level);
    expect(f!.verdict).toBe(verdict);
    expect(f!.evidence.class).toBe('memory');
    expect(f!.method).toBe('time to change bank by 60 deg after a step of full roll control (da = 0.3 rad) from trim');
  });

  it('not reached within the simulated time: fails at every level', () => {
    const [f] = rollFindings(responsesWith({ 60: null }), 'CR');
    expect(f!.verdict).toBe('fail');
    expect(f!.value).toBeNull();
    expect(f!.level).toBeNull();
    expect(f!.method).toContain('not reached within 10 s');
  });

  it('Class II-C Category C times 25 deg (the angle a criterion names is timed)', () => {
    expect(bankAnglesOf([mil]).map((a) => Math.round(a / DEG)).sort((a, b) => a - b)).toEqual([25, 30, 45, 60, 90]);
    const [f] = rollFindings(responsesWith({ 25: 0.8 }), 'PA', 'II-C');
    expect(f!.criterion).toBe('roll-performance-class-ii-c-cat-c');
    expect(f!.verdict).toBe('pass');
  });

  it('Class IV Category A: 90 deg outside CO and GA; no roll-performance criterion in CO', () => {
    expect(rollFindings(responsesWith({ 90: 1.2 }), 'TF', 'IV').map((f) => f.criterion)).toEqual(['roll-performance-class-iv-cat-a']);
    expect(rollFindings(responsesWith({ 90: 1.2 }), 'CO', 'IV')).toEqual([]);
  });

  it('no controls at all: not applicable, with the reason; no max: not evaluated with the reason; never a pass', () => {
    const r = evaluateCondition({ aircraftClass: 'I', condition: conditionOf({ phase: 'CR', requiredLevel: 1 }), analysis: analysisOf(modes), set: mil, responses: null });
    expect(r.findings.filter((f) => f.quantity === 'time_to_bank')).toEqual([]);
    expect(r.notApplicable.find((n) => n.criterion === 'roll-performance-class-i-cat-b')!.reason).toBe(
      'the condition names no cockpit controls (a response criterion needs them, e.g. controls.roll with max for roll performance)',
    );
    const noMax = { ...responsesWith({}, null), timeToBank: [], timeToBankReason: 'the roll control da has no max (full control travel): the full-control step cannot be made' };
    const [b] = rollFindings(noMax, 'CR');
    expect(b!.verdict).toBe('not_evaluated');
    expect(b!.reason).toBe('the roll control da has no max (full control travel): the full-control step cannot be made');
  });

  it('is evaluated without a roll mode (a coupled roll-spiral): the figure comes from the response', () => {
    const coupled = [modeFromRoots('roll_spiral', pairFrom(0.5, 1)), modeFromRoots('dutch_roll', pairFrom(0.3, 2))];
    const [f] = rollFindings(responsesWith({ 60: 1.5 }), 'CR', 'I', coupled);
    expect(f!.verdict).toBe('pass');
  });
});
