/**
 * Bandwidth and phase delay (src/responses/bandwidth.ts) on the three kinds of frequency source.
 * Check values:
 * - closed form for K e^(-tau s)/s: the phase is -90 deg - omega tau, so omega180 = pi/(2 tau),
 *   phase bandwidth pi/(4 tau), gain bandwidth omega180 / 10^(6/20) (the gain falls 20 dB per
 *   decade), phase delay tau/2;
 * - the project's reference vectors (computed with numpy/scipy, not published values) for
 *   K(s+1.25)e^(-0.1s)/(s(s^2+4.2s+9)), K(s+0.8)e^(-0.05s)/(s(s^2+2s+4)) and
 *   K(s+1.25)/(s(s^2+4.2s+9)), quoted to 3 decimals.
 */
import { describe, expect, it } from 'vitest';
import { bandwidthFigures } from '../../src/responses/bandwidth.js';
import { logSpace, responseReader, sampleResponse, type FrequencySource } from '../../src/responses/frequency-response.js';
import { linearChannel } from '../../src/responses/linear-channel.js';
import { channelTransfer } from '../../src/responses/transfer-function.js';

const quadratic = (zeta: number, w: number) => {
  const re = -zeta * w;
  const im = w * Math.sqrt(1 - zeta * zeta);
  return [{ re, im }, { re, im: -im }];
};

describe('K e^(-tau s)/s (closed form)', () => {
  const tau = 0.1;
  const K = 2.5;
  const closed = { omega180: Math.PI / (2 * tau), bandwidthPhase: Math.PI / (4 * tau), bandwidthGain: Math.PI / (2 * tau) / 10 ** (6 / 20), phaseDelay: tau / 2 };
  const model: FrequencySource = { kind: 'model', channel: linearChannel([[0]], [1], [K], 0, tau) };
  const zpk: FrequencySource = { kind: 'zpk', transfer: { gain: K, zeros: [], poles: [{ re: 0, im: 0 }], delay: tau } };
  const points: FrequencySource = { kind: 'points', points: sampleResponse(responseReader(zpk), logSpace(0.01, 100, 401)) };

  it.each([['model', model], ['zpk', zpk]] as const)('%s source: exact to 1e-8', (_, source) => {
    const f = bandwidthFigures(source, { responseType: 'rate' });
    expect(f.omega180).toBeCloseTo(closed.omega180, 8);
    expect(f.bandwidthPhase).toBeCloseTo(closed.bandwidthPhase, 8);
    expect(f.bandwidthGain).toBeCloseTo(closed.bandwidthGain, 8);
    expect(f.phaseDelay).toBeCloseTo(closed.phaseDelay, 8);
    // rate response: the lesser of the two
    expect(f.bandwidth).toBeCloseTo(closed.bandwidthPhase, 8);
    expect(f.bandwidthFrom).toBe('phase');
    expect(f.reasons).toEqual({});
  });

  it('sampled points (100 per decade): linear interpolation in log frequency, within 0.1 %', () => {
    const f = bandwidthFigures(points, { responseType: 'rate' });
    expect(f.omega180! / closed.omega180 - 1).toBeLessThan(1e-3);
    expect(Math.abs(f.bandwidthPhase! / closed.bandwidthPhase - 1)).toBeLessThan(1e-3);
    expect(Math.abs(f.bandwidthGain! / closed.bandwidthGain - 1)).toBeLessThan(1e-3);
    expect(Math.abs(f.phaseDelay! / closed.phaseDelay - 1)).toBeLessThan(1e-2);
  });

  it('attitude-command type: the bandwidth is the phase bandwidth; rate type: the lesser of the two', () => {
    const lag: FrequencySource = { kind: 'zpk', transfer: { gain: 4, zeros: [{ re: -1.25, im: 0 }], poles: [{ re: 0, im: 0 }, ...quadratic(0.7, 3)], delay: 0.1 } };
    const rate = bandwidthFigures(lag, { responseType: 'rate' });
    const attitude = bandwidthFigures(lag, { responseType: 'attitude' });
    expect(attitude.bandwidth).toBe(attitude.bandwidthPhase);
    expect(rate.bandwidth).toBe(Math.min(rate.bandwidthGain!, rate.bandwidthPhase!));
  });
});

describe('reference vectors (computed with numpy/scipy)', () => {
  const cases = [
    { label: 'K(s+1.25)e^(-0.1s)/(s(s^2+4.2s+9))', z: -1.25, zeta: 0.7, w: 3, tau: 0.1, want: { omega180: 5.742, bandwidthPhase: 3.202, bandwidthGain: 3.895, phaseDelay: 0.077 } },
    { label: 'K(s+0.8)e^(-0.05s)/(s(s^2+2s+4))', z: -0.8, zeta: 0.5, w: 2, tau: 0.05, want: { omega180: 5.298, bandwidthPhase: 2.389, bandwidthGain: 3.854, phaseDelay: 0.039 } },
  ];
  it.each(cases)('$label', ({ z, zeta, w, tau, want }) => {
    const transfer = { gain: 3, zeros: [{ re: z, im: 0 }], poles: [{ re: 0, im: 0 }, ...quadratic(zeta, w)], delay: tau };
    for (const source of [{ kind: 'zpk', transfer }, { kind: 'points', points: sampleResponse(responseReader({ kind: 'zpk', transfer }), logSpace(0.01, 100, 801)) }] as FrequencySource[]) {
      const f = bandwidthFigures(source, { responseType: 'rate' });
      expect(f.omega180).toBeCloseTo(want.omega180, 2);
      expect(f.bandwidthPhase).toBeCloseTo(want.bandwidthPhase, 2);
      expect(f.bandwidthGain).toBeCloseTo(want.bandwidthGain, 2);
      expect(f.phaseDelay).toBeCloseTo(want.phaseDelay, 3);
    }
  });

  it('the same as a state-space model with a delay gives the same figures (model source, complex LU)', () => {
    // s^3 + 4.2 s^2 + 9 s in companion form, numerator 3 (s + 1.25)
    const channel = linearChannel([[0, 1, 0], [0, 0, 1], [0, -9, -4.2]], [0, 0, 1], [3 * 1.25, 3, 0], 0, 0.1);
    const f = bandwidthFigures({ kind: 'model', channel }, { responseType: 'rate' });
    const zpk = bandwidthFigures({ kind: 'zpk', transfer: channelTransfer(channel).full }, { responseType: 'rate' });
    expect(f.omega180).toBeCloseTo(5.742, 2);
    for (const key of ['omega180', 'bandwidthPhase', 'bandwidthGain', 'phaseDelay'] as const) expect(f[key]).toBeCloseTo(zpk[key]!, 8);
  });

  it('K(s+1.25)/(s(s^2+4.2s+9)): no omega180, so no gain bandwidth or phase delay, and the bandwidth is the phase bandwidth 4.389', () => {
    const f = bandwidthFigures({ kind: 'zpk', transfer: { gain: 1, zeros: [{ re: -1.25, im: 0 }], poles: [{ re: 0, im: 0 }, ...quadratic(0.7, 3)], delay: 0 } }, { responseType: 'rate' });
    expect(f.omega180).toBeNull();
    expect(f.reasons.omega180).toBe('the phase does not reach -180 deg from 0.01 to 100 rad/s');
    expect(f.bandwidthGain).toBeNull();
    expect(f.reasons.bandwidthGain).toBe('undefined without omega180');
    expect(f.phaseDelay).toBeNull();
    expect(f.bandwidthPhase).toBeCloseTo(4.389, 3);
    expect(f.bandwidth).toBe(f.bandwidthPhase);
    expect(f.bandwidthFrom).toBe('phase');
  });
});

describe('undefined figures say why', () => {
  it('a phase below -180 deg at the lowest frequency (e.g. a reversed sign) gives no omega180', () => {
    const f = bandwidthFigures({ kind: 'zpk', transfer: { gain: -1, zeros: [], poles: [{ re: 0, im: 0 }], delay: 0.1 } }, { responseType: 'rate', anchor: { omega: 0.01, phase: -270 } });
    expect(f.omega180).toBeNull();
    expect(f.reasons.omega180).toBe('the phase is already below -180 deg at 0.01 rad/s');
    expect(f.bandwidth).toBeNull();
    expect(f.reasons.bandwidth).toBe('no phase bandwidth');
  });

  it('2 omega180 beyond the band: no phase delay', () => {
    const f = bandwidthFigures({ kind: 'zpk', transfer: { gain: 1, zeros: [], poles: [{ re: 0, im: 0 }], delay: 0.1 } }, { responseType: 'rate', range: [0.01, 20] });
    expect(f.omega180).toBeCloseTo(15.708, 3);
    expect(f.phaseDelay).toBeNull();
    expect(f.reasons.phaseDelay).toBe('2 omega180 (31.42 rad/s) lies beyond 20 rad/s');
  });

  it('the anchor picks the 360 deg branch', () => {
    const transfer = { gain: 1, zeros: [], poles: [{ re: 0, im: 0 }], delay: 0.1 };
    const reader = responseReader({ kind: 'zpk', transfer }, { anchor: { omega: 1, phase: 270 } });
    expect(reader.phaseAt(1)).toBeCloseTo(270 - 0.1 * (180 / Math.PI), 9);
  });
});
