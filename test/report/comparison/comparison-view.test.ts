/**
 * "Changes since the baseline": a Comparison made with compareResults from two Larkspur
 * results, shown in the view and in the HTML, regressions first.
 */
import { describe, expect, it } from 'vitest';
import { compareResults } from '../../../src/compare/compare-results.js';
import { comparisonView, deltaText } from '../../../src/report/comparison/comparison-view.js';
import { renderHtml } from '../../../src/report/html.js';
import { buildReportView } from '../../../src/report/view-model.js';
import { larkspurReview } from '../../fixtures/results/larkspur-review.js';

/** The baseline iteration: the approach Dutch roll still passed, the cruise phugoid failed, a climb case existed. */
function baselineRun() {
  const base = larkspurReview();
  const r = base.results;
  r.generatedAt = '2026-11-02T09:30:00.000Z';
  r.tool.version = '0.0.9';
  r.inputs[0]!.sha256 = '0'.repeat(64);
  const pa = r.conditions[1]!;
  const dr = pa.findings.find((f) => f.criterion === 'dr-damping-c')!;
  Object.assign(dr, { verdict: 'pass', level: 1, value: 0.095, margin: 0.015 });
  const cr = r.conditions[0]!;
  const ph = cr.findings.find((f) => f.criterion === 'phugoid-damping')!;
  Object.assign(ph, { verdict: 'fail', level: 2, value: 0.02, margin: -0.02 });
  r.conditions.push({ ...cr, id: 'CL-2000', phase: 'CL' });
  return r;
}

describe('changes since the baseline', () => {
  const current = larkspurReview();
  const comparison = compareResults(current.results, baselineRun());
  const view = comparisonView(comparison, (id) => (id === 'PA-450' ? 'condition-2-PA-450' : null));

  it('names the baseline and says which inputs changed, by content hash', () => {
    expect(view.baseline).toEqual({ date: '2026-11-02 09:30 UTC', toolVersion: '0.0.9', aircraft: 'Larkspur LT-6, Class II-L' });
    expect(view.model).toBe('changed');
    expect(view.criteria).toBe('unchanged (same content)');
    const model = view.inputs.find((i) => i.role === 'model')!;
    expect(model).toMatchObject({ status: '~ changed', baselineSha: '000000000000', currentSha: '3f1c9a0e5b7d' });
  });

  it('lists the regression first, then the improvement, with the change of the figure', () => {
    expect(view.transitions.map((t) => [t.kind, t.condition, t.criterion])).toEqual([
      ['worse', 'PA-450', 'dr-damping-c'],
      ['better', 'CR-6000', 'phugoid-damping'],
    ]);
    const worse = view.transitions[0]!;
    expect(worse).toMatchObject({ symbol: '\u25bc', from: { verdict: 'pass' }, to: { verdict: 'fail' }, level: 'L1 \u2192 L2', anchor: 'condition-2-PA-450' });
    // zeta of -0.06 +/- 0.85i is 0.0704 (common practice); baseline 0.095: change -0.0246, -26 %
    expect(worse.value).toBe('0.0950 \u2192 0.0704');
    expect(worse.delta).toBe('\u22120.0246\u00a0(\u221226\u202f%)');
    expect(view.conditionsRemoved.map((c) => c.id)).toEqual(['CL-2000']);
    expect(view.summary[0]).toBe('\u25bc 1 worse');
  });

  it('shows the section right after the outcome, before the envelope summary, regression before improvement', () => {
    const html = renderHtml(buildReportView(current.results, current.sets, { reportId: 'MG-CMP', comparison }));
    const section = html.slice(html.indexOf('<section class="comparison"'), html.indexOf('</section>', html.indexOf('<section class="comparison"')));
    expect(html.indexOf('id="changes-since-baseline"')).toBeLessThan(html.indexOf('id="envelope-summary"'));
    expect(html.indexOf('class="outcome"')).toBeLessThan(html.indexOf('id="changes-since-baseline"'));
    const kinds = [...section.matchAll(/data-kind="(\w+)"/g)].map((m) => m[1]);
    expect(kinds.slice(0, 2)).toEqual(['worse', 'better']);
    expect(section).toContain('Changes since the baseline');
    expect(section).toContain('CL-2000');
    expect(section).toContain('modalgate 0.0.9');
  });

  it('prints figure changes with sign and relative change', () => {
    expect(deltaText({ baseline: 0.5, current: 0.6, delta: 0.1, relative: 0.2 })).toBe('+0.100\u00a0(+20\u202f%)');
    expect(deltaText({ baseline: null, current: 0.6, delta: null, relative: null })).toBe('now has a value');
    expect(deltaText({ baseline: 0, current: 0, delta: 0, relative: null })).toBe('0');
  });

  it('says when nothing changed', () => {
    const same = compareResults(current.results, larkspurReview().results);
    expect(comparisonView(same, () => null).nothingChanged).toBe(true);
  });
});
