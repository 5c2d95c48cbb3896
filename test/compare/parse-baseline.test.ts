import { describe, expect, it } from 'vitest';
import { parseBaselineResults } from '../../src/compare/parse-baseline.js';
import { compareResults } from '../../src/compare/compare-results.js';
import { renderResultsJson } from '../../src/report/json.js';
import { InputError } from '../../src/errors.js';
import { condition, finding, mode, results } from './results-fixture.js';

/** The smallest file contract 2 allows, written with two-space indents so places are stable. */
function smallFile(): Record<string, any> {
  return {
    format: 'modalgate-results/1',
    tool: { name: 'modalgate', version: '0.1.0' },
    inputs: [{ role: 'model', path: 'm.yaml', sha256: 'ab' }],
    aircraft: { name: 'T', class: 'II-L' },
    conditions: [
      {
        id: 'C1',
        phase: 'CR',
        requiredLevel: 1,
        modes: [{ kind: 'short_period', eigenvalues: [{ re: -1, im: 2 }], naturalFrequency: 2.2, dampingRatio: 0.45 }],
        findings: [{ criterion: 'sp', mode: 'short_period', quantity: 'damping_ratio', value: 0.45, level: 1, verdict: 'pass', margin: 0.1 }],
      },
    ],
  };
}

function messageOf(text: string): string {
  try {
    parseBaselineResults(text, 'old.json');
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }
  throw new Error('expected an InputError');
}

describe('parseBaselineResults: good files', () => {
  it('reads back what the results writer wrote, infinite figures included', () => {
    const written = results({
      conditions: [
        condition({
          id: 'CR-1',
          modes: [mode({ kind: 'spiral', eigenvalues: [{ re: -0.01, im: 0 }], timeConstant: 100 })],
          findings: [finding({ criterion: 'spiral-t2', mode: 'spiral', quantity: 'time_to_double', verdict: 'pass', value: Number.POSITIVE_INFINITY, margin: null })],
        }),
      ],
    });
    const back = parseBaselineResults(renderResultsJson(written), 'old.json');
    expect(back.conditions[0]?.findings[0]?.value).toBeNull();
    expect(back.conditions[0]?.notes).toEqual([]);
    expect(back.inputs).toEqual(written.inputs);
    // Same run on both sides: nothing moved.
    const cmp = compareResults(written, back);
    expect(cmp.counts).toMatchObject({ regressions: 0, improvements: 0, unchanged: 1, findingsAdded: 0, findingsRemoved: 0 });
    expect(cmp.inputs.modelChanged || cmp.inputs.criteriaChanged).toBe(false);
  });

  it('accepts the contract-2 minimum, ignores unknown fields and says which stand-ins it used', () => {
    const file = smallFile();
    file.somethingNew = { a: 1 };
    file.conditions[0].extra = true;
    const back = parseBaselineResults(JSON.stringify(file, null, 2), 'old.json');
    expect(back.conditions[0]?.modes[0]?.naturalFrequency).toBe(2.2);
    expect(back.summary).toEqual({ pass: 1, marginal: 0, fail: 0, not_evaluated: 0 });
    expect(back.conditions[0]?.notes).toEqual([
      'baseline file gave no findings[].evidence (taken from `confidence`: published as secondary, otherwise memory), requiredLevelFrom, airspeed, form, subsystems, coupling: stand-ins used, not for display',
    ]);
    // Neither evidence nor the former confidence: memory, the least trusted class.
    expect(back.conditions[0]?.findings[0]?.evidence).toEqual({ class: 'memory', sources: [] });
    // A file written before evidence classes: its confidence "published" meant "read in a reproduction".
    file.conditions[0].findings[0].confidence = 'published';
    const older = parseBaselineResults(JSON.stringify(file, null, 2), 'old.json');
    expect(older.conditions[0]?.findings[0]?.evidence).toEqual({ class: 'secondary', sources: [] });
    expect('extra' in (back.conditions[0] ?? {})).toBe(false);
  });

  it('reads YAML too', () => {
    const yaml = 'format: modalgate-results/1\ntool: { name: modalgate, version: "0.1.0" }\ninputs: []\naircraft: { name: T, class: I }\nconditions: []\n';
    expect(parseBaselineResults(yaml, 'old.yaml').aircraft.class).toBe('I');
  });
});

describe('parseBaselineResults: bad files, messages pinned', () => {
  const cases: [string, (f: Record<string, any>) => void, string][] = [
    [
      'a model file given as baseline',
      (f) => { f.format = 'modalgate-model/1'; },
      'old.json:2:13: format: not one of the allowed values (expected "modalgate-results/1", found "modalgate-model/1") [invalid_value]',
    ],
    [
      'results of another tool',
      (f) => { f.tool.name = 'other'; },
      'old.json:4:13: tool.name: not one of the allowed values (expected "modalgate", found "other") [invalid_value]',
    ],
    [
      'a value written as text',
      (f) => { f.conditions[0].findings[0].value = '0.45'; },
      'old.json:41:20: conditions[0].findings[0].value: wrong type (expected a finite number, found "0.45") [invalid_type]',
    ],
    [
      'a level that does not exist',
      (f) => { f.conditions[0].findings[0].level = 4; },
      'old.json:42:20: conditions[0].findings[0].level: not one of the allowed values (expected 1 | 2 | 3, found 4) [invalid_value]',
    ],
    [
      'a class that is not one of the standard classes',
      (f) => { f.aircraft.class = 'II'; },
      'old.json:16:14: aircraft.class: not one of the allowed values (expected "I" | "II-L" | "II-C" | "III" | "IV", found "II") [invalid_value]',
    ],
    [
      'no conditions',
      (f) => { delete f.conditions; },
      'old.json:1:1: conditions: missing (expected a list, found nothing) [invalid_type]',
    ],
    [
      'a condition id used twice',
      (f) => { f.conditions.push(f.conditions[0]); },
      'old.json:49:13: conditions[1].id: condition id already used by conditions[0] (expected a unique condition id, found "C1") [duplicate_id]',
    ],
  ];
  it.each(cases)('%s', (_label, mutate, expected) => {
    const file = smallFile();
    mutate(file);
    expect(messageOf(JSON.stringify(file, null, 2))).toBe(expected);
  });

  it('collects every problem in one pass', () => {
    const file = smallFile();
    file.aircraft.class = 'V';
    file.conditions[0].findings[0].verdict = 'ok';
    const lines = messageOf(JSON.stringify(file, null, 2)).split('\n');
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/^old\.json:16:14: aircraft\.class: /);
    expect(lines[1]).toMatch(/^old\.json:43:22: conditions\[0\]\.findings\[0\]\.verdict: .*found "ok"/);
  });

  it('says a file that is not JSON is not JSON', () => {
    expect(messageOf('{ "format": "modalgate-results/1",\n  "tool": { "name": "modalgate" \n}')).toMatch(/^old\.json.*: not valid YAML\/JSON: .*\[syntax\]$/);
  });

  it('says a list is not a results file', () => {
    expect(messageOf('[1, 2]')).toBe('old.json:1:1: wrong type (expected a mapping, found a list of 2) [invalid_type]');
  });
});
