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
 *
 * A large sweep written only to JSON does not wait for the finished results: the command line
 * writes it as the conditions are checked (results-json-file.ts), from the same pieces
 * (`compactOpening`, `summaryText`, `conditionJson`), so that file has these same bytes.
 */
import { InternalError } from '../errors.js';
import type { ConditionResult, Results, ResultsHead, VerdictCounts } from '../types.js';

/** Up to this many conditions the file is indented; above, it has one compact line per condition. */
export const INDENT_UP_TO_CONDITIONS = 200;

/**
 * [characters] width of each count in a compact file's summary. The counts are padded with
 * spaces (JSON allows them there) so that the summary always has the same length: a large
 * sweep's file is written as it is checked (results-json-file.ts), and its summary, known only
 * at the end, is then written into the place left for it.
 */
const COUNT_WIDTH = 12;

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
  const { conditions, summary, ...head } = results;
  const { before, after } = compactOpening(head);
  const count = conditions.length;
  let lines: string[] = [`${before}${summaryText(summary)}${after}\n`];
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

/**
 * A compact file's text up to the conditions, in two parts around the summary:
 * `before` ends with `"summary":`, `after` is `,"conditions":[`.
 */
export function compactOpening(head: ResultsHead): { before: string; after: string } {
  const tail = ',"summary":null,"conditions":[]}';
  const text = JSON.stringify({ ...head, summary: null, conditions: [] });
  if (!text.endsWith(tail)) throw new InternalError('results head: summary and conditions must come last');
  return { before: `${text.slice(0, -tail.length)},"summary":`, after: ',"conditions":[' };
}

/** The summary of a compact file, always COUNT_WIDTH characters per count. */
export function summaryText(summary: VerdictCounts): string {
  const count = (n: number) => {
    const text = String(n);
    if (text.length > COUNT_WIDTH) throw new InternalError(`verdict count ${n} is too large for the results summary`);
    return text.padStart(COUNT_WIDTH);
  };
  return `{"pass":${count(summary.pass)},"marginal":${count(summary.marginal)},"fail":${count(summary.fail)},"not_evaluated":${count(summary.not_evaluated)}}`;
}

function sameRun(conditions: readonly ConditionResult[], from: number, members: readonly ConditionResult[]): boolean {
  if (from + members.length > conditions.length) return false;
  for (let k = 0; k < members.length; k += 1) if (conditions[from + k] !== members[k]) return false;
  return true;
}
