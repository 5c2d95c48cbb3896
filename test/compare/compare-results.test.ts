import { describe, expect, it } from 'vitest';
import { compareResults } from '../../src/compare/compare-results.js';
import { formatComparisonText } from '../../src/compare/format-comparison.js';
import { comparisonView } from '../../src/report/comparison/comparison-view.js';
import type { InputFile, Verdict } from '../../src/types.js';
import { condition, finding, mode, results } from './results-fixture.js';

describe('compareResults: verdict transitions', () => {
  // Five criteria on one condition; each row is (criterion, baseline verdict, current verdict).
  const rows: [string, Verdict, Verdict][] = [
    ['c-marginal', 'pass', 'marginal'],
    ['c-fail', 'marginal', 'fail'],
    ['c-lost', 'pass', 'not_evaluated'],
    ['c-better', 'fail', 'pass'],
    ['c-same', 'pass', 'pass'],
    ['c-better-2', 'marginal', 'pass'],
  ];
  const base = results({ conditions: [condition({ id: 'CR-1', findings: rows.map(([c, v]) => finding({ criterion: c, verdict: v })) })] });
  const now = results({ conditions: [condition({ id: 'CR-1', findings: rows.map(([c, , v]) => finding({ criterion: c, verdict: v })) })] });
  const cmp = compareResults(now, base);

  it('lists regressions first (fail, then not evaluated, then marginal), improvements after, unchanged last', () => {
    expect(cmp.findings.map((f) => [f.criterion, f.transition])).toEqual([
      ['c-fail', 'regression'],
      ['c-lost', 'regression'],
      ['c-marginal', 'regression'],
      ['c-better', 'improvement'],
      ['c-better-2', 'improvement'],
      ['c-same', 'unchanged'],
    ]);
  });

  it('counts each kind', () => {
    expect(cmp.counts).toMatchObject({ regressions: 3, improvements: 2, unchanged: 1, findingsAdded: 0, findingsRemoved: 0 });
  });

  it('keeps both verdicts and levels', () => {
    const f = cmp.findings.find((x) => x.criterion === 'c-fail');
    expect(f?.verdict).toEqual({ baseline: 'marginal', current: 'fail' });
    expect(f?.level).toEqual({ baseline: 1, current: 1 });
  });
});

describe('compareResults: figure changes', () => {
  // Two design iterations of the same airframe: the baseline with the short-period figures
  // from Nelson's rounded derivatives (Nelson, Flight Stability and Automatic Control, 2nd ed.,
  // 1998, ch. 4; eigenvalues -2.489 +/- 2.601i computed from the printed A matrix, common
  // practice), the current run with the published roots -2.51 +/- 2.59i (same chapter, from memory).
  const wnBase = Math.hypot(-2.489, 2.601);
  const zBase = 2.489 / wnBase;
  const wnNow = Math.hypot(-2.51, 2.59);
  const zNow = 2.51 / wnNow;
  const sp = (wn: number, z: number) => mode({ kind: 'short_period', naturalFrequency: wn, dampingRatio: z });
  const base = results({
    conditions: [condition({ id: 'SL', modes: [sp(wnBase, zBase)], findings: [finding({ criterion: 'sp-zeta', verdict: 'pass', value: zBase, margin: zBase - 0.35 })] })],
  });
  const now = results({
    conditions: [condition({ id: 'SL', modes: [sp(wnNow, zNow)], findings: [finding({ criterion: 'sp-zeta', verdict: 'pass', value: zNow, margin: zNow - 0.35 })] })],
  });
  const cmp = compareResults(now, base);

  it('gives omega_n and zeta as absolute and relative changes', () => {
    // Check values: omega_n 3.600 -> 3.607 rad/s, zeta 0.691 -> 0.696 (Nelson, 2nd ed., ch. 4).
    expect(wnBase).toBeCloseTo(3.600, 3);
    expect(wnNow).toBeCloseTo(3.607, 3);
    const m = cmp.modes[0];
    expect(m).toMatchObject({ condition: 'SL', kind: 'short_period', index: 0, presence: 'both' });
    expect(m?.naturalFrequency.delta).toBeCloseTo(wnNow - wnBase, 12);
    expect(m?.naturalFrequency.relative).toBeCloseTo((wnNow - wnBase) / wnBase, 12);
    expect(m?.dampingRatio.baseline).toBeCloseTo(0.691, 3);
    expect(m?.dampingRatio.delta).toBeCloseTo(zNow - zBase, 12);
  });

  it('gives the finding value and margin changes', () => {
    const f = cmp.findings[0];
    expect(f?.transition).toBe('unchanged');
    expect(f?.value.delta).toBeCloseTo(zNow - zBase, 12);
    expect(f?.margin.relative).toBeCloseTo((zNow - zBase) / (zBase - 0.35), 12);
  });

  const figureCases: [string, number | null, number | null, { delta: number | null; relative: number | null }][] = [
    ['both finite', 2, 3, { delta: 1, relative: 0.5 }],
    ['negative baseline uses |baseline|', -2, -3, { delta: -1, relative: -0.5 }],
    ['zero baseline has no relative change', 0, 1, { delta: 1, relative: null }],
    ['figure appeared', null, 1, { delta: null, relative: null }],
    // JSON writes an infinite time to double as null: the two runs hold the same figure.
    ['infinite now, null in the file', null, Number.POSITIVE_INFINITY, { delta: null, relative: null }],
  ];
  it.each(figureCases)('finding value change: %s', (_label, before, after, expected) => {
    const b = results({ conditions: [condition({ id: 'X', findings: [finding({ criterion: 'k', verdict: 'pass', value: before })] })] });
    const a = results({ conditions: [condition({ id: 'X', findings: [finding({ criterion: 'k', verdict: 'pass', value: after })] })] });
    expect(compareResults(a, b).findings[0]?.value).toMatchObject(expected);
  });

  it('pairs modes of one kind in order and reports modes that came or went', () => {
    const b = results({ conditions: [condition({ id: 'X', modes: [mode({ kind: 'spiral' }), mode({ kind: 'other' }), mode({ kind: 'other' })] })] });
    const a = results({ conditions: [condition({ id: 'X', modes: [mode({ kind: 'roll' }), mode({ kind: 'other' })] })] });
    expect(compareResults(a, b).modes.map((m) => [m.kind, m.index, m.presence])).toEqual([
      ['roll', 0, 'added'],
      ['other', 0, 'both'],
      ['other', 1, 'removed'],
      ['spiral', 0, 'removed'],
    ]);
  });
});

describe('compareResults: conditions and criteria that came or went', () => {
  const base = results({
    conditions: [
      condition({ id: 'CR-1', findings: [finding({ criterion: 'a', verdict: 'pass' }), finding({ criterion: 'old', verdict: 'fail' })] }),
      condition({ id: 'PA-9', phase: 'PA', findings: [finding({ criterion: 'a', verdict: 'fail' })] }),
    ],
  });
  const now = results({
    conditions: [
      condition({ id: 'CR-1', findings: [finding({ criterion: 'a', verdict: 'pass' }), finding({ criterion: 'new', verdict: 'marginal' })] }),
      condition({ id: 'CR-2', findings: [finding({ criterion: 'a', verdict: 'fail' }), finding({ criterion: 'a', verdict: 'pass', quantity: 'cap' })] }),
    ],
  });
  const cmp = compareResults(now, base);

  it('names added and removed conditions with their verdict counts', () => {
    expect(cmp.conditions.common).toBe(1);
    expect(cmp.conditions.added).toEqual([{ id: 'CR-2', phase: 'CR', summary: { pass: 1, marginal: 0, fail: 1, not_evaluated: 0 } }]);
    expect(cmp.conditions.removed).toEqual([{ id: 'PA-9', phase: 'PA', summary: { pass: 0, marginal: 0, fail: 1, not_evaluated: 0 } }]);
    expect(cmp.counts).toMatchObject({ conditionsAdded: 1, conditionsRemoved: 1 });
  });

  it('names criteria added and removed over all conditions', () => {
    expect(cmp.criteria).toEqual({ added: ['new'], removed: ['old'] });
  });

  it('lists findings new or gone within a common condition', () => {
    expect(cmp.findingsAdded).toEqual([{ condition: 'CR-1', criterion: 'new', mode: 'short_period', quantity: 'damping_ratio', verdict: 'marginal' }]);
    expect(cmp.findingsRemoved).toEqual([{ condition: 'CR-1', criterion: 'old', mode: 'short_period', quantity: 'damping_ratio', verdict: 'fail' }]);
  });

  it('notices an aircraft renamed or reclassed', () => {
    expect(cmp.aircraftChanged).toBe(false);
    expect(compareResults(results({ aircraft: { name: 'Test aircraft', class: 'III' } }), base).aircraftChanged).toBe(true);
  });

  it('names the criteria whose boundary evidence changed, with the findings it concerns', () => {
    const before = results({
      conditions: [
        condition({ id: 'CR-1', findings: [finding({ criterion: 'a', verdict: 'pass' }), finding({ criterion: 'b', verdict: 'pass' })] }),
        condition({ id: 'CR-2', findings: [finding({ criterion: 'a', verdict: 'pass' })] }),
      ],
    });
    const read = { class: 'published' as const, sources: ['spec'] };
    const after = results({
      conditions: [
        condition({ id: 'CR-1', findings: [finding({ criterion: 'a', verdict: 'pass', evidence: read }), finding({ criterion: 'b', verdict: 'pass' })] }),
        condition({ id: 'CR-2', findings: [finding({ criterion: 'a', verdict: 'pass', evidence: read })] }),
      ],
    });
    const cmp = compareResults(after, before);
    expect(cmp.evidenceChanges).toEqual([{ criterion: 'a', baseline: 'memory', current: 'published', findings: 2 }]);
    expect(cmp.findings.find((f) => f.criterion === 'a')?.evidence).toEqual({ baseline: 'memory', current: 'published' });
    expect(formatComparisonText(cmp, { color: false })).toContain('Boundary evidence changed (1)\n  a: memory -> published (2 finding(s))');
    expect(comparisonView(cmp, () => null).criteriaChanges).toContain('boundary evidence of a: memory \u2192 published (2 findings)');
    expect(compareResults(before, before).evidenceChanges).toEqual([]);
  });

  it('reports criteria sets added and removed', () => {
    const other = results({ criteriaSets: [{ id: 'civil-23', title: 'Civil', chain: ['civil-23'], sources: [] }] });
    expect(compareResults(other, base).criteriaSets).toEqual({ added: ['civil-23'], removed: ['test-set'] });
  });
});

describe('compareResults: did the model or the criteria change?', () => {
  const model = (path: string, sha: string): InputFile => ({ role: 'model', path, sha256: sha });
  const crit = (path: string, sha: string): InputFile => ({ role: 'criteria', path, sha256: sha });
  const cases: {
    name: string;
    baseline: InputFile[];
    current: InputFile[];
    model: boolean;
    criteria: boolean;
    statuses: string[];
  }[] = [
    { name: 'same files, same content', baseline: [model('/a/m.yaml', '1'), crit('/a/c.yaml', '2')], current: [model('/a/m.yaml', '1'), crit('/a/c.yaml', '2')], model: false, criteria: false, statuses: ['same', 'same'] },
    { name: 'model edited', baseline: [model('/a/m.yaml', '1'), crit('/a/c.yaml', '2')], current: [model('/a/m.yaml', '9'), crit('/a/c.yaml', '2')], model: true, criteria: false, statuses: ['changed', 'same'] },
    { name: 'criteria edited', baseline: [model('m.yaml', '1'), crit('c.yaml', '2')], current: [model('m.yaml', '1'), crit('c.yaml', '3')], model: false, criteria: true, statuses: ['same', 'changed'] },
    { name: 'other checkout, same base names', baseline: [model('/ci/run/m.yaml', '1')], current: [model('C:\\work\\m.yaml', '1')], model: false, criteria: false, statuses: ['same'] },
    { name: 'criteria file dropped', baseline: [model('m.yaml', '1'), crit('c.yaml', '2'), crit('d.yaml', '4')], current: [model('m.yaml', '1'), crit('c.yaml', '2')], model: false, criteria: true, statuses: ['same', 'same', 'removed'] },
    { name: 'criteria file added to the chain', baseline: [model('m.yaml', '1')], current: [model('m.yaml', '1'), crit('c.yaml', '2')], model: false, criteria: true, statuses: ['same', 'added'] },
    { name: 'model renamed, content kept', baseline: [model('m1.yaml', '1')], current: [model('m2.yaml', '1')], model: false, criteria: false, statuses: ['renamed'] },
    { name: 'model renamed and edited', baseline: [model('m1.yaml', '1')], current: [model('m2.yaml', '7')], model: true, criteria: false, statuses: ['added', 'removed'] },
    { name: 'a criteria file with the model content is no rename of the model', baseline: [model('m1.yaml', '1')], current: [crit('m2.yaml', '1')], model: true, criteria: true, statuses: ['added', 'removed'] },
    {
      name: 'the baseline file itself is not an input to compare',
      baseline: [model('m.yaml', '1')],
      current: [model('m.yaml', '1'), { role: 'baseline', path: 'old.json', sha256: '5' }],
      model: false,
      criteria: false,
      statuses: ['same'],
    },
  ];
  it.each(cases)('$name', (c) => {
    const cmp = compareResults(results({ inputs: c.current }), results({ inputs: c.baseline }));
    expect(cmp.inputs.modelChanged).toBe(c.model);
    expect(cmp.inputs.criteriaChanged).toBe(c.criteria);
    expect(cmp.inputs.files.map((f) => f.status)).toEqual(c.statuses);
  });
});

describe('compareResults: finding keys', () => {
  it('pairs repeated criterion/mode/quantity triples in order', () => {
    const f = (v: Verdict) => finding({ criterion: 'dr', mode: 'dutch_roll', verdict: v });
    const base = results({ conditions: [condition({ id: 'X', findings: [f('pass'), f('fail')] })] });
    const now = results({ conditions: [condition({ id: 'X', findings: [f('pass'), f('pass')] })] });
    const cmp = compareResults(now, base);
    expect(cmp.findings.map((x) => x.transition)).toEqual(['improvement', 'unchanged']);
  });

  it('tells apart two quantities of one criterion', () => {
    const base = results({ conditions: [condition({ id: 'X', findings: [finding({ criterion: 'sp', verdict: 'pass', quantity: 'cap' })] })] });
    const now = results({ conditions: [condition({ id: 'X', findings: [finding({ criterion: 'sp', verdict: 'pass', quantity: 'natural_frequency' })] })] });
    const cmp = compareResults(now, base);
    expect(cmp.findings).toEqual([]);
    expect(cmp.counts).toMatchObject({ findingsAdded: 1, findingsRemoved: 1 });
  });
});
