/**
 * A finding's value as a function of its mode's roots (and of n/alpha for CAP), with its
 * derivative by the chain rule. The same formulas as src/modes/modal-figures.ts and
 * src/criteria/derived-figures.ts (common practice, e.g. Nelson, Flight Stability and
 * Automatic Control, 2nd ed., ch. 4):
 * - pair lambda = sigma + i omega: omega_n = |lambda|, zeta = -sigma / omega_n, zeta omega_n = -sigma;
 * - split pair l1, l2: omega_n = sqrt(l1 l2), zeta = -(l1 + l2) / (2 omega_n), zeta omega_n = -(l1 + l2) / 2;
 * - one real root: tau = -1/lambda, omega_n = |lambda|;
 * - time to double ln2 / Re(lambda) of the fastest divergent root; CAP = omega_n^2 / (n/alpha).
 */
import type { Complex, Quantity } from '../types.js';

export interface Slope {
  /** [SI unit of the quantity] */
  value: number;
  /** [SI unit of the quantity per unit of the parameter] */
  derivative: number;
}

/** n/alpha [g/rad] and its derivative, for CAP */
export type NAlphaSlope = Slope | null;

/**
 * `roots` are the mode's eigenvalues as the analysis gives them (a pair with the positive
 * imaginary part first); `changes` the derivative of each. Null where the quantity has no
 * value for these roots (the evaluator then made no number either).
 */
export function figureSlope(quantity: Quantity, roots: readonly Complex[], changes: readonly Complex[], nAlpha: NAlphaSlope): Slope | null {
  const second = secondOrder(roots, changes);
  switch (quantity) {
    case 'natural_frequency':
      return second?.omega ?? null;
    case 'damping_ratio':
      return second?.zeta ?? null;
    case 'damping_frequency_product':
      return second?.product ?? null;
    case 'cap': {
      const omega = second?.omega;
      if (!omega || nAlpha === null || !(nAlpha.value > 0)) return null;
      const value = (omega.value * omega.value) / nAlpha.value;
      const derivative = (2 * omega.value * omega.derivative) / nAlpha.value - (value * nAlpha.derivative) / nAlpha.value;
      return { value, derivative };
    }
    case 'time_to_double': {
      let k = -1;
      for (let i = 0; i < roots.length; i += 1) if (k < 0 || roots[i]!.re > roots[k]!.re) k = i;
      const re = roots[k]?.re;
      if (re === undefined || !(re > 0)) return null;
      return { value: Math.LN2 / re, derivative: (-Math.LN2 * changes[k]!.re) / (re * re) };
    }
    case 'time_constant': {
      const root = roots.length === 1 ? roots[0]! : undefined;
      if (!root || root.im !== 0 || root.re === 0) return null;
      return { value: -1 / root.re, derivative: changes[0]!.re / (root.re * root.re) };
    }
    case 'time_to_bank':
    case 'equivalent_time_delay':
    case 'pitch_bandwidth':
    case 'pitch_phase_delay':
      // response or equivalent-system figures, not functions of the roots alone
      return null;
  }
}

/** The quantities whose value comes from a mode's roots (and n/alpha): the ones differentiated here. */
export const MODAL_QUANTITIES: ReadonlySet<Quantity> = new Set<Quantity>([
  'damping_ratio',
  'natural_frequency',
  'damping_frequency_product',
  'cap',
  'time_to_double',
  'time_constant',
]);

interface SecondOrder {
  omega: Slope | null;
  zeta: Slope | null;
  product: Slope | null;
}

function secondOrder(roots: readonly Complex[], changes: readonly Complex[]): SecondOrder | null {
  const [a, b] = roots;
  const [da, db] = changes;
  if (a === undefined || da === undefined) return null;
  if (a.im !== 0) {
    const omega = Math.hypot(a.re, a.im);
    const dOmega = (a.re * da.re + a.im * da.im) / omega;
    const zeta = -a.re / omega;
    return {
      omega: { value: omega, derivative: dOmega },
      zeta: { value: zeta, derivative: (-da.re * omega + a.re * dOmega) / (omega * omega) },
      product: { value: -a.re, derivative: -da.re },
    };
  }
  if (b === undefined || db === undefined) {
    // one real root: omega_n = |lambda|, zeta = -sign(lambda) (a constant), zeta omega_n = -lambda
    if (a.re === 0) return { omega: { value: 0, derivative: Math.abs(da.re) }, zeta: null, product: null };
    const sign = Math.sign(a.re);
    return {
      omega: { value: Math.abs(a.re), derivative: sign * da.re },
      zeta: { value: -sign, derivative: 0 },
      product: { value: -a.re, derivative: -da.re },
    };
  }
  const product = a.re * b.re;
  const omega = product > 0 ? Math.sqrt(product) : null;
  const dOmega = omega !== null ? (b.re * da.re + a.re * db.re) / (2 * omega) : 0;
  const converges = a.re < 0 && b.re < 0;
  const sum = a.re + b.re;
  const dSum = da.re + db.re;
  return {
    omega: omega !== null ? { value: omega, derivative: dOmega } : null,
    zeta: converges && omega !== null ? { value: -sum / (2 * omega), derivative: -dSum / (2 * omega) + (sum * dOmega) / (2 * omega * omega) } : null,
    product: converges && omega !== null ? { value: -sum / 2, derivative: -dSum / 2 } : null,
  };
}
