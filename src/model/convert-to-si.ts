/**
 * A state-space model written in US units, brought to SI by a change of state coordinates.
 * With x_SI = T x_US, T = diag(t_i) by state dimension (src/units.ts):
 * A_SI = T A T^-1, B_SI = T B, C_SI = C T^-1, D unchanged (a similarity transform, so the
 * eigenvalues do not move). Inputs and outputs keep their written units.
 */
import type { StateSpace, UnitSystem } from '../types.js';
import { stateDimension, stateFactor } from '../units.js';

export function stateSpaceToSI(system: StateSpace, units: UnitSystem): { system: StateSpace; notes: string[] } {
  const notes: string[] = [];
  const other = system.states.filter((s) => stateDimension(s) === 'other');
  if (units === 'SI') {
    if (other.length > 0) notes.push(`state(s) ${other.join(', ')} are not known by name: taken as written, no unit check`);
    return { system, notes };
  }
  const t = system.states.map((s) => stateFactor(s, units));
  const scaled = system.states.filter((s, i) => t[i] !== 1);
  const converted: StateSpace = {
    ...system,
    A: system.A.map((row, i) => row.map((a, j) => (t[i]! * a) / t[j]!)),
    B: system.B.map((row, i) => row.map((b) => t[i]! * b)),
    C: system.C.map((row) => row.map((c, j) => c / t[j]!)),
    D: system.D.map((row) => [...row]),
  };
  if (scaled.length > 0) notes.push(`state(s) ${scaled.join(', ')} converted from ft to m (x 0.3048); angles and rates unchanged`);
  if (other.length > 0) notes.push(`state(s) ${other.join(', ')} are not known by name: left in their written units (not converted)`);
  if (system.inputs.length > 0) notes.push(`inputs ${system.inputs.join(', ')} keep their written units`);
  if (system.outputs.length > 0) notes.push(`outputs ${system.outputs.join(', ')} keep their written units`);
  return { system: converted, notes };
}
