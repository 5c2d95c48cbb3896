/**
 * The worst case of each criterion over the sweep: the failed finding furthest outside its
 * boundary, else the marginal one closest to it, else a not-evaluated one, else the pass with
 * the smallest margin. Margins of one criterion share one quantity and unit, so they compare.
 */
import type { ConditionResult, Finding } from '../../types.js';
import { QUANTITY_LABEL, QUANTITY_UNIT } from '../labels.js';
import type { WorstCaseRow } from '../report-view.js';
import { VERDICT_ORDER, verdictMark } from '../verdict-marks.js';
import { signedSig, sig, unitText } from '../view-format.js';
import { type CriterionColumn, criterionKey } from './criterion-columns.js';

interface Candidate {
  index: number;
  finding: Finding;
}

/** Lower is worse: verdict first (VERDICT_ORDER), then the signed margin. */
function worse(a: Candidate, b: Candidate): boolean {
  const ra = VERDICT_ORDER.indexOf(a.finding.verdict);
  const rb = VERDICT_ORDER.indexOf(b.finding.verdict);
  if (ra !== rb) return ra < rb;
  const ma = a.finding.margin ?? Number.POSITIVE_INFINITY;
  const mb = b.finding.margin ?? Number.POSITIVE_INFINITY;
  return ma < mb;
}

export function worstCases(
  conditions: readonly ConditionResult[],
  columns: readonly CriterionColumn[],
  anchorOf: (index: number) => string | null,
): WorstCaseRow[] {
  const stats = new Map<string, { counts: WorstCaseRow['counts']; evaluated: number; worst: Candidate | null }>();
  for (const col of columns) {
    stats.set(col.key, { counts: { fail: 0, marginal: 0, notEvaluated: 0, pass: 0, notApplicable: 0 }, evaluated: 0, worst: null });
  }
  conditions.forEach((c, index) => {
    const counted = new Set<string>();
    for (const f of c.findings) {
      const s = stats.get(criterionKey(f.set, f.criterion));
      if (!s) continue;
      if (f.verdict === 'not_evaluated') s.counts.notEvaluated += 1;
      else s.counts[f.verdict] += 1;
      const key = criterionKey(f.set, f.criterion);
      if (!counted.has(key)) {
        counted.add(key);
        s.evaluated += 1;
      }
      const candidate = { index, finding: f };
      if (s.worst === null || worse(candidate, s.worst)) s.worst = candidate;
    }
    for (const n of c.notApplicable) {
      const s = stats.get(criterionKey(n.set, n.criterion));
      if (s) s.counts.notApplicable += 1;
    }
  });
  return columns.map((col) => {
    const s = stats.get(col.key)!;
    const unit = unitText(col.unit || (col.quantity ? QUANTITY_UNIT[col.quantity] : ''));
    const w = s.worst;
    return {
      number: col.number,
      criterion: col.id,
      set: col.set,
      title: col.title,
      source: col.source,
      evidence: col.evidence,
      quantity: col.quantity ? QUANTITY_LABEL[col.quantity] : '\u2013',
      unit,
      evaluated: s.evaluated,
      counts: s.counts,
      worst: w === null ? null : {
        condition: conditions[w.index]!.id,
        anchor: anchorOf(w.index),
        value: sig(w.finding.value),
        margin: signedSig(w.finding.margin),
        mark: verdictMark(w.finding.verdict),
      },
    };
  });
}
