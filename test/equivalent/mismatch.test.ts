import { describe, expect, it } from 'vitest';
import { mismatch, normalisedMismatch, PHASE_WEIGHT } from '../../src/equivalent/mismatch.js';
import { logSpaced, samplesFromComplex, unwrapDegrees } from '../../src/equivalent/response-samples.js';

describe('mismatch of the reference', () => {
  it('three points worked by hand', () => {
    // dG = 1, -2, 0.5 dB; dPhi = 10, 0, -20 deg.
    // M = (1 + 4 + 0.25) + 0.01745 (100 + 0 + 400) = 5.25 + 8.725 = 13.975 (by hand)
    const hos = { frequency: [0.1, 1, 10], gain: [3, -4, -19.5], phase: [-5, -40, -150] };
    const loes = { frequency: [0.1, 1, 10], gain: [2, -2, -20], phase: [-15, -40, -130] };
    expect(PHASE_WEIGHT).toBe(0.01745);
    expect(mismatch(hos, loes)).toBeCloseTo(13.975, 12);
    // J = (20/n) M = 20/3 x 13.975 = 93.1667 (by hand)
    expect(normalisedMismatch(13.975, 3)).toBeCloseTo(93.16667, 4);
  });

  it('1 dB weighs as 7.57 deg (1/sqrt(0.01745), the reference)', () => {
    const a = { frequency: [1], gain: [1], phase: [0] };
    const b = { frequency: [1], gain: [0], phase: [7.57] };
    const zero = { frequency: [1], gain: [0], phase: [0] };
    expect(mismatch(a, zero)).toBeCloseTo(mismatch(b, zero), 3);
  });
});

describe('fit grid and phase', () => {
  it('20 points per decade over 0.1-10 rad/s, log-spaced, ends included', () => {
    const w = logSpaced(0.1, 10);
    expect(w).toHaveLength(41);
    expect(w[0]).toBeCloseTo(0.1, 14);
    expect(w[20]).toBeCloseTo(1, 12);
    expect(w[40]).toBeCloseTo(10, 12);
  });

  it('unwraps the phase from the lowest frequency', () => {
    expect(unwrapDegrees([170, -170, -150, 170])).toEqual([170, 190, 210, 170]);
  });

  it('a pure delay e^(-j w tau) gives a phase falling linearly past -180 deg', () => {
    const w = [1, 5, 10, 20];
    const s = samplesFromComplex(w, w.map((x) => ({ re: Math.cos(0.2 * x), im: -Math.sin(0.2 * x) })));
    s.phase.forEach((p, i) => expect(p).toBeCloseTo((-0.2 * w[i]! * 180) / Math.PI, 9));
    s.gain.forEach((g) => expect(g).toBeCloseTo(0, 12));
  });
});
