/**
 * A large sweep's results file written as the conditions are checked: the same bytes as the
 * writer of finished results, and nothing changed or left behind when the run fails.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCheck } from '../../src/check.js';
import { conditionJson, INDENT_UP_TO_CONDITIONS, renderResultsJson } from '../../src/report/json.js';
import type { ResultsHead } from '../../src/types.js';
import { ResultsJsonFile } from '../../src/report/results-json-file.js';
import type { CheckOutcome } from '../../src/check.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'mg-results-file-'));
const model = join(dir, 'sweep.json');
let outcome: CheckOutcome;

beforeAll(async () => {
  // the invented benchmark aircraft, 260 seeded conditions: more than are written indented
  execFileSync(process.execPath, [join(ROOT, 'bench/make-sweep.mjs'), '--count', '260', '--seed', '11', '--out', model]);
  outcome = await runCheck({ model, criteria: ['mil-f-8785c'], toolVersion: 'test', command: ['modalgate'], generatedAt: '2026-12-02T00:00:00.000Z' });
  expect(outcome.results.conditions.length).toBeGreaterThan(INDENT_UP_TO_CONDITIONS);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function headOf(o: CheckOutcome): ResultsHead {
  const { summary: _summary, conditions: _conditions, ...head } = o.results;
  return head;
}

/** [characters] the longest condition line, to size a buffer that holds only a few */
function conditionJsonLength(results: CheckOutcome['results']): number {
  return Math.max(...results.conditions.map((c) => conditionJson(c).length));
}

const leftovers = () => readdirSync(dir).filter((name) => name.endsWith('.tmp'));

describe('ResultsJsonFile', () => {
  it('writes exactly the bytes of the finished-results writer, summary included', async () => {
    const path = join(dir, 'streamed.json');
    const file = ResultsJsonFile.open(path, headOf(outcome));
    for (const c of outcome.results.conditions) file.add(c);
    expect(existsSync(path)).toBe(false); // nothing in place until it is finished
    await file.finish(outcome.results.summary);
    expect(readFileSync(path, 'utf8')).toBe(renderResultsJson(outcome.results));
    expect(JSON.parse(readFileSync(path, 'utf8')).summary).toEqual(outcome.results.summary);
    expect(leftovers()).toEqual([]);
  });

  it('writes the same bytes whatever the buffer size, lines longer than the buffer and non-ASCII text included', async () => {
    // ids in 2-, 3- and 4-byte UTF-8, so that a line's byte length is well above its length
    const conditions = outcome.results.conditions.map((c, i) => (i % 2 === 1 ? { ...c, id: `${c.id}-${'Ünï—✓-𝛼'.repeat(200)}` } : c));
    const results = { ...outcome.results, conditions };
    const expected = renderResultsJson(results);
    const lineLength = conditionJsonLength(results);
    for (const bufferBytes of [4096, 3 * lineLength, 1 << 16, 1 << 22]) {
      const path = join(dir, `buffer-${bufferBytes}.json`);
      const file = ResultsJsonFile.open(path, headOf(outcome), bufferBytes);
      for (const c of conditions) file.add(c);
      await file.finish(results.summary);
      expect(readFileSync(path, 'utf8'), `buffer of ${bufferBytes} bytes`).toBe(expected);
    }
    expect(leftovers()).toEqual([]);
  });

  it('leaves the last good file as it was when abandoned half-way', () => {
    const path = join(dir, 'kept.json');
    writeFileSync(path, 'the last good results');
    const file = ResultsJsonFile.open(path, headOf(outcome));
    for (const c of outcome.results.conditions.slice(0, 120)) file.add(c);
    expect(leftovers()).toHaveLength(1);
    file.abort();
    file.abort(); // twice is harmless
    expect(readFileSync(path, 'utf8')).toBe('the last good results');
    expect(leftovers()).toEqual([]);
    expect(() => file.add(outcome.results.conditions[0]!)).toThrow(/finished or abandoned/);
  });

  it('pads the summary counts to one width, which JSON readers ignore', () => {
    const text = renderResultsJson(outcome.results);
    expect(text).toMatch(/"summary":\{"pass": +\d+,"marginal": +\d+,"fail": +\d+,"not_evaluated": +\d+\}/);
  });
});
