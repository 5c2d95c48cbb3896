/**
 * A file written piece by piece through one reusable buffer: each text is encoded straight
 * into the buffer, which is written out when the next text may not fit. No joined block
 * strings and no fresh buffer per block, so the texts die young. Used by the outputs that a
 * sweep writes as its conditions are checked (results-json-file.ts, junit-file.ts).
 */
import { closeSync, openSync, writeSync } from 'node:fs';

/** [bytes] most bytes one UTF-16 code unit can take in UTF-8 */
const MAX_UTF8_PER_UNIT = 3;

export class BufferedFile {
  #fd: number | undefined;
  #buffer: Buffer;
  #used = 0;
  /** [bytes] where the next write goes in the file */
  #position = 0;

  /** Create `path`, which must not exist yet (it is a fresh temporary name). */
  constructor(path: string, bufferBytes: number) {
    this.#fd = openSync(path, 'wx', 0o644);
    this.#buffer = Buffer.allocUnsafe(bufferBytes);
  }

  /** [bytes] written or buffered so far */
  get size(): number {
    return this.#position + this.#used;
  }

  /** Encode `text` after what the buffer holds; write the buffer out first if it may not fit. */
  append(text: string): void {
    const room = this.#buffer.length - this.#used;
    if (text.length * MAX_UTF8_PER_UNIT > room) {
      this.flush();
      if (text.length * MAX_UTF8_PER_UNIT > this.#buffer.length) {
        this.appendBytes(Buffer.from(text));
        return;
      }
    }
    this.#used += this.#buffer.write(text, this.#used);
  }

  /** Bytes after what has been appended (the buffer is written out first). */
  appendBytes(bytes: Uint8Array): void {
    this.flush();
    this.#writeAt(bytes, this.#position);
    this.#position += bytes.length;
  }

  /** Overwrite bytes already written, at `offset` (e.g. a count known only at the end). */
  writeAt(text: string, offset: number): void {
    this.flush();
    this.#writeAt(Buffer.from(text), offset);
  }

  flush(): void {
    if (this.#used === 0) return;
    const used = this.#used;
    this.#used = 0;
    this.#writeAt(this.#buffer.subarray(0, used), this.#position);
    this.#position += used;
  }

  /** Write out what is buffered and close the file. */
  close(): void {
    const fd = this.#fd;
    if (fd === undefined) return;
    this.flush();
    this.#fd = undefined;
    closeSync(fd);
  }

  /** Close without writing what is buffered; safe to call twice. */
  discard(): void {
    const fd = this.#fd;
    this.#fd = undefined;
    this.#used = 0;
    if (fd === undefined) return;
    try {
      closeSync(fd);
    } catch {
      // already closed or never usable: nothing more to do with it
    }
  }

  #writeAt(bytes: Uint8Array, offset: number): void {
    const fd = this.#fd;
    if (fd === undefined) throw new Error('file already closed');
    let done = 0;
    while (done < bytes.length) done += writeSync(fd, bytes, done, bytes.length - done, offset + done);
  }
}
