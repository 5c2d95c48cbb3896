/**
 * What each mode looks like, as data: the root forms it may take and the states whose
 * participation marks it (common practice, e.g. Nelson, Flight Stability and Automatic Control,
 * 2nd ed., ch. 4 and 5; McRuer, Ashkenas and Graham, Aircraft Dynamics and Automatic Control,
 * ch. 5 and 6). Adding a mode adds a row.
 */
import type { ModeKind } from '../types.js';

/** pair: one complex pair; real: one real root; two-real: a pair split into two real roots */
export type RootForm = 'pair' | 'real' | 'two-real';

export interface ModeTemplate {
  kind: ModeKind;
  forms: readonly RootForm[];
  /** states whose summed participation marks the mode */
  marks: readonly string[];
  /** the mode exists only when one of these states is modelled (none: always) */
  needs?: readonly string[];
  /** words for the marking states in the basis text */
  label: string;
}

export const LONGITUDINAL_TEMPLATES: readonly ModeTemplate[] = [
  // Fast incidence and pitch-rate motion at nearly constant speed.
  { kind: 'short_period', forms: ['pair', 'two-real'], marks: ['q', 'w', 'alpha'], label: 'pitch-rate and incidence' },
  // Slow exchange of speed and pitch attitude at nearly constant incidence: needs a speed state.
  {
    kind: 'phugoid',
    forms: ['pair', 'two-real'],
    marks: ['u', 'vT', 'theta'],
    needs: ['u', 'vT'],
    label: 'speed and pitch-attitude',
  },
];

export const LATERAL_TEMPLATES: readonly ModeTemplate[] = [
  { kind: 'dutch_roll', forms: ['pair', 'two-real'], marks: ['beta', 'v', 'r'], label: 'sideslip and yaw-rate' },
  { kind: 'roll', forms: ['real'], marks: ['p'], label: 'roll-rate' },
  { kind: 'spiral', forms: ['real'], marks: ['phi'], label: 'bank-angle' },
  // Roll and spiral roots coalesced into one oscillation of roll rate and bank angle.
  { kind: 'roll_spiral', forms: ['pair'], marks: ['p', 'phi'], label: 'roll-rate and bank-angle' },
];
