/**
 * The JUnit file of a sweep, written as the conditions are checked instead of from the
 * finished results: each condition's suite goes at once to a temporary file of suites. The
 * totals on the root element are known only at the end, so `finish` writes the declaration and
 * the root start tag to a second temporary file beside the target, copies the suites after
 * them and closes the root; the file then waits to be put in place with the run's other
 * outputs, as one set (write-atomic.ts). The bytes are those of renderJunit for the same
 * results (test/report/junit-file.test.ts); until then the target is untouched, and `abort`
 * removes both temporary files, so a failed run leaves the last good file as it was.
 */
import { closeSync, openSync, readSync } from 'node:fs';
import { InternalError } from '../errors.js';
import type { ConditionResult } from '../types.js';
import { BufferedFile } from './buffered-file.js';
import { addJunitTotals, JUNIT_CLOSE, JUNIT_DECLARATION, junitRoot, renderJunitSuite, type JunitOptions, type JunitTotals } from './junit.js';
import { outputError } from './output-error.js';
import { commitFiles, dropTemporary, newTemporary, realTarget, targetKind, type PreparedFile } from './write-atomic.js';

/** [bytes] the buffer suites are encoded into, and the block the suites are copied in */
const BUFFER_BYTES = 1 << 22;

export class JunitFile {
  readonly path: string;
  #target: string;
  #aircraft: string;
  #options: JunitOptions;
  #bufferBytes: number;
  #suitesPath: string;
  #suites: BufferedFile | undefined;
  #totals: JunitTotals = { tests: 0, failures: 0, skipped: 0 };
  /** the second temporary file, while `finish` writes it */
  #finalPath: string | undefined;

  private constructor(path: string, target: string, aircraft: string, options: JunitOptions, suitesPath: string, suites: BufferedFile, bufferBytes: number) {
    this.path = path;
    this.#target = target;
    this.#aircraft = aircraft;
    this.#options = options;
    this.#suitesPath = suitesPath;
    this.#suites = suites;
    this.#bufferBytes = bufferBytes;
  }

  /** `bufferBytes` (tests only) sets the size of the encoding buffer. */
  static open(path: string, aircraft: string, options: JunitOptions, bufferBytes: number = BUFFER_BYTES): JunitFile {
    const target = realTarget(path);
    let suitesPath: string | undefined;
    try {
      if (targetKind(target) === 'other') throw Object.assign(new Error('not a regular file'), { code: 'MG_NOT_REGULAR' });
      suitesPath = newTemporary(target);
      return new JunitFile(path, target, aircraft, options, suitesPath, new BufferedFile(suitesPath, bufferBytes), bufferBytes);
    } catch (err) {
      if (suitesPath) dropTemporary(suitesPath);
      throw outputError(path, err);
    }
  }

  /** The next condition's suite. */
  add(condition: ConditionResult): void {
    const suites = this.#suites;
    if (suites === undefined) throw new InternalError('JUnit file already finished or abandoned');
    const suite = renderJunitSuite(this.#aircraft, condition, this.#options);
    try {
      suites.append(suite.xml);
      suites.append('\n');
    } catch (err) {
      this.abort();
      throw outputError(this.path, err);
    }
    addJunitTotals(this.#totals, suite);
  }

  /**
   * Head with the totals, the suites, the end; the file then waits under its temporary name to
   * be put in place with the run's other outputs (commitFiles), or dropped by `abort`.
   */
  prepare(): PreparedFile {
    const suites = this.#suites;
    if (suites === undefined) throw new InternalError('JUnit file already finished or abandoned');
    try {
      suites.close();
      this.#suites = undefined;
      this.#finalPath = newTemporary(this.#target);
      const out = new BufferedFile(this.#finalPath, this.#bufferBytes);
      try {
        out.append(`${JUNIT_DECLARATION}\n${junitRoot(this.#aircraft, this.#totals)}\n`);
        copyInto(out, this.#suitesPath, this.#bufferBytes);
        out.append(`${JUNIT_CLOSE}\n`);
        out.close();
      } finally {
        out.discard();
      }
      dropTemporary(this.#suitesPath);
    } catch (err) {
      this.abort();
      throw outputError(this.path, err);
    }
    return { path: this.path, target: this.#target, temp: this.#finalPath! };
  }

  /** Finish the file and put it in place of the target, on its own. */
  async finish(): Promise<void> {
    await commitFiles([this.prepare()]);
  }

  /** Give up: remove the temporary files; the target stays as it was. Safe to call twice. */
  abort(): void {
    this.#suites?.discard();
    this.#suites = undefined;
    dropTemporary(this.#suitesPath);
    if (this.#finalPath !== undefined) dropTemporary(this.#finalPath);
    this.#finalPath = undefined;
  }
}

/** Append the whole of the file at `path` to `out`, block by block. */
function copyInto(out: BufferedFile, path: string, blockBytes: number): void {
  const fd = openSync(path, 'r');
  try {
    const block = Buffer.allocUnsafe(blockBytes);
    for (;;) {
      const read = readSync(fd, block, 0, block.length, null);
      if (read === 0) break;
      out.appendBytes(block.subarray(0, read));
    }
  } finally {
    closeSync(fd);
  }
}
