/**
 * Primed lateral derivatives (Etkin & Reid, Dynamics of Flight, 3rd ed., ch. 4). The check is
 * independent of the formula: the rolling and yawing moment equations with a product of inertia,
 *   Ix p' - Ixz r' = Ix L,   Iz r' - Ixz p' = Iz N      (Nelson, 2nd ed., ch. 5, moment equations)
 * are solved directly for p' and r'; the primed derivatives must give the same accelerations.
 */
import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { primeMomentPair } from '../../src/model/inertia-coupling.js';

describe('primeMomentPair', () => {
  it.each([
    // invented inertias [slug ft^2] and derivatives (common practice magnitudes for a light aircraft)
    [1048, 3530, 120, -8.4, -0.35],
    [20000, 52000, -3500, -1.2, 0.4],
  ])('Ix %d, Iz %d, Ixz %d: primed L, N solve the coupled moment equations', (Ix, Iz, Ixz, L, N) => {
    const primed = primeMomentPair(L, N, { Ix, Iz, Ixz });
    const M = new Matrix([[Ix, -Ixz], [-Ixz, Iz]]);
    const accelerations = solve(M, Matrix.columnVector([Ix * L, Iz * N]));
    expect(primed.L).toBeCloseTo(accelerations.get(0, 0), 12);
    expect(primed.N).toBeCloseTo(accelerations.get(1, 0), 12);
  });

  it('changes nothing when Ixz = 0', () => {
    expect(primeMomentPair(-8.4, -0.35, { Ix: 1048, Iz: 3530, Ixz: 0 })).toEqual({ L: -8.4, N: -0.35 });
  });
});
