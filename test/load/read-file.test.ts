import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { readInputFile } from '../../src/load/read-file.js';

describe('readInputFile', () => {
  const dir = mkdtempSync(join(tmpdir(), 'modalgate-read-'));

  it('returns the text and its SHA-256 ("abc": FIPS 180-2, appendix B.1 example)', async () => {
    const path = join(dir, 'abc.txt');
    writeFileSync(path, 'abc');
    expect(await readInputFile(path)).toEqual({ path, text: 'abc', sha256: 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad' });
  });

  it('a missing file is an InputError with code unreadable', async () => {
    const path = join(dir, 'nope.yaml');
    const err = await readInputFile(path).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).message).toBe(`${path}: file not found [unreadable]`);
  });

  it('a directory is unreadable too', async () => {
    const err = await readInputFile(dir).catch((e: unknown) => e);
    expect((err as InputError).issues[0]!.code).toBe('unreadable');
  });
});
