/**
 * Evaluate one flight condition against a resolved criteria set: phase -> category, required
 * level, then one finding per applicable criterion and matching mode. Pure.
 */
import { InputError } from '../errors.js';
import type {
  AircraftClass,
  Category,
  ConditionResponses,
  Finding,
  FlightCondition,
  Level,
  ModalAnalysis,
  Mode,
  ModeKind,
  ResolvedCriteriaSet,
  ResolvedCriterion,
  NotApplicable,
  EquivalentSystem,
} from '../types.js';
import { flat } from '../flat-string.js';
import { AXIS_MODE, equivalentBasis, equivalentMode } from '../equivalent/equivalent-mode.js';
import { evaluators, isResponseRow, type CriterionArgs as OneArgs, type ResponseFigures } from './evaluators.js';
import { findingEvidence } from './evidence.js';
import { judged, notEvaluated } from './finding.js';
import { expandedLevelsOf, expandLevels, levelKey } from './level-bounds.js';
import { judgeRegion } from './region-verdict.js';
import { judge } from './verdict.js';

export interface ConditionEvaluation {
  category: Category | null;
  requiredLevel: Level;
  requiredLevelFrom: 'model' | 'criteria default';
  findings: Finding[];
  /** applicable criteria that make no finding here, with the reason (e.g. the mode they govern is absent by design) */
  notApplicable: NotApplicable[];
  warnings: string[];
}

export function evaluateCondition(input: {
  aircraftClass: AircraftClass;
  condition: FlightCondition;
  analysis: ModalAnalysis;
  set: ResolvedCriteriaSet;
  /** the responses to the cockpit controls; absent or null when the condition names none */
  responses?: ConditionResponses | null;
  /** equivalent systems fitted for the condition's controls; each also goes through the modal criteria */
  equivalentSystems?: readonly EquivalentSystem[];
  /** bandwidth and phase delay, for the region criteria */
  responseFigures?: ResponseFigures;
  /** set when the condition has no model to take roots from (e.g. frequency responses only): why the modal criteria are not evaluated */
  noModes?: string;
}): ConditionEvaluation {
  const { aircraftClass, condition, analysis, set } = input;
  const responses = input.responses ?? null;
  const equivalents = input.equivalentSystems ?? [];
  const category = set.phaseCategories[condition.phase];
  if (category === undefined) {
    const known = Object.keys(set.phaseCategories);
    throw new InputError([
      {
        ...condition.place,
        field: 'phase',
        message: `condition '${condition.id}': flight phase '${condition.phase}' has no category in criteria set '${set.id}'`,
        expected: known.length > 0 ? known.join(' | ') : 'a phase listed under phaseCategories of the criteria set',
        found: JSON.stringify(condition.phase),
        code: 'unknown_phase',
      },
    ]);
  }
  const requiredLevel = condition.requiredLevel ?? set.defaultRequiredLevel;
  const requiredLevelFrom = condition.requiredLevel !== null ? 'model' : 'criteria default';
  const warnings: string[] = [];
  const findings: Finding[] = [];
  const notApplicable: NotApplicable[] = [];

  for (const criterion of selection(set, aircraftClass, category, condition.phase).criteria) {
    const altitude = altitudeApplies(criterion, condition);
    if (altitude === 'outside') continue;
    if (altitude === 'unknown') {
      findings.push(notEvaluatedHere(criterion, requiredLevel, `the criterion applies by altitude and condition '${condition.id}' gives no altitude`));
      continue;
    }
    const row = evaluators[criterion.quantity];
    if (isResponseRow(row)) {
      // a model that names no cockpit controls asks for modes only: said, never passed
      if (responses === null) {
        notApplicable.push({ criterion: criterion.id, set: criterion.set, title: criterion.title, source: criterion.source, reason: NO_CONTROLS });
        continue;
      }
      findings.push(evaluateOne({ criterion, mode: null, condition, analysis, aircraftClass, requiredLevel, set, responses }));
      continue;
    }
    const common = { condition, analysis, aircraftClass, requiredLevel, set, responses, ...(input.responseFigures ? { responseFigures: input.responseFigures } : {}) };
    if (row.from === 'response' || criterion.region) {
      // a criterion of augmented aircraft: no pitch response, nothing to judge (the pipeline
      // warns where the model looks augmented but names no controls)
      if (!input.responseFigures?.pitch) continue;
      findings.push(criterion.region ? judgeRegion({ criterion, ...common }) : evaluateResponse({ criterion, ...common }));
      continue;
    }
    const fitted = equivalents.filter((e) => AXIS_MODE[e.axis] === criterion.mode);
    if (row.from === 'equivalent') {
      // likewise: an equivalent-system criterion makes no finding where no system was fitted
      for (const e of fitted) findings.push(evaluateEquivalent({ criterion, ...common, equivalent: e }));
      continue;
    }
    // modal criteria: the raw roots, then the equivalent system of the axis where one is fitted
    const withEquivalents = () => {
      for (const e of fitted) findings.push(evaluateEquivalent({ criterion, ...common, equivalent: e }));
    };
    if (input.noModes !== undefined) {
      findings.push(notEvaluatedHere(criterion, requiredLevel, input.noModes));
      withEquivalents();
      continue;
    }
    const modes: Mode[] = [];
    for (const m of analysis.modes) if (m.kind === criterion.mode) modes.push(m);
    const absentMeans = criterion.params['notApplicableIfModeAbsent'];
    if (modes.length === 0 && typeof absentMeans === 'string') {
      notApplicable.push({ criterion: criterion.id, set: criterion.set, title: criterion.title, source: criterion.source, reason: absentMeans });
      withEquivalents();
      continue;
    }
    if (modes.length === 0) {
      findings.push(notEvaluatedHere(criterion, requiredLevel, absentModeReason(criterion, analysis)));
      withEquivalents();
      continue;
    }
    if (modes.length > 1) {
      warnings.push(`${modes.length} modes identified as ${criterion.mode}: criterion ${criterion.id} is evaluated for each`);
    }
    for (const mode of modes) {
      // figures that rounding has made meaningless get no verdict, whatever their value
      if (mode.inaccurate !== undefined) findings.push(notEvaluatedHere(criterion, requiredLevel, mode.inaccurate));
      else findings.push(evaluateOne({ criterion, mode, condition, analysis, aircraftClass, requiredLevel, set, responses }));
    }
    withEquivalents();
  }
  warnings.push(...uncoveredModes(set, analysis, aircraftClass, category, condition.phase));
  return { category, requiredLevel, requiredLevelFrom, findings, notApplicable, warnings: warnings.map(flat) };
}

/**
 * A dynamic mode that no applicable criterion looks at is said out loud (e.g. a coupled
 * roll-spiral oscillation in a Category A phase), so that silence is never read as a pass.
 */
function uncoveredModes(
  set: ResolvedCriteriaSet,
  analysis: ModalAnalysis,
  aircraftClass: AircraftClass,
  category: Category,
  phase: string,
): string[] {
  const { covered } = selection(set, aircraftClass, category, phase);
  const out: string[] = [];
  const seen: ModeKind[] = [];
  for (const { kind } of analysis.modes) {
    if (kind === 'kinematic' || kind === 'other' || covered.has(kind) || seen.includes(kind)) continue;
    seen.push(kind);
    out.push(`no criterion of set '${set.id}' applies to the ${kind} mode in Category ${category} (phase ${phase}): it is not checked`);
  }
  return out;
}

interface Selection {
  /** the criteria of the set that apply, in the set's order */
  criteria: readonly ResolvedCriterion[];
  /** the mode kinds they look at */
  covered: ReadonlySet<ModeKind>;
}

/**
 * The criteria that apply to a class, category and phase, worked out once per set: a sweep
 * has thousands of conditions and a handful of such selections. A resolved set is never
 * changed after it is resolved, which is what keeps the cached selection valid.
 */
const selections = new WeakMap<ResolvedCriteriaSet, Map<string, Selection>>();

function selection(set: ResolvedCriteriaSet, aircraftClass: AircraftClass, category: Category, phase: string): Selection {
  let bySelection = selections.get(set);
  if (bySelection === undefined) {
    bySelection = new Map();
    selections.set(set, bySelection);
  }
  const key = `${aircraftClass}\n${category}\n${phase}`;
  let found = bySelection.get(key);
  if (found === undefined) {
    const criteria = set.criteria.filter((c) => selects(c, aircraftClass, category, phase));
    found = { criteria, covered: new Set(criteria.map((c) => c.mode)) };
    bySelection.set(key, found);
  }
  return found;
}

function selects(c: ResolvedCriterion, aircraftClass: AircraftClass, category: Category, phase: string): boolean {
  const { classes, categories, phases } = c.applies;
  return (
    (classes === undefined || classes.includes(aircraftClass)) &&
    (categories === undefined || categories.includes(category)) &&
    (phases === undefined || phases.includes(phase))
  );
}

function altitudeApplies(c: ResolvedCriterion, condition: FlightCondition): 'inside' | 'outside' | 'unknown' {
  const band = c.applies.altitude;
  if (band === undefined) return 'inside';
  if (condition.altitude === null) return 'unknown';
  if (band.below !== undefined && !(condition.altitude < band.below)) return 'outside';
  if (band.atOrAbove !== undefined && !(condition.altitude >= band.atOrAbove)) return 'outside';
  return 'inside';
}

const NO_CONTROLS = 'the condition names no cockpit controls (a response criterion needs them, e.g. controls.roll with max for roll performance)';

function absentModeReason(c: ResolvedCriterion, analysis: ModalAnalysis): string {
  const written = c.params['ifModeAbsent'];
  if (typeof written === 'string') return written;
  const coupled = analysis.modes.some((m) => m.kind === 'roll_spiral');
  if (coupled && (c.mode === 'roll' || c.mode === 'spiral')) {
    return `no ${c.mode} mode: the roll and spiral roots form a coupled roll-spiral oscillation (see the roll-spiral criterion)`;
  }
  return `no ${c.mode} mode identified in this condition`;
}

/** A finding with nothing evaluated: no value, so not_evaluated, with the reason. */
function notEvaluatedHere(c: ResolvedCriterion, requiredLevel: Level, reason: string): Finding {
  return notEvaluated(c, expandedLevelsOf(c.levels), findingEvidence(c, requiredLevel, false), reason, undefined);
}


/**
 * A criterion judged on the figures of an equivalent system. A fit beyond the mismatch
 * guidance is not used: its figure is shown, the verdict is not_evaluated, and the reason says so.
 */
function evaluateEquivalent(args: OneArgs & { equivalent: EquivalentSystem }): Finding {
  const mode = equivalentMode(args.equivalent);
  const finding = evaluateOne({ ...args, mode });
  finding.basis = equivalentBasis(args.equivalent);
  if (!args.equivalent.valid && finding.verdict !== 'not_evaluated') {
    finding.verdict = 'not_evaluated';
    finding.level = null;
    finding.margin = null;
    finding.reason = flat(`the equivalent system is not valid (${args.equivalent.remarks.join('; ')}): its figure is shown, not judged`);
  }
  return finding;
}

/** A criterion on a response figure (no mode): judged once per condition. */
function evaluateResponse(args: OneArgs): Finding {
  return evaluateOne({ ...args, mode: NO_MODE });
}

/** The mode argument of response rows, which do not read it. */
const NO_MODE: Mode = {
  kind: 'other', eigenvalues: [], naturalFrequency: null, dampingRatio: null, dampedFrequency: null, period: null,
  timeConstant: null, timeToHalf: null, timeToDouble: null, cyclesToHalf: null, basis: '', ambiguous: false, referenceState: '', shape: [],
};

function evaluateOne(args: OneArgs & { mode: Mode | null; equivalent?: EquivalentSystem }): Finding {
  const { criterion, mode, requiredLevel, set } = args;
  const row = evaluators[criterion.quantity];
  const result = isResponseRow(row) ? row.evaluateResponses(args) : mode ? row.evaluate(mode, args) : { value: null, reason: 'no mode' };
  const levels = result.adjustedBounds ?? criterion.levels;
  const bounds = levels === criterion.levels ? expandedLevelsOf(levels) : expandLevels(levels);
  const evidence = findingEvidence(criterion, requiredLevel, levels !== criterion.levels && adjustedAt(criterion, bounds, requiredLevel));
  const ambiguity = mode?.ambiguous ? ' (mode identification not clear-cut)' : '';
  const method = result.method;
  const divergentDamping = row.damping && result.divergent === true;
  const allowedFrom = criterion.params['divergenceAllowedFromLevel'];
  const bestReachable: Level | null = divergentDamping ? (allowedFrom === 2 || allowedFrom === 3 ? allowedFrom : null) : 1;

  if (result.value === null) {
    if (divergentDamping && bestReachable === null) {
      const reason = `${result.reason ?? 'divergent mode'}: a divergent mode fails the damping criterion${ambiguity}`;
      return judged(criterion, bounds, evidence, null, null, 'fail', null, reason, method);
    }
    return notEvaluated(criterion, bounds, evidence, `${result.reason ?? 'no value'}${ambiguity}`, method);
  }
  const judgement = judge({
    value: result.value,
    bounds,
    requiredLevel,
    quantity: criterion.quantity,
    band: set.marginalBand,
    strict: criterion.params['strictBounds'] === true,
    bestReachable,
  });
  const finite = Number.isFinite(result.value);
  let reason = judgement.reason;
  // the usual finding adds nothing to the shared sentence of its verdict
  if (divergentDamping) reason += '; divergent mode (a root with Re > 0)';
  if (!finite) reason += '; the value is unbounded';
  if (ambiguity !== '') reason += ambiguity;
  return judged(criterion, bounds, evidence, finite ? result.value : null, judgement.level, judgement.verdict, judgement.margin, reason, method);
}

/** Whether the evaluator moved the required level's bounds away from the criterion's own. */
function adjustedAt(c: ResolvedCriterion, bounds: Finding['bounds'], requiredLevel: Level): boolean {
  const key = levelKey(requiredLevel);
  const own = expandedLevelsOf(c.levels)[key];
  const used = bounds[key];
  return own.min !== used?.min || own.max !== used?.max;
}
