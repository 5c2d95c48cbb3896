import { describe, expect, it } from 'vitest';
import { buildReportView } from '../../src/report/view-model.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

describe('buildReportView', () => {
  const { results, sets } = larkspurReview();
  const view = buildReportView(results, sets, { reportId: 'MG-0000000001' });
  const findings = results.conditions.flatMap((c) => c.findings);

  it('counts every verdict over all findings and names the worst as the outcome', () => {
    const byWord = Object.fromEntries(view.tally.map((t) => [t.mark.verdict, t.count]));
    expect(byWord).toEqual({
      pass: findings.filter((f) => f.verdict === 'pass').length,
      marginal: findings.filter((f) => f.verdict === 'marginal').length,
      fail: findings.filter((f) => f.verdict === 'fail').length,
      not_evaluated: findings.filter((f) => f.verdict === 'not_evaluated').length,
    });
    expect(view.totalFindings).toBe(findings.length);
    expect(view.overall.word).toBe('FAIL');
    expect(view.evidence.notPublished).toBe(findings.filter((f) => f.evidence.class !== 'published').length);
  });

  it('keeps a symbol beside every verdict word', () => {
    for (const c of view.conditions) {
      for (const row of c.findings) {
        expect(row.mark.symbol).not.toBe('');
        expect(row.mark.word).not.toBe('');
      }
    }
    const words = new Set(view.conditions.flatMap((c) => c.findings.map((f) => f.mark.word)));
    expect(words).toEqual(new Set(['pass', 'marginal', 'FAIL', 'not evaluated']));
  });

  it('gives one section per condition with its required level and where it came from', () => {
    expect(view.conditions.map((c) => c.id)).toEqual(['CR-6000', 'PA-450', 'TF-300']);
    expect(view.conditions[1]?.requiredLevelFrom).toBe('criteria set default');
    expect(view.conditions[0]?.requiredLevelFrom).toBe('set in the model file');
    expect(new Set(view.conditions.map((c) => c.anchor)).size).toBe(3);
    expect(view.conditions.map((c) => c.mark.word)).toEqual(['marginal', 'FAIL', 'FAIL']);
  });

  it('formats the figures of the modal table from the eigenvalues', () => {
    const cruise = view.conditions[0]!;
    const sp = cruise.modes.find((m) => m.kind === 'short period')!;
    // omega_n = |lambda| and zeta = -Re/|lambda| (common practice): -1.6 +/- 2.4i gives 2.884 and 0.5547
    expect(sp.naturalFrequency).toBe('2.88');
    expect(sp.dampingRatio).toBe('0.555');
    expect(sp.eigenvalues).toBe('\u22121.600 \u00b1 2.400i');
  });

  it('warns about boundaries from memory, ambiguous modes and keeps the defaults applied', () => {
    const tf = view.conditions[2]!;
    expect(tf.warnings.some((w) => /recalled from memory/.test(w) && /sp-cap-a/.test(w))).toBe(true);
    expect(tf.warnings.some((w) => /not clear-cut/.test(w) && /roll\u2013spiral/.test(w))).toBe(true);
    expect(view.conditions[1]!.notes.join(' ')).toMatch(/default Level 1 applied/);
    const roll = tf.findings.find((f) => f.criterion === 'roll-tau-a-ii')!;
    expect(roll.mark.word).toBe('not evaluated');
    expect(roll.reason).toMatch(/coupled pair/);
  });

  it('draws three charts per condition, or says why not', () => {
    for (const c of view.conditions) {
      expect(c.charts).toHaveLength(3);
      for (const chart of c.charts) expect(chart.caption.length).toBeGreaterThan(10);
    }
    const tf = view.conditions[2]!;
    expect(tf.charts.every((ch) => ch.svg !== null)).toBe(true);
  });

  it('lists dropped criteria, criteria notes and the traceability record', () => {
    const set = view.criteriaSets[0]!;
    expect(set.chain).toBe('mil-f-8785c \u2192 lt6-programme');
    expect(set.dropped.map((d) => d.id)).toEqual(['roll-spiral-oscillation', 'time-delay']);
    expect(view.traceability.inputs.map((i) => i.sha256)).toEqual(results.inputs.map((i) => i.sha256));
    expect(view.traceability.command).toContain("'out/lt6 review.pdf'");
    expect(view.traceability.reportId).toBe('MG-0000000001');
    expect(view.date).toBe('2026-11-30 14:05 UTC');
    expect(view.cautions.join(' ')).toMatch(/certifying or procuring authority/);
    expect(view.cautions.join(' ')).toMatch(/equivalent-system/);
  });

  it('keeps only the conditions with issues in detail when asked', () => {
    const fresh = larkspurReview();
    fresh.results.conditions[0]!.findings = fresh.results.conditions[0]!.findings.filter((f) => f.verdict === 'pass');
    const issues = buildReportView(fresh.results, fresh.sets, { reportId: 'x', detail: 'issues' });
    expect(issues.conditions.map((c) => c.id)).toEqual(['PA-450', 'TF-300']);
    expect(issues.detail).toMatch(/2 of 3; 1 condition whose findings all pass left out/);
    // the all-pass condition still stands in the summaries, without a link to a section
    expect(issues.overview.rows.map((r) => r.anchor === null)).toEqual([true, false, false]);
    const none = buildReportView(fresh.results, fresh.sets, { reportId: 'x', detail: 'none' });
    expect(none.conditions).toEqual([]);
    expect(none.detail).toMatch(/no condition has a section.*3 conditions left out/i);
    expect(none.envelope?.matrix.chunks[0]?.rows).toHaveLength(3);
  });

  it('says when no required level was set rather than inventing one', () => {
    const fresh = larkspurReview();
    const c = fresh.results.conditions[0]!;
    c.requiredLevel = null;
    c.requiredLevelFrom = null;
    const v = buildReportView(fresh.results, fresh.sets, { reportId: 'x' });
    expect(v.conditions[0]!.requiredLevel).toBe('not set');
    expect(v.conditions[0]!.requiredLevelFrom).toBe('no criteria evaluated');
    expect(v.requiredLevels).toBe('Level 1 (PA-450, TF-300); not set (CR-6000)');
  });
});
