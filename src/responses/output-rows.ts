/**
 * The output rows a response can be taken at: an output of the model (a row of C and D, by its
 * name in `outputs`), a state by name, or a derived output where the states allow it:
 * - nz [g], incremental normal load factor at the centre of gravity, positive nose-up (pull):
 *   a_z = w' - u0 q in stability axes (small perturbations, Nelson, Flight Stability and
 *   Automatic Control, 2nd ed., ch. 3), so nz = -a_z / g = (u0 q - w') / g with a w state, or
 *   nz = u0 (q - alpha') / g with an alpha state (w = u0 alpha); w' and alpha' are rows of
 *   A x + B u, so nz has a feedthrough wherever the control moves w or alpha directly;
 * - alpha = w / u0 [rad] with a w state; beta = v / u0 [rad] with a v state (small angles).
 * g is standard gravity (9.80665 m/s^2), the unit g. An output of the model of the same name
 * is used before any state or derived row.
 */
import { STANDARD_GRAVITY } from '../criteria/derived-figures.js';
import type { StateSpace } from '../types.js';

export interface OutputRow {
  name: string;
  /** per state */
  c: number[];
  /** per input */
  d: number[];
  /** rad, rad/s, g, or 'as written' */
  unit: string;
  /** how the row was made, for the notes (null for a plain state) */
  how: string | null;
}

const STATE_UNITS: Readonly<Record<string, string>> = {
  q: 'rad/s', p: 'rad/s', r: 'rad/s', theta: 'rad', phi: 'rad', psi: 'rad', alpha: 'rad', beta: 'rad',
};

export function outputRow(system: StateSpace, name: string, airspeed: number): OutputRow | { reason: string } {
  const { states, A, B, inputs } = system;
  const n = states.length;
  const m = inputs.length;
  const unitRow = (i: number, scale = 1) => states.map((_, k) => (k === i ? scale : 0));
  const none = new Array<number>(m).fill(0);

  const o = system.outputs.indexOf(name);
  if (o >= 0) return { name, c: [...system.C[o]!], d: [...system.D[o]!], unit: 'as written', how: `${name} is the model's output row '${name}' (C and D)` };
  const s = states.indexOf(name);
  if (s >= 0) return { name, c: unitRow(s), d: none, unit: STATE_UNITS[name] ?? 'as written', how: null };

  const w = states.indexOf('w');
  const v = states.indexOf('v');
  const alpha = states.indexOf('alpha');
  const q = states.indexOf('q');
  switch (name) {
    case 'alpha':
      if (w >= 0) return { name, c: unitRow(w, 1 / airspeed), d: none, unit: 'rad', how: 'alpha = w / u0 (small angles)' };
      return { reason: 'no alpha or w state' };
    case 'beta':
      if (v >= 0) return { name, c: unitRow(v, 1 / airspeed), d: none, unit: 'rad', how: 'beta = v / u0 (small angles)' };
      return { reason: 'no beta or v state' };
    case 'nz': {
      if (q < 0 || (w < 0 && alpha < 0)) return { reason: 'nz needs a q state and a w or alpha state (or an output row nz)' };
      const c = new Array<number>(n).fill(0);
      const d = new Array<number>(m).fill(0);
      if (w >= 0) {
        // nz = (u0 q - w') / g
        for (let k = 0; k < n; k += 1) c[k] = -A[w]![k]! / STANDARD_GRAVITY;
        c[q] = c[q]! + airspeed / STANDARD_GRAVITY;
        for (let j = 0; j < m; j += 1) d[j] = -B[w]![j]! / STANDARD_GRAVITY;
        return { name, c, d, unit: 'g', how: "nz = (u0 q - w') / g at the centre of gravity (stability axes, incremental, positive nose-up; g = 9.80665 m/s^2)" };
      }
      // nz = u0 (q - alpha') / g
      const k0 = airspeed / STANDARD_GRAVITY;
      for (let k = 0; k < n; k += 1) c[k] = -k0 * A[alpha]![k]!;
      c[q] = c[q]! + k0;
      for (let j = 0; j < m; j += 1) d[j] = -k0 * B[alpha]![j]!;
      return { name, c, d, unit: 'g', how: "nz = u0 (q - alpha') / g at the centre of gravity (stability axes, incremental, positive nose-up; g = 9.80665 m/s^2)" };
    }
    default:
      return { reason: `no state or output named ${name}` };
  }
}
