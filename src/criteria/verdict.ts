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
  const { value, bounds, requiredLevel, bestReachable } = input;
  const level =
    bestReachable === null ? null : (LEVELS.find((l) => l >= bestReachable && holds(bounds[levelKey(l)], value, input.strict)) ?? null);
  const governing = governingBoundary(input);
  const margin = governing && Number.isFinite(governing.margin) ? governing.margin : null;

  if (level === null || level > requiredLevel) {
    const reached = level === null ? 'no level reached' : `Level ${level} reached`;
    const side = governing ? ` (${governing.side === 'min' ? 'below the minimum' : 'above the maximum'} of Level ${requiredLevel})` : '';
    return { level, verdict: 'fail', margin, reason: `${reached}, Level ${requiredLevel} required${side}` };
  }
  if (governing && governing.margin < bandAround(governing.boundary, input)) {
    return {
      level,
      verdict: 'marginal',
      margin,
      reason: `Level ${level} reached (Level ${requiredLevel} required), within the marginal band of the Level ${requiredLevel} ${governing.side === 'min' ? 'minimum' : 'maximum'}`,
    };
  }
  return { level, verdict: 'pass', margin, reason: `Level ${level} reached (Level ${requiredLevel} required)` };
}

/** The boundary of the required level nearest the value: min or max, whichever is closer. */
function governingBoundary({ value, bounds, requiredLevel }: VerdictInput):
  | { side: 'min' | 'max'; boundary: number; margin: number }
  | undefined {
  const bound = bounds[levelKey(requiredLevel)];
  const candidates: { side: 'min' | 'max'; boundary: number; margin: number }[] = [];
  if (bound.min !== undefined) candidates.push({ side: 'min', boundary: bound.min, margin: value - bound.min });
  if (bound.max !== undefined) candidates.push({ side: 'max', boundary: bound.max, margin: bound.max - value });
  return candidates.sort((a, b) => a.margin - b.margin)[0];
}

/** Width of the marginal band at a boundary, in the quantity's unit. */
export function bandAround(boundary: number, { quantity, band }: Pick<VerdictInput, 'quantity' | 'band'>): number {
  if (boundary === 0) return band.absolute[quantity] ?? 0;
  return band.relative * Math.abs(boundary);
}
