/**
 * The bank angles [rad] the time-to-bank criteria of some sets name (`params.bankAngle`), so
 * that the responses stage times exactly those. Worked out once per set (a resolved set never
 * changes).
 */
import type { ResolvedCriteriaSet } from '../types.js';

const bySet = new WeakMap<ResolvedCriteriaSet, number[]>();

export function bankAnglesOf(sets: readonly ResolvedCriteriaSet[]): number[] {
  const out: number[] = [];
  for (const set of sets) {
    let angles = bySet.get(set);
    if (angles === undefined) {
      angles = [];
      for (const c of set.criteria) {
        const a = c.params['bankAngle'];
        if (c.quantity === 'time_to_bank' && typeof a === 'number' && a > 0 && !angles.includes(a)) angles.push(a);
      }
      bySet.set(set, angles);
    }
    for (const a of angles) if (!out.includes(a)) out.push(a);
  }
  return out;
}
