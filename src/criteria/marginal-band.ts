/**
 * The marginal band used where a criteria chain sets none. A value inside the required level
 * but closer to its governing boundary than the band is `marginal`.
 */
import type { Quantity } from '../types.js';

/** fraction of the governing boundary (common practice: 10 %) */
export const DEFAULT_RELATIVE_BAND = 0.1;

/**
 * [SI unit of each quantity] absolute band used where the governing boundary is 0, where a
 * fraction of the boundary would be no band at all. Our own choice (common practice has no
 * number): about the resolution to which these figures are read from flight test.
 */
export const DEFAULT_ABSOLUTE_BAND: Record<Quantity, number> = {
  damping_ratio: 0.01,
  natural_frequency: 0.05,
  cap: 0.01,
  damping_frequency_product: 0.01,
  time_to_double: 1,
  time_constant: 0.05,
  time_to_bank: 0.1,
  equivalent_time_delay: 0.01,
  pitch_bandwidth: 0.1,
  pitch_phase_delay: 0.01,
};
