/**
 * Whether a mode grows or dies away, and whether it is a real root (or two) rather than an
 * oscillation: the words a reviewer reads a mode by before any figure.
 */
import type { Complex, Mode } from '../types.js';

export type Stability = 'convergent' | 'neutral' | 'divergent';

/** From the largest real part of the mode's roots: > 0 divergent, < 0 convergent, 0 neutral. */
export function modeStability(mode: Pick<Mode, 'eigenvalues'>): Stability {
  if (mode.eigenvalues.length === 0) return 'neutral';
  const top = Math.max(...mode.eigenvalues.map((e) => e.re));
  return top > 0 ? 'divergent' : top < 0 ? 'convergent' : 'neutral';
}

/**
 * A real mode (roll, spiral, a split short period, a first-order "other") has no damping ratio
 * or natural frequency a reader should see: its figures are a time constant, a time to half or
 * to double, and its stability.
 */
export function isRealMode(mode: Pick<Mode, 'eigenvalues'>): boolean {
  return mode.eigenvalues.length > 0 && mode.eigenvalues.every((e: Complex) => e.im === 0);
}
