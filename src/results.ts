/** Assemble the results object (contract 2, `modalgate-results/1`) from the pipeline's parts. */
import type { ConditionEvaluation } from './criteria/evaluate.js';
import type {
  AircraftModel,
  ConditionResult,
  Finding,
  FlightCondition,
  InputFile,
  ModalAnalysis,
  ResolvedCriteriaSet,
  Results,
  ResultsHead,
  VerdictCounts,
} from './types.js';

export function assembleCondition(
  condition: FlightCondition,
  analysis: ModalAnalysis,
  evaluations: ConditionEvaluation[],
): ConditionResult {
  const first = evaluations[0];
  const requiredLevel = first?.requiredLevel ?? condition.requiredLevel;
  const requiredLevelFrom = first?.requiredLevelFrom ?? (condition.requiredLevel !== null ? 'model' : null);
  const warnings = [...analysis.warnings];
  for (const e of evaluations) for (const w of e.warnings) if (!warnings.includes(w)) warnings.push(w);
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
    modes: analysis.modes,
    findings: evaluations.flatMap((e) => e.findings),
    notApplicable: evaluations.flatMap((e) => e.notApplicable),
    warnings,
    notes: condition.notes,
  };
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
