/** Printed names of the mode kinds and bounded quantities (the trade's own terms). */
import type { AircraftClass, Category, ModeKind, Quantity } from '../types.js';

export const MODE_LABEL: Record<ModeKind, string> = {
  short_period: 'short period',
  phugoid: 'phugoid',
  dutch_roll: 'Dutch roll',
  roll: 'roll',
  spiral: 'spiral',
  roll_spiral: 'roll\u2013spiral (coupled)',
  kinematic: 'kinematic',
  other: 'other',
};

export const QUANTITY_LABEL: Record<Quantity, string> = {
  damping_ratio: 'damping ratio \u03b6',
  natural_frequency: 'natural frequency \u03c9n',
  cap: 'CAP \u03c9sp\u00b2/(n/\u03b1)',
  damping_frequency_product: '\u03b6\u03c9n',
  time_to_double: 'time to double',
  time_constant: 'time constant',
  time_to_bank: 'time to bank',
  equivalent_time_delay: 'equivalent time delay \u03c4e',
  pitch_bandwidth: 'pitch bandwidth \u03c9BW',
  pitch_phase_delay: 'phase delay \u03c4p',
};

/** Fallback units when a finding arrives without one (the quantity fixes its SI unit). */
export const QUANTITY_UNIT: Record<Quantity, string> = {
  damping_ratio: '',
  natural_frequency: 'rad/s',
  cap: '1/(s^2 g)',
  damping_frequency_product: 'rad/s',
  time_to_double: 's',
  time_constant: 's',
  time_to_bank: 's',
  equivalent_time_delay: 's',
  pitch_bandwidth: 'rad/s',
  pitch_phase_delay: 's',
};

export function classLabel(cls: AircraftClass): string {
  return `Class ${cls}`;
}

export function categoryLabel(category: Category | null): string {
  return category === null ? 'not assigned' : `Category ${category}`;
}

/** Plain-ASCII names for the terminal (and JUnit): the trade's spelling, no internal names. */
export const MODE_TEXT: Record<ModeKind, string> = {
  short_period: 'short period',
  phugoid: 'phugoid',
  dutch_roll: 'Dutch roll',
  roll: 'roll',
  spiral: 'spiral',
  roll_spiral: 'roll-spiral (coupled)',
  kinematic: 'kinematic',
  other: 'other',
};

export const QUANTITY_TEXT: Record<Quantity, string> = {
  damping_ratio: 'damping ratio',
  natural_frequency: 'natural frequency',
  cap: 'CAP',
  damping_frequency_product: 'zeta*wn',
  time_to_double: 'time to double',
  time_constant: 'time constant',
  time_to_bank: 'time to bank',
  equivalent_time_delay: 'equivalent time delay',
  pitch_bandwidth: 'pitch bandwidth',
  pitch_phase_delay: 'phase delay',
};
