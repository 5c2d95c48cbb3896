/**
 * What the sweep covers, one row per flight phase: how many conditions, the airspeed and
 * altitude spans, and how many conditions end on each verdict (the worst of their findings).
 */
import type { ConditionResult, Verdict } from '../../types.js';
import { conditionVerdict } from '../condition-status.js';
import { categoryLabel } from '../labels.js';
import type { CoverageRow } from '../report-view.js';
import { VERDICT_ORDER, verdictMark } from '../verdict-marks.js';
import { sig } from '../view-format.js';

function span(values: number[], unit: string, format: (v: number) => string): string {
  if (values.length === 0) return 'not given';
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo === hi ? `${format(lo)}\u2009${unit}` : `${format(lo)} \u2026 ${format(hi)}\u2009${unit}`;
}

export function coverageRows(conditions: readonly ConditionResult[]): CoverageRow[] {
  const byPhase = new Map<string, ConditionResult[]>();
  for (const c of conditions) {
    const list = byPhase.get(c.phase);
    if (list) list.push(c);
    else byPhase.set(c.phase, [c]);
  }
  return [...byPhase.entries()].map(([phase, list]) => {
    const counts: Record<Verdict, number> = { fail: 0, marginal: 0, not_evaluated: 0, pass: 0 };
    for (const c of list) counts[conditionVerdict(c)] += 1;
    const categories = [...new Set(list.map((c) => categoryLabel(c.category)))].join(', ');
    const altitudes = list.map((c) => c.altitude).filter((a): a is number => a !== null);
    return {
      phase,
      category: categories,
      conditions: list.length,
      airspeed: span(list.map((c) => c.airspeed), 'm/s', (v) => sig(v, 3)),
      // whole metres, as in the condition tables
      altitude: span(altitudes, 'm', (v) => String(Math.round(v))) + (altitudes.length < list.length && altitudes.length > 0 ? ` (${list.length - altitudes.length} not given)` : ''),
      tally: VERDICT_ORDER.map((v) => ({ mark: verdictMark(v), count: counts[v] })),
    };
  });
}
