import { describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { buildReportView } from '../../src/report/view-model.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

function render(mutate?: (f: ReturnType<typeof larkspurReview>) => void): string {
  const fixture = larkspurReview();
  mutate?.(fixture);
  return renderHtml(buildReportView(fixture.results, fixture.sets, { reportId: 'MG-HTML' }));
}

describe('renderHtml', () => {
  const html = render();

  it('is one self-contained document under a policy that forbids every load', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).toContain(`<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:;`);
    expect(html).not.toMatch(/<(script|link|iframe|img|object|embed)\b/i);
    expect(html).not.toMatch(/\ssrc=/i);
    // Links only within the document (condition sections from the envelope summary).
    expect(html.match(/\shref="[^#]/gi)).toBeNull();
    expect(html).toContain('href="#condition-2-PA-450"');
    expect(html.match(/<style>/g)?.length).toBeGreaterThanOrEqual(1);
    expect(html).toContain('break-inside: avoid');
  });

  it('escapes what came from the input files', () => {
    const hostile = render((f) => {
      f.results.aircraft.name = 'LT-6 <b onmouseover=x>';
      f.results.conditions[0]!.id = '"><svg onload=alert(1)>';
      f.results.inputs[0]!.path = 'samples/<i>.yaml';
    });
    expect(hostile).not.toContain('<b onmouseover');
    expect(hostile).toContain('LT-6 &lt;b onmouseover&#x3D;x&gt;');
    expect(hostile).not.toContain('<svg onload');
    expect(hostile).not.toContain('<i>.yaml');
  });

  it('has a section per condition with the three figures', () => {
    expect(html.match(/<section class="condition"/g)).toHaveLength(3);
    expect(html.match(/<figure class="chart-figure"/g)).toHaveLength(9);
    expect(html.match(/<svg [^>]*class="chart chart-(s-plane|short-period|dutch-roll)"/g)).toHaveLength(9);
  });

  it('shows a caption instead of a chart when its data are missing', () => {
    const partial = render((f) => {
      const c = f.results.conditions[2]!;
      c.modes = c.modes.filter((m) => m.kind !== 'dutch_roll');
    });
    expect(partial).toContain('No identified Dutch roll mode for this condition: chart not drawn.');
    expect(partial.match(/<svg [^>]*class="chart chart-(s-plane|short-period|dutch-roll)"/g)).toHaveLength(8);
  });

  it('gives sections only to conditions with issues under detail issues, and says how many were left out', () => {
    const fixture = larkspurReview();
    const cr = fixture.results.conditions[0]!;
    cr.findings = cr.findings.map((f) => ({ ...f, verdict: 'pass' as const }));
    const out = renderHtml(buildReportView(fixture.results, fixture.sets, { reportId: 'MG-HTML', detail: 'issues' }));
    expect(out.match(/<section class="condition"/g)).toHaveLength(2);
    expect(out).not.toContain('id="condition-1-CR-6000"');
    expect(out).toContain('Only conditions with a fail, marginal or not-evaluated finding have a section: 2 of 3; 1 condition whose findings all pass left out.');
    // the all-pass condition is still in the summaries, without a link
    expect(out).toMatch(/<tr data-condition="CR-6000"><td class="mono m-cond">CR-6000<\/td>/);
    const none = renderHtml(buildReportView(fixture.results, fixture.sets, { reportId: 'MG-HTML', detail: 'none' }));
    expect(none).not.toContain('<section class="condition"');
    expect(none).toContain('3 conditions left out');
  });

  it('counts a declared not-applicable criterion neither as a finding nor as a pass', () => {
    const withNa = render();
    const without = render((f) => {
      for (const c of f.results.conditions) c.notApplicable = [];
    });
    const tallyOf = (h: string) => h.slice(h.indexOf('<div class="outcome">'), h.indexOf('</div>', h.indexOf('<div class="outcome">')));
    expect(tallyOf(withNa)).toBe(tallyOf(without));
    expect(withNa.match(/<b>Not applicable:<\/b>/g)).toHaveLength(2);
    expect(without).not.toContain('<b>Not applicable:</b>');
  });
});
