import { describe, expect, it } from 'vitest';
import { renderJunit } from '../../src/report/junit.js';
import type { Finding, Verdict } from '../../src/types.js';
import { condition, finding, results } from '../compare/results-fixture.js';
import { elementsNamed, parseXml, type XmlElement } from './mini-xml.js';

// Short-period damping, MIL-F-8785C 3.2.2.1.2, Category B: Level 1 0.30 to 2.00, Level 2 0.20
// to 2.00, Level 3 at least 0.15 (values from memory).
const spBounds = { '1': { min: 0.3, max: 2 }, '2': { min: 0.2, max: 2 }, '3': { min: 0.15 } };
const sp = (over: Partial<Finding> & { verdict: Verdict }) =>
  finding({ criterion: 'sp-zeta', quantity: 'damping_ratio', bounds: spBounds, ...over });

const mixed = results({
  aircraft: { name: 'Test aircraft', class: 'II-L' },
  conditions: [
    condition({
      id: 'CR-1',
      findings: [
        sp({ verdict: 'pass', value: 0.6, level: 1, margin: 0.3 }),
        sp({ criterion: 'sp-2', verdict: 'marginal', value: 0.31, level: 1, margin: 0.01 }),
        sp({ criterion: 'sp-3', verdict: 'fail', value: 0.25, level: 2, margin: -0.05 }),
      ],
    }),
    condition({
      id: 'PA-1',
      phase: 'PA',
      findings: [
        sp({ criterion: 'dr-zeta', mode: 'dutch_roll', verdict: 'not_evaluated', value: null, level: null, margin: null, reason: 'no Dutch-roll mode was identified' }),
        sp({ criterion: 'dr-wn', mode: 'dutch_roll', verdict: 'marginal', value: 0.42, level: 1, margin: 0.02 }),
      ],
    }),
  ],
});

function counts(e: XmlElement) {
  const a = e.attributes;
  return { tests: a.tests, failures: a.failures, errors: a.errors, skipped: a.skipped, time: a.time };
}

describe('renderJunit: counts', () => {
  const table: ['fail' | 'marginal', { failures: string; skipped: string }, [string, string][]][] = [
    ['fail', { failures: '1', skipped: '1' }, [['1', '0'], ['0', '1']]],
    ['marginal', { failures: '3', skipped: '1' }, [['2', '0'], ['1', '1']]],
  ];
  it.each(table)('failOn %s', (failOn, total, perSuite) => {
    const root = parseXml(renderJunit(mixed, { failOn }));
    expect(root.name).toBe('testsuites');
    expect(counts(root)).toEqual({ tests: '5', failures: total.failures, errors: '0', skipped: total.skipped, time: '0' });
    const suites = elementsNamed(root, 'testsuite');
    expect(suites.map((s) => s.attributes.name)).toEqual(['Test aircraft.CR-1', 'Test aircraft.PA-1']);
    expect(suites.map((s) => [s.attributes.failures, s.attributes.skipped])).toEqual(perSuite);
    expect(elementsNamed(root, 'failure')).toHaveLength(Number(total.failures));
    expect(elementsNamed(root, 'skipped')).toHaveLength(1);
    for (const t of elementsNamed(root, 'testcase')) expect(t.attributes.time).toBe('0');
  });

  it('names test cases <criterion id> <quantity in words, never an internal name>, classname <aircraft>.<condition id>', () => {
    const cases = elementsNamed(parseXml(renderJunit(mixed, { failOn: 'fail' })), 'testcase');
    expect(cases.map((c) => `${c.attributes.classname} | ${c.attributes.name}`)).toEqual([
      'Test aircraft.CR-1 | sp-zeta damping ratio',
      'Test aircraft.CR-1 | sp-2 damping ratio',
      'Test aircraft.CR-1 | sp-3 damping ratio',
      'Test aircraft.PA-1 | dr-zeta damping ratio',
      'Test aircraft.PA-1 | dr-wn damping ratio',
    ]);
  });

  it('puts value, bounds, level and margin in the failure message', () => {
    const failure = elementsNamed(parseXml(renderJunit(mixed, { failOn: 'fail' })), 'failure')[0];
    expect(failure?.attributes.type).toBe('fail');
    expect(failure?.attributes.message).toBe('fail: value 0.2500 [-], Level 1 bounds min 0.3000 max 2.000, level reached 2 (required 1), margin -0.0500');
    expect(failure?.text).toContain('Level 3: min 0.1500');
    expect(failure?.text).toContain('evidence of the boundary: memory (recalled or inferred, not read in any retrievable text');
  });

  it('gives the reason of a finding not evaluated', () => {
    const skipped = elementsNamed(parseXml(renderJunit(mixed, { failOn: 'fail' })), 'skipped');
    expect(skipped[0]?.attributes.message).toBe('no Dutch-roll mode was identified');
  });

  it('shows a marginal finding in the log when it does not fail the build', () => {
    const root = parseXml(renderJunit(mixed, { failOn: 'fail' }));
    const marginal = elementsNamed(root, 'testcase').find((c) => c.attributes.name === 'sp-2 damping ratio');
    expect(marginal?.children.map((c) => c.name)).toEqual(['system-out']);
    expect(marginal?.children[0]?.text).toMatch(/^marginal: value 0\.3100 .*\(not a failure unless failing on marginal\)$/);
  });

  it('writes an empty suite for a condition with no findings', () => {
    const root = parseXml(renderJunit(results({ conditions: [condition({ id: 'X' })] }), { failOn: 'fail' }));
    expect(counts(elementsNamed(root, 'testsuite')[0]!)).toEqual({ tests: '0', failures: '0', errors: '0', skipped: '0', time: '0' });
  });
});

describe('renderJunit: escaping', () => {
  const nasty = `A<&>"'B`;
  const table: { field: string; make: () => ReturnType<typeof results>; read: (root: XmlElement) => string | undefined; expected: string }[] = [
    {
      field: 'aircraft name in classname',
      make: () => results({ aircraft: { name: nasty, class: 'I' }, conditions: [condition({ id: 'c', findings: [sp({ verdict: 'pass' })] })] }),
      read: (r) => elementsNamed(r, 'testcase')[0]?.attributes.classname,
      expected: `${nasty}.c`,
    },
    {
      field: 'condition id in suite name',
      make: () => results({ conditions: [condition({ id: nasty, findings: [] })] }),
      read: (r) => elementsNamed(r, 'testsuite')[0]?.attributes.name,
      expected: `Test aircraft.${nasty}`,
    },
    {
      field: 'criterion id in test name',
      make: () => results({ conditions: [condition({ id: 'c', findings: [sp({ criterion: nasty, verdict: 'pass' })] })] }),
      read: (r) => elementsNamed(r, 'testcase')[0]?.attributes.name,
      expected: `${nasty} damping ratio`,
    },
    {
      field: 'unit in the failure message',
      make: () => results({ conditions: [condition({ id: 'c', findings: [sp({ verdict: 'fail', unit: nasty, value: 0.1, level: null, margin: -0.2 })] })] }),
      read: (r) => elementsNamed(r, 'failure')[0]?.attributes.message,
      expected: `fail: value 0.1000 [${nasty}], Level 1 bounds min 0.3000 max 2.000, level reached none (required 1), margin -0.200`,
    },
    {
      field: 'reason with a newline and a tab in an attribute',
      make: () => results({ conditions: [condition({ id: 'c', findings: [sp({ verdict: 'not_evaluated', reason: `line 1 ${nasty}\n\tline 2` })] })] }),
      read: (r) => elementsNamed(r, 'skipped')[0]?.attributes.message,
      expected: `line 1 ${nasty}\n\tline 2`,
    },
    {
      field: 'source in failure text',
      make: () => results({ conditions: [condition({ id: 'c', findings: [sp({ verdict: 'fail', source: nasty })] })] }),
      read: (r) => elementsNamed(r, 'failure')[0]?.text.split('\n').find((l) => l.startsWith('source: ')),
      expected: `source: ${nasty}`,
    },
    {
      field: 'control character and lone surrogate replaced',
      make: () => results({ conditions: [condition({ id: 'c', findings: [sp({ verdict: 'not_evaluated', reason: 'a\u0001b\ud800c' })] })] }),
      read: (r) => elementsNamed(r, 'skipped')[0]?.attributes.message,
      expected: 'a\ufffdb\ufffdc',
    },
    {
      field: 'warning in suite output',
      make: () => results({ conditions: [condition({ id: 'c', warnings: [`coupled ${nasty}`] })] }),
      read: (r) => elementsNamed(r, 'system-out')[0]?.text,
      expected: `warning: coupled ${nasty}`,
    },
  ];
  it.each(table)('$field', ({ make, read, expected }) => {
    const xml = renderJunit(make(), { failOn: 'fail' });
    expect(read(parseXml(xml))).toBe(expected);
  });

  it('never leaves a raw special inside an attribute value', () => {
    const xml = renderJunit(table[0]!.make(), { failOn: 'fail' });
    expect(xml).toContain('classname="A&lt;&amp;&gt;&quot;&apos;B.c"');
  });
});

describe('the XML reader used here rejects what is not well-formed', () => {
  const bad = ['<a><b></a></b>', '<a x="1" x="2"/>', '<a>&bogus;</a>', '<a x="<"/>', '<a>1 & 2</a>', '<a/><b/>', '<a>\u0001</a>'];
  it.each(bad)('%s', (xml) => {
    expect(() => parseXml(xml)).toThrow(/not well-formed/);
  });
});
