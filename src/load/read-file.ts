/**
 * Read an input file as UTF-8 text with its SHA-256, for traceability in the results. Only a
 * regular file is read, and only up to a size limit: a FIFO, a device such as /dev/zero or a
 * folder would otherwise hang the run or fill the memory. The file is opened without blocking
 * (a FIFO with no writer would block the open itself) and checked on the open handle, so what
 * is checked is what is read. A byte-order mark is dropped from the text (not from the hash).
 */
import { createHash } from 'node:crypto';
import { constants } from 'node:fs';
import { open } from 'node:fs/promises';
import { InputError, type InputIssue } from '../errors.js';

/** [bytes] largest model, condition table or criteria file read (README, "What modalgate guarantees") */
export const INPUT_LIMIT_BYTES = 256 * 1024 * 1024;
/** [bytes] largest baseline results file read (a results file is some 10 kB per condition) */
export const BASELINE_LIMIT_BYTES = 512 * 1024 * 1024;

export interface ReadOptions {
  /** [bytes] default INPUT_LIMIT_BYTES */
  limitBytes?: number;
  /**
   * Where the file was named (e.g. a model's `conditionTable.file`): a problem reading it is
   * reported there, with the file's path in the message.
   */
  namedAt?: Omit<InputIssue, 'message' | 'code'>;
  /** what the file is, for messages named elsewhere, e.g. 'condition table' */
  what?: string;
}

/** Why a file could not be read, in words: 'file not found', 'is a folder', 'is empty'... */
export class UnreadableFile extends Error {
  readonly reason: string;
  readonly found: string | undefined;
  constructor(reason: string, found?: string) {
    super(reason);
    this.reason = reason;
    this.found = found;
  }
}

export async function readInputFile(path: string, options: ReadOptions = {}): Promise<{ path: string; text: string; sha256: string }> {
  let bytes: Buffer;
  try {
    bytes = await readRegularFile(path, options.limitBytes ?? INPUT_LIMIT_BYTES);
  } catch (err) {
    if (!(err instanceof UnreadableFile)) throw err;
    const { namedAt, what } = options;
    const issue: InputIssue = namedAt
      ? { ...namedAt, message: `the ${what ?? 'file'} ${path} ${err.reason.replace(/^file not found/, 'was not found')}`, ...(err.found ? { found: err.found } : {}), code: 'unreadable' }
      : { file: path, field: '', message: err.reason, ...(err.found ? { found: err.found } : {}), code: 'unreadable' };
    throw new InputError([issue]);
  }
  return { path, text: withoutByteOrderMark(bytes.toString('utf8')), sha256: sha256Hex(bytes) };
}

/**
 * The bytes of a regular, non-empty file of at most `limitBytes`; an UnreadableFile saying why
 * not otherwise.
 */
export async function readRegularFile(path: string, limitBytes: number = INPUT_LIMIT_BYTES): Promise<Buffer> {
  let handle;
  try {
    handle = await open(path, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (err) {
    throw new UnreadableFile(openReason(err as NodeJS.ErrnoException));
  }
  try {
    const info = await handle.stat();
    if (info.isDirectory()) throw new UnreadableFile('is a folder, not a file');
    if (!info.isFile()) throw new UnreadableFile('is not a regular file (a FIFO, socket or device); only regular files are read', kindOf(info));
    if (info.size > limitBytes) throw new UnreadableFile(`is larger than the ${mebibytes(limitBytes)} limit for an input file`, mebibytes(info.size));
    if (info.size === 0) throw new UnreadableFile('is empty', '0 bytes');
    const bytes = await handle.readFile();
    // grown while it was read (being written by something else): not a file to trust
    if (bytes.length > limitBytes) throw new UnreadableFile(`is larger than the ${mebibytes(limitBytes)} limit for an input file`, mebibytes(bytes.length));
    return bytes;
  } catch (err) {
    if (err instanceof UnreadableFile) throw err;
    throw new UnreadableFile(`cannot be read (${(err as NodeJS.ErrnoException).code ?? (err as Error).message})`);
  } finally {
    await handle.close().catch(() => undefined);
  }
}

/** SHA-256 of a file's content, hex, as the results' inputs list it. */
export function sha256Hex(content: string | Buffer): string {
  return createHash('sha256').update(content).digest('hex');
}

/** Text without a leading UTF-8 byte-order mark (some editors write one before JSON or YAML). */
export function withoutByteOrderMark(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

function openReason(err: NodeJS.ErrnoException): string {
  switch (err.code) {
    case 'ENOENT':
      return 'file not found';
    case 'EACCES':
    case 'EPERM':
      return 'cannot be read (no permission)';
    case 'ENOTDIR':
      return 'file not found (a part of its path is not a folder)';
    case 'ELOOP':
      return 'cannot be read (too many symbolic links)';
    default:
      return `cannot be read (${err.code ?? err.message})`;
  }
}

function kindOf(info: { isFIFO(): boolean; isSocket(): boolean; isCharacterDevice(): boolean; isBlockDevice(): boolean }): string {
  if (info.isFIFO()) return 'a FIFO';
  if (info.isSocket()) return 'a socket';
  if (info.isCharacterDevice()) return 'a character device';
  if (info.isBlockDevice()) return 'a block device';
  return 'not a regular file';
}

function mebibytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(bytes < 1024 * 1024 ? 3 : 0)} MiB`;
}
