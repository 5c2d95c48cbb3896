/**
 * The envelope summary built from the Larkspur fixture (three conditions) and from sweeps made
 * of its conditions: numbered criteria, verdict matrix, worst cases and coverage.
 */
import { describe, expect, it } from 'vitest';
import { criterionColumns } from '../../../src/report/envelope/criterion-columns.js';
import { envelopeView } from '../../../src/report/envelope/envelope-view.js';
import { MATRIX_LIMITS, verdictMatrix } from '../../../src/report/envelope/verdict-matrix.js';
import type { Verdict } from '../../../src/types.js';
import { larkspurReview } from '../../fixtures/results/larkspur-review.js';
import { sweepOf } from '../../fixtures/results/larkspur-sweep.js';

/** The cell text the document promises in its key: symbol and letter. */
const CELL: Record<Verdict, string> = { pass: '\u2713P', marginal: '\u25d2M', fail: '\u2717F', not_evaluated: '\u25cbN' };

function cellAt(view: ReturnType<typeof envelopeView>, condition: string, criterion: string) {
  for (const chunk of view.matrix.chunks) {
    const row = chunk.rows.find((r) => r.id === condition);
    const i = chunk.columns.findIndex((c) => c.id === criterion);
    if (row && i >= 0) return row.cells[i]!;
  }
  throw new Error(`no cell ${condition} / ${criterion}`);
}

describe('envelope summary', () => {
  const { results, sets } = larkspurReview();
  const view = envelopeView(results.conditions, sets, (i) => `condition-${i + 1}`);

  it('numbers every criterion that made a finding or was declared not applicable, grouped by mode', () => {
    const columns = criterionColumns(results.conditions, sets);
    const ids = new Set(results.conditions.flatMap((c) => [...c.findings.map((f) => f.criterion), ...c.notApplicable.map((n) => n.criterion)]));
    expect(columns.map((c) => c.id).sort()).toEqual([...ids].sort());
    expect(columns.map((c) => c.number)).toEqual(columns.map((_, i) => i + 1));
    // short period first, the coupled roll-spiral criterion (a roll_spiral criterion of the set) after roll and spiral
    expect(columns[0]!.mode).toBe('short_period');
    const rs = columns.find((c) => c.id === 'roll-spiral-coupling-bc')!;
    expect(rs.mode).toBe('roll_spiral');
    expect(rs.number).toBe(columns.length);
  });

  it('puts each finding verdict in its cell, a dot where the criterion is declared not applicable, blank where not applied', () => {
    for (const c of results.conditions) {
      for (const f of c.findings) expect(cellAt(view, c.id, f.criterion).text).toBe(CELL[f.verdict]);
    }
    expect(cellAt(view, 'PA-450', 'dr-damping-c').text).toBe('\u2717F');
    expect(cellAt(view, 'CR-6000', 'phugoid-damping').text).toBe('\u25d2M');
    expect(cellAt(view, 'TF-300', 'roll-tau-a-ii').text).toBe('\u25cbN');
    expect(cellAt(view, 'CR-6000', 'roll-spiral-coupling-bc')).toMatchObject({ text: '\u00b7', state: 'not_applicable' });
    expect(cellAt(view, 'TF-300', 'roll-spiral-coupling-bc')).toMatchObject({ text: '', state: 'not_applied' });
    expect(cellAt(view, 'CR-6000', 'dr-damping-c')).toMatchObject({ text: '', state: 'not_applied' });
    const filled = view.matrix.chunks.flatMap((ch) => ch.rows.flatMap((r) => r.cells)).filter((cell) => cell.state !== 'not_applied' && cell.state !== 'not_applicable');
    expect(filled).toHaveLength(results.conditions.flatMap((c) => c.findings).length);
    expect(view.matrix.more).toBeNull();
    expect(view.matrix.chunks[0]!.rows.map((r) => r.anchor)).toEqual(['condition-1', 'condition-2', 'condition-3']);
  });

  it('names the worst case of each criterion', () => {
    const byId = new Map(view.worstCases.map((w) => [w.criterion, w]));
    // Phugoid: the marginal cruise finding is worse than the two passes.
    expect(byId.get('phugoid-damping')!.worst).toMatchObject({ condition: 'CR-6000', mark: { verdict: 'marginal' } });
    expect(byId.get('phugoid-damping')!.counts).toEqual({ fail: 0, marginal: 1, notEvaluated: 0, pass: 2, notApplicable: 0 });
    // Civil 7-cycle rule, zeta >= 0.0523 (14 CFR 23.181(b) as a damping ratio): both conditions pass, the
    // smaller margin is the approach: zeta = -Re/|lambda| of -0.06 +/- 0.85i = 0.0704 (common practice).
    expect(byId.get('dr-cycles-low')!.worst).toMatchObject({ condition: 'PA-450', value: '0.0704', mark: { verdict: 'pass' } });
    // Spiral: one convergent pass, one divergent pass, one not evaluated -> the not-evaluated one is the worst case.
    expect(byId.get('spiral-double-ii')!.worst).toMatchObject({ condition: 'TF-300', value: '\u2013', mark: { verdict: 'not_evaluated' } });
    const rs = byId.get('roll-spiral-coupling-bc')!;
    expect(rs.worst).toBeNull();
    expect(rs.counts.notApplicable).toBe(2);
    expect(rs.evaluated).toBe(0);
  });

  it('summarises the coverage by flight phase', () => {
    expect(view.coverage.map((r) => [r.phase, r.conditions, r.airspeed])).toEqual([
      ['CR', 1, '120\u2009m/s'], ['PA', 1, '62.0\u2009m/s'], ['TF', 1, '150\u2009m/s'],
    ]);
    const pa = view.coverage[1]!;
    expect(Object.fromEntries(pa.tally.map((t) => [t.mark.verdict, t.count]))).toEqual({ fail: 1, marginal: 0, not_evaluated: 0, pass: 0 });
  });

  it('draws each key figure against airspeed and altitude, the altitudes differing', () => {
    expect(view.trends.map((t) => t.id)).toEqual([
      'trend-sp-damping-airspeed', 'trend-sp-damping-altitude', 'trend-sp-cap-airspeed', 'trend-sp-cap-altitude',
      'trend-dr-damping-airspeed', 'trend-dr-damping-altitude', 'trend-dr-frequency-airspeed', 'trend-dr-frequency-altitude',
      'trend-roll-tau-airspeed', 'trend-roll-tau-altitude',
    ]);
    // Dutch roll frequency: the fixture gives >= 0.4 rad/s at Level 1 in every category (MIL-F-8785C 3.3.1.1, from memory).
    const frequency = view.trends.find((t) => t.id === 'trend-dr-frequency-airspeed')!;
    expect(frequency.caption).toMatch(/Level 1 bound \u2265 0\.4 of .* the same for every condition/);
    expect(frequency.svg).toContain('class="boundary"');
    // Dutch roll damping: 0.08 (B, C), 0.19 (A) and the civil 0.0523 differ: bars per condition, no line.
    const damping = view.trends.find((t) => t.id === 'trend-dr-damping-airspeed')!;
    expect(damping.caption).toMatch(/differ across the sweep/);
    expect(damping.svg).not.toContain('class="boundary"');
    expect(damping.svg).toContain('class="level1-bars"');
    // Roll: TF-300 has no roll mode, so one condition is missing from the chart.
    expect(view.trends.find((t) => t.id === 'trend-roll-tau-airspeed')!.caption).toMatch(/1 condition without a value/);
  });
});

describe('verdict matrix of a large sweep', () => {
  const { sets } = larkspurReview();

  it('lists only the conditions with issues, worst first, up to the cap, and says how many it left out', () => {
    const conditions = sweepOf(600, 5);
    const columns = criterionColumns(conditions, sets);
    const m = verdictMatrix(conditions, columns, () => null);
    const rows = m.chunks[0]!.rows;
    expect(rows).toHaveLength(MATRIX_LIMITS.rowCap);
    expect(m.scope).toMatch(/Only the 120 of 600 conditions with a fail, marginal or not-evaluated finding, worst first; the 480 whose findings all pass/);
    expect(m.more).toMatch(/and 70 more conditions with issues/);
    // worst first: failing conditions before any merely marginal one
    const words = rows.map((r) => r.mark.verdict);
    expect(words.indexOf('marginal') === -1 || words.lastIndexOf('fail') < words.indexOf('marginal')).toBe(true);
    expect(rows.every((r) => r.mark.verdict !== 'pass')).toBe(true);
  });

  it('says so when no condition of a large sweep has an issue', () => {
    const conditions = sweepOf(100, 1_000_000).slice(1);
    const m = verdictMatrix(conditions, criterionColumns(conditions, sets), () => null);
    expect(m.chunks[0]!.rows).toEqual([]);
    expect(m.scope).toMatch(/None of the 99 conditions/);
  });

  it('splits a wide set of criteria into even tables', () => {
    const { results } = larkspurReview();
    const columns = criterionColumns(results.conditions, sets);
    const m = verdictMatrix(results.conditions, columns, () => null, { listAllUpTo: 40, rowCap: 50, columnsPerTable: 10 });
    const widths = m.chunks.map((c) => c.columns.length);
    expect(widths.reduce((a, b) => a + b, 0)).toBe(columns.length);
    expect(Math.max(...widths) - Math.min(...widths)).toBeLessThanOrEqual(1);
    expect(m.chunks.every((c) => c.rows.every((r) => r.cells.length === c.columns.length))).toBe(true);
  });
});
