/**
 * Trend chart of one key figure over a sweep: marks by verdict shape, coincident marks
 * merged into one, the single Level 1 line or each condition's own bound, and nothing
 * non-finite in the SVG.
 */
import { describe, expect, it } from 'vitest';
import { trendChart, type TrendChartSpec } from '../../../src/report/charts/trend-chart.js';
import { KEY_FIGURES, trendSeries } from '../../../src/report/charts/trend-data.js';
import type { TrendPoint } from '../../../src/report/charts/trend-data.js';
import { larkspurReview } from '../../fixtures/results/larkspur-review.js';

function spec(points: TrendPoint[], over: Partial<TrendChartSpec> = {}): TrendChartSpec {
  return { id: 't', label: 'test chart', xLabel: 'V [m/s]', yLabel: '\u03b6 [\u2013]', points, boundary: null, perPointBounds: false, ...over };
}

describe('trend chart', () => {
  it('merges coincident marks, so that ten thousand equal conditions are one mark', () => {
    const points: TrendPoint[] = Array.from({ length: 10_000 }, () => ({ x: 100, y: 0.3, verdict: 'pass', level1: null, condition: 'same' }));
    points.push({ x: 140, y: 0.1, verdict: 'fail', level1: null, condition: 'odd' });
    const out = trendChart(spec(points));
    expect(out.marks).toBe(2);
    expect(out.svg).toContain('class="marks marks-pass" data-count="1"');
    expect(out.svg).toContain('class="marks marks-fail" data-count="1"');
    expect(out.svg.length).toBeLessThan(8000);
  });

  it('draws a mark shape per verdict and names each in the legend', () => {
    const verdicts = ['pass', 'marginal', 'fail', 'not_evaluated', null] as const;
    const out = trendChart(spec(verdicts.map((v, i) => ({ x: 50 + 10 * i, y: 0.1 * (i + 1), verdict: v, level1: null, condition: `c${i}` }))));
    for (const cls of ['marks-pass', 'marks-marginal', 'marks-fail', 'marks-not_evaluated', 'marks-none']) expect(out.svg).toContain(cls);
    for (const word of ['>pass<', '>marginal<', '>FAIL<', '>not evaluated<', '>no criterion<']) expect(out.svg).toContain(word);
  });

  it('draws the single Level 1 line and hatches its outside; leaves a far bound off the chart and says so', () => {
    const points: TrendPoint[] = [0.3, 0.5, 0.7].map((y, i) => ({ x: 60 + 20 * i, y, verdict: 'pass', level1: { min: 0.35, max: 1.3 }, condition: `c${i}` }));
    // short-period damping Level 1 0.35 ... 1.30, Categories A and C (MIL-F-8785C 3.2.2.1.2, from memory)
    const near = trendChart(spec(points, { boundary: { min: 0.35 } }));
    expect(near.svg.match(/class="boundary"/g)).toHaveLength(1);
    expect(near.svg).toContain('Level 1 \u2265 0.35');
    expect(near.svg).toContain('class="outside-l1"');
    const far = trendChart(spec(points, { boundary: { max: 30 } }));
    expect(far.svg).not.toContain('class="boundary"');
    expect(far.offChart).toEqual(['Level 1 maximum 30 lies above the plotted range']);
  });

  it('gives each condition its own bound as a bar when the bounds differ', () => {
    const points: TrendPoint[] = [
      { x: 60, y: 0.1, verdict: 'pass', level1: { min: 0.08 }, condition: 'slow' },
      { x: 90, y: 0.2, verdict: 'marginal', level1: { min: 0.19 }, condition: 'fast' },
    ];
    const out = trendChart(spec(points, { perPointBounds: true }));
    expect(out.svg).toContain('class="level1-bars"');
    expect(out.svg.match(/h9/g)?.length).toBeGreaterThanOrEqual(2);
    expect(out.svg).not.toMatch(/NaN|Infinity|undefined/);
  });

  it('names each point\'s condition on hover, up to a few hundred points', () => {
    const out = trendChart(spec([{ x: 60, y: 0.1, verdict: 'pass', level1: null, condition: 'fwd-h500-v55' }]));
    expect(out.svg).toContain('<title>fwd-h500-v55: 0.1 at 60</title>');
    const many: TrendPoint[] = Array.from({ length: 10_000 }, (_, i) => ({ x: 50 + (i % 50), y: 0.3, verdict: 'pass', level1: null, condition: `c${i}` }));
    expect(trendChart(spec(many)).svg).not.toContain('<title>c1:');
  });

  it('draws a flat series and a single condition without a degenerate scale', () => {
    for (const points of [[{ x: 80, y: 0.5, verdict: 'pass' as const, level1: null, condition: 'a' }], [{ x: 80, y: 0, verdict: 'pass' as const, level1: null, condition: 'a' }, { x: 80, y: 0, verdict: 'pass' as const, level1: null, condition: 'a' }]]) {
      const out = trendChart(spec(points));
      expect(out.svg).not.toMatch(/NaN|Infinity|undefined/);
      expect(out.marks).toBe(1);
    }
  });

  it('takes the judged value and the worst verdict of the findings on the figure', () => {
    const { results } = larkspurReview();
    const dr = KEY_FIGURES.find((f) => f.key === 'dr-damping')!;
    const s = trendSeries(results.conditions, dr);
    // CR-6000: zeta of -0.2 +/- 1.5i = 0.132 (common practice), judged by two criteria that both pass
    expect(s.points[0]).toMatchObject({ x: 120, verdict: 'pass' });
    expect(s.points[0]!.y).toBeCloseTo(0.2 / Math.hypot(0.2, 1.5), 12);
    // PA-450 fails the MIL-F-8785C 3.3.1.1 minimum and passes the civil one: the mark is a fail
    expect(s.points[1]).toMatchObject({ x: 62, verdict: 'fail', level1: { min: 0.08 } });
    expect(s.byAltitude.points.map((p) => p.x)).toEqual([6000, 450, 300]);
    expect(s.boundaries.map((b) => b.bound.min).sort()).toEqual([0.0523, 0.08, 0.19]);
  });
});
