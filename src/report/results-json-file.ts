/**
 * A large sweep's results file, written as the conditions are checked instead of from the
 * finished results: each condition's line is encoded into a buffer at once, and the buffer is
 * written to a temporary file beside the target whenever it is full, so the run need not keep
 * every condition's text and result until the end. The summary, known only at the end, goes
 * into the place left for it (fixed width, see json.ts); then the file is put in place with
 * the run's other outputs, as one set (write-atomic.ts). Until then the target is untouched, and
 * `abort` removes the temporary file, so a failed run leaves the last good results as they were.
 * A target that is not a regular file (e.g. /dev/null) is refused by `open`: the cli streams
 * only to regular files.
 *
 * The bytes are those of resultsJsonChunks for the same results (test/report/results-json-file.test.ts).
 * Measured on the 10,000-condition bench sweep: about 0.3 s and 100 MB less than keeping
 * every result for the writer (bench/sweep.mjs).
 */
import { InternalError } from '../errors.js';
import type { ConditionResult, ResultsHead, VerdictCounts } from '../types.js';
import { BufferedFile } from './buffered-file.js';
import { outputError } from './output-error.js';
import { compactOpening, conditionJson, summaryText } from './json.js';
import { commitFiles, dropTemporary, newTemporary, realTarget, targetKind, type PreparedFile } from './write-atomic.js';

/** [bytes] the buffer each condition's line is encoded into, written out when full */
const BUFFER_BYTES = 1 << 22;

export class ResultsJsonFile {
  readonly path: string;
  #target: string;
  #temp: string;
  #file: BufferedFile | undefined;
  /** [bytes] where the summary starts */
  #summaryAt: number;
  #count = 0;

  private constructor(path: string, target: string, temp: string, file: BufferedFile, summaryAt: number) {
    this.path = path;
    this.#target = target;
    this.#temp = temp;
    this.#file = file;
    this.#summaryAt = summaryAt;
  }

  /**
   * Start the file: its head, with a summary of zeros to be replaced by `finish`.
   * `bufferBytes` (tests only) sets the size of the encoding buffer.
   */
  static open(path: string, head: ResultsHead, bufferBytes: number = BUFFER_BYTES): ResultsJsonFile {
    const target = realTarget(path);
    let temp: string | undefined;
    let buffered: BufferedFile;
    try {
      if (targetKind(target) === 'other') throw Object.assign(new Error('not a regular file'), { code: 'MG_NOT_REGULAR' });
      temp = newTemporary(target);
      buffered = new BufferedFile(temp, bufferBytes);
    } catch (err) {
      if (temp) dropTemporary(temp);
      throw outputError(path, err);
    }
    const { before, after } = compactOpening(head);
    const file = new ResultsJsonFile(path, target, temp, buffered, Buffer.byteLength(before));
    try {
      buffered.append(`${before}${summaryText({ pass: 0, marginal: 0, fail: 0, not_evaluated: 0 })}${after}\n`);
    } catch (err) {
      file.abort();
      throw outputError(path, err);
    }
    return file;
  }

  /** The next condition's line. */
  add(condition: ConditionResult): void {
    const file = this.#file;
    if (file === undefined) throw new InternalError('results file already finished or abandoned');
    const line = conditionJson(condition);
    try {
      // the separator on its own: joined to the line, it would make a copy of the line
      if (this.#count > 0) file.append(',\n');
      file.append(line);
    } catch (err) {
      this.abort();
      throw outputError(this.path, err);
    }
    this.#count += 1;
  }

  /**
   * Write the rest and the summary; the file then waits under its temporary name to be put in
   * place with the run's other outputs (commitFiles), or dropped by `abort`.
   */
  prepare(summary: VerdictCounts): PreparedFile {
    const file = this.#file;
    if (file === undefined) throw new InternalError('results file already finished or abandoned');
    try {
      file.append('\n]}\n');
      file.writeAt(summaryText(summary), this.#summaryAt);
      file.close();
      this.#file = undefined;
    } catch (err) {
      this.abort();
      throw outputError(this.path, err);
    }
    return { path: this.path, target: this.#target, temp: this.#temp };
  }

  /** Write the rest and the summary, then put the file in place of the target, on its own. */
  async finish(summary: VerdictCounts): Promise<void> {
    await commitFiles([this.prepare(summary)]);
  }

  /** Give up: remove the temporary file; the target stays as it was. Safe to call twice. */
  abort(): void {
    this.#file?.discard();
    this.#file = undefined;
    dropTemporary(this.#temp);
  }
}
