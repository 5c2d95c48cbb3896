/**
 * A mode that turns divergent is said as that, alone; a real root is compared by its time
 * constant or time to double, never by omega_n and zeta. Spiral roots are test values
 * (T = -1/lambda, t2 = ln 2 / lambda: closed form).
 */
import { describe, expect, it } from 'vitest';
import { compareResults } from '../../src/compare/compare-results.js';
import { formatComparisonText } from '../../src/compare/format-comparison.js';
import { modeChangeItems } from '../../src/compare/mode-change-items.js';
import { comparisonView } from '../../src/report/comparison/comparison-view.js';
import { condition, mode, results } from './results-fixture.js';

const spiral = (lambda: number) =>
  mode({
    kind: 'spiral',
    eigenvalues: [{ re: lambda, im: 0 }],
    naturalFrequency: Math.abs(lambda),
    dampingRatio: lambda < 0 ? 1 : -1,
    timeConstant: -1 / lambda,
    timeToHalf: lambda < 0 ? Math.LN2 / -lambda : null,
    timeToDouble: lambda > 0 ? Math.LN2 / lambda : null,
  });
const run = (lambda: number) => results({ conditions: [condition({ id: 'CL', modes: [spiral(lambda)] })] });

describe('mode changes', () => {
  it('a spiral turning divergent is one stability item, not "omega_n +986 %"', () => {
    const cmp = compareResults(run(0.0041), run(-0.00038));
    const items = modeChangeItems(cmp.modes[0]!);
    expect(items).toEqual([{ kind: 'stability', from: 'convergent', to: 'divergent', size: Number.POSITIVE_INFINITY }]);
    expect(formatComparisonText(cmp, { color: false })).toContain('CL spiral: turns divergent (was convergent)');
    const view = comparisonView(cmp, () => null);
    expect(view.modeChanges[0]).toMatchObject({ figure: 'stability', change: 'convergent \u2192 divergent: turns divergent' });
    expect(JSON.stringify(view.modeChanges)).not.toContain('\u03c9n');
  });

  it('a real root that stays convergent is compared by its time constant', () => {
    const cmp = compareResults(run(-0.2), run(-0.1));
    const items = modeChangeItems(cmp.modes[0]!);
    expect(items).toHaveLength(1);
    expect(items[0]).toMatchObject({ kind: 'figure', figure: 'timeConstant' });
    // T: 10 s -> 5 s, -50 %
    if (items[0]?.kind === 'figure') expect(items[0].change.relative).toBeCloseTo(-0.5, 12);
  });
});
