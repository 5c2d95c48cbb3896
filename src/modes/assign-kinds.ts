/**
 * Assignment of mode kinds to the roots of one axis: of all ways to give each template at most
 * one candidate (a pair, a real root or two real roots, as the template allows), take the one
 * with the largest summed marking participation, each eigenvalue counting once (a pair counts
 * twice). The search is exhaustive (an axis has a handful of roots); every complete assignment
 * is kept so that each kind's best rival (an assignment giving that kind other roots or none)
 * can be found afterwards.
 */
import type { ModeTemplate, RootForm } from './mode-templates.js';
import type { Root } from './roots.js';

export interface Candidate {
  template: ModeTemplate;
  form: RootForm;
  roots: Root[];
  /** mean marking participation over the candidate's eigenvalues [-] */
  share: number;
  /** share times the number of eigenvalues */
  score: number;
}

export interface AxisAssignment {
  picks: Candidate[];
  /** summed score of the picks */
  total: number;
  /** per pick (same order), the total of its best rival; -Infinity when there is none */
  rivalTotals: number[];
}

/** Summed participation of the marking states in one root. */
export function markShare(root: Root, marks: readonly string[]): number {
  let sum = 0;
  for (let k = 0; k < root.states.length; k += 1) {
    if (marks.includes(root.states[k]!)) sum += root.participation[k]!;
  }
  return sum;
}

/** Roots are few (an axis has a handful); a bit mask per candidate keeps the search allocation-free. */
const MAX_ROOTS = 30;

export function assignKinds(roots: readonly Root[], templates: readonly ModeTemplate[]): AxisAssignment {
  if (roots.length > MAX_ROOTS) throw new RangeError(`too many roots on one axis (${roots.length})`);
  const shares = templates.map((t) => roots.map((root) => markShare(root, t.marks)));
  const allowed = templates.map(
    (t) => t.needs === undefined || roots.some((r) => t.needs!.some((s) => r.states.includes(s))),
  );
  const takesPair = templates.map((t) => t.forms.includes('pair'));
  const takesReal = templates.map((t) => t.forms.includes('real'));
  const takesTwoReal = templates.map((t) => t.forms.includes('two-real'));
  const oscillatory = roots.map((r) => r.oscillatory);
  const size = templates.length;
  const current: number[] = new Array<number>(size).fill(0); // bit mask of the roots given to each template
  const leafMasks: number[] = []; // every complete assignment, `size` masks each
  const leafTotals: number[] = [];

  const walk = (t: number, used: number, total: number): void => {
    if (t === size) {
      for (let k = 0; k < size; k += 1) leafMasks.push(current[k]!);
      leafTotals.push(total);
      return;
    }
    current[t] = 0;
    walk(t + 1, used, total); // this mode absent
    if (!allowed[t]) return;
    const share = shares[t]!;
    for (let i = 0; i < roots.length; i += 1) {
      const bit = 1 << i;
      if ((used & bit) !== 0) continue;
      if (oscillatory[i]) {
        if (!takesPair[t]) continue;
        current[t] = bit;
        walk(t + 1, used | bit, total + 2 * share[i]!);
        continue;
      }
      if (takesReal[t]) {
        current[t] = bit;
        walk(t + 1, used | bit, total + share[i]!);
      }
      if (takesTwoReal[t]) {
        for (let j = i + 1; j < roots.length; j += 1) {
          const bit2 = 1 << j;
          if ((used & bit2) !== 0 || oscillatory[j]) continue;
          current[t] = bit | bit2;
          walk(t + 1, used | bit | bit2, total + share[i]! + share[j]!);
        }
      }
    }
    current[t] = 0;
  };
  walk(0, 0, 0);

  let bestLeaf = 0;
  for (let l = 1; l < leafTotals.length; l += 1) if (leafTotals[l]! > leafTotals[bestLeaf]!) bestLeaf = l;
  const bestTotal = leafTotals[bestLeaf]!;
  const best = leafMasks.slice(bestLeaf * size, bestLeaf * size + size);
  const rival = new Array<number>(size).fill(-Infinity);
  for (let l = 0; l < leafTotals.length; l += 1) {
    for (let t = 0; t < size; t += 1) {
      if (leafMasks[l * size + t] !== best[t] && leafTotals[l]! > rival[t]!) rival[t] = leafTotals[l]!;
    }
  }

  const picks: Candidate[] = [];
  const rivalTotals: number[] = [];
  templates.forEach((template, t) => {
    const mask = best[t]!;
    if (mask === 0) return;
    const chosen = roots.filter((_, i) => (mask & (1 << i)) !== 0);
    const score = chosen.reduce((s, root) => s + (root.oscillatory ? 2 : 1) * shares[t]![roots.indexOf(root)]!, 0);
    const form: RootForm = chosen.length === 2 ? 'two-real' : chosen[0]!.oscillatory ? 'pair' : 'real';
    const count = form === 'real' ? 1 : 2;
    picks.push({ template, form, roots: chosen, share: score / count, score });
    rivalTotals.push(rival[t]!);
  });
  return { picks, total: bestTotal, rivalTotals };
}
