/**
 * The JUnit file of a sweep written as the conditions are checked: the same bytes as the
 * writer of finished results, and nothing changed or left behind when the run fails.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCheck, type CheckOutcome } from '../../src/check.js';
import { JunitFile } from '../../src/report/junit-file.js';
import { renderJunit } from '../../src/report/junit.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'mg-junit-file-'));
const model = join(dir, 'sweep.json');
let outcome: CheckOutcome;

beforeAll(async () => {
  // the invented benchmark aircraft, 120 seeded conditions, US units and cross terms (warnings)
  execFileSync(process.execPath, [join(ROOT, 'bench/make-sweep.mjs'), '--count', '120', '--seed', '7', '--units', 'US', '--coupled', '--out', model]);
  outcome = await runCheck({ model, criteria: ['mil-f-8785c'], toolVersion: 'test', command: ['modalgate'], generatedAt: '2026-12-02T00:00:00.000Z' });
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const leftovers = () => readdirSync(dir).filter((name) => name.endsWith('.tmp'));

describe('JunitFile', () => {
  it.each([['fail'], ['marginal']] as const)('writes exactly the bytes of renderJunit (failing on %s), whatever the buffer size', async (failOn) => {
    // an aircraft name in 2-, 3- and 4-byte UTF-8 and XML specials, so that escaping and byte
    // lengths are exercised
    const aircraft = `Tern <"Ünï—✓-𝛼" & co>`;
    const results = { ...outcome.results, aircraft: { ...outcome.results.aircraft, name: aircraft } };
    const expected = renderJunit(results, { failOn });
    expect(expected).toMatch(/<failure /);
    for (const bufferBytes of [1024, 1 << 16, 1 << 22]) {
      const path = join(dir, `streamed-${failOn}-${bufferBytes}.xml`);
      const file = JunitFile.open(path, aircraft, { failOn }, bufferBytes);
      for (const c of results.conditions) file.add(c);
      expect(readdirSync(dir)).not.toContain(`streamed-${failOn}-${bufferBytes}.xml`); // nothing in place until finished
      await file.finish();
      expect(readFileSync(path, 'utf8'), `buffer of ${bufferBytes} bytes`).toBe(expected);
    }
    expect(leftovers()).toEqual([]);
  });

  it('writes a file with no conditions as renderJunit does', async () => {
    const path = join(dir, 'empty.xml');
    const file = JunitFile.open(path, 'Tern', { failOn: 'fail' });
    await file.finish();
    expect(readFileSync(path, 'utf8')).toBe(renderJunit({ ...outcome.results, aircraft: { ...outcome.results.aircraft, name: 'Tern' }, conditions: [] }, { failOn: 'fail' }));
  });

  it('leaves the last good file as it was when abandoned half-way', () => {
    const path = join(dir, 'kept.xml');
    writeFileSync(path, 'the last good JUnit');
    const file = JunitFile.open(path, 'Tern', { failOn: 'fail' });
    for (const c of outcome.results.conditions.slice(0, 60)) file.add(c);
    expect(leftovers()).toHaveLength(1);
    file.abort();
    file.abort(); // twice is harmless
    expect(readFileSync(path, 'utf8')).toBe('the last good JUnit');
    expect(leftovers()).toEqual([]);
    expect(() => file.add(outcome.results.conditions[0]!)).toThrow(/finished or abandoned/);
  });
});
