import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dutchRollChart } from '../../src/report/charts/dutch-roll-chart.js';
import { sPlaneChart } from '../../src/report/charts/s-plane-chart.js';
import { shortPeriodChart } from '../../src/report/charts/short-period-chart.js';
import type { ConditionResult, Mode } from '../../src/types.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

/** A pair with figures from the usual formulas (common practice). */
function pair(kind: Mode['kind'], re: number, im: number): Mode {
  const wn = Math.hypot(re, im);
  return {
    kind, eigenvalues: [{ re, im }, { re, im: -im }], naturalFrequency: wn, dampingRatio: -re / wn, dampedFrequency: im,
    period: (2 * Math.PI) / im, timeConstant: null, timeToHalf: null, timeToDouble: null, cyclesToHalf: null,
    basis: 'generated', ambiguous: false, referenceState: 'q', shape: [],
  };
}

function withModes(sp: Mode, dr: Mode, extra: Mode[], capScale: number): ConditionResult {
  const base = larkspurReview().results.conditions[2]!;
  const findings = base.findings.map((f) => (f.quantity === 'cap' ? { ...f, value: ((sp.naturalFrequency ?? 1) ** 2) / capScale } : f));
  return { ...base, modes: [sp, dr, ...extra], findings };
}

function wellFormed(svg: string): void {
  expect(svg).not.toMatch(/NaN|Infinity|undefined/);
  expect(svg.match(/<g[\s>]/g)?.length ?? 0).toBe(svg.match(/<\/g>/g)?.length ?? 0);
  expect(svg.startsWith('<svg')).toBe(true);
  expect(svg.endsWith('</svg>')).toBe(true);
}

describe('charts on arbitrary poles', () => {
  it('always draw finite, balanced SVG', () => {
    const re = fc.double({ min: -40, max: 2, noNaN: true }).filter((v) => Math.abs(v) > 1e-4);
    const im = fc.double({ min: 1e-3, max: 12, noNaN: true });
    fc.assert(
      fc.property(re, im, re, im, fc.double({ min: -50, max: 0.5, noNaN: true }), fc.double({ min: 0.5, max: 400, noNaN: true }), (spRe, spIm, drRe, drIm, realRoot, nAlpha) => {
        const extra: Mode = { ...pair('other', realRoot, 1), eigenvalues: [{ re: realRoot, im: 0 }], dampingRatio: null, dampedFrequency: null, period: null, kind: 'other' };
        const c = withModes(pair('short_period', spRe, spIm), pair('dutch_roll', drRe, drIm), [extra], nAlpha);
        for (const chart of [sPlaneChart(c), shortPeriodChart(c), dutchRollChart(c)]) {
          expect(chart.svg).not.toBeNull();
          wellFormed(chart.svg!);
        }
      }),
      { numRuns: 300, seed: 20261202 },
    );
  });
});

describe('charts on degenerate poles', () => {
  it('draw the s-plane with zero and vanishing roots (heading and position states; a found counterexample)', () => {
    const zero: Mode = { ...pair('kinematic', 0, 1), eigenvalues: [{ re: 0, im: 0 }], dampingRatio: null, dampedFrequency: null, period: null, kind: 'kinematic' };
    const tiny: Mode = { ...zero, eigenvalues: [{ re: 1.93e-322, im: 0 }], kind: 'other' };
    for (const extra of [[zero], [tiny], [zero, tiny]]) {
      const c = withModes(pair('short_period', -1e-4, 1e-3), pair('dutch_roll', -1e-4, 1e-3), extra, 0.5);
      wellFormed(sPlaneChart(c).svg!);
    }
  });
});
