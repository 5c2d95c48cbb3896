/**
 * The per-condition stage of the pipeline: analyse the modes of each condition, evaluate it
 * against every criteria set, assemble its result. Pure (no file, clock or randomness), so the
 * same function runs in the main thread and in the worker threads of a large sweep.
 */
import { evaluateCondition } from '../criteria/evaluate.js';
import { InputError, type InputIssue } from '../errors.js';
import { analyseModes } from '../modes/analyse.js';
import { assembleCondition } from '../results.js';
import type { AircraftClass, ConditionResult, FlightCondition, ResolvedCriteriaSet } from '../types.js';

export interface ConditionsChecked {
  /** one per condition, in the order given */
  results: ConditionResult[];
  /** input problems found while evaluating (e.g. a phase a criteria set has no category for) */
  issues: InputIssue[];
}

export function checkConditions(
  conditions: readonly FlightCondition[],
  aircraftClass: AircraftClass,
  sets: readonly ResolvedCriteriaSet[],
  onEach?: (done: number) => void,
): ConditionsChecked {
  const results: ConditionResult[] = [];
  const issues: InputIssue[] = [];
  for (let index = 0; index < conditions.length; index += 1) {
    results.push(checkOneCondition(conditions[index]!, aircraftClass, sets, issues));
    onEach?.(index + 1);
  }
  return { results, issues };
}

/** One condition; its input problems are added to `issues`, any other error is thrown. */
export function checkOneCondition(
  condition: FlightCondition,
  aircraftClass: AircraftClass,
  sets: readonly ResolvedCriteriaSet[],
  issues: InputIssue[],
): ConditionResult {
  const analysis = analyseModes(condition.system, { airspeed: condition.airspeed });
  const evaluations = [];
  for (const set of sets) {
    try {
      evaluations.push(evaluateCondition({ aircraftClass, condition, analysis, set }));
    } catch (err) {
      if (err instanceof InputError) issues.push(...err.issues);
      else throw err;
    }
  }
  return assembleCondition(condition, analysis, evaluations);
}
