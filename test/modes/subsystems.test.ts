import { describe, expect, it } from 'vitest';
import { COUPLING_TOLERANCE, measureCoupling, splitSubsystems, stateGroup } from '../../src/modes/subsystems.js';
import { structuralBlocks } from '../../src/modes/structural-blocks.js';
import { spectrum } from '../../src/modes/spectrum.js';
import { collectRoots } from '../../src/modes/roots.js';
import { combine, navionLateral, navionLongitudinal } from './navion-fixture.js';

// State groups by name: the model contract of modalgate (longitudinal u, w, alpha, vT, q,
// theta; lateral v, beta, p, r, phi; kinematic psi, xE, yE, h; anything else other).

describe('stateGroup and splitSubsystems', () => {
  it.each([
    ['u', 'longitudinal'], ['w', 'longitudinal'], ['alpha', 'longitudinal'], ['vT', 'longitudinal'],
    ['q', 'longitudinal'], ['theta', 'longitudinal'], ['v', 'lateral'], ['beta', 'lateral'], ['p', 'lateral'],
    ['r', 'lateral'], ['phi', 'lateral'], ['psi', 'kinematic'], ['xE', 'kinematic'], ['yE', 'kinematic'],
    ['h', 'kinematic'], ['de', 'other'], ['rpm', 'other'], ['Q', 'other'], ['toString', 'other'],
  ])('%s is %s', (name, group) => {
    expect(stateGroup(name)).toBe(group);
  });

  it('keeps the model order within each group', () => {
    expect(splitSubsystems(['phi', 'q', 'h', 'de', 'beta', 'u', 'psi'])).toEqual({
      longitudinal: ['q', 'u'],
      lateral: ['phi', 'beta'],
      kinematic: ['h', 'psi'],
      other: ['de'],
    });
  });
});

describe('structuralBlocks', () => {
  it('separates the Navion longitudinal and lateral blocks (no cross terms)', () => {
    const blocks = structuralBlocks(combine(navionLongitudinal(), navionLateral()).A).map((b) => b.join(','));
    expect(blocks.sort()).toEqual(['0,1,2,3', '4,5,6,7']);
  });

  it('puts an integrator fed by a block, feeding nothing, in a block of its own', () => {
    // x1' = -x1 + x2, x2' = -x2 + x1, x3' = x1: x3 integrates the first block
    const blocks = structuralBlocks([
      [-1, 1, 0],
      [1, -1, 0],
      [1, 0, 0],
    ]);
    expect(blocks.map((b) => b.join(',')).sort()).toEqual(['0,1', '2']);
  });
});

describe('measureCoupling', () => {
  const base = combine(navionLongitudinal(), navionLateral());
  // the eigenvalues of A found with the modes, as analyseModes passes them
  const coupling = (A: number[][], states: readonly string[]) => measureCoupling(A, states, collectRoots(A, states).values);
  const withCross = (entries: [string, string, number][]) => {
    const A = base.A.map((row) => row.slice());
    for (const [i, j, x] of entries) A[base.states.indexOf(i)]![base.states.indexOf(j)] = x;
    return A;
  };

  it('is zero without cross terms', () => {
    expect(coupling(base.A, base.states)).toEqual({ coupling: 0, decoupled: true, tolerance: COUPLING_TOLERANCE });
  });

  it('is zero for a one-way coupling, which cannot move a root (block-triangular matrix)', () => {
    const A = withCross([['p', 'q', 3], ['r', 'u', 0.2]]);
    expect(coupling(A, base.states).coupling).toBeLessThan(1e-12);
  });

  it('grows with two-way coupling and does not depend on state units', () => {
    const small = coupling(withCross([['q', 'r', 0.1], ['r', 'q', -0.1]]), base.states).coupling;
    const large = coupling(withCross([['q', 'r', 1], ['r', 'q', -1]]), base.states).coupling;
    expect(small).toBeGreaterThan(0);
    expect(large).toBeGreaterThan(small);
    // the same coupling with q in deg/s (row q times 57.3, column q divided by 57.3)
    const k = 180 / Math.PI;
    const A = withCross([['q', 'r', 1], ['r', 'q', -1]]);
    const qi = base.states.indexOf('q');
    const scaled = A.map((row, i) => row.map((x, j) => (x * (i === qi ? k : 1)) / (j === qi ? k : 1)));
    expect(coupling(scaled, base.states).coupling).toBeCloseTo(large, 9);
  });

  it('reuses the roots found for the modes: the same measure as from the spectrum of A computed afresh', () => {
    const A = withCross([['q', 'r', 0.4], ['r', 'q', -0.3], ['w', 'p', 0.05], ['p', 'w', 0.02]]);
    const reused = coupling(A, base.states);
    expect(reused.coupling).toBeGreaterThan(0);
    expect(collectRoots(A, base.states).values).toEqual(spectrum(A));
    expect(measureCoupling(A, base.states, spectrum(A))).toEqual(reused);
  });
});
