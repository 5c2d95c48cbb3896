import { describe, expect, it } from 'vitest';
import { classifyTransition, concernOf } from '../../src/compare/verdict-transition.js';
import type { Verdict } from '../../src/types.js';

// The rule is modalgate's own review policy (common practice: a reviewer looks again at
// anything that got worse or lost its evidence); no published source fixes it.
describe('classifyTransition', () => {
  const table: [Verdict, Verdict, 'regression' | 'improvement' | 'unchanged'][] = [
    ['pass', 'pass', 'unchanged'],
    ['pass', 'marginal', 'regression'],
    ['pass', 'fail', 'regression'],
    ['pass', 'not_evaluated', 'regression'],
    ['marginal', 'pass', 'improvement'],
    ['marginal', 'marginal', 'unchanged'],
    ['marginal', 'fail', 'regression'],
    ['marginal', 'not_evaluated', 'regression'],
    ['fail', 'pass', 'improvement'],
    ['fail', 'marginal', 'improvement'],
    ['fail', 'fail', 'unchanged'],
    ['fail', 'not_evaluated', 'regression'],
    ['not_evaluated', 'pass', 'improvement'],
    ['not_evaluated', 'marginal', 'regression'],
    ['not_evaluated', 'fail', 'regression'],
    ['not_evaluated', 'not_evaluated', 'unchanged'],
  ];
  it.each(table)('%s -> %s is %s', (from, to, kind) => {
    expect(classifyTransition(from, to)).toBe(kind);
  });

  it('ranks a new failure above lost evidence above a new marginal result', () => {
    const order = (['marginal', 'not_evaluated', 'fail'] as Verdict[]).sort((a, b) => concernOf(a) - concernOf(b));
    expect(order).toEqual(['fail', 'not_evaluated', 'marginal']);
  });
});
