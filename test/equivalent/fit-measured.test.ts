/**
 * Equivalent systems from measured frequency responses, end to end (files -> fits ->
 * findings), against scipy fits of the exact responses (test/fixtures/equivalent/
 * measured-responses.py writes both the CSV files and expected.json).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import { loadModel } from '../../src/load/load-model.js';
import { checkOneCondition } from '../../src/sweep/check-conditions.js';

const dir = 'test/fixtures/equivalent/measured';
const expected = JSON.parse(readFileSync(`${dir}/expected.json`, 'utf8')) as {
  pitch: Record<string, number>;
  roll: Record<string, number>;
  bandwidth: Record<string, number>;
};

describe('measured responses of an invented fly-by-wire aircraft', async () => {
  const { model } = await loadModel(`${dir}/fbw-measured.yaml`);
  const mil = (await loadCriteriaSet('mil-f-8785c')).set;
  const result = checkOneCondition(model.conditions[0]!, model.aircraft.class, [mil], { modeShapes: true }, []);
  const pitch = result.equivalentSystems!.find((e) => e.axis === 'pitch')!;
  const roll = result.equivalentSystems!.find((e) => e.axis === 'roll')!;

  it('fits q and nz together and matches scipy within the interpolation of the data (30 points per decade)', () => {
    expect(pitch.method).toBe('q-and-nz');
    expect(pitch.from).toBe('frequency response');
    expect(pitch.points).toBe(41);
    expect(pitch.parameters['dampingRatio']).toBeCloseTo(expected.pitch['dampingRatio']!, 2);
    expect(pitch.parameters['naturalFrequency']).toBeCloseTo(expected.pitch['naturalFrequency']!, 2);
    expect(pitch.parameters['inverseTtheta2']).toBeCloseTo(expected.pitch['inverseTtheta2']!, 2);
    expect(pitch.timeDelay).toBeCloseTo(expected.pitch['timeDelay']!, 3);
  });

  it('the prefilter makes the pitch mismatch exceed the guidance: not valid, figures shown but not judged', () => {
    // scipy: M_q 37.1, M_nz 45.3 (expected.json), both beyond the guidance of 10
    expect(pitch.channels[0]!.mismatch).toBeCloseTo(expected.pitch['mismatchQ']!, 0);
    expect(pitch.valid).toBe(false);
    const delay = result.findings.find((f) => f.criterion === 'equivalent-time-delay-pitch')!;
    expect(delay.verdict).toBe('not_evaluated');
    expect(delay.value).toBeCloseTo(expected.pitch['timeDelay']!, 3);
    expect(result.warnings.some((w) => w.startsWith('the pitch equivalent system is not valid'))).toBe(true);
  });

  it('fits the roll form and judges it: T_R and tau against 3.3.1.2 and 3.5.3 (Level 1)', () => {
    expect(roll.valid).toBe(true);
    expect(roll.parameters['rollTimeConstant']).toBeCloseTo(expected.roll['rollTimeConstant']!, 3);
    expect(roll.timeDelay).toBeCloseTo(expected.roll['timeDelay']!, 3);
    const tr = result.findings.filter((f) => f.criterion === 'roll-time-constant-cat-c-light');
    expect(tr.map((f) => f.verdict)).toEqual(['not_evaluated', 'pass']);
    expect(tr[0]!.reason).toBe('the condition gives frequency responses only (no state-space model): no raw roots to judge');
    expect(tr[1]!.basis).toMatch(/^equivalent system: roll/);
  });

  it('judges bandwidth and phase delay from theta = q/s of the measured q', () => {
    const bw = result.findings.find((f) => f.criterion === 'pitch-bandwidth-phase-delay-cat-c')!;
    expect(bw.method).toBe('theta/Fes = (q/Fes)/s from the measured q (fr-q.csv)');
    // scipy on the exact response: gain bandwidth 1.918 rad/s (below the phase bandwidth 2.515), tau_p 0.175 s;
    // read from 30 points per decade by interpolation in log frequency: within 1 %
    expect(Math.abs(bw.value! / expected.bandwidth['bandwidth']! - 1)).toBeLessThan(0.01);
    expect(Math.abs(bw.against!.value! / expected.bandwidth['phaseDelay']! - 1)).toBeLessThan(0.01);
    // (1.92 rad/s, 0.175 s): Level 2 in Category C (bandwidth below 2.5 rad/s; memory, low)
    expect(bw.level).toBe(2);
  });
});
