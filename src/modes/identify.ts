/**
 * Mode identification by participation factors and frequency, never by state position.
 *
 * 1. Each root goes to the state group holding most of its participation. Roots of "other"
 *    states (actuators, filters, engines) are `other`; roots of heading, position and height
 *    states are `kinematic` (a zero root of psi is never a spiral).
 * 2. On each axis the kinds are assigned by the search in assign-kinds.ts.
 * 3. The result is checked: characteristic states must hold at least half of the
 *    participation, no rival assignment may come close, the short period must be faster than
 *    the phugoid and the roll faster than the spiral. A failed check marks the mode ambiguous
 *    and a warning says why.
 */
import type { Complex, Mode, ModeKind } from '../types.js';
import { assignKinds, markShare, type Candidate } from './assign-kinds.js';
import {
  GROUP_WORDS,
  bankToSideslip,
  formatNumber,
  formatRoot,
  formLabel,
  frequencyRank,
  groupSummary,
  pct,
  rootSummary,
} from './basis-text.js';
import { flat } from '../flat-string.js';
import { geometricMean, modalFigures } from './modal-figures.js';
import { modeShape } from './mode-shape.js';
import { LATERAL_TEMPLATES, LONGITUDINAL_TEMPLATES, type ModeTemplate } from './mode-templates.js';
import { leastStable, type Root } from './roots.js';
import type { StateGroup } from './subsystems.js';

export interface IdentifyContext {
  /** [m/s] true airspeed, to express a v state as sideslip (beta = v / V) in the basis */
  airspeed: number;
}

export interface Identification {
  modes: Mode[];
  warnings: string[];
}

/** A root whose largest group holds less than this is split across groups. */
export const GROUP_DOMINANCE = 0.8;
/** Characteristic states holding less than this share leave the identification unclear. */
export const CLEAR_SHARE = 0.5;
/** A rival assignment closer than this (in eigenvalue-weighted participation) is a near tie. */
export const TIE_MARGIN = 0.2;
/** Both marks of a longitudinal pair within this band (around 50 %) signal a third oscillatory mode. */
const MIXED_PAIR_BAND = [0.3, 0.7] as const;

const KIND_WORDS: Record<ModeKind, string> = {
  short_period: 'short period',
  phugoid: 'phugoid',
  dutch_roll: 'Dutch roll',
  roll: 'roll',
  spiral: 'spiral',
  roll_spiral: 'roll-spiral',
  kinematic: 'kinematic',
  other: 'other',
};

const KIND_ORDER: readonly ModeKind[] = [
  'short_period',
  'phugoid',
  'dutch_roll',
  'roll',
  'spiral',
  'roll_spiral',
  'other',
  'kinematic',
];

export function identifyModes(roots: readonly Root[], context: IdentifyContext): Identification {
  const modes: Mode[] = [];
  const warnings: string[] = [];
  const axis: Record<StateGroup, Root[]> = { longitudinal: [], lateral: [], kinematic: [], other: [] };

  for (const root of roots) {
    const group = dominantGroup(root);
    const share = root.groupShare[group];
    axis[group].push(root);
    if (share < GROUP_DOMINANCE) {
      warnings.push(
        `root ${formatRoot(root.value)} is split across groups (${groupSummary(root)}); taken as ${GROUP_WORDS[group]}`,
      );
    }
  }

  for (const group of ['other', 'kinematic'] as const) {
    const kind: ModeKind = group;
    for (const root of axis[group]) {
      const zero = isNumericalZero(root, roots);
      const label = zero ? `real root at zero (|lambda| ${formatNumber(magnitude(root.value))})` : formLabel([root]);
      const basis = `${label}; ${rootSummary(root)}`;
      modes.push(buildMode(kind, [root], basis, root.groupShare[group] < GROUP_DOMINANCE));
    }
  }

  identifyAxis(axis.longitudinal, LONGITUDINAL_TEMPLATES, 'longitudinal', context, modes, warnings);
  identifyAxis(axis.lateral, LATERAL_TEMPLATES, 'lateral', context, modes, warnings);

  modes.sort(
    (a, b) =>
      KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) ||
      magnitude(b.eigenvalues[0]!) - magnitude(a.eigenvalues[0]!),
  );
  return { modes, warnings: warnings.map(flat) };
}

function identifyAxis(
  roots: Root[],
  templates: readonly ModeTemplate[],
  group: 'longitudinal' | 'lateral',
  context: IdentifyContext,
  modes: Mode[],
  warnings: string[],
): void {
  if (roots.length === 0) return;
  const best = assignKinds(roots, templates);
  const picks = best.picks;
  const doubts: string[][] = picks.map(() => []);

  for (let p = 0; p < picks.length; p += 1) {
    const pick = picks[p]!;
    if (pick.share < CLEAR_SHARE) {
      doubts[p]!.push(`its ${pick.template.label} states hold only ${pct(pick.share)} of the participation`);
    }
    const rival = best.rivalTotals[p]!;
    if (best.total - rival < TIE_MARGIN) {
      doubts[p]!.push(`a different choice of roots scores almost as well (${best.total.toFixed(2)} vs ${rival.toFixed(2)})`);
    }
  }
  checkOrder(picks, 'short_period', 'phugoid', doubts);
  checkOrder(picks, 'roll', 'spiral', doubts);
  if (group === 'longitudinal') checkThirdOscillatoryMode(roots, picks, doubts, warnings);

  const frequencies = picks.map((pick) => characteristicFrequency(pick.roots));
  for (let p = 0; p < picks.length; p += 1) {
    const pick = picks[p]!;
    const why = doubts[p]!;
    const kind = pick.template.kind;
    let ambiguous = why.length > 0;
    for (const root of pick.roots) if (root.groupShare[group] < GROUP_DOMINANCE) ambiguous = true;
    const lead = leastStable(pick.roots);
    let basis =
      `${formLabel(pick.roots)}; ${rootSummary(lead)}; ${pick.template.label} states hold ` +
      `${pct(pick.share)}; ${frequencyRank(frequencies, p, GROUP_WORDS[group])}`;
    if (kind === 'dutch_roll') basis += bankToSideslip(lead, context.airspeed);
    if (why.length > 0) {
      const reasons = why.join('; ');
      warnings.push(`${KIND_WORDS[kind]} identification is not clear-cut: ${reasons}`);
      basis += `; uncertain: ${reasons}`;
    }
    modes.push(buildMode(kind, pick.roots, basis, ambiguous));
  }

  for (const root of roots) {
    if (picks.some((pick) => pick.roots.includes(root))) continue;
    warnings.push(`${GROUP_WORDS[group]} root ${formatRoot(root.value)} fits none of the ${GROUP_WORDS[group]} modes; reported as other`);
    modes.push(buildMode('other', [root], `${formLabel([root])}; ${rootSummary(root)}; left over after the ${GROUP_WORDS[group]} modes were assigned`, true));
  }
}

/** The faster mode of a pair of kinds must have the higher characteristic frequency. */
function checkOrder(picks: readonly Candidate[], fast: ModeKind, slow: ModeKind, doubts: string[][]): void {
  const a = picks.findIndex((p) => p.template.kind === fast);
  const b = picks.findIndex((p) => p.template.kind === slow);
  if (a < 0 || b < 0) return;
  const fa = characteristicFrequency(picks[a]!.roots);
  const fb = characteristicFrequency(picks[b]!.roots);
  if (fa > fb) return;
  const text = `the ${KIND_WORDS[fast]} (${formatNumber(fa)} rad/s) is not faster than the ${KIND_WORDS[slow]} (${formatNumber(fb)} rad/s)`;
  doubts[a]!.push(text);
  doubts[b]!.push(text);
}

/**
 * Near neutral static stability one short-period root and one phugoid root can combine into a
 * "third oscillatory mode" (McRuer, Ashkenas and Graham, Aircraft Dynamics and Automatic
 * Control, 1973, ch. 5, from memory): one pair mixing both sets of states plus two real roots. Names then
 * stop meaning what the criteria assume.
 */
function checkThirdOscillatoryMode(
  roots: readonly Root[],
  picks: readonly Candidate[],
  doubts: string[][],
  warnings: string[],
): void {
  const pairs = roots.filter((r) => r.oscillatory);
  if (pairs.length !== 1 || roots.length - pairs.length < 2) return;
  const pair = pairs[0]!;
  const [spTemplate, phTemplate] = LONGITUDINAL_TEMPLATES;
  const sp = markShare(pair, spTemplate!.marks);
  const ph = markShare(pair, phTemplate!.marks);
  const [low, high] = MIXED_PAIR_BAND;
  if (sp < low || sp > high || ph < low || ph > high) return;
  const text =
    `the only longitudinal pair ${formatRoot(pair.value)} mixes ${spTemplate!.label} (${pct(sp)}) and ` +
    `${phTemplate!.label} (${pct(ph)}) motion beside real roots: the pattern of a third oscillatory mode near neutral static stability`;
  warnings.push(`longitudinal: ${text}`);
  for (const why of doubts) why.push('third oscillatory mode present');
}

function buildMode(kind: ModeKind, roots: readonly Root[], basis: string, ambiguous: boolean): Mode {
  // A split mode lists its least stable root first and shows its shape: it governs the response.
  const lead = leastStable(roots);
  let eigenvalues: Complex[];
  if (roots.length === 2) eigenvalues = [lead.value, (lead === roots[0] ? roots[1]! : roots[0]!).value];
  else if (lead.oscillatory) eigenvalues = [lead.value, { re: lead.value.re, im: -lead.value.im }];
  else eigenvalues = [lead.value];
  const figures = modalFigures(eigenvalues);
  const { referenceState, shape } = modeShape(lead, kind);
  return {
    kind,
    eigenvalues,
    naturalFrequency: figures.naturalFrequency,
    dampingRatio: figures.dampingRatio,
    dampedFrequency: figures.dampedFrequency,
    period: figures.period,
    timeConstant: figures.timeConstant,
    timeToHalf: figures.timeToHalf,
    timeToDouble: figures.timeToDouble,
    cyclesToHalf: figures.cyclesToHalf,
    basis: flat(basis),
    ambiguous,
    referenceState,
    shape,
    ...(kind === 'kinematic' || kind === 'other' ? {} : optional('inaccurate', accuracyLost(roots))),
  };
}

function optional<K extends string>(key: K, value: string | undefined): { [P in K]?: string } {
  return (value === undefined ? {} : { [key]: value }) as { [P in K]?: string };
}

function dominantGroup(root: Root): StateGroup {
  let best: StateGroup = 'longitudinal';
  for (const group of ['lateral', 'kinematic', 'other'] as const) {
    if (root.groupShare[group] > root.groupShare[best]) best = group;
  }
  return best;
}

/**
 * A root is zero when it is within 1e-9 of the spectral radius of zero, or within its own
 * rounding error bound: relative to the matrix, never in absolute terms, so that a model in
 * other time units (or scaled by 1e-300) has the same zero roots.
 */
function isNumericalZero(root: Root, all: readonly Root[]): boolean {
  let radius = 0;
  for (const r of all) radius = Math.max(radius, magnitude(r.value));
  const size = magnitude(root.value);
  return size <= 1e-9 * radius || size <= root.errorBound;
}

/** Relative rounding error above which a root's figures are not trusted for a verdict. */
const ACCURACY_LIMIT = 1e-3;

/** Why the figures of a mode's roots cannot be trusted, or undefined when they can. */
function accuracyLost(roots: readonly Root[]): string | undefined {
  for (const root of roots) {
    const size = magnitude(root.value);
    if (!(root.errorBound <= ACCURACY_LIMIT * size)) {
      const relative = size > 0 ? root.errorBound / size : Infinity;
      return `accuracy lost: the root ${formatRoot(root.value)} is known only to a relative error of ${formatNumber(relative)} (the model's entries span too wide a range for double precision); not evaluated`;
    }
  }
  return undefined;
}

/** [rad/s] |lambda| of a pair, sqrt|l1 l2| of two real roots, |lambda| of one real root */
function characteristicFrequency(roots: readonly Root[]): number {
  if (roots.length === 2) return geometricMean(roots[0]!.value.re, roots[1]!.value.re);
  return magnitude(roots[0]!.value);
}

function magnitude(z: Complex): number {
  return Math.hypot(z.re, z.im);
}
