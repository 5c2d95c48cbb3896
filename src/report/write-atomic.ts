/**
 * Write a file so that readers only ever see the old content or the complete new content:
 * write a temporary file beside it, flush it to disk, then rename over the target. A failure
 * at any step removes the temporary file and leaves the existing report untouched.
 */
import { randomBytes } from 'node:crypto';
import { open, rename, rm } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';

/** Text produced piece by piece (e.g. a large results file), written in blocks. */
export type Chunks = Iterable<string>;

const BLOCK = 1 << 20;

export async function writeFileAtomic(path: string, data: string | Buffer | Chunks): Promise<void> {
  // Same directory, so that the rename stays on one file system and is atomic.
  const temp = join(dirname(path), `.${basename(path)}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`);
  let handle: Awaited<ReturnType<typeof open>> | undefined;
  try {
    handle = await open(temp, 'wx', 0o644);
    if (typeof data === 'string' || Buffer.isBuffer(data)) await handle.writeFile(data);
    else {
      let block = '';
      for (const chunk of data) {
        block += chunk;
        if (block.length >= BLOCK) {
          await handle.write(block);
          block = '';
        }
      }
      if (block) await handle.write(block);
    }
    await handle.sync();
    await handle.close();
    handle = undefined;
    await rename(temp, path);
  } catch (err) {
    if (handle) await handle.close().catch(() => undefined);
    await rm(temp, { force: true }).catch(() => undefined);
    throw err;
  }
}
