/**
 * How a verdict moved between two design iterations. The rule is the reviewer's question
 * "does this need a look now that it did not need before?":
 * - pass -> marginal or fail, marginal -> fail: worse;
 * - anything -> not_evaluated: worse, because evidence that existed is gone;
 * - not_evaluated -> marginal or fail: worse, because a problem has come to light;
 * - not_evaluated -> pass, fail -> marginal or pass, marginal -> pass: better.
 */
import type { Verdict } from '../types.js';

export type TransitionKind = 'regression' | 'improvement' | 'unchanged';

/** Rank of the evaluated verdicts, lower is better. */
const evaluatedRank: Record<Exclude<Verdict, 'not_evaluated'>, number> = { pass: 0, marginal: 1, fail: 2 };

export function classifyTransition(from: Verdict, to: Verdict): TransitionKind {
  if (from === to) return 'unchanged';
  if (to === 'not_evaluated') return 'regression';
  if (from === 'not_evaluated') return to === 'pass' ? 'improvement' : 'regression';
  return evaluatedRank[to] > evaluatedRank[from] ? 'regression' : 'improvement';
}

/**
 * Order of concern of the verdict a finding moved to, used to list regressions: a new failure
 * first, then lost evidence, then a new marginal result (lower sorts first).
 */
export function concernOf(to: Verdict): number {
  switch (to) {
    case 'fail': return 0;
    case 'not_evaluated': return 1;
    case 'marginal': return 2;
    case 'pass': return 3;
  }
}
