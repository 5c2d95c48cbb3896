/**
 * A sweep of 2,000 conditions renders, and stays a document of sensible size: sections only
 * for conditions with issues, per-section charts capped, matrix rows and trend marks bounded.
 */
import { describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { buildReportView, SECTION_CHART_CAP } from '../../src/report/view-model.js';
import { sweepReview } from '../fixtures/results/larkspur-sweep.js';

describe('report of a 2,000-condition sweep', () => {
  const { results, sets } = sweepReview(2000, 10);

  it('renders with detail issues under 15 MB, a section per condition with an issue', () => {
    const started = performance.now();
    const html = renderHtml(buildReportView(results, sets, { reportId: 'MG-SWEEP', detail: 'issues' }));
    const seconds = (performance.now() - started) / 1000;
    expect(html.length).toBeLessThan(15_000_000);
    expect(html.match(/<section class="condition"/g)).toHaveLength(200);
    expect(html.match(/<svg [^>]*class="chart chart-s-plane"/g)).toHaveLength(SECTION_CHART_CAP);
    expect(html).toContain('Only conditions with a fail, marginal or not-evaluated finding have a section: 200 of 2000; 1800 conditions whose findings all pass left out');
    // matrix capped at 50 rows, with the count of those left out
    const matrix = html.slice(html.indexOf('<table class="grid-table matrix"'), html.indexOf('</table>', html.indexOf('<table class="grid-table matrix"')));
    expect(matrix.match(/<tr data-condition=/g)).toHaveLength(50);
    expect(html).toContain('and 150 more conditions with issues');
    // at-a-glance list replaced by a sentence
    expect(html).toContain('2000 conditions: too many to list one by one here');
    expect(seconds).toBeLessThan(10);
  });

  it('keeps each trend chart small however many conditions it marks', () => {
    const view = buildReportView(results, sets, { reportId: 'MG-SWEEP', detail: 'none' });
    for (const t of view.envelope!.trends) {
      expect(t.svg === null || t.svg.length < 150_000).toBe(true);
      if (t.svg) expect(t.svg).not.toMatch(/NaN|undefined|Infinity/);
    }
    expect(view.conditions).toEqual([]);
  });

  it('renders every condition with detail all without running out of string', () => {
    const html = renderHtml(buildReportView(results, sets, { reportId: 'MG-SWEEP', detail: 'all' }));
    expect(html.match(/<section class="condition"/g)).toHaveLength(2000);
    expect(html.length).toBeLessThan(60_000_000);
  });
});
