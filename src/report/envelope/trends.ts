/**
 * The trend charts of the envelope summary: each key figure against airspeed, and against
 * altitude when the altitudes of the sweep differ. Says per chart which Level 1 boundary is
 * drawn, or why none is.
 */
import type { ConditionResult } from '../../types.js';
import { bandwidthChart, bandwidthFinding } from '../charts/bandwidth-chart.js';
import { trendChart } from '../charts/trend-chart.js';
import { altitudesVary, KEY_FIGURES, type BoundaryUse, type KeyFigure, type TrendAxis, type TrendSeries, trendSeries } from '../charts/trend-data.js';
import type { ChartView } from '../report-view.js';
import { boundText } from '../view-format.js';

const AXIS_LABEL: Record<TrendAxis, string> = { airspeed: 'true airspeed V [m/s]', altitude: 'altitude h [m]' };
const AXIS_WORD: Record<TrendAxis, string> = { airspeed: 'airspeed', altitude: 'altitude' };

function boundaryText(uses: readonly BoundaryUse[]): string {
  const listed = uses.slice(0, 4).map((u) => `${boundText(u.bound)} (${u.criteria.slice(0, 3).join(', ')}${u.criteria.length > 3 ? ', \u2026' : ''})`);
  return listed.join('; ') + (uses.length > 4 ? `; and ${uses.length - 4} more` : '');
}

function trendView(all: TrendSeries, figure: KeyFigure, axis: TrendAxis): ChartView {
  const id = `trend-${figure.key}-${axis}`;
  const title = `${figure.title} against ${AXIS_WORD[axis]}`;
  const series = axis === 'airspeed' ? all : { ...all.byAltitude, boundaries: all.boundaries };
  const missing = series.missing > 0 ? ` ${series.missing} condition${series.missing === 1 ? '' : 's'} without a value${axis === 'altitude' ? ' or an altitude' : ''} not drawn.` : '';
  if (series.points.length === 0) {
    return { id, title, svg: null, caption: `No condition has a value of this figure.${missing}` };
  }
  const single = series.boundaries.length === 1 ? series.boundaries[0]! : null;
  const chart = trendChart({
    id: `${figure.key}-${axis}`,
    label: title,
    xLabel: AXIS_LABEL[axis],
    yLabel: figure.axis,
    points: series.points,
    boundary: single?.bound ?? null,
    perPointBounds: series.boundaries.length > 1,
  });
  let boundary: string;
  if (series.boundaries.length === 0) boundary = 'No criterion sets a Level 1 bound on this figure.';
  else if (single) boundary = `Line: the Level 1 bound ${boundText(single.bound)} of ${single.criteria.join(', ')}, the same for every condition.`;
  else boundary = `Level 1 bounds differ across the sweep: ${boundaryText(series.boundaries)}; each bar is the bound of the condition above or below it.`;
  const off = chart.offChart.length > 0 ? ` ${chart.offChart.join('; ')}.` : '';
  const merged = chart.marks < series.points.length ? ` ${series.points.length} conditions drawn as ${chart.marks} marks (coincident marks merged).` : ` ${series.points.length} conditions.`;
  return { id, title, svg: chart.svg, caption: `${boundary}${off}${merged}${missing}` };
}

export function envelopeTrends(conditions: readonly ConditionResult[]): ChartView[] {
  const axes: TrendAxis[] = altitudesVary(conditions) ? ['airspeed', 'altitude'] : ['airspeed'];
  const trends = KEY_FIGURES.flatMap((figure) => {
    const series = trendSeries(conditions, figure);
    if (figure.optional && series.points.length === 0) return [];
    return axes.map((axis) => trendView(series, figure, axis));
  });
  return [...trends, ...bandwidthCharts(conditions)];
}

/** All conditions of the sweep on one bandwidth chart per region criterion (its regions differ by category). */
function bandwidthCharts(conditions: readonly ConditionResult[]): ChartView[] {
  const byCriterion = new Map<string, ConditionResult[]>();
  for (const c of conditions) {
    const f = bandwidthFinding(c);
    if (!f) continue;
    byCriterion.set(f.criterion, [...(byCriterion.get(f.criterion) ?? []), c]);
  }
  return [...byCriterion.entries()].map(([criterion, group]) => ({
    id: `trend-bandwidth-${criterion}`,
    title: `Pitch bandwidth and phase delay, all conditions (${criterion})`,
    ...bandwidthChart(group, `sweep-${criterion}`),
  }));
}
