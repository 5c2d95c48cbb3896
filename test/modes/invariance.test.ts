import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyseModes } from '../../src/modes/analyse.js';
import { spectrum } from '../../src/modes/spectrum.js';
import type { Complex, ModalAnalysis, StateSpace } from '../../src/types.js';
import { CR96008_LATERAL, CR96008_LONGITUDINAL, FT, combine, navionLateral, navionLongitudinal, stateSpace } from './navion-fixture.js';

// Participation factors do not change with state scaling or ordering (Perez-Arriaga, Verghese
// and Schweppe, IEEE Trans. PAS-101, 1982), and eigenvalues do not change under any
// similarity transform T A T^-1 (linear algebra): so neither may the identified modes.

/** [m/s] 176 ft/s (Nelson, 2nd ed., ch. 4) */
const AIRSPEED = 176 * FT;
/** deg per rad */
const DEG = 180 / Math.PI;

function perturbed(scale: number[]): StateSpace {
  const lon = { ...CR96008_LONGITUDINAL };
  const lat = { ...CR96008_LATERAL };
  const keysLon = Object.keys(lon) as (keyof typeof lon)[];
  const keysLat = Object.keys(lat) as (keyof typeof lat)[];
  keysLon.forEach((k, i) => (lon[k] *= scale[i]!));
  keysLat.forEach((k, i) => (lat[k] *= scale[keysLon.length + i]!));
  return combine(navionLongitudinal(lon), navionLateral(lat));
}

/** x' = T x with T = P diag(s): A' = T A T^-1, state names follow the permutation. */
function permuteAndScale(system: StateSpace, order: number[], scales: number[]): StateSpace {
  const states = order.map((i) => system.states[i]!);
  const A = order.map((i, a) => order.map((j, b) => (scales[a]! * system.A[i]![j]!) / scales[b]!));
  return stateSpace(states, A);
}

function signature(result: ModalAnalysis): { kind: string; roots: Complex[]; ambiguous: boolean; reference: string }[] {
  return result.modes
    .map((m) => ({ kind: m.kind, roots: m.eigenvalues, ambiguous: m.ambiguous, reference: m.referenceState }))
    .sort((a, b) => a.kind.localeCompare(b.kind) || a.roots[0]!.re - b.roots[0]!.re);
}

function expectSameRoots(a: Complex[], b: Complex[], relative: number): void {
  expect(a).toHaveLength(b.length);
  const key = (z: Complex) => z.re * 1e3 + z.im;
  const sa = [...a].sort((x, y) => key(x) - key(y));
  const sb = [...b].sort((x, y) => key(x) - key(y));
  sa.forEach((z, i) => {
    const w = sb[i]!;
    expect(Math.hypot(z.re - w.re, z.im - w.im)).toBeLessThanOrEqual(relative * Math.max(1, Math.hypot(w.re, w.im)));
  });
}

const derivativeScales = fc.array(fc.double({ min: 0.9, max: 1.1, noNaN: true }), { minLength: 15, maxLength: 15 });
const stateScales = fc.array(
  fc.oneof(fc.constant(1), fc.constant(FT), fc.constant(1 / FT), fc.constant(DEG), fc.double({ min: 1e-3, max: 1e3, noNaN: true })),
  { minLength: 8, maxLength: 8 },
);
const permutation = fc.shuffledSubarray([0, 1, 2, 3, 4, 5, 6, 7], { minLength: 8, maxLength: 8 });

describe('identification invariance', () => {
  it('ft -> m: scaling u and w by 0.3048 changes no eigenvalue and no kind', () => {
    const us = combine(navionLongitudinal(), navionLateral());
    const si = permuteAndScale(us, [0, 1, 2, 3, 4, 5, 6, 7], [FT, FT, 1, 1, 1, 1, 1, 1]);
    const a = signature(analyseModes(us, { airspeed: AIRSPEED }));
    const b = signature(analyseModes(si, { airspeed: AIRSPEED }));
    expect(b.map((m) => m.kind)).toEqual(a.map((m) => m.kind));
    a.forEach((m, i) => expectSameRoots(b[i]!.roots, m.roots, 1e-9));
  });

  it('permuting and scaling states (T A T^-1, T = P diag(s)) leaves eigenvalues and kinds unchanged', () => {
    fc.assert(
      fc.property(derivativeScales, permutation, stateScales, (dScale, order, scales) => {
        const system = perturbed(dScale);
        const reference = signature(analyseModes(system, { airspeed: AIRSPEED }));
        const moved = signature(analyseModes(permuteAndScale(system, order, scales), { airspeed: AIRSPEED }));
        expect(moved.map((m) => [m.kind, m.ambiguous, m.reference])).toEqual(reference.map((m) => [m.kind, m.ambiguous, m.reference]));
        reference.forEach((m, i) => expectSameRoots(moved[i]!.roots, m.roots, 1e-8));
      }),
      { numRuns: 60, seed: 20261202 },
    );
  });

  it('a similarity transform mixing states leaves the eigenvalues unchanged (states lose meaning: eigenvalues only)', () => {
    const mixing = fc.array(fc.double({ min: -0.3, max: 0.3, noNaN: true }), { minLength: 64, maxLength: 64 });
    fc.assert(
      fc.property(derivativeScales, mixing, (dScale, entries) => {
        const system = perturbed(dScale);
        const n = 8;
        // T = I + E with |E| small enough to stay invertible; T^-1 by Gauss-Jordan below.
        const T = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (__, j) => (i === j ? 1 : 0) + entries[i * n + j]! / 4));
        const Ti = invert(T);
        const TA = multiply(multiply(T, system.A), Ti);
        expectSameRoots(spectrum(TA), spectrum(system.A), 1e-7);
      }),
      { numRuns: 60, seed: 20261202 },
    );
  });
});

function multiply(a: number[][], b: number[][]): number[][] {
  return a.map((row) => b[0]!.map((_, j) => row.reduce((s, x, k) => s + x * b[k]![j]!, 0)));
}

function invert(m: number[][]): number[][] {
  const n = m.length;
  const a = m.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  for (let c = 0; c < n; c += 1) {
    let p = c;
    for (let r = c + 1; r < n; r += 1) if (Math.abs(a[r]![c]!) > Math.abs(a[p]![c]!)) p = r;
    [a[c], a[p]] = [a[p]!, a[c]!];
    const pivot = a[c]![c]!;
    a[c] = a[c]!.map((x) => x / pivot);
    for (let r = 0; r < n; r += 1) {
      if (r === c) continue;
      const f = a[r]![c]!;
      a[r] = a[r]!.map((x, j) => x - f * a[c]![j]!);
    }
  }
  return a.map((row) => row.slice(n));
}
