/**
 * Step responses (src/responses/step-response.ts) against python-control's step_response
 * (test/fixtures/responses/make-channel-fixtures.py), and the matrix exponential against
 * closed forms.
 */
import { describe, expect, it } from 'vitest';
import { matrixExponential } from '../../src/responses/matrix-exponential.js';
import { hermiteCrossing, stepResponse } from '../../src/responses/step-response.js';
import { FIXTURE_CHANNELS, FIXTURE_MODELS } from './fixture-channels.js';

describe('matrix exponential', () => {
  it('of a rotation generator is the rotation (closed form: e^[[0, w], [-w, 0]] t = [[cos, sin], [-sin, cos]])', () => {
    const w = 7.3;
    const E = matrixExponential(Float64Array.from([0, w, -w, 0]), 2);
    expect(E[0]).toBeCloseTo(Math.cos(w), 13);
    expect(E[1]).toBeCloseTo(Math.sin(w), 13);
    expect(E[2]).toBeCloseTo(-Math.sin(w), 13);
  });
  it('of a Jordan block [[a, 1], [0, a]] is e^a [[1, 1], [0, 1]] (closed form)', () => {
    const a = -2.5;
    const E = matrixExponential(Float64Array.from([a, 1, 0, a]), 2);
    expect(E[0]).toBeCloseTo(Math.exp(a), 14);
    expect(E[1]).toBeCloseTo(Math.exp(a), 14);
    expect(E[2]).toBe(0);
  });
});

describe('step response (python-control step_response fixtures)', () => {
  const live = FIXTURE_CHANNELS.filter((f) => !f.identicallyZero);
  it.each(live.map((f) => [`${f.model}: ${f.output}/${f.input}`, f] as const))('%s', (_, f) => {
    const m = FIXTURE_MODELS[f.model]!;
    const j = m.inputs.indexOf(f.input);
    const b = m.B.map((row) => row[j]!);
    const o = m.outputs?.indexOf(f.output) ?? -1;
    const c = o >= 0 ? m.C![o]! : m.states.map((s) => (s === f.output ? 1 : 0));
    const d = o >= 0 ? m.D![o]![j]! : 0;
    const dt = f.times[1]! - f.times[0]!;
    const r = stepResponse(m.A, b, [{ c, d }], 1, dt, f.times.length - 1);
    const scale = Math.max(...f.step.map(Math.abs), 1e-12);
    f.step.forEach((y, k) => expect(Math.abs(r.values[0]![k]! - y) / scale).toBeLessThan(1e-9));
  });

  it('scales with the step size and gives the output rate c (A x + b u)', () => {
    const m = FIXTURE_MODELS['lateral']!;
    const b = m.B.map((row) => row[0]!);
    const phi = m.states.map((s) => (s === 'phi' ? 1 : 0));
    const p = m.states.map((s) => (s === 'p' ? 1 : 0));
    const one = stepResponse(m.A, b, [{ c: phi, d: 0 }, { c: p, d: 0 }], 1, 0.01, 300);
    const two = stepResponse(m.A, b, [{ c: phi, d: 0 }], 2, 0.01, 300);
    expect(two.values[0]![300]).toBeCloseTo(2 * one.values[0]![300]!, 12);
    // phi' = p (the lateral model's phi row is [0, 1, 0, 0, 0])
    for (const k of [0, 50, 300]) expect(one.rates[0]![k]).toBeCloseTo(one.values[1]![k]!, 12);
  });
});

describe('Hermite crossing', () => {
  it('is exact for a cubic (y = t^3 reaches 0.125 at t = 0.5)', () => {
    expect(hermiteCrossing(0, 1, 0, 1, 0, 3, 0.125)).toBeCloseTo(0.5, 12);
  });
});
