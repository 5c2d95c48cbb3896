/**
 * The results JSON writer (contract 2). Infinite values become null: JSON has no infinity.
 * Indented for ordinary runs; compact for sweeps, where indentation would double the size.
 */
import type { Results } from '../types.js';

const INDENT_UP_TO_CONDITIONS = 200;

export function renderResultsJson(results: Results): string {
  const indent = results.conditions.length <= INDENT_UP_TO_CONDITIONS ? 2 : undefined;
  return `${JSON.stringify(results, (_key, value) => (typeof value === 'number' && !Number.isFinite(value) ? null : value), indent)}\n`;
}
