/** US -> SI by state dimension: x_SI = T x_US, A_SI = T A T^-1, B_SI = T B, C_SI = C T^-1 (a similarity transform). */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stateSpaceToSI } from '../../src/model/convert-to-si.js';
import { eigenvalues } from './eigenvalues.js';

describe('stateSpaceToSI', () => {
  const us = {
    states: ['u', 'theta', 'h', 'de_act'],
    A: [[-0.045, -32.2, 0, 1.5], [0.001, -0.5, 0, 0], [0.02, 176, 0, 0], [0, 0, 0, -20]],
    inputs: ['de_cmd'],
    B: [[0], [0], [3], [20]],
    outputs: ['h_baro'],
    C: [[0, 0, 1, 0]],
    D: [[0]],
  };
  const { system, notes } = stateSpaceToSI(us, 'US');

  it('scales velocity and length rows and columns by 0.3048 m/ft (exact); angles and others unchanged', () => {
    expect(system.A[0]![1]).toBeCloseTo(-32.2 * 0.3048, 12); // u' per theta: ft/s^2 -> m/s^2
    expect(system.A[1]![0]).toBeCloseTo(0.001 / 0.3048, 12); // theta' per u: 1/ft -> 1/m
    expect(system.A[2]![0]).toBeCloseTo(0.02, 12); // h' per u: length over length
    expect(system.A[0]![3]).toBeCloseTo(1.5 * 0.3048, 12); // u' per actuator deflection
    expect(system.B.map((r) => r[0])).toEqual([0, 0, 3 * 0.3048, 20]);
    expect(system.C[0]).toEqual([0, 0, 1 / 0.3048, 0]);
    expect(notes).toContain('state(s) de_act are not known by name: left in their written units (not converted)');
  });

  it('leaves the eigenvalues where they were', () => {
    const before = eigenvalues(us.A);
    eigenvalues(system.A).forEach((r, i) => {
      expect(r.re).toBeCloseTo(before[i]!.re, 10);
      expect(r.im).toBeCloseTo(before[i]!.im, 10);
    });
  });

  it('is the identity for SI input', () => {
    expect(stateSpaceToSI(us, 'SI').system).toEqual(us);
  });

  it('keeps the similarity invariants (trace, sum of principal 2x2 minors) of any US model', () => {
    const states = ['u', 'w', 'q', 'theta', 'h'];
    const entry = fc.double({ min: -100, max: 100, noNaN: true });
    fc.assert(
      fc.property(fc.array(fc.array(entry, { minLength: 5, maxLength: 5 }), { minLength: 5, maxLength: 5 }), (A) => {
        const si = stateSpaceToSI({ states, A, inputs: [], B: A.map(() => []), outputs: [], C: [], D: [] }, 'US').system.A;
        const trace = (M: number[][]) => M.reduce((t, row, i) => t + row[i]!, 0);
        const minors = (M: number[][]) => {
          let sum = 0;
          for (let i = 0; i < 5; i++) for (let j = i + 1; j < 5; j++) sum += M[i]![i]! * M[j]![j]! - M[i]![j]! * M[j]![i]!;
          return sum;
        };
        expect(trace(si)).toBeCloseTo(trace(A), 8);
        expect(minors(si)).toBeCloseTo(minors(A), 6);
      }),
      { numRuns: 200 },
    );
  });
});
