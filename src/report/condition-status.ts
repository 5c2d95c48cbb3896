/**
 * What a condition amounts to for the reader of a sweep: its worst verdict, whether it needs a
 * look (an "issue") and how it ranks against the others when only the worst can be listed.
 */
import type { ConditionResult, Verdict } from '../types.js';
import { VERDICT_ORDER, worstVerdict } from './verdict-marks.js';

/** Worst verdict of the condition's findings; a condition with no finding has no evidence: not evaluated. */
export function conditionVerdict(c: ConditionResult): Verdict {
  return worstVerdict(c.findings.map((f) => f.verdict));
}

/** An issue is anything short of every finding passing: a fail, a marginal or a not-evaluated finding. */
export function hasIssue(c: ConditionResult): boolean {
  return conditionVerdict(c) !== 'pass';
}

/**
 * Order of concern, worst first: worst verdict, then more failing findings, then more marginal
 * ones, then the order of the model file. Returns the indices of `conditions`.
 */
export function byConcern(conditions: readonly ConditionResult[], indices: readonly number[]): number[] {
  const rank = (v: Verdict) => VERDICT_ORDER.indexOf(v);
  const keyed = indices.map((i) => {
    const c = conditions[i]!;
    let fail = 0;
    let marginal = 0;
    for (const f of c.findings) {
      if (f.verdict === 'fail') fail += 1;
      else if (f.verdict === 'marginal') marginal += 1;
    }
    return { i, rank: rank(conditionVerdict(c)), fail, marginal };
  });
  keyed.sort((a, b) => a.rank - b.rank || b.fail - a.fail || b.marginal - a.marginal || a.i - b.i);
  return keyed.map((k) => k.i);
}
