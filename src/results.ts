/** Assemble the results object (contract 2, `modalgate-results/1`) from the pipeline's parts. */
import type { ConditionEvaluation } from './criteria/evaluate.js';
import type {
  AircraftModel,
  ConditionResponses,
  ConditionResult,
  EquivalentSystem,
  Finding,
  FlightCondition,
  InputFile,
  ModalAnalysis,
  Mode,
  ResolvedCriteriaSet,
  ResultMode,
  Results,
  ResultsContents,
  ResultsHead,
  VerdictCounts,
} from './types.js';

/**
 * Above this many conditions the results leave the mode shapes out unless asked for (a third
 * of a sweep's results file: 42 of 122 MB on the 10,000-condition bench sweep); it is the
 * size above which the results file is written in its compact sweep form.
 */
export const MODE_SHAPES_UP_TO = 200;

/** What results of `total` conditions hold: mode shapes when asked (`modeShapes`), else up to MODE_SHAPES_UP_TO. */
export function resultsContents(total: number, modeShapes: boolean | undefined): ResultsContents {
  return { modeShapes: modeShapes ?? total <= MODE_SHAPES_UP_TO };
}

export function assembleCondition(
  condition: FlightCondition,
  analysis: ModalAnalysis,
  evaluations: ConditionEvaluation[],
  contents: ResultsContents,
  responses: ConditionResponses | null,
  fits?: { systems: EquivalentSystem[]; notes: string[] },
): ConditionResult {
  const first = evaluations[0];
  const requiredLevel = first?.requiredLevel ?? condition.requiredLevel;
  const requiredLevelFrom = first?.requiredLevelFrom ?? (condition.requiredLevel !== null ? 'model' : null);
  const warnings = [...analysis.warnings];
  for (const e of evaluations) for (const w of e.warnings) if (!warnings.includes(w)) warnings.push(w);
  for (const s of fits?.systems ?? []) {
    if (!s.valid) warnings.push(`the ${s.axis} equivalent system is not valid (${s.remarks.join('; ')}): its figures are shown, not judged`);
  }
  return {
    id: condition.id,
    phase: condition.phase,
    category: first?.category ?? null,
    requiredLevel,
    requiredLevelFrom,
    airspeed: condition.airspeed,
    altitude: condition.altitude,
    form: condition.form,
    subsystems: analysis.subsystems,
    coupling: analysis.coupling,
    modes: contents.modeShapes ? analysis.modes : analysis.modes.map(withoutShape),
    findings: evaluations.flatMap((e) => e.findings),
    notApplicable: evaluations.flatMap((e) => e.notApplicable),
    responses,
    ...(fits && fits.systems.length > 0 ? { equivalentSystems: fits.systems } : {}),
    warnings,
    notes: fits && fits.notes.length > 0 ? [...condition.notes, ...fits.notes] : condition.notes,
  };
}

function withoutShape(mode: Mode): ResultMode {
  const { referenceState: _referenceState, shape: _shape, ...rest } = mode;
  return rest;
}

export function countVerdicts(findings: Iterable<Finding>): VerdictCounts {
  const counts: VerdictCounts = { pass: 0, marginal: 0, fail: 0, not_evaluated: 0 };
  for (const f of findings) counts[f.verdict] += 1;
  return counts;
}

/** The counts of several parts (e.g. the shares of a sweep) added up. */
export function addVerdictCounts(parts: Iterable<VerdictCounts>): VerdictCounts {
  const total: VerdictCounts = { pass: 0, marginal: 0, fail: 0, not_evaluated: 0 };
  for (const p of parts) {
    total.pass += p.pass;
    total.marginal += p.marginal;
    total.fail += p.fail;
    total.not_evaluated += p.not_evaluated;
  }
  return total;
}

export interface ResultsParts {
  request: { toolVersion: string; command: string[]; generatedAt: string };
  model: AircraftModel;
  sets: ResolvedCriteriaSet[];
  inputs: InputFile[];
  contents: ResultsContents;
}

/** Everything of the results but the summary and the conditions, in the results' key order. */
export function resultsHead(parts: ResultsParts): ResultsHead {
  return {
    format: 'modalgate-results/1',
    tool: { name: 'modalgate', version: parts.request.toolVersion },
    generatedAt: parts.request.generatedAt,
    command: parts.request.command,
    inputs: parts.inputs,
    aircraft: { ...parts.model.aircraft },
    criteriaSets: parts.sets.map((s) => ({ id: s.id, title: s.title, chain: s.chain, sources: s.sources })),
    contents: parts.contents,
  };
}

export function assembleResults(
  parts: ResultsParts & {
    conditions: ConditionResult[];
    /** verdicts over every condition checked; absent = counted from `conditions` */
    summary?: VerdictCounts;
  },
): Results {
  return {
    ...resultsHead(parts),
    summary: parts.summary ?? countVerdicts(parts.conditions.flatMap((c) => c.findings)),
    conditions: parts.conditions,
  };
}
