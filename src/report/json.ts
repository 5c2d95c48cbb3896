/** The results JSON writer (contract 2). Infinite values become null: JSON has no infinity. */
import type { Results } from '../types.js';

export function renderResultsJson(results: Results): string {
  return `${JSON.stringify(results, (_key, value) => (typeof value === 'number' && !Number.isFinite(value) ? null : value), 2)}\n`;
}
