/**
 * The "what would move it" rows, the numbers that decide a sweep's findings, and how both are
 * shown in the terminal and the review document (hand-made sensitivities: presentation only;
 * the figures themselves are tested in test/sensitivity/).
 */
import { describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { formatResultsText } from '../../src/report/terminal.js';
import { buildReportView } from '../../src/report/view-model.js';
import { decidingNumbers, genericName, moveRows } from '../../src/report/what-would-move.js';
import type { ConditionResult, Finding, Sensitivity } from '../../src/types.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

const reached = (parameter: string, current: number, change: number): Sensitivity => ({
  parameter,
  current,
  derivative: -0.2,
  influence: 3,
  toBoundary: { change, estimate: change * 1.02, verifiedValue: 0.19, verifiedLevel: 1, verifiedVerdict: 'marginal' },
});
const unreached = (parameter: string): Sensitivity => ({
  parameter,
  current: 0.5,
  derivative: 0.01,
  influence: 0.2,
  toBoundary: null,
  reason: 'not reachable by this parameter alone: the linear estimate needs 4.1 (more than twice the number)',
});

describe('moveRows', () => {
  it('gives now, needed, change, ratio and the level reached; an unreachable number keeps its reason', () => {
    const finding = { verdict: 'fail', sensitivities: [reached('conditions[1].lateral.derivatives.Nr', -0.7, -0.05), unreached('conditions[1].airspeed')] } as Finding;
    const [a, b] = moveRows(finding);
    expect(a).toMatchObject({ parameter: 'conditions[1].lateral.derivatives.Nr', now: -0.7, change: -0.05, reached: 'Level 1, marginal' });
    expect(a!.needed).toBeCloseTo(-0.75, 12);
    expect(a!.ratio).toBeCloseTo(0.75 / 0.7, 12);
    expect(a!.estimate).toBeCloseTo(-0.051, 12);
    expect(b!.needed).toBeNull();
    expect(b!.reached).toMatch(/^not reachable by this parameter alone/);
  });
});

describe('decidingNumbers', () => {
  it('counts the number that leads each failing and marginal finding, the condition left out', () => {
    const condition = (findings: Partial<Finding>[]) => ({ findings }) as ConditionResult;
    const conditions = [
      condition([{ verdict: 'fail', sensitivities: [reached('conditions[0].lateral.derivatives.Nr', -0.7, -0.1), unreached('conditions[0].airspeed')] }]),
      condition([{ verdict: 'fail', sensitivities: [reached('conditions[1].lateral.derivatives.Nr', -0.6, -0.1)] }]),
      condition([{ verdict: 'marginal', sensitivities: [reached('conditions[2].airspeed', 80, -5)] }]),
      // a pass with sensitivities (--sensitivities all) decides nothing
      condition([{ verdict: 'pass', sensitivities: [reached('conditions[3].airspeed', 80, -5)] }]),
    ];
    expect(decidingNumbers(conditions)).toEqual([
      { number: 'lateral.derivatives.Nr', leadsFail: 2, leadsMarginal: 0, inTopFive: 2, reachesAlone: 2 },
      { number: 'airspeed', leadsFail: 0, leadsMarginal: 1, inTopFive: 2, reachesAlone: 1 },
    ]);
  });

  it('names a table cell by its column and a shared number by its place in common', () => {
    expect(genericName('samples/env.csv:14:Cmalpha')).toBe('column Cmalpha of samples/env.csv');
    expect(genericName('conditionTable.common.nondimensional.mass')).toBe('conditionTable.common.nondimensional.mass');
    expect(genericName('conditions[12].stateSpace.A[3][2]')).toBe('stateSpace.A[3][2]');
  });
});

describe('shown under the finding', () => {
  function withMoves() {
    const fixture = larkspurReview();
    const finding = fixture.results.conditions[0]!.findings.find((f) => f.verdict === 'fail' || f.verdict === 'marginal')!;
    finding.sensitivities = [reached('conditions[0].lateral.derivatives.Nr', -0.7, -0.05), unreached('conditions[0].airspeed')];
    const other = fixture.results.conditions[1]!.findings[0]!;
    other.sensitivities = [];
    other.sensitivityNote = 'not defined: the root -2.000 is repeated or nearly so (a defective mode has no derivative)';
    return { fixture, finding };
  }

  it('in the terminal: a table per finding, and over the sweep the numbers that decide', () => {
    const { fixture, finding } = withMoves();
    const text = formatResultsText(fixture.results, { color: false, detail: 'all', findings: true });
    expect(text).toContain(`what would move ${finding.criterion}`);
    expect(text).toMatch(/conditions\[0\]\.lateral\.derivatives\.Nr +-0\.7000 +-0\.7500 +-0\.0500 \(x1\.07\) +-0\.0510 +Level 1, marginal/);
    expect(text).toMatch(/conditions\[0\]\.airspeed .*not reachable by this parameter alone/);
    expect(text).toContain('not defined: the root -2.000 is repeated or nearly so');
    expect(text).toMatch(/numbers that most often decide failing and marginal findings:\n.*\n.*\n +lateral\.derivatives\.Nr +\d/);
  });

  it('in the review document: the table under its finding, and the caution that one number at a time is a linearised aid', () => {
    const { fixture } = withMoves();
    const html = renderHtml(buildReportView(fixture.results, fixture.sets, { reportId: 'MG-MOVE' }));
    expect(html.match(/<tr class="moves-row">/g)).toHaveLength(2);
    // the condition's part of the name once in the head, the rest in the row, whole in its title
    expect(html).toContain('in <span class="mono">conditions[0].</span>');
    expect(html).toContain('<td class="mono number" title="conditions[0].lateral.derivatives.Nr">lateral.derivatives.Nr</td>');
    expect(html).toContain('class="unreached"');
    expect(html).toContain('not defined: the root -2.000 is repeated or nearly so');
    expect(html).toContain('linearised design aid');
    expect(html).toContain('Numbers that most often decide failing and marginal findings');
  });
});
