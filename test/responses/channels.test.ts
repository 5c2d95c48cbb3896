/**
 * Transfer functions and frequency responses of single channels against python-control /
 * scipy (test/fixtures/responses/make-channel-fixtures.py): zeros from the Rosenbrock pencil,
 * poles eig(A), gain the first nonzero Markov parameter (or D), and G(j omega).
 */
import { describe, expect, it } from 'vitest';
import { channelValue } from '../../src/responses/channel-value.js';
import { responseReader } from '../../src/responses/frequency-response.js';
import { channelTransfer } from '../../src/responses/transfer-function.js';
import { channelOfFixture, FIXTURE_CHANNELS, sameRoots } from './fixture-channels.js';

const live = FIXTURE_CHANNELS.filter((f) => !f.identicallyZero);
const name = (f: { model: string; input: string; output: string }) => `${f.model}: ${f.output}/${f.input}`;

describe('zeros, poles and gain (python-control / scipy fixtures)', () => {
  it.each(live.map((f) => [name(f), f] as const))('%s', (_, f) => {
    const t = channelTransfer(channelOfFixture(f));
    expect(t.full.gain).toBeCloseTo(f.gain, 9);
    expect(sameRoots(t.full.poles, f.poles, 1e-7)).toBeNull();
    expect(sameRoots(t.full.zeros, f.zeros, 1e-6)).toBeNull();
    expect(t.relativeDegree).toBe(f.poles.length - f.zeros.length);
  });

  it('a channel with no path from input to output is identically zero, with no zeros (scipy: all Markov parameters 0)', () => {
    const zero = FIXTURE_CHANNELS.filter((f) => f.identicallyZero);
    expect(zero.length).toBeGreaterThan(5);
    for (const f of zero) {
      const t = channelTransfer(channelOfFixture(f));
      expect(t.full.gain).toBe(0);
      expect(t.full.zeros).toEqual([]);
      expect(t.relativeDegree).toBeNull();
    }
  });

  it('the combined 9-state model gives the lateral channels the longitudinal roots as exactly cancelling zeros', () => {
    const f = live.find((c) => c.model === 'combined' && c.input === 'da' && c.output === 'phi')!;
    const t = channelTransfer(channelOfFixture(f));
    // kept: beta, p, r, phi (psi does not reach phi); left out: u, w, q, theta, psi
    expect(t.states.kept).toEqual([4, 5, 6, 7]);
    expect(t.reduced.poles).toHaveLength(4);
    expect(t.full.poles).toHaveLength(9);
  });
});

describe('frequency response (python-control frequency_response)', () => {
  it.each(live.map((f) => [name(f), f] as const))('%s', (_, f) => {
    const channel = channelOfFixture(f);
    const t = channelTransfer(channel);
    const zpk = responseReader({ kind: 'zpk', transfer: t.full });
    const model = responseReader({ kind: 'model', channel });
    // both unwrapped from the lowest frequency; branches may differ by a constant 360k
    const offZ = f.phaseDeg[0]! - zpk.phaseAt(f.omegas[0]!);
    const offM = f.phaseDeg[0]! - model.phaseAt(f.omegas[0]!);
    expect(Math.abs(offZ / 360 - Math.round(offZ / 360))).toBeLessThan(1e-9);
    f.omegas.forEach((w, i) => {
      const g = channelValue(channel, w);
      expect(10 * Math.log10(g.re ** 2 + g.im ** 2)).toBeCloseTo(f.gainDb[i]!, 7);
      expect(zpk.gainAt(w)).toBeCloseTo(f.gainDb[i]!, 6);
      expect(model.gainAt(w)).toBeCloseTo(f.gainDb[i]!, 7);
      expect(zpk.phaseAt(w) + offZ).toBeCloseTo(f.phaseDeg[i]!, 5);
      expect(model.phaseAt(w) + offM).toBeCloseTo(f.phaseDeg[i]!, 5);
    });
  });
});
