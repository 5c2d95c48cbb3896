import { describe, expect, it } from 'vitest';
import { byConcern, hasIssue } from '../../src/report/condition-status.js';
import { selectDetail } from '../../src/report/detail-selection.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

describe('which conditions get a section', () => {
  const { results } = larkspurReview();
  const [cr, pa, tf] = results.conditions as [typeof results.conditions[0], typeof results.conditions[0], typeof results.conditions[0]];

  it('counts a marginal, failing or not-evaluated finding as an issue, and a condition without findings too', () => {
    expect([cr, pa, tf].map(hasIssue)).toEqual([true, true, true]);
    expect(hasIssue({ ...cr, findings: cr.findings.map((f) => ({ ...f, verdict: 'pass' as const })) })).toBe(false);
    // no finding is no evidence: never passed by default
    expect(hasIssue({ ...cr, findings: [] })).toBe(true);
  });

  it('selects all, issues or none and says what was left out', () => {
    const clean = { ...cr, findings: cr.findings.map((f) => ({ ...f, verdict: 'pass' as const })) };
    const list = [clean, pa, tf];
    expect(selectDetail(list, 'all')).toMatchObject({ detailed: [0, 1, 2], omitted: 0 });
    expect(selectDetail(list, 'issues')).toMatchObject({ detailed: [1, 2], omitted: 1 });
    expect(selectDetail(list, 'issues').text).toMatch(/2 of 3; 1 condition whose findings all pass left out/);
    expect(selectDetail(list, 'none')).toMatchObject({ detailed: [], omitted: 3 });
  });

  it('orders by concern: failing conditions first, more failures before fewer, then marginal', () => {
    // PA-450 fails two findings, TF-300 one (and has marginal and not-evaluated ones), CR-6000 is marginal only
    expect(byConcern(results.conditions, [0, 1, 2]).map((i) => results.conditions[i]!.id)).toEqual(['PA-450', 'TF-300', 'CR-6000']);
  });
});
