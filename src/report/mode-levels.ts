/**
 * One level per mode: the worst level reached over the mode's criteria, and the criterion
 * that decides it. A criterion with one bound for every level (a civil rule's single
 * requirement, a floor the standard sets at Level 3 only) says "met" or "not met": met, it
 * cannot lift or lower a level on its own; not met, the mode reaches no level.
 */
import { expandLevels } from '../criteria/level-bounds.js';
import type { ConditionResult, Finding, Level, ModeKind, Verdict } from '../types.js';
import { VERDICT_ORDER, worstVerdict } from './verdict-marks.js';

export interface ModeLevel {
  /** worst level reached; null when a criterion reaches none; undefined when no criterion grades levels */
  level: Level | null | undefined;
  /** worst verdict of the mode's findings; null when the mode has none */
  verdict: Verdict | null;
  /** the criterion behind `level` (and `verdict`) */
  decidedBy: string | null;
  /** findings of the mode that could not be evaluated */
  notEvaluated: number;
}

/** True when every level carries the same bound: the criterion is a single requirement. */
export function isSingleRequirement(f: Pick<Finding, 'bounds' | 'against'>): boolean {
  if (f.against !== undefined) return false; // a region criterion grades levels by its polygons
  const e = expandLevels(f.bounds);
  const same = (a: { min?: number; max?: number }, b: { min?: number; max?: number }) => a.min === b.min && a.max === b.max;
  return same(e['1'], e['2']) && same(e['2'], e['3']);
}

/** Rank of a finding's level for "worst of": 1..3, 4 for no level reached, 0 for a met single requirement. */
function rankOf(f: Finding): number {
  if (f.level === null) return 4;
  return isSingleRequirement(f) ? 0 : f.level;
}

export function modeLevel(c: Pick<ConditionResult, 'findings'>, kind: ModeKind): ModeLevel {
  // the mode's own roots only: equivalent-system and response findings are not figures of the raw mode
  const own = c.findings.filter((f) => f.mode === kind && f.basis === undefined && f.against === undefined);
  const evaluated = own.filter((f) => f.verdict !== 'not_evaluated');
  const notEvaluated = own.length - evaluated.length;
  if (own.length === 0) return { level: undefined, verdict: null, decidedBy: null, notEvaluated };
  const verdict = worstVerdict(own.map((f) => f.verdict));
  if (evaluated.length === 0) return { level: undefined, verdict, decidedBy: own[0]!.criterion, notEvaluated };
  // worst rank first, then worst verdict, then the smallest margin
  const vRank = (v: Verdict) => VERDICT_ORDER.indexOf(v);
  const decider = [...evaluated].sort(
    (a, b) => rankOf(b) - rankOf(a) || vRank(a.verdict) - vRank(b.verdict) || (a.margin ?? Infinity) - (b.margin ?? Infinity),
  )[0]!;
  const rank = rankOf(decider);
  const level: Level | null | undefined = rank === 4 ? null : rank === 0 ? undefined : (rank as Level);
  // a worse verdict on another criterion (marginal at the same level) names that one instead
  const byVerdict = evaluated.find((f) => f.verdict === verdict && rankOf(f) === rank);
  return { level, verdict, decidedBy: (byVerdict ?? decider).criterion, notEvaluated };
}

/** The mode's one level in words: `Level 2`, `no level`, `bounds met` (single requirements only). */
export function modeLevelWords(m: ModeLevel): string {
  if (m.verdict === null) return 'no criterion';
  if (m.level === undefined) return m.verdict === 'not_evaluated' ? 'not evaluated' : 'bounds met';
  return m.level === null ? 'no level' : `Level ${m.level}`;
}

/** A finding's level reached in words; a single requirement is `met` / `not met`; null when not evaluated. */
export function levelReachedWords(f: Finding): string | null {
  if (f.verdict === 'not_evaluated') return null;
  if (isSingleRequirement(f)) return f.level === null ? 'not met' : 'met';
  return f.level === null ? 'no level' : `Level ${f.level}`;
}
