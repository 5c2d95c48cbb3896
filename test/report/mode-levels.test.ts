/**
 * One level per mode (the worst of its criteria, with the criterion that decides it), single
 * requirements read as met / not met, and the defaults shown beside a failing finding.
 * The rule "a mode is as good as its worst requirement" is common practice in handling-qualities
 * reviews; the bounds below are test values, not published ones.
 */
import { describe, expect, it } from 'vitest';
import { defaultsBehind } from '../../src/report/finding-defaults.js';
import { isSingleRequirement, modeLevel } from '../../src/report/mode-levels.js';
import { condition, finding } from '../compare/results-fixture.js';

const graded = { '1': { min: 0.04 }, '2': { min: 0 }, '3': {} };
const floor = { '1': { min: 55 }, '2': { min: 55 }, '3': { min: 55 } };

describe('modeLevel', () => {
  it('is the worst level of the mode\'s criteria and names the criterion deciding it', () => {
    const c = condition({
      id: 'climb',
      findings: [
        finding({ criterion: 'ph-zeta', mode: 'phugoid', verdict: 'fail', level: 3, bounds: graded, margin: -0.05 }),
        finding({ criterion: 'ph-t2', mode: 'phugoid', verdict: 'pass', level: 1, bounds: floor, margin: 289 }),
        finding({ criterion: 'sp-zeta', mode: 'short_period', verdict: 'pass', level: 1, bounds: graded }),
      ],
    });
    expect(modeLevel(c, 'phugoid')).toEqual({ level: 3, verdict: 'fail', decidedBy: 'ph-zeta', notEvaluated: 0 });
    expect(modeLevel(c, 'short_period')).toMatchObject({ level: 1, verdict: 'pass', decidedBy: 'sp-zeta' });
    expect(modeLevel(c, 'roll')).toEqual({ level: undefined, verdict: null, decidedBy: null, notEvaluated: 0 });
  });

  it('a met single requirement neither lifts nor lowers the level; an unmet one leaves no level', () => {
    const met = condition({ id: 'a', findings: [finding({ criterion: 'ph-t2', mode: 'phugoid', verdict: 'pass', level: 1, bounds: floor })] });
    expect(modeLevel(met, 'phugoid')).toMatchObject({ level: undefined, verdict: 'pass', decidedBy: 'ph-t2' });
    const unmet = condition({
      id: 'b',
      findings: [
        finding({ criterion: 'ph-zeta', mode: 'phugoid', verdict: 'pass', level: 1, bounds: graded }),
        finding({ criterion: 'ph-t2', mode: 'phugoid', verdict: 'fail', level: null, bounds: floor }),
      ],
    });
    expect(modeLevel(unmet, 'phugoid')).toMatchObject({ level: null, verdict: 'fail', decidedBy: 'ph-t2' });
  });

  it('a marginal finding at the same level names that criterion', () => {
    const c = condition({
      id: 'fa',
      findings: [
        finding({ criterion: 'dr-zeta', mode: 'dutch_roll', verdict: 'marginal', level: 1, margin: 0.008, bounds: graded }),
        finding({ criterion: 'dr-wn', mode: 'dutch_roll', verdict: 'pass', level: 1, margin: 0.001, bounds: graded }),
      ],
    });
    expect(modeLevel(c, 'dutch_roll')).toMatchObject({ level: 1, verdict: 'marginal', decidedBy: 'dr-zeta' });
  });

  it('a civil rule written at Level 1 only is a single requirement (levels left out take the one above)', () => {
    expect(isSingleRequirement({ bounds: { '1': { min: 0.052 } } })).toBe(true);
    expect(isSingleRequirement({ bounds: floor })).toBe(true);
    expect(isSingleRequirement({ bounds: graded })).toBe(false);
  });
});

describe('defaultsBehind', () => {
  const notes = [
    'altitude is geometric',
    'g = 9.80665 m/s^2 (default for SI input) used in the weight and the kinematic terms',
    'CDu, CLu, Cmu, CLalphadot not given: taken as 0',
    'Xq taken as 0 (no drag-due-to-pitch-rate coefficient in the nondimensional form)',
    'CYp not given: taken as 0',
    'L and N derivatives taken as primed (as stated)',
    'Lr, Nr not given: taken as 0',
  ];
  const c = condition({ id: 'x', notes });
  it('gives the longitudinal defaults to a longitudinal mode, gravity to the phugoid only', () => {
    expect(defaultsBehind(c, { mode: 'phugoid' })).toEqual([notes[1], notes[2], notes[3]]);
    expect(defaultsBehind(c, { mode: 'short_period' })).toEqual([notes[2], notes[3]]);
  });
  it('gives the lateral-directional defaults to a lateral mode, and nothing to an "other" mode', () => {
    expect(defaultsBehind(c, { mode: 'dutch_roll' })).toEqual([notes[4], notes[6]]);
    expect(defaultsBehind(c, { mode: 'other' })).toEqual([]);
  });
});
