import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fitPitch, fitRoll, fitYaw, type FitChannel } from '../../src/equivalent/fit-loes.js';
import { logSpaced, logSpacedCount, samplesFromComplex } from '../../src/equivalent/response-samples.js';
import type { Complex } from '../../src/types.js';
import { div, mul, polyAt, responseAt } from './rational.js';

type Factors = { num: number[]; den: number[] }[];

function channel(output: string, w: number[], factors: Factors, tau = 0, extra?: (w: number) => Complex): FitChannel {
  const h = w.map((wi) => {
    const base = responseAt(factors, wi, tau);
    return extra ? mul(base, extra(wi)) : base;
  });
  return { output, samples: samplesFromComplex(w, h) };
}

/** Second-order Pade approximation of e^(-tau s): (1 - tau s/2 + (tau s)^2/12) / (1 + tau s/2 + (tau s)^2/12). */
function pade2(tau: number): (w: number) => Complex {
  return (w) => div(polyAt([(tau * tau) / 12, -tau / 2, 1], w), polyAt([(tau * tau) / 12, tau / 2, 1], w));
}

const grid = logSpaced(0.1, 10); // 41 points, 20 per decade

/** The check-vector HOS of the reference: short term x second-order actuator (20 rad/s, zeta 0.7) x 1/(s/15 + 1). */
const REFERENCE_HOS: Factors = [
  { num: [1, 1.25], den: [1, 4.2, 9] },
  { num: [400], den: [1, 28, 400] },
  { num: [1], den: [1 / 15, 1] },
];

describe('pitch equivalent system', () => {
  it('gives back the parameters of an exact LOES times a Pade delay', () => {
    // LOES K 2 (s + 1.3) / (s^2 + 2 0.55 3.2 s + 3.2^2), delay 0.08 s as a second-order Pade
    // approximant (closed form; the Pade phase error at 10 rad/s is under 0.1 deg).
    const q = channel('q', grid, [{ num: [2, 2.6], den: [1, 2 * 0.55 * 3.2, 3.2 * 3.2] }], 0, pade2(0.08));
    const fit = fitPitch({ q, method: 'q-only' });
    expect(fit.parameters['gain']).toBeCloseTo(2, 3);
    expect(fit.parameters['inverseTtheta2']).toBeCloseTo(1.3, 3);
    expect(fit.parameters['dampingRatio']).toBeCloseTo(0.55, 3);
    expect(fit.parameters['naturalFrequency']).toBeCloseTo(3.2, 3);
    expect(fit.timeDelay).toBeCloseTo(0.08, 3);
    expect(fit.mismatch).toBeLessThan(1e-3);
    expect(fit.valid).toBe(true);
    expect(fit.method).toBe('q-only');
    expect(fit.points).toBe(41);
    expect(fit.frequencyRange[0]).toBeCloseTo(0.1, 12);
    expect(fit.frequencyRange[1]).toBeCloseTo(10, 12);
  });

  it('matches the computed check vector of the reference (HOS with actuator and filter)', () => {
    // Check vector (computed with numpy/scipy, a self-consistency value, not a published one):
    // HOS = (s + 1.25)/(s^2 + 4.2 s + 9) x 400/(s^2 + 28 s + 400) x 1/(s/15 + 1), 30 log-spaced
    // points 0.1-10 rad/s, raw M: K 0.866, 1/Ttheta2 1.40, zeta 0.632, w 2.95, tau 0.123 s, M 1.41.
    const w = logSpacedCount(0.1, 10, 30);
    const q = channel('q', w, REFERENCE_HOS);
    const fit = fitPitch({ q, method: 'q-only' });
    expect(fit.parameters['gain']).toBeCloseTo(0.866, 3);
    expect(fit.parameters['inverseTtheta2']).toBeCloseTo(1.40, 2);
    expect(fit.parameters['dampingRatio']).toBeCloseTo(0.632, 3);
    expect(fit.parameters['naturalFrequency']).toBeCloseTo(2.95, 2);
    expect(fit.timeDelay).toBeCloseTo(0.123, 3);
    expect(fit.mismatch).toBeCloseTo(1.41, 2);
    expect(fit.valid).toBe(true);
  });

  it('holds 1/Ttheta2 at the airframe value when asked and says so', () => {
    const w = logSpacedCount(0.1, 10, 30);
    const q = channel('q', w, REFERENCE_HOS);
    const fit = fitPitch({ q, fixedInverseTtheta2: 1.25 });
    expect(fit.method).toBe('q-with-fixed-ttheta2');
    expect(fit.parameters['inverseTtheta2']).toBe(1.25);
    // held at the airframe value, the fit can only be worse than the free one (M 1.41)
    expect(fit.mismatch).toBeGreaterThan(1.41);
    expect(fit.valid).toBe(true);
  });

  it('takes a negative gain from a response 180 deg out (stick push gives nose down)', () => {
    const q = channel('q', grid, [{ num: [-2, -2.6], den: [1, 3.52, 10.24] }], 0, pade2(0.05));
    const fit = fitPitch({ q, method: 'q-only' });
    expect(fit.parameters['gain']).toBeCloseTo(-2, 3);
    expect(fit.timeDelay).toBeCloseTo(0.05, 3);
  });

  it('marks a fit beyond the mismatch guidance not valid and says why', () => {
    // a lightly damped 1.2 rad/s mode and a zero pair the short-term form cannot follow
    const q = channel('q', grid, [
      { num: [1, 1.25], den: [1, 4.2, 9] },
      { num: [1, 0.05, 0.81], den: [1, 0.12, 1.44] },
    ]);
    const fit = fitPitch({ q, method: 'q-only' });
    expect(fit.mismatch).toBeGreaterThan(10);
    expect(fit.valid).toBe(false);
    expect(fit.remarks.join(' ')).toMatch(/mismatch of q .* is beyond the guidance of 10/);
  });

  it('is deterministic', () => {
    const q = channel('q', grid, [{ num: [1, 1.25], den: [1, 4.2, 9] }, { num: [400], den: [1, 28, 400] }]);
    expect(fitPitch({ q })).toEqual(fitPitch({ q }));
  });
});

interface Fixture {
  cases: {
    name: string;
    q?: { factors: [number[], number[]][]; delay: number };
    nz?: { factors: [number[], number[]][]; delay: number };
    p?: { factors: [number[], number[]][]; delay: number };
    points: number;
    fit: Record<string, number>;
  }[];
}
const fixture = JSON.parse(
  readFileSync(new URL('../fixtures/equivalent/loes-fits.json', import.meta.url), 'utf8'),
) as Fixture;
const asFactors = (f: [number[], number[]][]): Factors => f.map(([num, den]) => ({ num, den }));

describe('scipy least_squares fixtures (test/fixtures/equivalent/loes-fits.py)', () => {
  it('pitch q and nz fitted together: common zeta and w', () => {
    const c = fixture.cases[0]!;
    const q = channel('q', grid, asFactors(c.q!.factors), c.q!.delay);
    const nz = channel('nz', grid, asFactors(c.nz!.factors), c.nz!.delay);
    const fit = fitPitch({ q, nz });
    expect(fit.method).toBe('q-and-nz');
    expect(fit.points).toBe(c.points);
    expect(fit.parameters['gain']).toBeCloseTo(c.fit['gain']!, 3);
    expect(fit.parameters['inverseTtheta2']).toBeCloseTo(c.fit['inverseTtheta2']!, 3);
    expect(fit.parameters['dampingRatio']).toBeCloseTo(c.fit['dampingRatio']!, 3);
    expect(fit.parameters['naturalFrequency']).toBeCloseTo(c.fit['naturalFrequency']!, 3);
    expect(fit.timeDelay).toBeCloseTo(c.fit['timeDelay']!, 4);
    const nzFit = fit.channels[1]!;
    expect(nzFit.output).toBe('nz');
    expect(nzFit.gain).toBeCloseTo(c.fit['nzGain']!, 3);
    expect(nzFit.timeDelay).toBeCloseTo(c.fit['nzTimeDelay']!, 4);
    expect(fit.channels[0]!.mismatch).toBeCloseTo(c.fit['mismatchQ']!, 2);
    expect(nzFit.mismatch).toBeCloseTo(c.fit['mismatchNz']!, 2);
  });

  it('roll p with actuator and filter', () => {
    const c = fixture.cases[1]!;
    const p = channel('p', grid, asFactors(c.p!.factors), c.p!.delay);
    const fit = fitRoll(p);
    expect(fit.parameters['gain']).toBeCloseTo(c.fit['gain']!, 3);
    expect(fit.parameters['rollTimeConstant']).toBeCloseTo(c.fit['rollTimeConstant']!, 4);
    expect(fit.timeDelay).toBeCloseTo(c.fit['timeDelay']!, 4);
    expect(fit.mismatch).toBeCloseTo(c.fit['mismatch']!, 3);
    expect(fit.valid).toBe(true);
  });
});

describe('roll and yaw equivalent systems', () => {
  it('roll: gives back K, T_R and tau of an exact form times a Pade delay', () => {
    const p = channel('p', grid, [{ num: [8], den: [1, 1 / 0.6] }], 0, pade2(0.09));
    const fit = fitRoll(p);
    expect(fit.parameters['gain']).toBeCloseTo(8, 3);
    expect(fit.parameters['rollTimeConstant']).toBeCloseTo(0.6, 4);
    expect(fit.timeDelay).toBeCloseTo(0.09, 3);
    expect(fit.form).toBe('p/Fas = K e^(-tau s) / (s + 1/T_R)');
  });

  it('yaw: gives back the Dutch-roll figures of an exact reduced form times a Pade delay', () => {
    const beta = channel('beta', grid, [{ num: [0.9], den: [1, 2 * 0.18 * 1.7, 1.7 * 1.7] }], 0, pade2(0.06));
    const fit = fitYaw(beta);
    expect(fit.parameters['dampingRatio']).toBeCloseTo(0.18, 4);
    expect(fit.parameters['naturalFrequency']).toBeCloseTo(1.7, 4);
    expect(fit.parameters['gain']).toBeCloseTo(0.9, 4);
    expect(fit.timeDelay).toBeCloseTo(0.06, 3);
  });
});
