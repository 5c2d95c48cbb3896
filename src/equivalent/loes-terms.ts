/**
 * The log of a low-order transfer function evaluated on the imaginary axis, factor by factor,
 * with its derivatives with respect to the fitted parameters. Working in the log makes every
 * factor additive: gain [dB] = 20 log10 |.|, phase [deg] = arg(.), each a sum over factors,
 * and the phase of each factor is continuous in frequency (no unwrapping of the model needed).
 *
 * Factors (s = j w):
 * - gain:   20 log10 |K| written directly in dB (the sign of K is handled by the phase branch)
 * - first:  (s + a)^(+-1)                       a = x[p] [1/s]
 * - second: (s^2 + 2 zeta w0 s + w0^2)^(+-1)    zeta = x[pz], w0 = x[pw] [rad/s]
 * - delay:  e^(-tau s)                          tau = x[p] [s]
 * - fixed:  prod (s - z) / prod (s - p) over given roots, normalised to unit gain at s = 0
 *           where no root is at the origin (held at high-order values, not fitted)
 */
import type { Complex } from '../types.js';

export type Term =
  | { kind: 'gain'; p: number }
  | { kind: 'first'; p: number; power: 1 | -1 }
  | { kind: 'second'; zeta: number; omega: number; power: 1 | -1 }
  | { kind: 'delay'; p: number }
  | { kind: 'fixed'; zeros: Complex[]; poles: Complex[] };

export interface LogResponse {
  /** [dB] */
  gain: Float64Array;
  /** [deg] */
  phase: Float64Array;
  /** d gain / d x[k] at point i, at [i m + k] (m parameters) [dB per unit of x[k]] */
  dGain: Float64Array;
  /** d phase / d x[k] at point i, at [i m + k] [deg per unit of x[k]] */
  dPhase: Float64Array;
}

const DB = 20 / Math.LN10;
const DEG = 180 / Math.PI;

/** The log response of the product of `terms` at frequencies `w` [rad/s] for parameters x. */
export function logResponse(terms: readonly Term[], x: readonly number[], w: readonly number[]): LogResponse {
  const n = w.length;
  const m = x.length;
  const gain = new Float64Array(n);
  const phase = new Float64Array(n);
  const dGain = new Float64Array(n * m);
  const dPhase = new Float64Array(n * m);
  for (const term of terms) {
    for (let i = 0; i < n; i++) {
      const wi = w[i]!;
      switch (term.kind) {
        case 'gain':
          gain[i]! += x[term.p]!;
          dGain[i * m + term.p]! += 1;
          break;
        case 'first': {
          const a = x[term.p]!;
          const mag2 = wi * wi + a * a;
          gain[i]! += term.power * 0.5 * DB * Math.log(mag2);
          phase[i]! += term.power * DEG * Math.atan2(wi, a);
          dGain[i * m + term.p]! += term.power * DB * (a / mag2);
          dPhase[i * m + term.p]! += term.power * DEG * (-wi / mag2);
          break;
        }
        case 'second': {
          const z = x[term.zeta]!;
          const w0 = x[term.omega]!;
          const re = w0 * w0 - wi * wi;
          const im = 2 * z * w0 * wi;
          const mag2 = re * re + im * im;
          gain[i]! += term.power * 0.5 * DB * Math.log(mag2);
          phase[i]! += term.power * DEG * Math.atan2(im, re);
          // d/dzeta: d re = 0, d im = 2 w0 w;  d/dw0: d re = 2 w0, d im = 2 zeta w
          const dImZ = 2 * w0 * wi;
          const dReW = 2 * w0;
          const dImW = 2 * z * wi;
          dGain[i * m + term.zeta]! += term.power * DB * ((im * dImZ) / mag2);
          dPhase[i * m + term.zeta]! += term.power * DEG * ((re * dImZ) / mag2);
          dGain[i * m + term.omega]! += term.power * DB * ((re * dReW + im * dImW) / mag2);
          dPhase[i * m + term.omega]! += term.power * DEG * ((re * dImW - im * dReW) / mag2);
          break;
        }
        case 'delay':
          phase[i]! -= DEG * wi * x[term.p]!;
          dPhase[i * m + term.p]! -= DEG * wi;
          break;
        case 'fixed': {
          const f = fixedFactor(term.zeros, term.poles, wi);
          gain[i]! += f.gain;
          phase[i]! += f.phase;
          break;
        }
      }
    }
  }
  return { gain, phase, dGain, dPhase };
}

/**
 * Gain [dB] and phase [deg] of prod (s - z) / prod (s - p) at s = j w, each root factor
 * divided by |root| (unit gain at s = 0) unless the root is at the origin. The phase of each
 * factor (j w - r) is taken continuous from w = 0+ (a left-half-plane real root gives 0 to
 * +90 deg; a right-half-plane one stays on the branch it starts on).
 */
export function fixedFactor(zeros: readonly Complex[], poles: readonly Complex[], w: number): { gain: number; phase: number } {
  let gain = 0;
  let phase = 0;
  const add = (r: Complex, power: 1 | -1) => {
    const re = -r.re;
    const im = w - r.im;
    const scale = Math.hypot(r.re, r.im);
    gain += power * DB * (Math.log(Math.hypot(re, im)) - (scale > 0 ? Math.log(scale) : 0));
    let angle = Math.atan2(im, re);
    // a right-half-plane root: keep the branch continuous as w rises through its imaginary part
    if (re < 0 && r.im > 0 && angle > 0) angle -= 2 * Math.PI;
    if (re < 0 && r.im <= 0 && angle < 0) angle += 2 * Math.PI;
    phase += power * DEG * angle;
  };
  for (const z of zeros) add(z, 1);
  for (const p of poles) add(p, -1);
  return { gain, phase };
}
