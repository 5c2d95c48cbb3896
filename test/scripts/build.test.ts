/**
 * scripts/build.mjs decides whether dist/ is current with the sources (npm's prepare skips
 * the compile when it is, e.g. the second time round on `npx modalgate`). Checked on a small
 * scratch tree with --status, which builds nothing.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const SCRIPT = fileURLToPath(new URL('../../scripts/build.mjs', import.meta.url));
const root = mkdtempSync(join(tmpdir(), 'mg-build-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));

const status = () => execFileSync(process.execPath, [SCRIPT, '--status', '--root', root], { encoding: 'utf8' }).trim();
// the digest the script records after a build, as `--status` computes it
const digest = () =>
  execFileSync(process.execPath, ['--input-type=module', '-e', `import { sourcesDigest } from ${JSON.stringify(SCRIPT)}; process.stdout.write(sourcesDigest(${JSON.stringify(root)}))`], { encoding: 'utf8' });

describe('scripts/build.mjs --status', () => {
  it('is stale without outputs, without a record, and after any source change; current otherwise', () => {
    writeFileSync(join(root, 'package.json'), '{"name":"scratch","type":"module"}');
    writeFileSync(join(root, 'tsconfig.json'), '{}');
    writeFileSync(join(root, 'tsconfig.build.json'), '{}');
    mkdirSync(join(root, 'src', 'modes'), { recursive: true });
    writeFileSync(join(root, 'src', 'cli.ts'), 'export const a = 1;\n');
    writeFileSync(join(root, 'src', 'modes', 'eigen.ts'), 'export const b = 2;\n');
    expect(status()).toBe('stale: dist/cli.js is missing');

    mkdirSync(join(root, 'dist'));
    writeFileSync(join(root, 'dist', 'cli.js'), '');
    writeFileSync(join(root, 'dist', 'index.js'), '');
    expect(status()).toBe('stale: no record of the sources dist/ was built from');

    writeFileSync(join(root, 'dist', '.sources-sha256'), `${digest()}\n`);
    expect(status()).toBe('current');

    // a changed file, a new file and a changed compiler setting each make it stale
    writeFileSync(join(root, 'src', 'modes', 'eigen.ts'), 'export const b = 3;\n');
    expect(status()).toBe('stale: the sources changed since dist/ was built');
    writeFileSync(join(root, 'dist', '.sources-sha256'), `${digest()}\n`);
    writeFileSync(join(root, 'src', 'modes', 'extra.ts'), '');
    expect(status()).toMatch(/^stale: the sources changed/);
    writeFileSync(join(root, 'dist', '.sources-sha256'), `${digest()}\n`);
    expect(status()).toBe('current');
    writeFileSync(join(root, 'tsconfig.build.json'), '{"compilerOptions":{}}');
    expect(status()).toMatch(/^stale: the sources changed/);
  });
});
