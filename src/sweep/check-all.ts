/**
 * Check every condition of a model: in the main thread for an ordinary model, over worker
 * threads for a large sweep, where starting the workers (a few tens of milliseconds each) is
 * paid back many times. Either way the results are the same, in the same order.
 */
import { availableParallelism } from 'node:os';
import type { AircraftModel, ResolvedCriteriaSet } from '../types.js';
import { checkConditions, type ConditionsChecked } from './check-conditions.js';
import { checkConditionsInWorkers } from './worker-pool.js';

/** Fewer conditions than this are checked in the main thread (measured on 2 cores). */
export const PARALLEL_FROM = 2000;
/** At most this many worker threads (the machine the targets were set for has 2 cores). */
export const MAX_WORKERS = 2;

export interface CheckAllOptions {
  /** worker threads to use: 0 = main thread only; absent = chosen by the number of conditions */
  workers?: number;
  onProgress?: (done: number, total: number) => void;
}

/** Worker threads for a sweep of `count` conditions: none below PARALLEL_FROM. */
export function workersFor(count: number, cores: number = availableParallelism()): number {
  if (count < PARALLEL_FROM || cores < 2) return 0;
  return Math.min(MAX_WORKERS, cores);
}

export async function checkAllConditions(
  model: AircraftModel,
  sets: readonly ResolvedCriteriaSet[],
  options: CheckAllOptions = {},
): Promise<ConditionsChecked> {
  const { conditions } = model;
  const workers = options.workers ?? workersFor(conditions.length);
  const total = conditions.length;
  if (workers === 0) {
    const onEach = options.onProgress ? (done: number) => options.onProgress!(done, total) : undefined;
    return checkConditions(conditions, model.aircraft.class, sets, onEach);
  }
  return checkConditionsInWorkers(conditions, model.aircraft.class, sets, {
    workers,
    ...(options.onProgress ? { onProgress: options.onProgress } : {}),
  });
}
