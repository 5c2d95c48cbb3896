/** Read an input file as UTF-8 text with its SHA-256, for traceability in the results. */
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { InputError } from '../errors.js';

export async function readInputFile(path: string): Promise<{ path: string; text: string; sha256: string }> {
  let bytes: Buffer;
  try {
    bytes = await readFile(path);
  } catch (err) {
    const reason = (err as NodeJS.ErrnoException).code === 'ENOENT' ? 'file not found' : `cannot be read (${(err as Error).message})`;
    throw new InputError([{ file: path, field: '', message: reason, code: 'unreadable' }]);
  }
  return { path, text: bytes.toString('utf8'), sha256: sha256Hex(bytes) };
}

/** SHA-256 of a file's content, hex, as the results' inputs list it. */
export function sha256Hex(content: string | Buffer): string {
  return createHash('sha256').update(content).digest('hex');
}
