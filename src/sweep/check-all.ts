/**
 * Check every condition of a model: in the main thread, or shared between the main thread and
 * worker threads. Either way the results are the same, in the same order.
 *
 * Workers pay less than one would hope: the main thread must still hold every condition's
 * result, and reading a result back from a worker (JSON.parse of its line, or a structured
 * clone, which is slower) costs about as much as computing it. On the 2-core machine the
 * targets were set for, a 10,000-condition sweep took 2.4-2.8 s with one worker against
 * 2.0-2.3 s without, with 1.4 s more CPU and 80 MB more memory; so the pool is chosen only for
 * large sweeps on machines with spare cores, and `workers` forces either way.
 */
import { availableParallelism } from 'node:os';
import type { AircraftModel, ResolvedCriteriaSet, ResultsContents, SensitivityChoice } from '../types.js';
import { checkConditions, type CheckEach, type ConditionsChecked } from './check-conditions.js';
import { checkConditionsInWorkers } from './worker-pool.js';

/** Fewer conditions than this are checked in the main thread. */
export const PARALLEL_FROM = 2000;
/** Workers are chosen by themselves only with at least this many cores (see above). */
export const MIN_CORES = 4;
/** At most this many worker threads. */
export const MAX_WORKERS = 2;

export interface CheckAllOptions {
  /** worker threads to use: 0 = main thread only; absent = chosen by the number of conditions */
  workers?: number;
  onProgress?: (done: number, total: number) => void;
  /**
   * Each result as it is checked, and which to keep: both run the conditions in the main
   * thread (a result leaves a worker only as a whole batch).
   */
  onResult?: CheckEach['onResult'];
  keep?: CheckEach['keep'];
  /** which findings get design sensitivities; absent = failing and marginal ones */
  sensitivities?: SensitivityChoice;
}

/** Worker threads for a sweep of `count` conditions: none below PARALLEL_FROM or MIN_CORES. */
export function workersFor(count: number, cores: number = availableParallelism()): number {
  if (count < PARALLEL_FROM || cores < MIN_CORES) return 0;
  return Math.min(MAX_WORKERS, cores - 1);
}

export async function checkAllConditions(
  model: AircraftModel,
  sets: readonly ResolvedCriteriaSet[],
  contents: ResultsContents,
  options: CheckAllOptions = {},
): Promise<ConditionsChecked> {
  const { conditions } = model;
  const streamed = options.onResult !== undefined || options.keep !== undefined;
  const workers = streamed ? 0 : (options.workers ?? workersFor(conditions.length));
  const total = conditions.length;
  if (workers === 0) {
    const onEach = options.onProgress ? (done: number) => options.onProgress!(done, total) : undefined;
    return checkConditions(conditions, model.aircraft.class, sets, contents, {
      ...(onEach ? { onEach } : {}),
      ...(options.sensitivities ? { sensitivities: options.sensitivities } : {}),
      ...(options.onResult ? { onResult: options.onResult } : {}),
      ...(options.keep ? { keep: options.keep } : {}),
    });
  }
  return checkConditionsInWorkers(conditions, model.aircraft.class, sets, contents, {
    workers,
    ...(options.onProgress ? { onProgress: options.onProgress } : {}),
    ...(options.sensitivities ? { sensitivities: options.sensitivities } : {}),
  });
}
