/**
 * The per-condition stage of the pipeline: analyse the modes of each condition, evaluate it
 * against every criteria set, assemble its result. Pure (no file, clock or randomness), so the
 * same function runs in the main thread and in the worker threads of a large sweep.
 */
import { evaluateCondition } from '../criteria/evaluate.js';
import { InputError, type InputIssue } from '../errors.js';
import { analyseModes } from '../modes/analyse.js';
import { analyseResponses } from '../responses/analyse-responses.js';
import { bankAnglesOf } from '../criteria/bank-angles.js';
import { assembleCondition } from '../results.js';
import { withSensitivities } from '../sensitivity/finding-sensitivities.js';
import type { AircraftClass, ConditionResult, FlightCondition, ResolvedCriteriaSet, ResultsContents, SensitivityChoice, VerdictCounts } from '../types.js';

export interface ConditionsChecked {
  /** one per condition, in the order given (only those kept, when a `keep` test was given) */
  results: ConditionResult[];
  /** input problems found while evaluating (e.g. a phase a criteria set has no category for) */
  issues: InputIssue[];
  /** verdicts over the findings of every condition checked, kept or not */
  summary: VerdictCounts;
}

export interface CheckEach {
  /** called after each condition with the number done */
  onEach?: (done: number) => void;
  /** called with each condition's result as soon as it is checked, in order */
  onResult?: (result: ConditionResult) => void;
  /** which results to keep in `results`; absent = all */
  keep?: (result: ConditionResult) => boolean;
  /** which findings get design sensitivities; absent = failing and marginal ones */
  sensitivities?: SensitivityChoice;
}

export function checkConditions(
  conditions: readonly FlightCondition[],
  aircraftClass: AircraftClass,
  sets: readonly ResolvedCriteriaSet[],
  contents: ResultsContents,
  each: CheckEach = {},
): ConditionsChecked {
  const results: ConditionResult[] = [];
  const issues: InputIssue[] = [];
  const summary: VerdictCounts = { pass: 0, marginal: 0, fail: 0, not_evaluated: 0 };
  const { onEach, onResult, keep } = each;
  const choice = each.sensitivities ?? 'issues';
  for (let index = 0; index < conditions.length; index += 1) {
    const result = checkOneCondition(conditions[index]!, aircraftClass, sets, contents, issues, choice);
    for (const f of result.findings) summary[f.verdict] += 1;
    onResult?.(result);
    if (keep === undefined || keep(result)) results.push(result);
    onEach?.(index + 1);
  }
  return { results, issues, summary };
}

/**
 * One condition: modes, findings per set, then the design sensitivities of the chosen
 * findings. Its input problems are added to `issues`, any other error is thrown.
 */
export function checkOneCondition(
  condition: FlightCondition,
  aircraftClass: AircraftClass,
  sets: readonly ResolvedCriteriaSet[],
  contents: ResultsContents,
  issues: InputIssue[],
  sensitivities: SensitivityChoice = 'issues',
): ConditionResult {
  const analysis = analyseModes(condition.system, { airspeed: condition.airspeed });
  const responses = analyseResponses(condition, analysis, { bankAngles: bankAnglesOf(sets) });
  const evaluations = [];
  for (const set of sets) {
    try {
      const evaluation = evaluateCondition({ aircraftClass, condition, analysis, set, responses });
      evaluations.push(withSensitivities({ aircraftClass, condition, analysis, set, evaluation, choice: sensitivities }));
    } catch (err) {
      if (err instanceof InputError) issues.push(...err.issues);
      else throw err;
    }
  }
  return assembleCondition(condition, analysis, evaluations, contents, responses);
}
