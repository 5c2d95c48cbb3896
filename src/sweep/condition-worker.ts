/**
 * Entry of a condition worker thread: checks its share of a sweep batch by batch with the same
 * function as the main thread, writes each condition's JSON line, and posts the lines back.
 */
import { parentPort } from 'node:worker_threads';
import type { InputIssue } from '../errors.js';
import { conditionJson } from '../report/json.js';
import type { ConditionResult } from '../types.js';
import { checkOneCondition } from './check-conditions.js';
import { isJsonSafe } from './json-safe.js';
import type { FailedMessage, ShareMessage, WorkerMessage } from './messages.js';

if (parentPort === null) throw new Error('condition-worker.js runs as a worker thread only');
const port = parentPort;

port.once('message', (share: ShareMessage) => {
  try {
    checkShare(share, (message) => port.postMessage(message));
  } catch (err) {
    const e = err instanceof Error ? err : new Error(String(err));
    const failed: FailedMessage = { type: 'failed', name: e.name, message: e.message, stack: e.stack };
    port.postMessage(failed);
  }
});

function checkShare(share: ShareMessage, send: (message: WorkerMessage) => void): void {
  const { conditions, aircraftClass, sets, contents, batch, sensitivities } = share;
  let lines: string[] = [];
  let exact: [number, ConditionResult][] = [];
  let issues: InputIssue[] = [];
  const flush = () => {
    send({ type: 'batch', text: `[${lines.join(',\n')}]`, exact, issues });
    lines = [];
    exact = [];
    issues = [];
  };
  for (const condition of conditions) {
    const result = checkOneCondition(condition, aircraftClass, sets, contents, issues, sensitivities);
    if (!isJsonSafe(result)) exact.push([lines.length, result]);
    lines.push(conditionJson(result));
    if (lines.length >= batch) flush();
  }
  if (lines.length > 0) flush();
  send({ type: 'done' });
}
