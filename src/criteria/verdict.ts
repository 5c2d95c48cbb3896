/**
 * From a value and a criterion's level bounds to level reached, verdict and margin.
 * - level: the best level whose bounds hold (null: none);
 * - fail: the level reached is worse than the required one, or none is reached;
 * - marginal: the required level is reached, but the value lies within the marginal band of
 *   that level's governing boundary (a fraction of the boundary; an absolute band per
 *   quantity where the boundary is 0);
 * - pass otherwise.
 * The margin is the signed distance to the governing boundary of the required level
 * (positive inside), in the quantity's unit. `not_evaluated` is decided before this point,
 * where a value is missing.
 */
import type { Level, Quantity, ResolvedCriteriaSet, Verdict } from '../types.js';
import { flat } from '../flat-string.js';
import { holds, LEVELS, levelKey, type ExpandedBounds } from './level-bounds.js';

export interface VerdictInput {
  value: number;
  bounds: ExpandedBounds;
  requiredLevel: Level;
  quantity: Quantity;
  band: ResolvedCriteriaSet['marginalBand'];
  /** bounds exclude their end points (e.g. "positively damped") */
  strict: boolean;
  /** the best level the value may reach; null: none (a divergent mode under a damping criterion) */
  bestReachable: Level | null;
}

export interface Judgement {
  level: Level | null;
  verdict: Exclude<Verdict, 'not_evaluated'>;
  /** [unit of the quantity] null when the required level has no bound or the distance is infinite */
  margin: number | null;
  reason: string;
}

export function judge(input: VerdictInput): Judgement {
  const { value, bounds, requiredLevel, bestReachable, strict } = input;
  let level: Level | null = null;
  if (bestReachable !== null) {
    for (const l of LEVELS) {
      if (l >= bestReachable && holds(bounds[levelKey(l)], value, strict)) {
        level = l;
        break;
      }
    }
  }
  const governing = governingBoundary(input);
  const margin = governing && Number.isFinite(governing.margin) ? governing.margin : null;

  // One bound for every level (a civil rule's single requirement, a floor the standard sets at
  // Level 3 only): it is met or not met, and says nothing of the level on its own.
  const single = singleRequirement(bounds);
  if (level === null || level > requiredLevel) {
    return { level, verdict: 'fail', margin, reason: single ? singleReason(0, governing?.side) : failReason(level, requiredLevel, governing?.side) };
  }
  if (governing && governing.margin < bandAround(governing.boundary, input)) {
    return { level, verdict: 'marginal', margin, reason: single ? singleReason(1, governing.side) : marginalReason(level, requiredLevel, governing.side) };
  }
  return { level, verdict: 'pass', margin, reason: single ? singleReason(2, undefined) : passReason(level, requiredLevel) };
}

function singleRequirement(bounds: ExpandedBounds): boolean {
  const a = bounds['1'];
  return LEVELS.every((l) => bounds[levelKey(l)].min === a.min && bounds[levelKey(l)].max === a.max);
}

/** 0 not met, 1 met within the marginal band, 2 met. */
function singleReason(state: 0 | 1 | 2, side: 'min' | 'max' | undefined): string {
  return once(400 + state * 10 + (side ? sideCode[side] : 0), () => {
    if (state === 2) return 'requirement met (one bound for every level)';
    const where = side ? ` ${state === 0 ? sideWords[side] : `near the ${boundaryWords[side]}`}` : '';
    return state === 0 ? `requirement not met (one bound for every level)${where ? `:${where}` : ''}` : `requirement met (one bound for every level), within the marginal band of the${where.replace(' near the', '')}`;
  });
}

/*
 * The reasons are a handful of sentences repeated across every finding of a sweep: each is
 * built once and shared, instead of a fresh string per finding.
 */
const reasons = new Map<number, string>();

const sideCode = { min: 1, max: 2 } as const;

function once(key: number, build: () => string): string {
  let text = reasons.get(key);
  if (text === undefined) {
    text = flat(build());
    reasons.set(key, text);
  }
  return text;
}

const sideWords = { min: 'below the minimum', max: 'above the maximum' } as const;
const boundaryWords = { min: 'minimum', max: 'maximum' } as const;

function failReason(level: Level | null, required: Level, side: 'min' | 'max' | undefined): string {
  return once(100 + (level ?? 0) * 10 + required + (side ? sideCode[side] * 1000 : 0), () => {
    const reached = level === null ? 'no level reached' : `Level ${level} reached`;
    const where = side ? ` (${sideWords[side]} of Level ${required})` : '';
    return `${reached}, Level ${required} required${where}`;
  });
}

function marginalReason(level: Level, required: Level, side: 'min' | 'max'): string {
  return once(
    200 + level * 10 + required + sideCode[side] * 1000,
    () => `Level ${level} reached (Level ${required} required), within the marginal band of the Level ${required} ${boundaryWords[side]}`,
  );
}

function passReason(level: Level, required: Level): string {
  return once(300 + level * 10 + required, () => `Level ${level} reached (Level ${required} required)`);
}

interface Governing {
  side: 'min' | 'max';
  boundary: number;
  margin: number;
}

/** The boundary of the required level nearest the value: min or max, whichever is closer (min on a tie). */
function governingBoundary({ value, bounds, requiredLevel }: VerdictInput): Governing | undefined {
  const bound = bounds[levelKey(requiredLevel)];
  const low = bound.min === undefined ? undefined : { side: 'min' as const, boundary: bound.min, margin: value - bound.min };
  if (bound.max === undefined) return low;
  const high = { side: 'max' as const, boundary: bound.max, margin: bound.max - value };
  // as a stable sort on the margin would choose: min first unless max is strictly nearer
  if (low === undefined || high.margin < low.margin) return high;
  return low;
}

/** Width of the marginal band at a boundary, in the quantity's unit. */
export function bandAround(boundary: number, { quantity, band }: Pick<VerdictInput, 'quantity' | 'band'>): number {
  if (boundary === 0) return band.absolute[quantity] ?? 0;
  return band.relative * Math.abs(boundary);
}
