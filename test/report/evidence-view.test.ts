/**
 * The evidence of the boundaries in the review document: beside every finding, in the criteria
 * section, counted on the first page, and the list of sources at the end.
 */
import { describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { buildReportView } from '../../src/report/view-model.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

const { results, sets } = larkspurReview();
const view = buildReportView(results, sets, { reportId: 'MG-EVIDENCE' });
const html = renderHtml(view);
const findings = results.conditions.flatMap((c) => c.findings);

describe('evidence in the review document', () => {
  it('counts on the first page the findings whose boundary is not published, by class, and says what it means', () => {
    const memory = findings.filter((f) => f.evidence.class === 'memory').length;
    expect(memory).toBeGreaterThan(0);
    expect(view.evidence.notPublished).toBe(memory);
    expect(view.evidence.byClass.map((b) => [b.evidence, b.count])).toEqual([
      ['published', findings.length - memory],
      ['memory', memory],
    ]);
    expect(view.evidence.statement).toBe(
      `${memory} of ${findings.length} findings are judged against a boundary that was not read in the primary document (${memory} memory). ` +
        'Their verdicts stand only as far as those values do: before the review relies on one, check its boundary in the published document. ' +
        'A memory or conflicting boundary may move a verdict either way; the criteria section gives the evidence of every level and the sources are listed at the end.',
    );
    const title = html.slice(html.indexOf('<header class="title-block">'), html.indexOf('</header>'));
    expect(title).toContain(`on boundaries not read in the primary document <b>${memory}</b>`);
    expect(title).toContain('<span class="flag ev ev-memory">memory</span>');
  });

  it('says so when every boundary is published', () => {
    const fixture = larkspurReview();
    for (const c of fixture.results.conditions) for (const f of c.findings) f.evidence = { class: 'published', sources: ['lt6-hq-spec'] };
    const v = buildReportView(fixture.results, fixture.sets, { reportId: 'MG-E2' });
    expect(v.evidence.notPublished).toBe(0);
    expect(v.evidence.statement).toBe('Every finding is judged against a boundary read in the primary document, at the page cited.');
  });

  it('marks every finding with its boundary evidence, its sources linked to the list at the end', () => {
    const rows = view.conditions.flatMap((c) => c.findings);
    // every condition has its section here, so the rows are the findings in order
    expect(rows.map((r) => r.evidence)).toEqual(findings.map((f) => f.evidence.class));
    const published = rows.find((r) => r.evidence === 'published')!;
    expect(published.evidenceSources).toEqual([{ id: 'lt6-hq-spec', anchor: 'source-lt6-hq-spec' }]);
    expect(html.match(/<span class="sub ev-line">boundary <span class="flag ev ev-/g)).toHaveLength(rows.length);
    expect(html).toContain('<a class="mono" href="#source-lt6-hq-spec">lt6-hq-spec</a>');
  });

  it('ends with the sources of every set, each with the number of findings that cite it', () => {
    expect(view.sources.map((s) => [s.id, s.kind, s.sets, s.findings])).toEqual([
      ['lt6-hq-spec', 'primary', 'lt6-programme', findings.filter((f) => f.evidence.sources.includes('lt6-hq-spec')).length],
      ['mil-reprint', 'reproduction', 'lt6-programme', 0],
      ['cfr-23-181-text', 'primary', 'cfr-23-181', findings.filter((f) => f.evidence.sources.includes('cfr-23-181-text')).length],
    ]);
    const last = html.lastIndexOf('<section');
    expect(html.slice(last)).toMatch(/^<section class="sources">\s*<h2>Sources of the boundaries<\/h2>/);
    expect(html.slice(last)).toContain('<tr id="source-lt6-hq-spec">');
  });

  it('gives in the criteria section the bounds and evidence of each level', () => {
    const c = view.criteriaSets[0]!.criteria.find((x) => x.id === 'sp-damping-b')!;
    expect(c.groups).toEqual([
      { covers: 'Levels 1, 2, 3', bounds: '0.3 \u2026 2 / 0.2 \u2026 2 / \u2265 0.15', evidence: 'memory', statedBy: null, cites: [], note: '' },
    ]);
    expect(html).toContain('<b>Levels 1, 2, 3</b> <span class="ev-bounds">0.3 \u2026 2 / 0.2 \u2026 2 / \u2265 0.15</span> <span class="flag ev ev-memory">memory</span>');
  });
});
