/**
 * Write a set of output files so that the set changes as one: every file is first written in
 * full under a temporary name beside its target, then all are put in place together. When
 * putting one in place fails, the ones already put in place get their previous content back
 * (kept as a hard link until the set is in place), so a failed run leaves every output as it
 * was; where even that fails, the error names exactly the outputs that were replaced.
 *
 * - Targets are real paths: a symbolic link is followed and the file it points to replaced.
 * - A character device (`/dev/null`, a terminal) is written through, never renamed over; any
 *   other file that is not a regular file (FIFO, socket, block device, folder) is refused.
 * - Runs writing the same outputs at once take turns: a lock file beside each output is held
 *   while the set is put in place, so the set is always one run's.
 * - Temporary, kept and lock files are named `.<output>.modalgate-<pid>-...`: they are removed
 *   on a signal (see removeLiveTemporaries), and a later run writing the same output removes
 *   those of runs that no longer exist.
 *
 * The temporary files are not flushed to disk (fsync) before the rename. What is promised is
 * that a failed run loses nothing, not that a report survives a power cut in the seconds after
 * it was written; the flush made every run wait on the disk (about 0.2-0.3 s for the 97 MB
 * results file of a 10,000-condition sweep, bench/sweep.mjs).
 */
import { randomBytes } from 'node:crypto';
import { rmSync, statSync } from 'node:fs';
import { link, lstat, open, readdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { InputError, type InputIssue } from '../errors.js';
import { realPath } from '../real-path.js';
import { outputError } from './output-error.js';

/** Text produced piece by piece (e.g. a large results file), written in blocks. */
export type Chunks = Iterable<string>;

/** One output written in full and waiting to be put in place. */
export type PreparedFile =
  /** a regular file (or a new one): `temp` is renamed over `target` */
  | { path: string; target: string; temp: string }
  /** a character device: the bytes are written through to it */
  | { path: string; target: string; device: Buffer };

/** An output set that failed after some of its files were put in place and could not be put back. */
export class OutputSetError extends InputError {
  /** the outputs (as the user named them) that now hold this run's content */
  readonly written: string[];

  constructor(issues: InputIssue[], written: string[]) {
    super(issues);
    this.written = written;
  }
}

const BLOCK = 1 << 20;
const MARK = 'modalgate';
/** [ms] how long to wait for another run to finish putting the same outputs in place */
const LOCK_WAIT_MS = 10_000;

/** Temporary, kept and lock files of this process, removed on a signal. */
const live = new Set<string>();
let committing = 0;
let afterCommit: (() => void) | undefined;

/** A fresh hidden name beside `path` (same folder, so that the rename stays on one file system). */
export function newTemporary(path: string, ending: 'tmp' | 'keep' = 'tmp'): string {
  const name = join(dirname(path), `.${basename(path)}.${MARK}-${process.pid}-${randomBytes(4).toString('hex')}.${ending}`);
  live.add(name);
  return name;
}

/** Remove a temporary file made by newTemporary (or forget one already renamed). */
export function dropTemporary(name: string, remove = true): void {
  live.delete(name);
  if (remove) rmSync(name, { force: true });
}

/**
 * For a signal handler: remove every temporary, kept and lock file of this process at once.
 * While a set is being put in place, returns false and calls `then` when it is done instead
 * (stopping half-way would leave a mixed set).
 */
export function removeLiveTemporaries(then?: () => void): boolean {
  if (committing > 0 && then) {
    afterCommit = then;
    return false;
  }
  for (const name of live) rmSync(name, { force: true });
  live.clear();
  return true;
}

/**
 * The path the output really goes to: an existing file (or link) by its real path, a new one
 * in its folder's real path. Used to compare outputs with each other and with the inputs.
 */
export const realTarget = realPath;

/** What is at `target` now: nothing, a regular file, a character device, or something refused. */
export function targetKind(target: string): 'none' | 'file' | 'device' | 'other' {
  let info;
  try {
    info = statSync(target);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return 'none';
    throw err;
  }
  if (info.isFile()) return 'file';
  if (info.isCharacterDevice()) return 'device';
  return 'other';
}

/** Write `data` in full under a temporary name beside `path` (nothing at `path` changes yet). */
export async function prepareFile(path: string, data: string | Buffer | Chunks): Promise<PreparedFile> {
  const target = realTarget(path);
  try {
    const kind = targetKind(target);
    if (kind === 'other') throw notRegular();
    if (kind === 'device') return { path, target, device: await bytesOf(data) };
  } catch (err) {
    throw outputError(path, err);
  }
  await sweepLeftovers(target);
  const temp = newTemporary(target);
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
    return { path, target, temp };
  } catch (err) {
    await inFlight.catch(() => undefined);
    if (handle) await handle.close().catch(() => undefined);
    dropTemporary(temp);
    throw outputError(path, err);
  }
}

/** Throw away prepared files that will not be put in place. */
export function discardPrepared(files: readonly PreparedFile[]): void {
  for (const f of files) if ('temp' in f) dropTemporary(f.temp);
}

/**
 * Put every prepared file in place, as one set: all of them, or (on failure) none, each
 * earlier output restored; an OutputSetError names any output that could not be restored.
 */
export async function commitFiles(files: readonly PreparedFile[]): Promise<void> {
  committing += 1;
  const locks: string[] = [];
  const placed: { file: PreparedFile & { temp: string }; existed: boolean; kept: string | undefined }[] = [];
  let kept: string[] = [];
  try {
    for (const target of [...new Set(files.map((f) => f.target))].sort()) locks.push(await takeLock(target));
    // Devices first: there is nothing to restore on a device, so a failure there must come
    // before any file is replaced.
    for (const f of files) {
      if (!('device' in f)) continue;
      try {
        await writeFile(f.target, f.device);
      } catch (err) {
        throw outputError(f.path, err);
      }
    }
    for (const f of files) {
      if (!('temp' in f)) continue;
      try {
        const kind = targetKind(f.target);
        if (kind !== 'none' && kind !== 'file') throw notRegular();
        let keep: string | undefined;
        if (kind === 'file') {
          keep = newTemporary(f.target, 'keep');
          // without hard links (some network file systems) the old file cannot be kept
          await link(f.target, keep).catch(() => {
            dropTemporary(keep!, false);
            keep = undefined;
          });
          if (keep) kept.push(keep);
        }
        await rename(f.temp, f.target);
        dropTemporary(f.temp, false);
        placed.push({ file: f, existed: kind === 'file', kept: keep });
      } catch (err) {
        throw outputError(f.path, err);
      }
    }
    for (const k of kept) dropTemporary(k);
    kept = [];
  } catch (err) {
    const written: string[] = [];
    for (const { file, existed, kept: keep } of placed.reverse()) {
      try {
        if (keep) {
          await rename(keep, file.target);
          dropTemporary(keep, false);
        } else if (existed) throw new Error('the previous file was not kept');
        else await rm(file.target, { force: true });
      } catch {
        written.push(file.path);
      }
    }
    for (const k of kept) dropTemporary(k);
    discardPrepared(files);
    if (written.length > 0 && err instanceof InputError) throw new OutputSetError(err.issues, written.reverse());
    throw err;
  } finally {
    for (const lock of locks) dropTemporary(lock);
    committing -= 1;
    if (committing === 0 && afterCommit) {
      const then = afterCommit;
      afterCommit = undefined;
      removeLiveTemporaries();
      then();
    }
  }
}

/** Write one file atomically (a set of one). */
export async function writeFileAtomic(path: string, data: string | Buffer | Chunks): Promise<void> {
  const prepared = await prepareFile(path, data);
  await commitFiles([prepared]);
}

async function bytesOf(data: string | Buffer | Chunks): Promise<Buffer> {
  if (Buffer.isBuffer(data)) return data;
  if (typeof data === 'string') return Buffer.from(data);
  return Buffer.from([...data].join(''));
}

function notRegular(): NodeJS.ErrnoException {
  return Object.assign(new Error('not a regular file'), { code: 'MG_NOT_REGULAR' });
}

/**
 * Take the lock beside `target`, waiting while a live run holds it; a lock left by a run that
 * no longer exists is taken over.
 */
async function takeLock(target: string): Promise<string> {
  const lock = join(dirname(target), `.${basename(target)}.${MARK}.lock`);
  const start = Date.now();
  for (;;) {
    try {
      await writeFile(lock, `${process.pid}\n`, { flag: 'wx', mode: 0o644 });
      live.add(lock);
      return lock;
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code !== 'EEXIST') throw outputError(target, err);
    }
    const holder = Number.parseInt(await readFile(lock, 'utf8').catch(() => ''), 10);
    if (Number.isInteger(holder) && !isAlive(holder)) {
      await rm(lock, { force: true });
      continue;
    }
    if (Date.now() - start > LOCK_WAIT_MS) {
      throw new InputError([
        {
          file: target,
          field: 'output',
          message: `another modalgate run (process ${Number.isInteger(holder) ? holder : 'unknown'}) is writing this output; try again when it has finished`,
          expected: 'no other run writing the same output',
          found: lock,
          code: 'output_locked',
        },
      ]);
    }
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}

/** Remove the temporary, kept and lock files beside `target` left by runs that no longer exist. */
async function sweepLeftovers(target: string): Promise<void> {
  const prefix = `.${basename(target)}.${MARK}-`;
  const names = await readdir(dirname(target)).catch(() => [] as string[]);
  for (const name of names) {
    if (!name.startsWith(prefix)) continue;
    const match = /^(\d+)-[0-9a-f]{8}\.(?:tmp|keep)$/.exec(name.slice(prefix.length));
    if (!match) continue;
    const pid = Number(match[1]);
    if (pid === process.pid || isAlive(pid)) continue;
    const path = join(dirname(target), name);
    if ((await lstat(path).catch(() => undefined))?.isFile()) await rm(path, { force: true });
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}
