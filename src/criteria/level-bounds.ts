/**
 * Levels of a criterion: how a level left out of a criteria file is filled in, and whether a
 * value holds a level's bounds. Level 1 is the best (satisfactory), Level 3 the worst
 * (controllable).
 */
import type { Bound, Level, LevelBounds } from '../types.js';

export const LEVELS: readonly Level[] = [1, 2, 3];

export type LevelKey = '1' | '2' | '3';

export const levelKey = (level: Level): LevelKey => (level === 1 ? '1' : level === 2 ? '2' : '3');

/** Every level's bounds, none left out. */
export type ExpandedBounds = Record<LevelKey, Bound>;

/**
 * A level a criterion does not list holds the bounds of the next better level, so leaving a
 * level out never loosens the requirement (civil rules list Level 1 only). An explicit `{}`
 * is the way to say "any value" at a level.
 */
export function expandLevels(levels: LevelBounds): ExpandedBounds {
  let previous: Bound = {};
  const out = {} as ExpandedBounds;
  for (const level of LEVELS) {
    const key = levelKey(level);
    const given = levels[key];
    previous = given ?? previous;
    out[key] = { ...previous };
  }
  return out;
}

/**
 * The expansion of a criterion's own levels, computed once per levels object and frozen: a
 * sweep makes one finding per criterion and condition, and every one of them may share it.
 * Bounds changed per condition (e.g. by the |phi/beta| rule) go through `expandLevels`.
 */
const expandedOnce = new WeakMap<LevelBounds, Readonly<ExpandedBounds>>();

export function expandedLevelsOf(levels: LevelBounds): Readonly<ExpandedBounds> {
  let out = expandedOnce.get(levels);
  if (out === undefined) {
    const fresh = expandLevels(levels);
    for (const level of LEVELS) Object.freeze(fresh[levelKey(level)]);
    out = Object.freeze(fresh);
    expandedOnce.set(levels, out);
  }
  return out;
}

/** Bounds are inclusive unless `strict` (e.g. "positively damped": zeta > 0). */
export function holds(bound: Bound, value: number, strict: boolean): boolean {
  if (Number.isNaN(value)) return false;
  if (bound.min !== undefined && (strict ? !(value > bound.min) : !(value >= bound.min))) return false;
  if (bound.max !== undefined && (strict ? !(value < bound.max) : !(value <= bound.max))) return false;
  return true;
}

export function isEmptyBound(bound: Bound): boolean {
  return bound.min === undefined && bound.max === undefined;
}
