/**
 * The results JSON writer (contract 2). JSON.stringify writes non-finite numbers as null,
 * which is the contract's "no value". Indented for ordinary runs; for sweeps compact, one
 * condition per line, and produced in blocks so that no single giant string is ever built.
 *
 * The lines of a run of conditions may have been written already, by the worker thread that
 * computed them (see src/sweep/): `rememberConditionsJson` keeps that text beside the first
 * condition object, and the writer uses it when the results hold the same objects in the same
 * order, instead of serialising them again. The text is `conditionJson` of those very
 * objects, so the file is the same either way; a condition is never changed after the check,
 * which is what keeps the text valid.
 */
import type { ConditionResult, Results } from '../types.js';

const INDENT_UP_TO_CONDITIONS = 200;

/** [characters] size of a block handed to the file writer */
const BLOCK = 1 << 20;

interface WrittenRun {
  members: readonly ConditionResult[];
  /** the members' lines joined by ",\n" */
  text: string;
}

const written = new WeakMap<ConditionResult, WrittenRun>();

/** The compact JSON text of one condition (a line of a sweep's results file). */
export function conditionJson(condition: ConditionResult): string {
  return JSON.stringify(condition);
}

/** Keep `text`, which must be the members' `conditionJson` lines joined by ",\n", for the writer. */
export function rememberConditionsJson(members: readonly ConditionResult[], text: string): void {
  if (members.length > 0) written.set(members[0]!, { members, text });
}

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
  const count = conditions.length;
  let lines: string[] = [`${opening.slice(0, -2)}\n`];
  let size = 0;
  let i = 0;
  while (i < count) {
    const run = written.get(conditions[i]!);
    let text: string;
    if (run !== undefined && sameRun(conditions, i, run.members)) {
      text = run.text;
      i += run.members.length;
    } else {
      text = conditionJson(conditions[i]!);
      i += 1;
    }
    lines.push(text, i < count ? ',\n' : '\n');
    size += text.length;
    if (size >= BLOCK) {
      yield lines.join('');
      lines = [];
      size = 0;
    }
  }
  lines.push(']}\n');
  yield lines.join('');
}

function sameRun(conditions: readonly ConditionResult[], from: number, members: readonly ConditionResult[]): boolean {
  if (from + members.length > conditions.length) return false;
  for (let k = 0; k < members.length; k += 1) if (conditions[from + k] !== members[k]) return false;
  return true;
}
