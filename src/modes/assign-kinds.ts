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

/**
 * The search is exponential in the number of roots; an axis of an aircraft model has a
 * handful (four or five), so beyond this many only the roots that best resemble some mode
 * are searched and the rest are left over (and reported by the caller).
 */
export const SEARCH_LIMIT = 8;

/**
 * A root with less than this share in a mode's marking states is not that mode at all; such
 * candidates are not considered, so that a root is left over (and reported) rather than
 * forced into a mode it does not resemble.
 */
export const MIN_CANDIDATE_SHARE = 0.1;

const PAIR = 1;
const REAL = 2;
const TWO_REAL = 4;
const FORM_BITS: Record<RootForm, number> = { pair: PAIR, real: REAL, 'two-real': TWO_REAL };

/** The state of one exhaustive search, passed down the recursion instead of captured. */
interface Search {
  rootCount: number;
  size: number;
  oscillatory: boolean[];
  /** per template, the forms it takes (PAIR | REAL | TWO_REAL), 0 when it cannot exist */
  forms: number[];
  /** marking share of root i for template t at t * rootCount + i */
  shares: number[];
  current: number[];
  leafMasks: number[];
  leafTotals: number[];
}

export function assignKinds(axisRoots: readonly Root[], templates: readonly ModeTemplate[]): AxisAssignment {
  const roots = axisRoots.length > SEARCH_LIMIT ? mostModeLike(axisRoots, templates) : axisRoots;
  const rootCount = roots.length;
  const size = templates.length;
  const search: Search = {
    rootCount,
    size,
    oscillatory: roots.map((r) => r.oscillatory),
    forms: new Array<number>(size),
    shares: new Array<number>(size * rootCount),
    current: new Array<number>(size).fill(0),
    leafMasks: [],
    leafTotals: [],
  };
  for (let t = 0; t < size; t += 1) {
    const template = templates[t]!;
    let forms = 0;
    if (template.needs === undefined || roots.some((r) => template.needs!.some((s) => r.states.includes(s)))) {
      for (const form of template.forms) forms |= FORM_BITS[form];
    }
    search.forms[t] = forms;
    for (let i = 0; i < rootCount; i += 1) search.shares[t * rootCount + i] = markShare(roots[i]!, template.marks);
  }
  walk(search, 0, 0, 0);

  const { leafMasks, leafTotals } = search;
  let bestLeaf = 0;
  for (let l = 1; l < leafTotals.length; l += 1) if (leafTotals[l]! > leafTotals[bestLeaf]!) bestLeaf = l;
  const bestTotal = leafTotals[bestLeaf]!;
  const picks: Candidate[] = [];
  const rivalTotals: number[] = [];
  for (let t = 0; t < size; t += 1) {
    const mask = leafMasks[bestLeaf * size + t]!;
    if (mask === 0) continue;
    let rival = -Infinity;
    for (let l = 0; l < leafTotals.length; l += 1) {
      if (leafMasks[l * size + t] !== mask && leafTotals[l]! > rival) rival = leafTotals[l]!;
    }
    const chosen: Root[] = [];
    let score = 0;
    for (let i = 0; i < rootCount; i += 1) {
      if ((mask & (1 << i)) === 0) continue;
      chosen.push(roots[i]!);
      score += (roots[i]!.oscillatory ? 2 : 1) * search.shares[t * rootCount + i]!;
    }
    const form: RootForm = chosen.length === 2 ? 'two-real' : chosen[0]!.oscillatory ? 'pair' : 'real';
    picks.push({ template: templates[t]!, form, roots: chosen, share: score / (form === 'real' ? 1 : 2), score });
    rivalTotals.push(rival);
  }
  return { picks, total: bestTotal, rivalTotals };
}

/** Give template t each allowed candidate of the unused roots in turn (or nothing), then recurse. */
function walk(search: Search, t: number, used: number, total: number): void {
  const { size, rootCount, current } = search;
  if (t === size) {
    for (let k = 0; k < size; k += 1) search.leafMasks.push(current[k]!);
    search.leafTotals.push(total);
    return;
  }
  current[t] = 0;
  walk(search, t + 1, used, total); // this mode absent
  const forms = search.forms[t]!;
  if (forms === 0) return;
  const base = t * rootCount;
  for (let i = 0; i < rootCount; i += 1) {
    const bit = 1 << i;
    if ((used & bit) !== 0) continue;
    const share = search.shares[base + i]!;
    if (share < MIN_CANDIDATE_SHARE) continue;
    if (search.oscillatory[i]) {
      if ((forms & PAIR) === 0) continue;
      current[t] = bit;
      walk(search, t + 1, used | bit, total + 2 * share);
      continue;
    }
    if ((forms & REAL) !== 0) {
      current[t] = bit;
      walk(search, t + 1, used | bit, total + share);
    }
    if ((forms & TWO_REAL) !== 0) {
      for (let j = i + 1; j < rootCount; j += 1) {
        const bit2 = 1 << j;
        if ((used & bit2) !== 0 || search.oscillatory[j] || search.shares[base + j]! < MIN_CANDIDATE_SHARE) continue;
        current[t] = bit | bit2;
        walk(search, t + 1, used | bit | bit2, total + share + search.shares[base + j]!);
      }
    }
  }
  current[t] = 0;
}

function mostModeLike(roots: readonly Root[], templates: readonly ModeTemplate[]): Root[] {
  const likeness = (root: Root) => Math.max(...templates.map((t) => markShare(root, t.marks)));
  return roots
    .map((root) => ({ root, like: likeness(root) }))
    .sort((a, b) => b.like - a.like)
    .slice(0, SEARCH_LIMIT)
    .map((entry) => entry.root);
}
