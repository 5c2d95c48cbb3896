/**
 * Trade figures read from the numerators (common practice in handling-qualities work):
 * - 1/Ttheta2 [rad/s]: minus the real zero of q / pitch control that belongs with the short
 *   period (of the real zeros away from the origin, the one nearest omega_sp in log
 *   frequency; the other, near the phugoid, is 1/Ttheta1);
 * - omega_phi [rad/s] and zeta_phi: the quadratic of the phi / roll control numerator (the
 *   complex pair nearest omega_d, else the two real zeros nearest omega_d as a product);
 * - omega_phi / omega_d: near 1, the roll control excites little Dutch roll.
 * Zeros that cancel poles exactly (states the channel cannot see) are left out first.
 */
import type { Complex, ResponseFigure } from '../types.js';

export function inverseTtheta2(zeros: readonly Complex[], omegaSp: number | null): ResponseFigure {
  if (omegaSp === null) return { value: null, reason: 'no short-period natural frequency to pick the zero by' };
  const scale = Math.max(omegaSp, 1e-6);
  const real = zeros.filter((z) => z.im === 0 && Math.abs(z.re) > 1e-9 * scale);
  if (real.length === 0) return { value: null, reason: 'the q numerator has no real zero away from the origin' };
  const best = nearestInLog(real, omegaSp);
  return { value: -best.re, method: `1/Ttheta2 = -z, z = ${best.re.toPrecision(4)} rad/s the real zero of q nearest omega_sp (${omegaSp.toPrecision(3)} rad/s)` };
}

export function rollNumerator(zeros: readonly Complex[], omegaD: number | null): { omegaPhi: ResponseFigure; zetaPhi: ResponseFigure; ratio: ResponseFigure } {
  const none = (reason: string) => ({ omegaPhi: { value: null, reason }, zetaPhi: { value: null, reason }, ratio: { value: null, reason } });
  if (omegaD === null) return none('no Dutch-roll natural frequency');
  const pairs = zeros.filter((z) => z.im > 0);
  let omega: number;
  let zeta: number;
  let how: string;
  if (pairs.length > 0) {
    const z = nearestInLog(pairs, omegaD);
    omega = Math.hypot(z.re, z.im);
    zeta = -z.re / omega;
    how = `the complex zero pair of phi nearest omega_d, ${z.re.toPrecision(4)} +/- ${z.im.toPrecision(4)}j`;
  } else {
    const real = zeros.filter((z) => z.im === 0 && z.re !== 0).sort((a, b) => logDistance(a, omegaD) - logDistance(b, omegaD));
    if (real.length < 2) return none('the phi numerator has no quadratic factor');
    const [a, b] = [real[0]!.re, real[1]!.re];
    if (a * b <= 0) return none('the two real zeros of phi nearest omega_d are of opposite sign: no omega_phi');
    omega = Math.sqrt(a * b);
    zeta = -(a + b) / (2 * omega);
    how = `the two real zeros of phi nearest omega_d, ${a.toPrecision(4)} and ${b.toPrecision(4)}`;
  }
  return {
    omegaPhi: { value: omega, method: `omega_phi from ${how}` },
    zetaPhi: { value: zeta, method: `zeta_phi from ${how}` },
    ratio: { value: omega / omegaD, method: `omega_phi / omega_d, omega_d = ${omegaD.toPrecision(4)} rad/s` },
  };
}

function logDistance(z: Complex, omega: number): number {
  return Math.abs(Math.log(Math.hypot(z.re, z.im) / omega));
}

function nearestInLog(roots: readonly Complex[], omega: number): Complex {
  let best = roots[0]!;
  for (const z of roots) if (logDistance(z, omega) < logDistance(best, omega)) best = z;
  return best;
}
