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
    expect(html).not.toMatch(/\s(src|href)=/i);
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
    expect(html.match(/<svg /g)).toHaveLength(9);
  });

  it('shows a caption instead of a chart when its data are missing', () => {
    const partial = render((f) => {
      const c = f.results.conditions[2]!;
      c.modes = c.modes.filter((m) => m.kind !== 'dutch_roll');
    });
    expect(partial).toContain('No identified Dutch roll mode for this condition: chart not drawn.');
    expect(partial.match(/<svg /g)).toHaveLength(8);
  });
});
