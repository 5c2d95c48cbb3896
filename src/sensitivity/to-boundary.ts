/**
 * The change of one number alone that takes a finding to its target (the boundary of the
 * required level; for a marginal finding, the edge of the marginal band): first the linear
 * estimate from the derivative, then a one-dimensional root find on the model re-analysed at
 * each trial value: secant steps aimed a little beyond the target, and once the target is
 * bracketed the Illinois variant of regula falsi (Dowell and Jarratt, BIT 11, 1971), which
 * keeps the bracket. The number may move between zero (no sign change) and twice its value; a
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
/** Re-analyses at most, per number. */
const MAX_TRIALS = 24;

interface Point {
  /** [file's unit] value of the number */
  at: number;
  /** distance to the target, negative short of it, >= 0 at or beyond it */
  g: number;
  /** null for the starting point (its values are the finding's own) */
  trial: Trial | null;
}

export function searchBoundary(search: BoundarySearch): BoundaryOutcome {
  const { current, slope, margin, target, tolerance, analyse } = search;
  const estimate = (target - margin) / slope;
  if (!Number.isFinite(estimate)) return { toBoundary: null, reason: 'the value does not change with this number (to first order)' };
  const towards = Math.sign(target - margin) || 1;
  const lowEnd = Math.min(current * SMALLEST_RATIO, current * LARGEST_RATIO);
  const highEnd = Math.max(current * SMALLEST_RATIO, current * LARGEST_RATIO);
  const clamp = (x: number) => Math.min(highEnd, Math.max(lowEnd, x));
  const settled = (p: Point) => (search.beyond ? p.g >= 0 && p.g <= tolerance : p.g < 0 && -p.g <= tolerance);
  const answer = (p: Point): BoundaryOutcome => ({
    toBoundary: { change: p.at - current, estimate, verifiedValue: p.trial!.value, verifiedLevel: p.trial!.level, verifiedVerdict: p.trial!.verdict },
  });
  const unreachable = (last: Point): BoundaryOutcome => {
    const need = current + estimate;
    const why = need * current <= 0 ? 'a change of sign' : 'more than twice the number';
    const shown = last.trial ? `, and at ${fmt(last.at)} the value is still ${fmt(last.trial.value)}` : '';
    return { toBoundary: null, reason: `not reachable by this parameter alone: the linear estimate needs ${fmt(need)} (${why})${shown}` };
  };

  // g of the point aimed at: half a tolerance beyond the target (or short of it, for a
  // passing finding), so that the first trial on the right side is most often close enough
  const gAim = (search.beyond ? 0.5 : -0.5) * tolerance;
  const direction = Math.sign(estimate);
  let short: Point = { at: current, g: towards * (margin - target), trial: null };
  let past: Point | undefined;
  let previous: Point = short;
  let next = clamp(current + (target + towards * gAim - margin) / slope);
  let side = 0;
  for (let n = 0; n < MAX_TRIALS; n += 1) {
    const trial = analyse(next);
    if (trial === null) return { toBoundary: null, reason: `the finding has no value when the number is ${fmt(next)} (the mode is no longer identified)` };
    const point: Point = { at: next, g: towards * (trial.margin - target), trial };
    if (settled(point)) return answer(point);
    if (point.g >= 0) {
      if (past !== undefined && side === 1) short = { ...short, g: short.g / 2 };
      past = point;
      side = 1;
    } else {
      if (past !== undefined && side === -1) past = { ...past, g: past.g / 2 };
      short = point;
      side = -1;
    }
    if (past === undefined) {
      // not bracketed yet: a secant step from the last two points, on within the range
      if (point.at === highEnd || point.at === lowEnd) return unreachable(point);
      const secant = (point.g - previous.g) / (point.at - previous.at);
      const useful = Number.isFinite(secant) && secant * direction > 0;
      next = clamp(useful ? point.at + (gAim - point.g) / secant : point.at + (point.at - current));
      previous = point;
      continue;
    }
    // bracketed: an Illinois step between the two ends
    const at = past.at - ((past.g - gAim) * (past.at - short.at)) / (past.g - short.g);
    if (!(Math.abs(at - short.at) > 0 && Math.abs(at - past.at) > 0)) break;
    next = at;
  }
  // the trials ran out: the end on the side asked for
  const end = search.beyond || short.trial === null ? past : short;
  return end === undefined ? unreachable(short) : answer(end);
}

function fmt(x: number): string {
  return Number.isFinite(x) ? x.toPrecision(4) : String(x);
}
