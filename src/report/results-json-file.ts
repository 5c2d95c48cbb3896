/**
 * A large sweep's results file, written as the conditions are checked instead of from the
 * finished results: each condition's line is encoded into a buffer at once, and the buffer is
 * written to a temporary file beside the target whenever it is full, so the run need not keep
 * every condition's text and result until the end. The summary, known only at the end, goes
 * into the place left for it (fixed width, see json.ts); then the file is renamed over the
 * target (as an output set of one, write-atomic.ts). Until then the target is untouched, and
 * `abort` removes the temporary file, so a failed run leaves the last good results as they were.
 * A target that is not a regular file (e.g. /dev/null) is refused by `open`: the cli streams
 * only to regular files.
 *
 * The bytes are those of resultsJsonChunks for the same results (test/report/results-json-file.test.ts).
 * Measured on the 10,000-condition bench sweep: about 0.3 s and 100 MB less than keeping
 * every result for the writer (bench/sweep.mjs).
 */
import { closeSync, openSync, writeSync } from 'node:fs';
import { InternalError } from '../errors.js';
import type { ConditionResult, ResultsHead, VerdictCounts } from '../types.js';
import { outputError } from './output-error.js';
import { compactOpening, conditionJson, summaryText } from './json.js';
import { commitFiles, dropTemporary, newTemporary, realTarget, targetKind } from './write-atomic.js';

/** [bytes] the buffer each condition's line is encoded into, written out when full */
const BUFFER_BYTES = 1 << 22;
/** [bytes] most bytes one UTF-16 code unit can take in UTF-8 */
const MAX_UTF8_PER_UNIT = 3;

export class ResultsJsonFile {
  readonly path: string;
  #target: string;
  #temp: string;
  #fd: number | undefined;
  /** [bytes] where the summary starts */
  #summaryAt: number;
  /** [bytes] where the next write goes in the file */
  #position = 0;
  /**
   * Lines are encoded straight into this buffer, which is written out when the next line may
   * not fit: no joined block strings and no fresh buffer per block, so the lines die young.
   */
  #buffer: Buffer;
  #used = 0;
  #count = 0;

  private constructor(path: string, target: string, temp: string, fd: number, summaryAt: number, bufferBytes: number) {
    this.path = path;
    this.#target = target;
    this.#buffer = Buffer.allocUnsafe(bufferBytes);
    this.#temp = temp;
    this.#fd = fd;
    this.#summaryAt = summaryAt;
  }

  /**
   * Start the file: its head, with a summary of zeros to be replaced by `finish`.
   * `bufferBytes` (tests only) sets the size of the encoding buffer.
   */
  static open(path: string, head: ResultsHead, bufferBytes: number = BUFFER_BYTES): ResultsJsonFile {
    const target = realTarget(path);
    let temp: string | undefined;
    let fd: number;
    try {
      if (targetKind(target) === 'other') throw Object.assign(new Error('not a regular file'), { code: 'MG_NOT_REGULAR' });
      temp = newTemporary(target);
      fd = openSync(temp, 'wx', 0o644);
    } catch (err) {
      if (temp) dropTemporary(temp);
      throw outputError(path, err);
    }
    const { before, after } = compactOpening(head);
    const file = new ResultsJsonFile(path, target, temp, fd, Buffer.byteLength(before), bufferBytes);
    try {
      file.#append(`${before}${summaryText({ pass: 0, marginal: 0, fail: 0, not_evaluated: 0 })}${after}\n`);
    } catch (err) {
      file.abort();
      throw outputError(path, err);
    }
    return file;
  }

  /** The next condition's line. */
  add(condition: ConditionResult): void {
    if (this.#fd === undefined) throw new InternalError('results file already finished or abandoned');
    const line = conditionJson(condition);
    try {
      // the separator on its own: joined to the line, it would make a copy of the line
      if (this.#count > 0) this.#append(',\n');
      this.#append(line);
    } catch (err) {
      this.abort();
      throw outputError(this.path, err);
    }
    this.#count += 1;
  }

  /** Write the rest and the summary, then put the file in place of the target. */
  async finish(summary: VerdictCounts): Promise<void> {
    const fd = this.#fd;
    if (fd === undefined) throw new InternalError('results file already finished or abandoned');
    try {
      this.#append('\n]}\n');
      this.#flush();
      writeSync(fd, summaryText(summary), this.#summaryAt);
      closeSync(fd);
      this.#fd = undefined;
    } catch (err) {
      this.abort();
      throw outputError(this.path, err);
    }
    await commitFiles([{ path: this.path, target: this.#target, temp: this.#temp }]);
  }

  /** Give up: remove the temporary file; the target stays as it was. Safe to call twice. */
  abort(): void {
    if (this.#fd !== undefined) {
      try {
        closeSync(this.#fd);
      } catch {
        // already closed or never usable: nothing more to do with it
      }
      this.#fd = undefined;
    }
    dropTemporary(this.#temp);
  }

  /** Encode `text` after what the buffer holds; write the buffer out first if it may not fit. */
  #append(text: string): void {
    const room = this.#buffer.length - this.#used;
    if (text.length * MAX_UTF8_PER_UNIT > room) {
      this.#flush();
      if (text.length * MAX_UTF8_PER_UNIT > this.#buffer.length) {
        this.#writeBytes(Buffer.from(text));
        return;
      }
    }
    this.#used += this.#buffer.write(text, this.#used);
  }

  #flush(): void {
    if (this.#used === 0) return;
    this.#writeBytes(this.#buffer.subarray(0, this.#used));
    this.#used = 0;
  }

  #writeBytes(bytes: Uint8Array): void {
    let done = 0;
    while (done < bytes.length) done += writeSync(this.#fd!, bytes, done, bytes.length - done, this.#position + done);
    this.#position += bytes.length;
  }
}
