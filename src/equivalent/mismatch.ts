/**
 * The mismatch between a high-order response and its equivalent system, as the reference
 * writes it (MIL-STD-1797A appendix discussion of 4.2.1.2; form from memory, high):
 *   M = sum_i [ (G_hos - G_loes)^2 + W (Phi_hos - Phi_loes)^2 ],  G in dB, Phi in deg, W = 0.01745,
 * so 1 dB weighs as 1/sqrt(W) = 7.57 deg. A normalised form J = (20/n) M is also in use.
 */
import type { ResponseSamples } from './response-samples.js';

/** [1/deg^2 relative to 1/dB^2] the phase weight of the mismatch (0.01745, i.e. pi/180 rounded). */
export const PHASE_WEIGHT = 0.01745;

/**
 * Fit-quality guidance beside the mismatch (memory, low to medium): M below about 10 is a good
 * match. Beyond it the equivalent figures are reported *not valid*; this is a warning on the
 * figures, never a pass or fail of a criterion.
 */
export const MISMATCH_GUIDANCE = 10;

/** What the `mismatch` figure is: the plain sum M over the fit points. */
export const MISMATCH_FORM = 'sum';

export const MISMATCH_FORM_TEXT =
  'M = sum over the fit points of (dG^2 + 0.01745 dPhi^2), gain in dB, phase in deg';

export const MISMATCH_GUIDANCE_TEXT =
  'M below about 10 is a good match (MIL-STD-1797A guidance, from memory); beyond it the equivalent figures are not valid';

/** M of the reference over matching points (same frequencies, phase in one branch). */
export function mismatch(hos: ResponseSamples, loes: ResponseSamples): number {
  if (hos.frequency.length !== loes.frequency.length) throw new RangeError('mismatch: the two responses need the same points');
  let sum = 0;
  for (let i = 0; i < hos.frequency.length; i++) {
    const dg = hos.gain[i]! - loes.gain[i]!;
    const dp = hos.phase[i]! - loes.phase[i]!;
    sum += dg * dg + PHASE_WEIGHT * dp * dp;
  }
  return sum;
}

/** J = (20/n) M, the normalised form (n = number of points). */
export function normalisedMismatch(m: number, points: number): number {
  return (20 / points) * m;
}
