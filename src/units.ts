/**
 * Unit systems of the model file and their conversion to SI. The model is SI inside; a file
 * written in US customary units (ft, slug, lbf, s) is converted once, at load time.
 */
import type { UnitSystem } from './types.js';

/** [m/ft] exact by the 1959 international yard and pound agreement */
export const FOOT = 0.3048;
/** [kg/slug] = lbf / (ft/s^2) with g0 = 9.80665 m/s^2 (NIST SP 811, appendix B) */
export const SLUG = 14.59390294;
/** [N/lbf] = 0.45359237 kg x 9.80665 m/s^2 (NIST SP 811, appendix B) */
export const POUND_FORCE = 4.4482216152605;
/** [m/s^2] standard acceleration of gravity (CGPM 1901; NIST SP 811) */
export const STANDARD_GRAVITY = 9.80665;
/** [ft/s^2] g used for US input when the file gives none (9.80665 / 0.3048 = 32.1740..., common practice) */
export const US_INPUT_GRAVITY = 32.174;

/** Factors that turn one unit of the written system into SI. */
export interface UnitFactors {
  /** [m per written length unit] */
  length: number;
  /** [kg per written mass unit] */
  mass: number;
  /** [N per written force unit] */
  force: number;
}

export const UNIT_FACTORS: Record<UnitSystem, UnitFactors> = {
  SI: { length: 1, mass: 1, force: 1 },
  US: { length: FOOT, mass: SLUG, force: POUND_FORCE },
};

/** Words for the notes: what a written unit system means. */
export const UNIT_WORDS: Record<UnitSystem, { length: string; velocity: string; acceleration: string; mass: string; inertia: string; area: string }> = {
  SI: { length: 'm', velocity: 'm/s', acceleration: 'm/s^2', mass: 'kg', inertia: 'kg m^2', area: 'm^2' },
  US: { length: 'ft', velocity: 'ft/s', acceleration: 'ft/s^2', mass: 'slug', inertia: 'slug ft^2', area: 'ft^2' },
};

/** The default g in the written units: 9.80665 m/s^2 for SI, 32.174 ft/s^2 for US. */
export function defaultGravity(units: UnitSystem): number {
  return units === 'US' ? US_INPUT_GRAVITY : STANDARD_GRAVITY;
}

/** What a state measures, which decides how it converts. */
export type StateDimension = 'velocity' | 'length' | 'angle' | 'angular_rate' | 'other';

/** Every state name the model contract knows, with its dimension (DESIGN.md, Contract 1). */
export const STATE_DIMENSIONS: Readonly<Record<string, StateDimension>> = {
  u: 'velocity',
  w: 'velocity',
  vT: 'velocity',
  v: 'velocity',
  xE: 'length',
  yE: 'length',
  h: 'length',
  alpha: 'angle',
  beta: 'angle',
  theta: 'angle',
  phi: 'angle',
  psi: 'angle',
  q: 'angular_rate',
  p: 'angular_rate',
  r: 'angular_rate',
};

export function stateDimension(state: string): StateDimension {
  return Object.hasOwn(STATE_DIMENSIONS, state) ? STATE_DIMENSIONS[state]! : 'other';
}

/**
 * Factor that turns a state written in `units` into SI: x_SI = t x_written. Velocities
 * and lengths scale with the length factor; angles [rad] and rates [rad/s] are the same in
 * both systems; an "other" state (actuator, filter, engine) is left as written (factor 1).
 */
export function stateFactor(state: string, units: UnitSystem): number {
  const dim = stateDimension(state);
  return dim === 'velocity' || dim === 'length' ? UNIT_FACTORS[units].length : 1;
}
