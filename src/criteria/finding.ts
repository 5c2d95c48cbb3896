/** Findings as literals, in the order of the `Finding` fields (see the comment below). */
import { flat } from '../flat-string.js';
import type { Finding, Level, ResolvedCriterion } from '../types.js';
import { evaluators } from './evaluators.js';

/*
 * Findings are written out as literals, in the order of the `Finding` fields, with `method`
 * last when there is one: a sweep makes hundreds of thousands of them, and a spread of a base
 * object per finding made the evaluation allocation-bound.
 */
export function notEvaluated(
  c: ResolvedCriterion,
  bounds: Finding['bounds'],
  evidence: Finding['evidence'],
  reason: string,
  method: string | undefined,
): Finding {
  return judged(c, bounds, evidence, null, null, 'not_evaluated', null, reason, method);
}

export function judged(
  c: ResolvedCriterion,
  bounds: Finding['bounds'],
  evidence: Finding['evidence'],
  value: number | null,
  level: Level | null,
  verdict: Finding['verdict'],
  margin: number | null,
  reason: string,
  method: string | undefined,
): Finding {
  const finding: Finding = {
    criterion: c.id,
    set: c.set,
    title: c.title,
    mode: c.mode,
    quantity: c.quantity,
    value,
    unit: evaluators[c.quantity].unit,
    level,
    verdict,
    margin,
    bounds,
    source: c.source,
    evidence,
    reason: flat(reason),
  };
  if (method !== undefined) finding.method = flat(method);
  return finding;
}

