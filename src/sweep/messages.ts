/** What the main thread and a condition worker say to each other (structured-cloned). */
import type { InputIssue } from '../errors.js';
import type { AircraftClass, ConditionResult, FlightCondition, ResolvedCriteriaSet, ResultsContents, SensitivityChoice } from '../types.js';

/** main -> worker, once: a contiguous share of the sweep's conditions */
export interface ShareMessage {
  conditions: FlightCondition[];
  aircraftClass: AircraftClass;
  sets: ResolvedCriteriaSet[];
  contents: ResultsContents;
  /** conditions per batch message sent back */
  batch: number;
  /** which findings get design sensitivities */
  sensitivities: SensitivityChoice;
}

/**
 * worker -> main: the next conditions of the share, in order. `text` is a JSON array whose
 * items are the conditions' results lines (`conditionJson`), joined by ",\n": parsed, it gives
 * the results themselves (JSON text is cheaper to send and to read than a structured clone),
 * and its inside is the results file's text for these conditions. A result that JSON would
 * change (see json-safe.ts) also comes as a structured clone in `exact`, by its index.
 */
export interface BatchMessage {
  type: 'batch';
  text: string;
  exact: [number, ConditionResult][];
  issues: InputIssue[];
}

/** worker -> main: the share is finished */
export interface DoneMessage {
  type: 'done';
}

/** worker -> main: an error other than an input problem (a bug); the share stops */
export interface FailedMessage {
  type: 'failed';
  name: string;
  message: string;
  stack: string | undefined;
}

export type WorkerMessage = BatchMessage | DoneMessage | FailedMessage;
