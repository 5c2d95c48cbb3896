/**
 * The results JSON writer (contract 2). JSON.stringify writes non-finite numbers as null,
 * which is the contract's "no value". Indented for ordinary runs; for sweeps compact, and
 * produced condition by condition so that no single giant string is ever built.
 */
import type { Results } from '../types.js';

const INDENT_UP_TO_CONDITIONS = 200;

export function renderResultsJson(results: Results): string {
  return [...resultsJsonChunks(results)].join('');
}

export function* resultsJsonChunks(results: Results): Generator<string> {
  if (results.conditions.length <= INDENT_UP_TO_CONDITIONS) {
    yield `${JSON.stringify(results, null, 2)}\n`;
    return;
  }
  const { conditions, ...head } = results;
  const opening = JSON.stringify({ ...head, conditions: [] });
  yield `${opening.slice(0, -2)}\n`;
  for (let i = 0; i < conditions.length; i++) {
    yield `${JSON.stringify(conditions[i])}${i + 1 < conditions.length ? ',' : ''}\n`;
  }
  yield ']}\n';
}
