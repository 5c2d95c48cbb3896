/**
 * Write a file so that readers only ever see the old content or the complete new content:
 * write a temporary file beside it, then rename over the target. A failure at any step removes
 * the temporary file and leaves the existing report untouched.
 *
 * The temporary file is not flushed to disk (fsync) before the rename. What is promised is
 * that a failed run loses nothing, not that a report survives a power cut in the seconds after
 * it was written; the flush made every run wait on the disk (about 0.2-0.3 s for the 97 MB
 * results file of a 10,000-condition sweep, bench/sweep.mjs). Like a compiler's output, the
 * file reaches the disk when the operating system writes it back.
 */
import { randomBytes } from 'node:crypto';
import { open, rename, rm } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { outputError } from './output-error.js';

/** Text produced piece by piece (e.g. a large results file), written in blocks. */
export type Chunks = Iterable<string>;

const BLOCK = 1 << 20;

/**
 * A fresh hidden name beside `path` for the file that is renamed over it: the same directory,
 * so that the rename stays on one file system and is atomic.
 */
export function tempPathBeside(path: string): string {
  return join(dirname(path), `.${basename(path)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
}

export async function writeFileAtomic(path: string, data: string | Buffer | Chunks): Promise<void> {
  const temp = tempPathBeside(path);
  let handle: Awaited<ReturnType<typeof open>> | undefined;
  let inFlight: Promise<unknown> = Promise.resolve();
  try {
    handle = await open(temp, 'wx', 0o644);
    if (typeof data === 'string' || Buffer.isBuffer(data)) await handle.writeFile(data);
    else {
      // One block is written while the next is made: the file system's time and the making
      // of the text overlap (about 0.2 s of waiting on a 97 MB results file, bench/sweep.mjs).
      // Only one write is ever in flight, so the blocks reach the file in order.
      const file = handle;
      let block = '';
      for (const chunk of data) {
        block += chunk;
        if (block.length >= BLOCK) {
          await inFlight;
          inFlight = file.write(block);
          // a failed write is rethrown by the next await; until then it must not count as unhandled
          inFlight.catch(() => undefined);
          block = '';
        }
      }
      await inFlight;
      if (block) await handle.write(block);
    }
    await handle.close();
    handle = undefined;
    await rename(temp, path);
  } catch (err) {
    await inFlight.catch(() => undefined);
    if (handle) await handle.close().catch(() => undefined);
    await rm(temp, { force: true }).catch(() => undefined);
    throw outputError(path, err);
  }
}
