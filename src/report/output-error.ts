/**
 * A results or report file that cannot be written (missing folder, no permission, full disk)
 * is the user's to fix, not a bug: it becomes an InputError naming the file (exit code 2).
 * Anything else is passed on as it is.
 */
import { InputError } from '../errors.js';

const REASONS: Record<string, string> = {
  ENOENT: 'its folder does not exist',
  ENOTDIR: 'a part of its path is not a folder',
  EACCES: 'no permission to write there',
  EPERM: 'no permission to write there',
  EROFS: 'the file system is read-only',
  ENOSPC: 'the disk is full',
  EDQUOT: 'the disk quota is used up',
  EISDIR: 'a folder of that name is in the way',
  EFBIG: 'the file is too large for the file system',
  ETXTBSY: 'the file is in use',
  MG_NOT_REGULAR: 'it is not a regular file (a FIFO, socket or block device): only regular files and character devices such as /dev/null are written',
};

export function outputError(path: string, err: unknown): unknown {
  const code = (err as NodeJS.ErrnoException | null)?.code;
  if (code === undefined || !(code in REASONS)) return err;
  return new InputError([
    { file: path, field: 'output', message: `cannot write the output file: ${REASONS[code]}`, expected: 'a file that can be written', found: code === 'MG_NOT_REGULAR' ? 'not a regular file' : code, code: 'output_unwritable' },
  ]);
}
