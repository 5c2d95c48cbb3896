/**
 * How a verdict is shown. The symbol and the word always travel together, so the document
 * reads the same in greyscale print, to a colour-blind reader and in pdftotext output.
 */
import type { Verdict } from '../types.js';

export interface VerdictMark {
  verdict: Verdict;
  /** shape that survives photocopying */
  symbol: string;
  word: string;
  /** CSS class; the style adds weight and a border pattern, never colour alone */
  cls: string;
}

const MARKS: Record<Verdict, VerdictMark> = {
  pass: { verdict: 'pass', symbol: '\u2713', word: 'pass', cls: 'v-pass' },
  marginal: { verdict: 'marginal', symbol: '\u25d2', word: 'marginal', cls: 'v-marginal' },
  fail: { verdict: 'fail', symbol: '\u2717', word: 'FAIL', cls: 'v-fail' },
  not_evaluated: { verdict: 'not_evaluated', symbol: '\u25cb', word: 'not evaluated', cls: 'v-none' },
};

/** Worst first: the order in which a reviewer must read them. */
export const VERDICT_ORDER: readonly Verdict[] = ['fail', 'marginal', 'not_evaluated', 'pass'];

export function verdictMark(verdict: Verdict): VerdictMark {
  return MARKS[verdict];
}

/** The verdict a group of findings is summarised by (nothing found counts as not evaluated). */
export function worstVerdict(verdicts: readonly Verdict[]): Verdict {
  for (const v of VERDICT_ORDER) if (verdicts.includes(v)) return v;
  return 'not_evaluated';
}
