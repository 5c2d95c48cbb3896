import { describe, expect, it } from 'vitest';
import { SEARCH_LIMIT, assignKinds } from '../../src/modes/assign-kinds.js';
import { LATERAL_TEMPLATES, LONGITUDINAL_TEMPLATES } from '../../src/modes/mode-templates.js';
import type { Root } from '../../src/modes/roots.js';

// Synthetic roots with chosen participation (no physics): checks of the assignment search alone.
function root(re: number, im: number, share: Record<string, number>): Root {
  const states = Object.keys(share);
  const participation = states.map((s) => share[s]!);
  return {
    value: { re, im },
    oscillatory: im > 0,
    states,
    vector: { re: participation.slice(), im: states.map(() => 0) },
    participation,
    groupShare: { longitudinal: 0, lateral: 1, kinematic: 0, other: 0 },
    errorBound: 0,
  };
}

describe('assignKinds', () => {
  it('gives each kind the roots whose marking states dominate, pairs counting twice', () => {
    const dutch = root(-0.5, 2.3, { beta: 0.48, p: 0.03, r: 0.46, phi: 0.03 });
    const roll = root(-8.4, 0, { beta: 0.01, p: 0.98, r: 0.01, phi: 0 });
    const spiral = root(-0.009, 0, { beta: 0, p: 0, r: 0.06, phi: 0.94 });
    const result = assignKinds([spiral, dutch, roll], LATERAL_TEMPLATES);
    expect(result.picks.map((p) => [p.template.kind, p.roots])).toEqual([
      ['dutch_roll', [dutch]],
      ['roll', [roll]],
      ['spiral', [spiral]],
    ]);
    expect(result.total).toBeCloseTo(2 * 0.94 + 0.98 + 0.94, 12);
    // best rival of the roll: leave it out (no other root is p-dominated)
    expect(result.rivalTotals[1]).toBeCloseTo(result.total - 0.98, 12);
  });

  it('never forces a root that does not resemble a mode (below 10 % marking share)', () => {
    const attitude = root(0, 0, { w: 0, q: 0.05, theta: 0.95 });
    const result = assignKinds([attitude], LONGITUDINAL_TEMPLATES);
    expect(result.picks).toEqual([]);
  });

  it(`searches at most ${SEARCH_LIMIT} roots and stays fast with many`, () => {
    const many = Array.from({ length: 20 }, (_, i) => root(-1 - i, 0, { p: 0.5 + i / 100, phi: 0.5 - i / 100 }));
    const start = Date.now();
    const result = assignKinds(many, LATERAL_TEMPLATES);
    expect(Date.now() - start).toBeLessThan(2000);
    expect(result.picks.map((p) => p.template.kind)).toEqual(['roll', 'spiral']);
    const [roll, spiral] = result.picks.map((p) => p.roots[0]!);
    expect(roll!.participation[0]!).toBeGreaterThan(spiral!.participation[0]!); // p share
    expect(many.indexOf(roll!)).toBeLessThan(SEARCH_LIMIT); // equally mode-like roots: the first are searched
  });
});
