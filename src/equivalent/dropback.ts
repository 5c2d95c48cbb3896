/**
 * Gibson's dropback figures of a pitch equivalent system, for a pitch stick step held and then
 * released (memory, medium; definition pinned here):
 * - dropback ratio DB/q_ss [s]: the attitude change after release, measured to the final
 *   (steady) attitude, over the steady pitch rate of the hold; for the equivalent system
 *   without delay this is DB/q_ss = Ttheta2 - 2 zeta / w (steady-state form, memory, high).
 *   A positive value is dropback, a negative one overshoot (the attitude keeps going).
 * - peak ratio q_pk/q_ss [-]: the largest pitch rate of the held step over its steady value,
 *   from the step response of K (s + 1/Ttheta2)/(s^2 + 2 zeta w s + w^2) (the delay only
 *   shifts it in time).
 * No boundaries are judged here: the published ones (memory, low) are not shipped.
 */

export interface DropbackFigures {
  /** [s] DB/q_ss, steady-state definition */
  dropbackRatio: number;
  /** [-] q_pk/q_ss */
  peakRatio: number;
  definition: string;
}

export const DROPBACK_DEFINITION =
  'Gibson dropback, steady-state definition: attitude change after release to the final attitude over q_ss, DB/q_ss = Ttheta2 - 2 zeta / w; q_pk/q_ss from the held step';

/** [1/s] inverseTtheta2, zeta [-], omega [rad/s] of the pitch equivalent system. */
export function dropbackFigures(inverseTtheta2: number, zeta: number, omega: number): DropbackFigures {
  const dropbackRatio = 1 / inverseTtheta2 - (2 * zeta) / omega;
  return { dropbackRatio, peakRatio: peakRatio(inverseTtheta2, zeta, omega), definition: DROPBACK_DEFINITION };
}

/**
 * q(t)/q_ss for the step of (s + a) w^2 / (a (s^2 + 2 zeta w s + w^2)): the second-order step
 * plus (1/a) times its derivative, sampled finely over ten time constants of the envelope;
 * the largest value (at least 1).
 */
function peakRatio(a: number, zeta: number, w: number): number {
  const steps = 4000;
  const end = 10 / (Math.min(zeta, 1) * w);
  let peak = 1;
  for (let i = 1; i <= steps; i++) {
    const t = (end * i) / steps;
    const value = unitStep(zeta, w, t) + unitImpulse(zeta, w, t) / a;
    if (value > peak) peak = value;
  }
  return peak;
}

/** Step response of w^2/(s^2 + 2 zeta w s + w^2) at t [s] (common practice). */
function unitStep(zeta: number, w: number, t: number): number {
  if (zeta < 1) {
    const wd = w * Math.sqrt(1 - zeta * zeta);
    return 1 - Math.exp(-zeta * w * t) * (Math.cos(wd * t) + ((zeta * w) / wd) * Math.sin(wd * t));
  }
  if (zeta === 1) return 1 - Math.exp(-w * t) * (1 + w * t);
  const r = w * Math.sqrt(zeta * zeta - 1);
  const s1 = -zeta * w + r;
  const s2 = -zeta * w - r;
  return 1 + (s2 * Math.exp(s1 * t) - s1 * Math.exp(s2 * t)) / (s1 - s2);
}

/** Impulse response of w^2/(s^2 + 2 zeta w s + w^2) at t [s] (the derivative of the step). */
function unitImpulse(zeta: number, w: number, t: number): number {
  if (zeta < 1) {
    const wd = w * Math.sqrt(1 - zeta * zeta);
    return ((w * w) / wd) * Math.exp(-zeta * w * t) * Math.sin(wd * t);
  }
  if (zeta === 1) return w * w * t * Math.exp(-w * t);
  const r = w * Math.sqrt(zeta * zeta - 1);
  const s1 = -zeta * w + r;
  const s2 = -zeta * w - r;
  return ((w * w) * (Math.exp(s1 * t) - Math.exp(s2 * t))) / (s1 - s2);
}
