/**
 * What would move it: for each chosen finding, the derivative of its value with respect to
 * every number of the model as written, the five with the largest normalised influence, and
 * for each of them the change that reaches the boundary, verified by re-analysis.
 *
 * d value / d p = d value / d lambda . y^T (dA/dp) x / (y^T x) (figure-slope.ts,
 * root-vectors.ts), where dA/dp is taken through the pure model build (rebuild.ts) by a
 * central difference: the build is a rational function of each written number, exact or
 * nearly so to first order, while the eigen-analysis, which is not, is differentiated
 * analytically. A boundary that itself moves with the model (the omega_n^2 |phi/beta| rise of
 * MIL-F-8785C 3.3.1.1) is held where it is for the ranking; the re-analysis sees it move.
 * Pure: no file, clock or randomness.
 */
import { nOverAlpha } from '../criteria/derived-figures.js';
import { evaluateCondition, type ConditionEvaluation } from '../criteria/evaluate.js';
import { bandAround } from '../criteria/verdict.js';
import { InternalError } from '../errors.js';
import { identifyModes } from '../modes/identify.js';
import { collectRoots } from '../modes/roots.js';
import { splitSubsystems } from '../modes/subsystems.js';
import type {
  AircraftClass,
  Complex,
  Finding,
  FlightCondition,
  ModalAnalysis,
  Mode,
  ResolvedCriteriaSet,
  Sensitivity,
  SensitivityChoice,
} from '../types.js';
import { figureSlope, MODAL_QUANTITIES, type NAlphaSlope } from './figure-slope.js';
import { rebuildWith, rebuiltWith } from './rebuild.js';
import { eigenvalueChange, rootVectors, type RootVectors, type SparseEntry } from './root-vectors.js';
import { searchBoundary, type Trial } from './to-boundary.js';
import { writtenNumbers, type NumberPath } from './written-numbers.js';

/** How many numbers are kept per finding, by influence. */
export const TOP = 5;
/** Relative step of the central difference of the build. */
const BUILD_STEP = 1e-6;
/** Eigenvalue condition number ||y|| ||x|| / |y^T x| above which a root counts as nearly defective. */
export const DEFECTIVE_CONDITION = 1e6;
/** Roots closer than this (relative to their size) count as repeated. */
const REPEATED = 1e-6;
/** |p dv/dp| below this fraction of the value is rounding, not influence. */
const NEGLIGIBLE = 1e-10;

export interface SensitivityInput {
  aircraftClass: AircraftClass;
  condition: FlightCondition;
  analysis: ModalAnalysis;
  set: ResolvedCriteriaSet;
  evaluation: ConditionEvaluation;
  choice: SensitivityChoice;
}

/** The evaluation with `sensitivities` (or a `sensitivityNote`) on each chosen finding. */
export function withSensitivities(input: SensitivityInput): ConditionEvaluation {
  const { evaluation, choice } = input;
  if (choice === 'none') return evaluation;
  const chosen = evaluation.findings.map((f) => f.value !== null && f.basis === undefined && f.verdict !== 'not_evaluated' && (choice === 'all' || f.verdict !== 'pass'));
  if (!chosen.includes(true)) return evaluation;
  const source = input.condition.written;
  const slopes = source ? buildSlopes(input.condition) : null;
  // several criteria look at one mode: its vectors are found once
  const vectorsOf = new Map<Mode, ReturnType<typeof defective>>();
  const findings = evaluation.findings.map((finding, index) => {
    if (!chosen[index]) return finding;
    if (slopes === null) return { ...finding, sensitivities: [], sensitivityNote: 'not computed: the condition as written is not at hand' };
    return forFinding(input, finding, index, slopes, vectorsOf);
  });
  return { ...evaluation, findings };
}

/** dA/dp and d(n/alpha)/dp for one written number. */
interface BuildSlope {
  path: NumberPath;
  name: string;
  current: number;
  /** [SI per file's unit] the entries of dA/dp that are not 0 (a state-space entry has one) */
  dA: SparseEntry[];
  nAlpha: number | null;
}

/** The build differentiated once per condition for every written number that moves A or n/alpha. */
function buildSlopes(condition: FlightCondition): BuildSlope[] {
  const source = condition.written!;
  const out: BuildSlope[] = [];
  for (const number of writtenNumbers(source)) {
    // a number written as 0 has no normalised influence and no change "within double" of it
    if (number.value === 0) continue;
    const h = BUILD_STEP * Math.abs(number.value);
    // the build is linear in a state-space entry (shape checks, unit scaling, placement), so a
    // one-sided difference is exact there; elsewhere it is central
    const linear = isStateSpaceEntry(number.path);
    const up = rebuiltWith(source, number.path, number.value + h);
    const down = linear ? { system: condition.system, nAlpha: condition.nAlpha, airspeed: condition.airspeed, liftData: condition.liftData } : rebuiltWith(source, number.path, number.value - h);
    if (up === null || down === null || up.system.states.length !== condition.system.states.length) continue;
    const span = linear ? h : 2 * h;
    const dA: SparseEntry[] = [];
    const n = up.system.A.length;
    for (let i = 0; i < n; i += 1) {
      const rowUp = up.system.A[i]!;
      const rowDown = down.system.A[i]!;
      for (let j = 0; j < n; j += 1) {
        const d = (rowUp[j]! - rowDown[j]!) / span;
        if (d !== 0) dA.push({ i, j, d });
      }
    }
    const nUp = nOverAlpha(up).value;
    const nDown = nOverAlpha(down).value;
    const nAlpha = nUp !== null && nDown !== null ? (nUp - nDown) / span : null;
    if (dA.length === 0 && !nAlpha) continue;
    out.push({ path: number.path, name: number.name, current: number.value, dA, nAlpha });
  }
  return out;
}

/** A number inside a state matrix as written: `stateSpace.A[i][j]`, at the top or in an axis. */
function isStateSpaceEntry(path: NumberPath): boolean {
  const k = path.length;
  return k >= 4 && path[k - 4] === 'stateSpace' && path[k - 3] === 'A' && typeof path[k - 2] === 'number' && typeof path[k - 1] === 'number';
}

function forFinding(
  input: SensitivityInput,
  finding: Finding,
  index: number,
  slopes: BuildSlope[],
  vectorsOf: Map<Mode, ReturnType<typeof defective>>,
): Finding {
  const { condition, analysis } = input;
  if (!MODAL_QUANTITIES.has(finding.quantity)) {
    return { ...finding, sensitivities: [], sensitivityNote: 'not computed: sensitivities cover the figures of the modes, not yet those of the responses' };
  }
  const zero = (mode: Mode) => mode.eigenvalues.map(() => ({ re: 0, im: 0 }));
  const nAlphaNow = nOverAlpha(condition).value;
  const nAlphaAt = (d: number | null): NAlphaSlope => (nAlphaNow === null ? null : { value: nAlphaNow, derivative: d ?? 0 });
  // the mode this finding was made from: the one whose roots give its value
  const mode = analysis.modes.find((m) => {
    if (m.kind !== finding.mode) return false;
    const v = figureSlope(finding.quantity, m.eigenvalues, zero(m), nAlphaAt(0))?.value;
    return v !== undefined && Math.abs(v - finding.value!) <= 1e-9 * Math.max(1, Math.abs(v));
  });
  if (mode === undefined) return { ...finding, sensitivities: [], sensitivityNote: 'not computed: the value does not come from the roots of a mode alone' };

  const roots = mode.eigenvalues;
  let defect = vectorsOf.get(mode);
  if (defect === undefined) {
    defect = defective(condition.system.A, roots, analysis);
    vectorsOf.set(mode, defect);
  }
  if ('note' in defect) return { ...finding, sensitivities: [], sensitivityNote: defect.note };

  const target = targetOf(input, finding);
  if (target === null) return { ...finding, sensitivities: [], sensitivityNote: 'not computed: no boundary of the required level to move towards' };

  const ranked: { slope: BuildSlope; derivative: number; influence: number }[] = [];
  for (const slope of slopes) {
    const changes: Complex[] = [];
    for (const v of defect.vectors) {
      // a pair's second root moves as the conjugate of the first
      changes.push(v === null ? conjugate(changes[changes.length - 1]!) : eigenvalueChange(v, slope.dA));
    }
    const figure = figureSlope(finding.quantity, roots, changes, nAlphaAt(slope.nAlpha));
    if (figure === null || !Number.isFinite(figure.derivative)) continue;
    // a change of the value below rounding (a number that does not reach this mode) is no influence
    const change = Math.abs(slope.current * figure.derivative);
    if (!(change > NEGLIGIBLE * Math.max(Math.abs(figure.value), target.distance))) continue;
    const influence = change / target.distance;
    ranked.push({ slope, derivative: figure.derivative, influence });
  }
  ranked.sort((x, y) => y.influence - x.influence);

  const sensitivities: Sensitivity[] = ranked.slice(0, TOP).map(({ slope, derivative, influence }) => {
    const outcome = searchBoundary({
      current: slope.current,
      slope: target.side * derivative,
      margin: finding.margin!,
      target: target.margin,
      beyond: finding.verdict !== 'pass',
      tolerance: target.tolerance,
      analyse: (value) => reanalyse(input, finding, index, slope.path, value),
    });
    const entry: Sensitivity = { parameter: slope.name, current: slope.current, derivative, influence, toBoundary: outcome.toBoundary };
    if (outcome.toBoundary === null) entry.reason = outcome.reason;
    return entry;
  });
  return sensitivities.length > 0
    ? { ...finding, sensitivities }
    : { ...finding, sensitivities, sensitivityNote: 'no number of the model moves this value' };
}

function conjugate(z: Complex): Complex {
  return { re: z.re, im: -z.im };
}

/**
 * The vectors of each root of the mode (null for a pair's conjugate root), or why the
 * sensitivity is not defined: a repeated root, or one whose eigenvalue condition number marks
 * it as nearly defective (its derivative grows without bound as the root becomes defective).
 */
function defective(
  A: readonly (readonly number[])[],
  roots: readonly Complex[],
  analysis: ModalAnalysis,
): { vectors: (RootVectors | null)[] } | { note: string } {
  const all: Complex[] = analysis.modes.flatMap((m) => m.eigenvalues);
  const vectors: (RootVectors | null)[] = [];
  for (let k = 0; k < roots.length; k += 1) {
    const root = roots[k]!;
    if (root.im < 0) {
      vectors.push(null);
      continue;
    }
    const size = Math.hypot(root.re, root.im);
    const close = all.filter((z) => Math.hypot(z.re - root.re, z.im - root.im) <= REPEATED * Math.max(size, 1e-12));
    // the root itself is among them once
    if (close.length > 1) return { note: `not defined: the root ${show(root)} is repeated or nearly so (a defective mode has no derivative)` };
    const v = rootVectors(A, root);
    if (!(v.conditionNumber <= DEFECTIVE_CONDITION)) {
      return { note: `not defined: the root ${show(root)} is nearly defective (eigenvalue condition number ${v.conditionNumber.toExponential(1)} > ${DEFECTIVE_CONDITION.toExponential(0)})` };
    }
    vectors.push(v);
  }
  return { vectors };
}

/**
 * How close to the target a verified change must come, as a fraction of the marginal band:
 * a failing finding then lands inside the required level within 5 % of the band's width
 * (0.5 % of the boundary with the usual 10 % band), a marginal one as far beyond the band.
 */
const CLOSE_ENOUGH = 0.05;

interface Target {
  /** +1: the governing boundary is a minimum (margin = value - min), -1: a maximum */
  side: 1 | -1;
  /** margin to reach */
  margin: number;
  /** [unit of the quantity] |margin now - target| (> 0) */
  distance: number;
  tolerance: number;
}

/** Where the finding should go: a failing or passing one to the boundary of the required level, a marginal one out of the band. */
function targetOf({ set, evaluation }: SensitivityInput, finding: Finding): Target | null {
  const { margin, value } = finding;
  if (margin === null || value === null) return null;
  const bound = finding.bounds[String(evaluation.requiredLevel) as '1' | '2' | '3'];
  if (bound === undefined) return null;
  const fromMin = bound.min !== undefined ? value - bound.min : undefined;
  const fromMax = bound.max !== undefined ? bound.max - value : undefined;
  const side: 1 | -1 = fromMin !== undefined && Math.abs(fromMin - margin) <= 1e-12 * Math.max(1, Math.abs(margin)) ? 1 : -1;
  if (side === -1 && fromMax === undefined) return null;
  const boundary = side === 1 ? bound.min! : bound.max!;
  const band = bandAround(boundary, { quantity: finding.quantity, band: set.marginalBand });
  const goal = finding.verdict === 'marginal' ? band : 0;
  const distance = Math.abs(goal - margin);
  const scale = band > 0 ? band : Math.max(Math.abs(boundary), Math.abs(value), 1e-9) * 0.1;
  return { side, margin: goal, distance: distance > 0 ? distance : scale * 1e-9, tolerance: CLOSE_ENOUGH * scale };
}

/** The finding again, with the number at `path` set to `value`: rebuild, analyse, evaluate. */
function reanalyse(input: SensitivityInput, finding: Finding, index: number, path: NumberPath, value: number): Trial | null {
  const { condition, set, aircraftClass, evaluation } = input;
  const rebuilt = rebuildWith(condition, condition.written!, path, value);
  if (rebuilt === null) return null;
  let analysis: ModalAnalysis;
  let again: ConditionEvaluation;
  try {
    // the modes as analyseModes finds them, without the coupling measure (a warning only)
    const { states, A } = rebuilt.system;
    const modes = identifyModes(collectRoots(A, states).roots, { airspeed: rebuilt.airspeed }).modes;
    analysis = { subsystems: splitSubsystems(states), coupling: 0, decoupled: true, modes, warnings: [] };
    again = evaluateCondition({ aircraftClass, condition: rebuilt, analysis, set: onlyCriterion(set, finding.criterion) });
  } catch (err) {
    if (err instanceof InternalError) return null;
    throw err;
  }
  // the same criterion on the same mode kind, the same one of them when there are several
  const same = (f: Finding) => f.criterion === finding.criterion && f.set === finding.set && f.mode === finding.mode;
  const ordinal = evaluation.findings.slice(0, index).filter(same).length;
  const match = again.findings.filter(same)[ordinal];
  if (match === undefined || match.value === null || match.margin === null || match.verdict === 'not_evaluated') return null;
  return { value: match.value, margin: match.margin, level: match.level, verdict: match.verdict };
}

/**
 * The set with only one of its criteria, made once per set and criterion: a re-analysis
 * needs one finding, and a resolved set is never changed after it is resolved.
 */
const single = new WeakMap<ResolvedCriteriaSet, Map<string, ResolvedCriteriaSet>>();

function onlyCriterion(set: ResolvedCriteriaSet, id: string): ResolvedCriteriaSet {
  let byId = single.get(set);
  if (byId === undefined) {
    byId = new Map();
    single.set(set, byId);
  }
  let one = byId.get(id);
  if (one === undefined) {
    one = { ...set, criteria: set.criteria.filter((c) => c.id === id) };
    byId.set(id, one);
  }
  return one;
}

function show(z: Complex): string {
  return z.im === 0 ? z.re.toPrecision(4) : `${z.re.toPrecision(4)} ${z.im < 0 ? '-' : '+'} ${Math.abs(z.im).toPrecision(4)}i`;
}
