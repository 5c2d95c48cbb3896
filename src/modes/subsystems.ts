/**
 * Split of the states into longitudinal, lateral-directional, kinematic and other groups by
 * name (never by position), and a measure of how strongly the longitudinal and lateral blocks
 * are coupled.
 */
import type { Complex, Subsystems } from '../types.js';
import { spectrum } from './spectrum.js';

export type StateGroup = keyof Subsystems;

export const GROUP_OF_STATE: Readonly<Record<string, StateGroup>> = {
  u: 'longitudinal',
  w: 'longitudinal',
  alpha: 'longitudinal',
  vT: 'longitudinal',
  q: 'longitudinal',
  theta: 'longitudinal',
  v: 'lateral',
  beta: 'lateral',
  p: 'lateral',
  r: 'lateral',
  phi: 'lateral',
  psi: 'kinematic',
  xE: 'kinematic',
  yE: 'kinematic',
  h: 'kinematic',
};

const GROUP_LOOKUP: ReadonlyMap<string, StateGroup> = new Map(Object.entries(GROUP_OF_STATE));

/** Group of a state name; any name not listed (actuator, filter, engine) is "other". */
export function stateGroup(name: string): StateGroup {
  return GROUP_LOOKUP.get(name) ?? 'other';
}

export function splitSubsystems(states: readonly string[]): Subsystems {
  const out: Subsystems = { longitudinal: [], lateral: [], kinematic: [], other: [] };
  for (const state of states) out[stateGroup(state)].push(state);
  return out;
}

/**
 * Largest relative root shift at which the blocks still count as decoupled: 1 % is well inside
 * the scatter of derivative data, so modes of the separate blocks are as good as the data
 * (common practice).
 */
export const COUPLING_TOLERANCE = 0.01;

export interface CouplingMeasure {
  /** largest relative eigenvalue shift from zeroing the cross blocks [-] */
  coupling: number;
  decoupled: boolean;
  /** the tolerance `decoupled` was judged against [-] */
  tolerance: number;
}

/**
 * Coupling of the longitudinal and lateral-directional blocks: every eigenvalue of A is
 * compared with the nearest one of A0, the same matrix with the cross blocks A_lon,lat and
 * A_lat,lon set to zero; the measure is max |lambda - lambda0| / max(|lambda0|, floor), with
 * floor = 1e-4 of the spectral radius so that zero roots do not divide by zero. Eigenvalues do
 * not change with state scaling, so neither does the measure; a one-way coupling (only one
 * cross block non-zero) leaves the roots unchanged and measures 0, as it should.
 * `values` are the eigenvalues of A already found for the modes (RootSet.values, in the order
 * spectrum() gives them); only those of A0 are computed here, without eigenvectors.
 */
export function measureCoupling(
  A: readonly (readonly number[])[],
  states: readonly string[],
  values: readonly Complex[],
): CouplingMeasure {
  const groups = states.map(stateGroup);
  const zeroed = A.map((row) => row.slice());
  let cross = false;
  for (let i = 0; i < states.length; i += 1) {
    for (let j = 0; j < states.length; j += 1) {
      const gi = groups[i];
      const gj = groups[j];
      const isCross =
        (gi === 'longitudinal' && gj === 'lateral') || (gi === 'lateral' && gj === 'longitudinal');
      if (isCross && zeroed[i]![j] !== 0) {
        cross = true;
        zeroed[i]![j] = 0;
      }
    }
  }
  if (!cross) return { coupling: 0, decoupled: true, tolerance: COUPLING_TOLERANCE };
  const coupling = largestRelativeShift(values, spectrum(zeroed));
  return { coupling, decoupled: coupling <= COUPLING_TOLERANCE, tolerance: COUPLING_TOLERANCE };
}

function largestRelativeShift(full: readonly Complex[], reference: readonly Complex[]): number {
  let radius = 0;
  for (const z of reference) radius = Math.max(radius, Math.hypot(z.re, z.im));
  const floor = 1e-4 * radius;
  const used = new Uint8Array(reference.length);
  let worst = 0;
  // Greedy nearest matching is enough here: the question is only whether any root moved.
  for (const z of full) {
    let best = -1;
    let bestDistance = Infinity;
    for (let k = 0; k < reference.length; k += 1) {
      if (used[k] === 1) continue;
      const d = Math.hypot(z.re - reference[k]!.re, z.im - reference[k]!.im);
      if (d < bestDistance) {
        bestDistance = d;
        best = k;
      }
    }
    if (best < 0) continue;
    used[best] = 1;
    const ref = reference[best]!;
    const shift = bestDistance / Math.max(Math.hypot(ref.re, ref.im), floor);
    if (shift > worst) worst = shift;
  }
  return worst;
}
