/**
 * The per-condition stage of the pipeline: analyse the modes of each condition, evaluate it
 * against every criteria set, assemble its result. Pure (no file, clock or randomness), so the
 * same function runs in the main thread and in the worker threads of a large sweep.
 */
import { evaluateCondition } from '../criteria/evaluate.js';
import { InputError, type InputIssue } from '../errors.js';
import { fitMeasuredResponses } from '../equivalent/fit-measured.js';
import { analyseModes } from '../modes/analyse.js';
import { analyseResponses } from '../responses/analyse-responses.js';
import { bankAnglesOf } from '../criteria/bank-angles.js';
import { assembleCondition } from '../results.js';
import { withSensitivities } from '../sensitivity/finding-sensitivities.js';
import type { AircraftClass, ConditionResult, FlightCondition, ModalAnalysis, ResolvedCriteriaSet, ResultsContents, SensitivityChoice, VerdictCounts } from '../types.js';

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
  const analysis = condition.form === 'frequencyResponses' ? NO_ANALYSIS : analyseModes(condition.system, { airspeed: condition.airspeed });
  const responses = condition.form === 'frequencyResponses' ? null : analyseResponses(condition, analysis, { bankAngles: bankAnglesOf(sets) });
  const fits = fitMeasuredResponses(condition);
  // bandwidth and phase delay for the region criteria: from measured responses (the model's own
  // theta response is not yet judged against the regions; its figures are in `responses.pitch`)
  const responseFigures = fits.responses;
  const augmented = {
    responses,
    ...(fits.systems.length > 0 ? { equivalentSystems: fits.systems } : {}),
    ...(responseFigures ? { responseFigures } : {}),
    ...(condition.form === 'frequencyResponses' ? { noModes: RESPONSES_ONLY } : {}),
  };
  const evaluations = [];
  for (const set of sets) {
    try {
      const evaluation = evaluateCondition({ aircraftClass, condition, analysis, set, ...augmented });
      // a condition of frequency responses only has no model numbers to move
      evaluations.push(condition.form === 'frequencyResponses' ? evaluation : withSensitivities({ aircraftClass, condition, analysis, set, evaluation, choice: sensitivities }));
    } catch (err) {
      if (err instanceof InputError) issues.push(...err.issues);
      else throw err;
    }
  }
  return assembleCondition(condition, analysis, evaluations, contents, responses, fits);
}

/** The modal analysis of a condition without a state-space model: nothing to analyse. */
const NO_ANALYSIS: ModalAnalysis = {
  subsystems: { longitudinal: [], lateral: [], kinematic: [], other: [] },
  coupling: 0,
  decoupled: true,
  modes: [],
  warnings: [],
};

const RESPONSES_ONLY = 'the condition gives frequency responses only (no state-space model): no raw roots to judge';
