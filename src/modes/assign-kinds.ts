/**
 * Assignment of mode kinds to the roots of one axis: of all ways to give each template at most
 * one candidate (a pair, a real root or two real roots, as the template allows), take the one
 * with the largest summed marking participation, each eigenvalue counting once (a pair counts
 * twice). The search is exhaustive (an axis has a handful of roots) and runs twice: once for
 * the best assignment, once for each kind's best rival, an assignment that gives that kind
 * other roots or none.
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
  const current = new Int32Array(templates.length); // bit mask of the roots given to each template
  const best = new Int32Array(templates.length);
  let bestTotal = -Infinity;
  const rival = new Float64Array(templates.length).fill(-Infinity);
  let pass: 'best' | 'rival' = 'best';

  const leaf = (total: number): void => {
    if (pass === 'best') {
      if (total > bestTotal) {
        bestTotal = total;
        best.set(current);
      }
      return;
    }
    for (let t = 0; t < templates.length; t += 1) {
      if (current[t] !== best[t] && total > rival[t]!) rival[t] = total;
    }
  };

  const walk = (t: number, used: number, total: number): void => {
    if (t === templates.length) {
      leaf(total);
      return;
    }
    current[t] = 0;
    walk(t + 1, used, total); // this mode absent
    if (!allowed[t]) return;
    const template = templates[t]!;
    const share = shares[t]!;
    for (let i = 0; i < roots.length; i += 1) {
      const bit = 1 << i;
      if ((used & bit) !== 0) continue;
      if (roots[i]!.oscillatory) {
        if (!template.forms.includes('pair')) continue;
        current[t] = bit;
        walk(t + 1, used | bit, total + 2 * share[i]!);
        continue;
      }
      if (template.forms.includes('real')) {
        current[t] = bit;
        walk(t + 1, used | bit, total + share[i]!);
      }
      if (template.forms.includes('two-real')) {
        for (let j = i + 1; j < roots.length; j += 1) {
          const bit2 = 1 << j;
          if ((used & bit2) !== 0 || roots[j]!.oscillatory) continue;
          current[t] = bit | bit2;
          walk(t + 1, used | bit | bit2, total + share[i]! + share[j]!);
        }
      }
    }
    current[t] = 0;
  };

  walk(0, 0, 0);
  pass = 'rival';
  walk(0, 0, 0);

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
