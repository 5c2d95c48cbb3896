/**
 * Verdict logic, table-driven: at, inside and just outside each boundary, the marginal band,
 * zero boundaries, strict bounds and unreachable levels. The rules are those of the project
 * design (level = best level whose bounds hold; marginal band 10 % of the governing boundary,
 * an absolute band where it is 0); the boundaries are MIL-F-8785C 3.2.2.1.2 short-period
 * damping, Categories A and C (value from memory), and 3.2.1.2 phugoid damping (from memory).
 */
import { describe, expect, it } from 'vitest';
import { expandLevels } from '../../src/criteria/level-bounds.js';
import { judge } from '../../src/criteria/verdict.js';
import type { Level, LevelBounds } from '../../src/types.js';

const band = { relative: 0.1, absolute: { damping_ratio: 0.01 } };
const shortPeriod: LevelBounds = { '1': { min: 0.35, max: 1.3 }, '2': { min: 0.25, max: 2.0 }, '3': { min: 0.15 } };
const phugoid: LevelBounds = { '1': { min: 0.04 }, '2': { min: 0 }, '3': {} };

type Row = [what: string, value: number, required: Level, level: Level | null, verdict: string, margin: number | null];

function run(levels: LevelBounds, value: number, required: Level, strict = false, bestReachable: Level | null = 1) {
  return judge({ value, bounds: expandLevels(levels), requiredLevel: required, quantity: 'damping_ratio', band, strict, bestReachable });
}

describe('judge: short-period damping, Cat A/C (band 10 % of the boundary)', () => {
  const rows: Row[] = [
    ['well inside Level 1', 0.7, 1, 1, 'pass', 0.35], // margin = min(0.70 - 0.35, 1.30 - 0.70)
    ['at the Level 1 minimum', 0.35, 1, 1, 'marginal', 0],
    ['inside the band of the minimum (0.03 < 0.035)', 0.38, 1, 1, 'marginal', 0.03],
    ['just outside the band of the minimum (0.04 > 0.035)', 0.39, 1, 1, 'pass', 0.04],
    ['just below the Level 1 minimum', 0.349, 1, 2, 'fail', -0.001],
    ['at the Level 1 maximum', 1.3, 1, 1, 'marginal', 0],
    ['inside the band of the maximum (0.10 < 0.13)', 1.2, 1, 1, 'marginal', 0.1],
    ['just outside the band of the maximum (0.14 > 0.13)', 1.16, 1, 1, 'pass', 0.14],
    ['just above the Level 1 maximum', 1.31, 1, 2, 'fail', -0.01],
    ['Level 2 reached, Level 2 required', 0.3, 2, 2, 'pass', 0.05], // band 0.025
    ['Level 1 reached, Level 2 required', 0.7, 2, 1, 'pass', 0.45],
    ['at the Level 3 minimum, Level 3 required', 0.15, 3, 3, 'marginal', 0],
    ['just below Level 3', 0.149, 3, null, 'fail', -0.001],
    ['above every maximum but Level 3 has none', 2.5, 1, 3, 'fail', -1.2],
    ['no level at all, Level 1 required', 0.1, 1, null, 'fail', -0.25],
  ];
  it.each(rows)('%s (%f, Level %i required)', (_what, value, required, level, verdict, margin) => {
    const j = run(shortPeriod, value, required);
    expect(j.level).toBe(level);
    expect(j.verdict).toBe(verdict);
    if (margin === null) expect(j.margin).toBeNull();
    else expect(j.margin).toBeCloseTo(margin, 12);
  });
});

describe('judge: zero boundaries use the absolute band (phugoid, Level 2 zeta >= 0)', () => {
  const rows: Row[] = [
    ['at zero', 0, 2, 2, 'marginal', 0],
    ['inside the absolute band (0.005 < 0.01)', 0.005, 2, 2, 'marginal', 0.005],
    ['outside the absolute band', 0.02, 2, 2, 'pass', 0.02],
    ['slightly negative', -0.001, 2, 3, 'fail', -0.001],
    ['Level 3 any value: no margin', -0.3, 3, 3, 'pass', null],
  ];
  it.each(rows)('%s', (_what, value, required, level, verdict, margin) => {
    const j = run(phugoid, value, required);
    expect([j.level, j.verdict]).toEqual([level, verdict]);
    if (margin === null) expect(j.margin).toBeNull();
    else expect(j.margin).toBeCloseTo(margin, 12);
  });
});

describe('judge: strict bounds and unreachable levels', () => {
  // 14 CFR 25.181: Dutch roll positively damped, zeta > 0 (one level).
  const positive: LevelBounds = { '1': { min: 0 } };
  it('a strict minimum of 0 is not met at 0', () => {
    expect(run(positive, 0, 1, true)).toMatchObject({ level: null, verdict: 'fail', margin: 0 });
  });
  it('just above a strict 0 is marginal, well above passes', () => {
    expect(run(positive, 0.001, 1, true)).toMatchObject({ level: 1, verdict: 'marginal' });
    expect(run(positive, 0.05, 1, true)).toMatchObject({ level: 1, verdict: 'pass' });
  });
  it('levels left out hold the bounds of the better level: one-level rules reach 1 or none', () => {
    expect(run(positive, -0.01, 3, true)).toMatchObject({ level: null, verdict: 'fail' });
  });
  it('no reachable level means fail whatever the value', () => {
    expect(run(shortPeriod, 0.7, 3, false, null)).toMatchObject({ level: null, verdict: 'fail' });
  });
  it('a value meeting Level 1 reaches only the best reachable level', () => {
    expect(run(phugoid, 0.1, 3, false, 3)).toMatchObject({ level: 3, verdict: 'pass' });
    expect(run(phugoid, 0.1, 1, false, 3)).toMatchObject({ level: 3, verdict: 'fail' });
  });
  it('an infinite value meets any minimum with no finite margin (time to double of a convergent mode)', () => {
    const j = judge({
      value: Infinity,
      bounds: expandLevels({ '1': { min: 20 }, '2': { min: 12 }, '3': { min: 4 } }),
      requiredLevel: 1,
      quantity: 'time_to_double',
      band: { relative: 0.1, absolute: {} },
      strict: false,
      bestReachable: 1,
    });
    expect(j).toMatchObject({ level: 1, verdict: 'pass', margin: null });
  });
});

describe('judge: a single requirement (one bound for every level) is met or not met', () => {
  // 14 CFR 25.181 style rule written at Level 1 only (levels left out take the bound above);
  // the 0.052 damping floor is a test value.
  const single: LevelBounds = { '1': { min: 0.052 } };
  it.each([
    [0.2, 'pass', 'requirement met (one bound for every level)'],
    [0.053, 'marginal', 'requirement met (one bound for every level), within the marginal band of the minimum'],
    [0.03, 'fail', 'requirement not met (one bound for every level): below the minimum'],
  ])('zeta %s: %s', (value, verdict, reason) => {
    const j = run(single, value, 1);
    expect(j.verdict).toBe(verdict);
    expect(j.reason).toBe(reason);
  });
  it('a graded criterion keeps its level words', () => {
    expect(run(phugoid, 0.1, 1).reason).toBe('Level 1 reached (Level 1 required)');
  });
});
