/**
 * Figures the criteria need that are not plain modal figures: n/alpha, CAP, |phi/beta| of the
 * Dutch roll, zeta omega_n, time to double. Each returns the figure and how it was obtained,
 * or null and why not (never a stand-in value).
 */
import type { Complex, FlightCondition, Mode } from '../types.js';

/** [m/s^2] standard gravity (ISO 80000-3; the value used by the standard atmosphere) */
export const STANDARD_GRAVITY = 9.80665;

export type Figure = { value: number; method: string } | { value: null; reason: string };

/**
 * n/alpha [g/rad], the steady normal-load change per angle of attack.
 * - given by the user (`nAlpha` of the condition), else
 * - n/alpha = -V A[w,w] / g with a `w` state: A[w,w] ~ Z_w, and dn/dalpha = -V Z_w / g
 *   (Nelson, Flight Stability and Automatic Control, 2nd ed., ch. 4, short-period approximation);
 * - n/alpha = -V A[alpha,alpha] / g with an `alpha` state (A[alpha,alpha] ~ Z_w as well);
 * - n/alpha = q S CL_alpha / W from lift data (the lift change per alpha over the weight).
 */
export function nOverAlpha(condition: Pick<FlightCondition, 'nAlpha' | 'system' | 'airspeed' | 'liftData'>): Figure {
  if (condition.nAlpha !== null) return { value: condition.nAlpha, method: 'n/alpha given in the model file' };
  const { states, A } = condition.system;
  for (const state of ['w', 'alpha'] as const) {
    const i = states.indexOf(state);
    const diagonal = i >= 0 ? A[i]?.[i] : undefined;
    if (diagonal !== undefined && Number.isFinite(condition.airspeed) && condition.airspeed > 0) {
      return {
        value: (-condition.airspeed * diagonal) / STANDARD_GRAVITY,
        method: `n/alpha = -V A[${state},${state}] / g from the model`,
      };
    }
  }
  const lift = condition.liftData;
  if (lift) {
    return {
      value: (lift.dynamicPressure * lift.wingArea * lift.liftCurveSlope) / lift.weight,
      method: 'n/alpha = q S CL_alpha / W from the lift data',
    };
  }
  return { value: null, reason: 'n/alpha unknown: the model has no w or alpha state and no lift data, and gives no nAlpha' };
}

/**
 * Control anticipation parameter CAP = omega_sp^2 / (n/alpha) [1/(s^2 g)]
 * (MIL-F-8785C 3.2.2.1.1, the short-period frequency boundaries).
 */
export function controlAnticipation(shortPeriod: Mode, condition: FlightCondition): Figure {
  const omega = shortPeriod.naturalFrequency;
  if (omega === null) return { value: null, reason: 'the short period has no natural frequency (real roots of opposite sign)' };
  const nAlpha = nOverAlpha(condition);
  if (nAlpha.value === null) return nAlpha;
  if (!(nAlpha.value > 0)) return { value: null, reason: `n/alpha is not positive (${nAlpha.method}): CAP is undefined` };
  return { value: (omega * omega) / nAlpha.value, method: `CAP = omega_sp^2 / (n/alpha); ${nAlpha.method}` };
}

/**
 * |phi/beta| of a mode from its eigenvector magnitudes; with a `v` state beta = v / V
 * (small-angle sideslip, common practice).
 */
export function rollToSideslip(mode: Mode, airspeed: number): Figure {
  const phi = mode.shape.find((s) => s.state === 'phi');
  if (!phi) return { value: null, reason: '|phi/beta| unknown: no phi state in the mode shape' };
  const beta = mode.shape.find((s) => s.state === 'beta');
  if (beta && beta.magnitude > 0) return { value: phi.magnitude / beta.magnitude, method: '|phi/beta| from the mode shape' };
  const v = mode.shape.find((s) => s.state === 'v');
  if (v && v.magnitude > 0 && airspeed > 0) {
    return { value: (phi.magnitude * airspeed) / v.magnitude, method: '|phi/beta| from the mode shape, beta = v / V' };
  }
  return { value: null, reason: '|phi/beta| unknown: no beta or v state with a nonzero part in the mode shape' };
}

/** zeta omega_n [rad/s] = -Re(lambda) of an oscillatory pair (common practice). */
export function dampingFrequencyProduct(mode: Mode): Figure {
  if (mode.dampingRatio === null || mode.naturalFrequency === null) {
    return { value: null, reason: 'the mode has no damping ratio and natural frequency' };
  }
  return { value: mode.dampingRatio * mode.naturalFrequency, method: 'zeta omega_n' };
}

/**
 * Time to double amplitude [s] = ln 2 / Re(lambda) of the fastest divergent root (common
 * practice); infinite when no root diverges, which meets any minimum.
 */
export function timeToDouble(eigenvalues: readonly Complex[]): Figure {
  if (eigenvalues.length === 0) return { value: null, reason: 'the mode has no eigenvalues' };
  const fastest = Math.max(...eigenvalues.map((e) => e.re));
  if (!(fastest > 0)) return { value: Infinity, method: 'no root with Re > 0: the mode does not diverge (time to double infinite)' };
  return { value: Math.LN2 / fastest, method: 'T2 = ln 2 / Re(lambda) of the fastest divergent root' };
}

/** True when any root of the mode has Re > 0. */
export function isDivergent(mode: Mode): boolean {
  return mode.eigenvalues.some((e) => e.re > 0);
}
