/**
 * Eigenvector shape of a mode: each state's magnitude and phase relative to a reference state,
 * with its participation. Magnitudes stay in the model's SI units (|phi|/|beta| in rad/rad,
 * |v|/|beta| in (m/s)/rad), so later stages can form ratios such as |phi/beta| directly.
 */
import type { ModeKind, StateShare } from '../types.js';
import type { Root } from './roots.js';

/** Preferred reference states by kind, first present one wins (common practice). */
export const REFERENCE_STATES: Readonly<Record<ModeKind, readonly string[]>> = {
  short_period: ['q', 'alpha', 'w'],
  phugoid: ['u', 'vT', 'theta'],
  dutch_roll: ['beta', 'v'],
  roll: ['p'],
  spiral: ['phi'],
  roll_spiral: ['phi', 'p'],
  kinematic: [],
  other: [],
};

/** A preferred state taking less than this share of the participation is not a good reference. */
const MIN_REFERENCE_SHARE = 0.01;

export interface ModeShape {
  referenceState: string;
  shape: StateShare[];
}

export function modeShape(root: Root, kind: ModeKind): ModeShape {
  const reference = referenceIndex(root, kind);
  const refRe = root.vector.re[reference]!;
  const refIm = root.vector.im[reference]!;
  const refSize2 = refRe * refRe + refIm * refIm;
  const shape: StateShare[] = [];
  for (let k = 0; k < root.states.length; k += 1) {
    // v_k / v_ref = v_k conj(v_ref) / |v_ref|^2
    const re = root.vector.re[k]!;
    const im = root.vector.im[k]!;
    const ratioRe = (re * refRe + im * refIm) / refSize2;
    const ratioIm = (im * refRe - re * refIm) / refSize2;
    const entry: StateShare = {
      state: root.states[k]!,
      magnitude: Math.sqrt(ratioRe * ratioRe + ratioIm * ratioIm),
      phase: k === reference ? 0 : Math.atan2(ratioIm, ratioRe),
      participation: root.participation[k]!,
    };
    // insertion keeps the largest participation first (a mode has a handful of states);
    // shifting by hand, as splice was the costliest step of the shape in a sweep
    let at = shape.length;
    shape.push(entry);
    while (at > 0 && shape[at - 1]!.participation < entry.participation) {
      shape[at] = shape[at - 1]!;
      at -= 1;
    }
    shape[at] = entry;
  }
  return { referenceState: root.states[reference]!, shape };
}

function referenceIndex(root: Root, kind: ModeKind): number {
  for (const state of REFERENCE_STATES[kind]) {
    const k = root.states.indexOf(state);
    if (k >= 0 && root.participation[k]! >= MIN_REFERENCE_SHARE) return k;
  }
  let best = 0;
  for (let k = 1; k < root.states.length; k += 1) {
    if (root.participation[k]! > root.participation[best]!) best = k;
  }
  return best;
}
