/**
 * The change of one number alone that takes a finding to its target (the boundary of the
 * required level; for a marginal finding, the edge of the marginal band): first the linear
 * estimate from the derivative, then a one-dimensional root find (bracket, then the Illinois
 * variant of regula falsi; Dowell and Jarratt, BIT 11, 1971) on the model re-analysed at each
 * trial value. The number may move between zero (no sign change) and twice its value; a
 * target outside that range is "not reachable by this parameter alone". Pure.
 */
import type { Level, ToBoundary, Verdict } from '../types.js';

/** The finding re-analysed at a trial value of the number; null when it has no value there (e.g. the mode is lost). */
export interface Trial {
  /** [SI unit of the quantity] */
  value: number;
  /** signed distance to the governing boundary of the required level, positive inside */
  margin: number;
  level: Level | null;
  verdict: Verdict;
}

export interface BoundarySearch {
  /** [file's unit] the number as written (not 0) */
  current: number;
  /** d margin / d number at the current value */
  slope: number;
  /** margin now */
  margin: number;
  /** margin to reach: 0 (the boundary) or the band's width (out of the marginal band) */
  target: number;
  /** accept the trial that ends beyond the target (true: fail or marginal now) or the last one short of it (a passing finding) */
  beyond: boolean;
  /** [unit of the margin] how close to the target is close enough */
  tolerance: number;
  analyse(value: number): Trial | null;
}

export type BoundaryOutcome = { toBoundary: ToBoundary } | { toBoundary: null; reason: string };

/** Smallest fraction of the number tried when it is reduced (0 itself may not build, e.g. a mass). */
const SMALLEST_RATIO = 1e-3;
/** Largest ratio tried: beyond it the change "more than doubles" the number. */
const LARGEST_RATIO = 2;
const MAX_STEPS = 40;

export function searchBoundary(search: BoundarySearch): BoundaryOutcome {
  const { current, slope, margin, target, analyse } = search;
  const estimate = (target - margin) / slope;
  if (!Number.isFinite(estimate)) return { toBoundary: null, reason: 'the value does not change with this number (to first order)' };
  // g < 0 short of the target, g >= 0 at or beyond it
  const towards = Math.sign(target - margin) || 1;
  const g = (trial: Trial) => towards * (trial.margin - target);
  const ratioWanted = 1 + estimate / current;
  const ratioEnd = ratioWanted > 1 ? LARGEST_RATIO : SMALLEST_RATIO;
  const endValue = current * ratioEnd;

  // bracket: the linear estimate first, then on towards the end of the range
  let a: Point = { at: current, g: towards * (margin - target), trial: null };
  let found: Point | undefined;
  const tries: number[] = [];
  if (ratioWanted > SMALLEST_RATIO && ratioWanted < LARGEST_RATIO) {
    const first = current + estimate;
    tries.push(first, first + 0.5 * (endValue - first), endValue);
  } else {
    tries.push(endValue);
  }
  for (const at of tries) {
    const trial = analyse(at);
    if (trial === null) return { toBoundary: null, reason: `the finding has no value when the number is ${fmt(at)} (the mode is no longer identified)` };
    const point: Point = { at, g: g(trial), trial };
    if (point.g >= 0) {
      found = point;
      break;
    }
    a = point;
  }
  if (found === undefined) {
    const need = current + estimate;
    const why = need * current <= 0 ? 'a change of sign' : 'more than twice the number';
    return {
      toBoundary: null,
      reason: `not reachable by this parameter alone: the linear estimate needs ${fmt(need)} (${why}), and at ${fmt(endValue)} the value is still ${fmt(a.trial?.value ?? NaN)}`,
    };
  }

  // Illinois: regula falsi that halves the stale end's g, so both ends close in
  let b: Point = found;
  let side = 0;
  // stop when the end that will be returned is close enough (the start itself never is)
  const settled = () => (search.beyond || a.trial === null ? b.g <= search.tolerance : -a.g <= search.tolerance);
  for (let step = 0; step < MAX_STEPS && !settled(); step += 1) {
    const at: number = b.at - (b.g * (b.at - a.at)) / (b.g - a.g);
    if (!(Math.abs(at - a.at) > 0 && Math.abs(at - b.at) > 0)) break;
    const trial = analyse(at);
    if (trial === null) break;
    const point: Point = { at, g: g(trial), trial };
    if (point.g >= 0) {
      b = point;
      if (side === 1) a = { ...a, g: a.g / 2 };
      side = 1;
    } else {
      a = point;
      if (side === -1) b = { ...b, g: b.g / 2 };
      side = -1;
    }
  }
  // the end on the side asked for; the start itself is never an answer
  const end = search.beyond || a.trial === null ? b : a;
  const trial = end.trial!;
  return {
    toBoundary: { change: end.at - current, estimate, verifiedValue: trial.value, verifiedLevel: trial.level, verifiedVerdict: trial.verdict },
  };
}

interface Point {
  /** [file's unit] value of the number */
  at: number;
  /** distance to the target, negative short of it */
  g: number;
  /** null for the starting point (its values are the finding's own) */
  trial: Trial | null;
}

function fmt(x: number): string {
  return Number.isFinite(x) ? x.toPrecision(4) : String(x);
}
