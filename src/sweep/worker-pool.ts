/**
 * A large sweep split over the main thread and worker threads: each takes one contiguous share
 * of the conditions and checks it with the same function (check-conditions.ts); a worker sends
 * back, batch by batch, the JSON lines of its results (see messages.ts). The shares are put
 * back together in the order of the model file, so the results are those of the serial path.
 */
import { Worker } from 'node:worker_threads';
import { InternalError, type InputIssue } from '../errors.js';
import { rememberConditionsJson } from '../report/json.js';
import { addVerdictCounts, countVerdicts } from '../results.js';
import type { AircraftClass, ConditionResult, FlightCondition, ResolvedCriteriaSet, ResultsContents, SensitivityChoice } from '../types.js';
import { checkConditions, type ConditionsChecked } from './check-conditions.js';
import type { BatchMessage, ShareMessage, WorkerMessage } from './messages.js';

export interface PoolOptions {
  /** number of worker threads (1 or more) */
  workers: number;
  /** conditions per message back; smaller batches keep each worker's memory low */
  batch?: number;
  /** called as batches arrive, with the conditions done over all workers */
  onProgress?: (done: number, total: number) => void;
  /** which findings get design sensitivities; absent = failing and marginal ones */
  sensitivities?: SensitivityChoice;
}

const DEFAULT_BATCH = 250;

export async function checkConditionsInWorkers(
  conditions: readonly FlightCondition[],
  aircraftClass: AircraftClass,
  sets: readonly ResolvedCriteriaSet[],
  contents: ResultsContents,
  options: PoolOptions,
): Promise<ConditionsChecked> {
  const total = conditions.length;
  const workers = Math.max(1, Math.min(options.workers, total));
  const batch = options.batch ?? DEFAULT_BATCH;
  const sensitivities = options.sensitivities ?? 'issues';
  let done = 0;
  const progress = (n: number) => {
    done += n;
    options.onProgress?.(done, total);
  };
  // The main thread takes the first share itself, while the workers start up.
  const [own, ...rest] = splitShares(total, workers + 1);
  const shares = rest.map(([from, to]) =>
    runShare({ conditions: conditions.slice(from, to), aircraftClass, sets: [...sets], contents, batch, sensitivities }, progress),
  );
  let mine: ConditionsChecked;
  try {
    mine = checkConditions(conditions.slice(own![0], own![1]), aircraftClass, sets, contents, { onEach: () => progress(1), sensitivities });
  } catch (err) {
    for (const share of shares) {
      share.stop();
      share.done.catch(() => undefined);
    }
    throw err;
  }
  const parts = [mine, ...(await Promise.all(shares.map((share) => share.done)))];
  const results: ConditionResult[] = [];
  const issues: InputIssue[] = [];
  for (const part of parts) {
    for (const r of part.results) results.push(r);
    for (const i of part.issues) issues.push(i);
  }
  // each part has counted its own findings already
  return { results, issues, summary: addVerdictCounts(parts.map((p) => p.summary)) };
}

/** [from, to) ranges of `count` nearly equal contiguous shares of `n` items */
export function splitShares(n: number, count: number): [number, number][] {
  const out: [number, number][] = [];
  for (let k = 0; k < count; k += 1) out.push([Math.floor((n * k) / count), Math.floor((n * (k + 1)) / count)]);
  return out;
}

interface RunningShare {
  done: Promise<ConditionsChecked>;
  /** stop the worker (its share is then rejected) */
  stop: () => void;
}

function runShare(share: ShareMessage, progress: (n: number) => void): RunningShare {
  const worker = new Worker(workerScript());
  const done = new Promise<ConditionsChecked>((resolve, reject) => {
    const results: ConditionResult[] = [];
    const issues: InputIssue[] = [];
    let settled = false;
    const finish = (error?: Error) => {
      if (settled) return;
      settled = true;
      void worker.terminate();
      if (error) reject(error);
      else resolve({ results, issues, summary: countVerdicts(results.flatMap((r) => r.findings)) });
    };
    worker.on('message', (message: WorkerMessage) => {
      if (message.type === 'batch') {
        const batch = readBatch(message);
        for (const result of batch) results.push(result);
        for (const issue of message.issues) issues.push(issue);
        progress(batch.length);
      } else if (message.type === 'done') {
        finish();
      } else {
        finish(rebuildError(message.name, message.message, message.stack));
      }
    });
    worker.on('error', (err) => finish(err));
    worker.on('exit', (code) => finish(new InternalError(`a condition worker stopped early (exit code ${code})`)));
    worker.postMessage(share);
  });
  return { done, stop: () => void worker.terminate() };
}

/** The results of a batch message, their JSON lines kept for the results file. */
export function readBatch(message: Pick<BatchMessage, 'text' | 'exact'>): ConditionResult[] {
  const batch = JSON.parse(message.text) as ConditionResult[];
  for (const [index, result] of message.exact) batch[index] = result;
  rememberConditionsJson(batch, message.text.slice(1, -1));
  return batch;
}

/** The worker's error as the serial path would have thrown it. */
function rebuildError(name: string, message: string, stack: string | undefined): Error {
  const prefix = 'internal error (a bug in modalgate, please report it): ';
  const error =
    name === 'InternalError' && message.startsWith(prefix)
      ? new InternalError(message.slice(prefix.length))
      : Object.assign(new Error(message), { name });
  if (stack !== undefined) error.stack = stack;
  return error;
}

/**
 * The compiled worker beside this module; when this module runs from its TypeScript source
 * (the test runner), the compiled one in dist/, as Node cannot start a worker from .ts.
 */
function workerScript(): URL {
  const here = import.meta.url;
  if (here.endsWith('.ts')) return new URL('../../dist/sweep/condition-worker.js', here);
  return new URL('./condition-worker.js', here);
}
