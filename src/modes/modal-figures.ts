/**
 * Modal figures of one mode from its roots. Formulas are common practice for a second-order
 * mode s^2 + 2 zeta omega_n s + omega_n^2 and a first-order mode s - lambda (e.g. Nelson,
 * Flight Stability and Automatic Control, 2nd ed., ch. 4):
 * omega_n = |lambda|, zeta = -Re(lambda)/|lambda|, omega_d = |Im(lambda)|, period = 2 pi/omega_d,
 * time constant = -1/lambda (real root), time to half = ln2/(-Re) (convergent),
 * time to double = ln2/Re (divergent), cycles to half = (ln2/2pi) omega_d/(-Re).
 * For a split mode (two real roots l1, l2) the pair is read as the factors of one quadratic:
 * omega_n = sqrt(l1 l2) when both roots have one sign, zeta = -(l1 + l2)/(2 sqrt(l1 l2)) when
 * both converge; the time figures come from the least stable root, which governs the response.
 */
import type { Complex, Mode } from '../types.js';
import { InternalError } from '../errors.js';

export type ModalFigures = Pick<
  Mode,
  | 'naturalFrequency'
  | 'dampingRatio'
  | 'dampedFrequency'
  | 'period'
  | 'timeConstant'
  | 'timeToHalf'
  | 'timeToDouble'
  | 'cyclesToHalf'
>;

export function modalFigures(eigenvalues: readonly Complex[]): ModalFigures {
  const [first, second] = eigenvalues;
  if (first === undefined || eigenvalues.length > 2) {
    throw new InternalError(`a mode has one or two eigenvalues, got ${eigenvalues.length}`);
  }
  if (first.im !== 0) return oscillatoryFigures(first);
  if (second === undefined) return realRootFigures(first.re);
  if (second.im !== 0) throw new InternalError('a mode mixes a real and a complex eigenvalue');
  return splitPairFigures(first.re, second.re);
}

function oscillatoryFigures(root: Complex): ModalFigures {
  const omegaN = Math.hypot(root.re, root.im); // no underflow or overflow of the squares
  const omegaD = Math.abs(root.im);
  const sigma = root.re;
  return {
    naturalFrequency: omegaN,
    dampingRatio: -sigma / omegaN,
    dampedFrequency: omegaD,
    period: (2 * Math.PI) / omegaD,
    timeConstant: null,
    timeToHalf: sigma < 0 ? Math.LN2 / -sigma : null,
    timeToDouble: sigma > 0 ? Math.LN2 / sigma : null,
    cyclesToHalf: sigma < 0 ? ((Math.LN2 / (2 * Math.PI)) * omegaD) / -sigma : null,
  };
}

function realRootFigures(lambda: number): ModalFigures {
  return {
    naturalFrequency: Math.abs(lambda),
    dampingRatio: lambda === 0 ? null : -Math.sign(lambda),
    dampedFrequency: null,
    period: null,
    timeConstant: lambda === 0 ? null : -1 / lambda,
    timeToHalf: lambda < 0 ? Math.LN2 / -lambda : null,
    timeToDouble: lambda > 0 ? Math.LN2 / lambda : null,
    cyclesToHalf: null,
  };
}

function splitPairFigures(l1: number, l2: number): ModalFigures {
  const sameSign = (l1 < 0 && l2 < 0) || (l1 > 0 && l2 > 0);
  const geometric = geometricMean(l1, l2);
  const sum = l1 + l2;
  const leastStable = Math.max(l1, l2);
  const converges = l1 < 0 && l2 < 0;
  return {
    naturalFrequency: sameSign ? geometric : null,
    dampingRatio: converges ? -(Number.isFinite(sum) ? sum : 2 * (l1 / 2 + l2 / 2)) / (2 * geometric) : null,
    dampedFrequency: null,
    period: null,
    timeConstant: leastStable === 0 ? null : -1 / leastStable,
    timeToHalf: converges ? Math.LN2 / -leastStable : null,
    timeToDouble: leastStable > 0 ? Math.LN2 / leastStable : null,
    cyclesToHalf: null,
  };
}

/**
 * sqrt|l1 l2|, taken as sqrt|l1| sqrt|l2| where the product itself would underflow or
 * overflow (roots near 1e-160 or 1e160).
 */
export function geometricMean(l1: number, l2: number): number {
  const product = Math.abs(l1 * l2);
  if (Number.isFinite(product) && product >= 2 ** -1022) return Math.sqrt(product);
  return Math.sqrt(Math.abs(l1)) * Math.sqrt(Math.abs(l2));
}
