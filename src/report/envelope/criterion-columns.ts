/**
 * The criteria of a sweep as numbered columns: every criterion that made a finding or was
 * declared not applicable somewhere, grouped by mode (the order a handling-qualities review
 * reads them in) and numbered once, so that the verdict matrix and the worst-case table share
 * the numbers.
 */
import { weaker } from '../../criteria/evidence.js';
import type { ConditionResult, EvidenceClass, ModeKind, Quantity, ResolvedCriteriaSet } from '../../types.js';

export interface CriterionColumn {
  /** 1-based number printed in the matrix heading */
  number: number;
  /** set + id: ids are unique within a set only */
  key: string;
  id: string;
  set: string;
  title: string;
  source: string;
  /** the weakest evidence class of the boundaries its findings were judged against */
  evidence: EvidenceClass;
  mode: ModeKind;
  quantity: Quantity | null;
  /** unit of the findings' values, as the results give it ('' when unknown) */
  unit: string;
}

const MODE_ORDER: readonly ModeKind[] = ['short_period', 'phugoid', 'dutch_roll', 'roll', 'spiral', 'roll_spiral', 'other', 'kinematic'];

export function criterionKey(set: string, id: string): string {
  return `${set}\u0000${id}`;
}

export function criterionColumns(conditions: readonly ConditionResult[], sets: readonly ResolvedCriteriaSet[]): CriterionColumn[] {
  const declared = new Map<string, { mode: ModeKind; quantity: Quantity; evidence: EvidenceClass; title: string; source: string }>();
  for (const s of sets) {
    for (const c of s.criteria) {
      const d = { mode: c.mode, quantity: c.quantity, evidence: weaker(weaker(c.evidence['1'].class, c.evidence['2'].class), c.evidence['3'].class), title: c.title, source: c.source };
      declared.set(criterionKey(c.set, c.id), d);
      // A criterion inherited through `extends` may be reported under the child set's id.
      declared.set(criterionKey(s.id, c.id), d);
    }
  }
  const seen = new Map<string, Omit<CriterionColumn, 'number'> & { first: number }>();
  let order = 0;
  for (const c of conditions) {
    for (const f of c.findings) {
      const key = criterionKey(f.set, f.criterion);
      const known = seen.get(key);
      if (known) {
        known.evidence = weaker(known.evidence, f.evidence.class);
        continue;
      }
      seen.set(key, {
        key, id: f.criterion, set: f.set, title: f.title, source: f.source, evidence: f.evidence.class,
        mode: f.mode, quantity: f.quantity, unit: f.unit, first: order++,
      });
    }
    for (const n of c.notApplicable) {
      const key = criterionKey(n.set, n.criterion);
      if (seen.has(key)) continue;
      const d = declared.get(key);
      seen.set(key, {
        key, id: n.criterion, set: n.set, title: n.title, source: n.source, evidence: d?.evidence ?? 'memory',
        mode: d?.mode ?? 'other', quantity: d?.quantity ?? null, unit: '', first: order++,
      });
    }
  }
  const rank = (m: ModeKind) => MODE_ORDER.indexOf(m);
  return [...seen.values()]
    .sort((a, b) => rank(a.mode) - rank(b.mode) || a.first - b.first)
    .map(({ first: _first, ...col }, i) => ({ ...col, number: i + 1 }));
}
