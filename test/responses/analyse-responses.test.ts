/**
 * The responses stage of one condition (src/responses/analyse-responses.ts): analytic cases,
 * the pilot's sign, missing full travel, feedthrough, derived nz.
 */
import { describe, expect, it } from 'vitest';
import { analyseModes } from '../../src/modes/analyse.js';
import { analyseResponses } from '../../src/responses/analyse-responses.js';
import type { CockpitControls, FlightCondition, StateSpace } from '../../src/types.js';
import { conditionOf } from '../criteria/build-inputs.js';

const DEG = Math.PI / 180;

function responsesOf(system: StateSpace, controls: CockpitControls, airspeed = 60) {
  const condition: FlightCondition = conditionOf({ phase: 'CR', airspeed, system, controls });
  return analyseResponses(condition, analyseModes(system, { airspeed }), { bankAngles: [25 * DEG] })!;
}

/**
 * First-order roll p/da = L_da / (s - L_p) (closed form, common practice): with tau = -1/L_p and
 * a step of da0, p = L_da da0 tau (1 - e^(-t/tau)) and phi = L_da da0 tau (t - tau (1 - e^(-t/tau))).
 */
function firstOrderRoll(Lp: number, Lda: number): StateSpace {
  return { states: ['p', 'phi'], A: [[Lp, 0], [1, 0]], inputs: ['da'], B: [[Lda], [0]], outputs: [], C: [], D: [[], []].slice(0, 0) };
}

function closedFormBankTime(Lp: number, Lda: number, da0: number, angle: number): number {
  const tau = -1 / Lp;
  const k = Lda * da0 * tau;
  const phi = (t: number) => k * (t - tau * (1 - Math.exp(-t / tau)));
  const rate = (t: number) => k * (1 - Math.exp(-t / tau));
  let t = angle / k + tau;
  for (let i = 0; i < 50; i += 1) t -= (phi(t) - angle) / rate(t);
  return t;
}

describe('first-order roll (closed form)', () => {
  const Lp = -2.2;
  const Lda = 9;
  const r = responsesOf(firstOrderRoll(Lp, Lda), { roll: { input: 'da', unit: 'rad', max: 0.3 } });

  it('time to bank for 25 (a criterion angle), 30, 45, 60 and 90 deg to 1e-6 s', () => {
    expect(r.timeToBank.map((t) => Math.round(t.angle / DEG))).toEqual([25, 30, 45, 60, 90]);
    for (const t of r.timeToBank) expect(t.time).toBeCloseTo(closedFormBankTime(Lp, Lda, 0.3, t.angle), 6);
    expect(r.timeToBankReason).toBeNull();
  });

  it('p/da = L_da / (s - L_p): gain L_da, the pole L_p and the phi integrator, no zeros but the one at 0', () => {
    const p = r.transferFunctions.find((t) => t.output === 'p')!;
    expect(p.gain).toBeCloseTo(Lda, 12);
    expect(p.poles).toEqual([{ re: Lp, im: 0 }, { re: 0, im: 0 }]);
    // phi does not reach p: its root (0) cancels as an invariant zero
    expect(p.zeros).toEqual([{ re: 0, im: 0 }]);
    const phi = r.transferFunctions.find((t) => t.output === 'phi')!;
    expect(phi.zeros).toEqual([]);
    expect(phi.relativeDegree).toBe(2);
  });

  it('not reached in 10 s: time null', () => {
    const slow = responsesOf(firstOrderRoll(Lp, Lda), { roll: { input: 'da', unit: 'rad', max: 0.005 } });
    // steady p = 9 x 0.005 / 2.2 = 0.0205 rad/s: about 11 deg in 10 s
    expect(slow.timeToBank.find((t) => Math.abs(t.angle - 30 * DEG) < 1e-9)!.time).toBeNull();
  });
});

describe("the pilot's sign", () => {
  it('a model whose positive aileron rolls left is reversed: right roll, same times, noted', () => {
    const r = responsesOf(firstOrderRoll(-2.2, -9), { roll: { input: 'da', unit: 'rad', max: 0.3 } });
    expect(r.controls[0]!.signReversed).toBe(true);
    expect(r.transferFunctions.find((t) => t.output === 'p')!.gain).toBeCloseTo(9, 12);
    expect(r.timeToBank[1]!.time).toBeCloseTo(closedFormBankTime(-2.2, 9, 0.3, 30 * DEG), 6);
    expect(r.notes.some((n) => n.includes('reversed input'))).toBe(true);
  });
});

describe('missing full travel', () => {
  it('no time to bank, with the reason; transfer functions still given', () => {
    const r = responsesOf(firstOrderRoll(-2.2, 9), { roll: { input: 'da', unit: 'rad', max: null } });
    expect(r.timeToBank).toEqual([]);
    expect(r.timeToBankReason).toBe('the roll control da has no max (full control travel): the full-control step cannot be made');
    expect(r.roll).toBeNull();
    expect(r.transferFunctions).toHaveLength(2);
  });
});

describe('pitch: K e^0 / s-like attitude, feedthrough and derived nz', () => {
  // short-period model in w, q, theta (SI), u0 = 60 m/s: w' = Zw w + u0 q + Zde de; q' = Mw w + Mq q + Mde de
  const u0 = 60;
  const Zw = -1.9;
  const Mw = -0.09;
  const Mq = -2.4;
  const Zde = -5;
  const Mde = -14;
  const system: StateSpace = {
    states: ['w', 'q', 'theta'],
    A: [[Zw, u0, 0], [Mw, Mq, 0], [0, 1, 0]],
    inputs: ['de'],
    B: [[Zde], [Mde], [0]],
    outputs: ['nz'],
    // an accelerometer row written by hand: nz = (u0 q - w')/g, so D = -Zde/g
    C: [[-Zw / 9.80665, (u0 - u0) / 9.80665, 0]],
    D: [[-Zde / 9.80665]],
  };
  const r = responsesOf(system, { pitch: { input: 'de', unit: 'rad', max: null } }, u0);

  it('the elevator is reversed (Mde < 0) and q/de has gain -Mde, one zero at -1/Ttheta2 and the theta zero at 0', () => {
    expect(r.controls[0]!.signReversed).toBe(true);
    const q = r.transferFunctions.find((t) => t.output === 'q')!;
    expect(q.gain).toBeCloseTo(-Mde, 12);
    // closed form of this model: q/de numerator Mde s - (Mde Zw - Mw Zde), zero at Zw - Mw Zde / Mde
    const z = Zw - (Mw * Zde) / Mde;
    expect(q.zeros.map((x) => x.re).sort((a, b) => a - b)[0]).toBeCloseTo(z, 10);
    expect(r.figures.inverseTtheta2.value).toBeCloseTo(-z, 10);
  });

  it('derived nz equals the nz the model writes as an output (same C and D): same gain and zeros', () => {
    const derived = responsesOf({ ...system, outputs: [], C: [], D: [[]].slice(0, 0) }, { pitch: { input: 'de', unit: 'rad', max: null } }, u0);
    const nz = derived.transferFunctions.find((t) => t.output === 'nz')!;
    expect(nz.outputUnit).toBe('g');
    // nz/de in the pilot's sense has the feedthrough +Zde/g (reversed) as its gain, D != 0
    expect(nz.gain).toBeCloseTo(Zde / 9.80665, 12);
    expect(nz.relativeDegree).toBe(0);
    expect(derived.notes.some((n) => n.startsWith("pitch control: nz = (u0 q - w') / g"))).toBe(true);
    const written = r.transferFunctions.find((t) => t.output === 'nz')!;
    expect(written.outputUnit).toBe('as written');
    expect(written.gain).toBeCloseTo(nz.gain, 12);
    expect(written.zeros).toHaveLength(nz.zeros.length);
    written.zeros.forEach((z, i) => expect(z.re).toBeCloseTo(nz.zeros[i]!.re, 9));
  });

  it('bandwidth of theta / de: a second-order short period with no delay never reaches -180 deg', () => {
    expect(r.pitch!.omega180).toBeNull();
    expect(r.pitch!.bandwidthPhase).toBeGreaterThan(0);
    expect(r.pitch!.bandwidth).toBe(r.pitch!.bandwidthPhase);
  });
});
