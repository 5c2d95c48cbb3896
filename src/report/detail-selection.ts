/**
 * Which conditions get a section of their own (`--detail all|issues|none`) and the sentence
 * that tells the reader what was left out. A sweep of thousands of conditions would otherwise
 * be a document nobody can print; the results file always holds every condition.
 */
import type { ConditionResult } from '../types.js';
import { hasIssue } from './condition-status.js';

export type DetailMode = 'all' | 'issues' | 'none';

export interface DetailSelection {
  mode: DetailMode;
  /** indices of the conditions that get a section, in the order of the model file */
  detailed: number[];
  /** conditions without a section */
  omitted: number;
  /** what the document says about it */
  text: string;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

export function selectDetail(conditions: readonly ConditionResult[], mode: DetailMode): DetailSelection {
  const all = conditions.map((_, i) => i);
  const detailed = mode === 'all' ? all : mode === 'none' ? [] : all.filter((i) => hasIssue(conditions[i]!));
  const omitted = conditions.length - detailed.length;
  let text: string;
  if (mode === 'all') {
    text = `every condition has a section (${plural(conditions.length, 'condition')})`;
  } else if (mode === 'none') {
    text = `no condition has a section (detail none was asked for); ${plural(omitted, 'condition')} left out`;
  } else {
    text =
      `only conditions with a fail, marginal or not-evaluated finding have a section: ` +
      `${detailed.length} of ${conditions.length}; ${plural(omitted, 'condition')} whose findings all pass left out`;
  }
  return { mode, detailed, omitted, text };
}
