/**
 * Numbers at the edge of double precision. Closed-form facts used as checks: the eigenvalues of
 * cA are c times those of A, so damping ratios and mode kinds do not change with c (common
 * practice: a change of time unit); an eigenvalue is computed to about eps ||A|| kappa (Golub and
 * Van Loan, Matrix Computations, 4th ed., 7.2.2), so where that exceeds the root itself no
 * figure of it may carry a verdict.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/check.js';
import { analyseModes } from '../../src/modes/analyse.js';
import type { Mode } from '../../src/types.js';
import { runCli } from '../run-cli.js';
import { CR96008_LATERAL, combine, navionLateral, navionLongitudinal, stateSpace } from './navion-fixture.js';

/** [m/s] 176 ft/s (Nelson, 2nd ed., ch. 4) */
const AIRSPEED = 176 * 0.3048;
const navion = combine(navionLongitudinal(), navionLateral(CR96008_LATERAL));

function scaled(c: number) {
  return { ...navion, A: navion.A.map((r) => r.map((x) => x * c)) };
}

function summary(modes: Mode[]) {
  return modes.map((m) => ({ kind: m.kind, zeta: m.dampingRatio, re: m.eigenvalues[0]!.re, im: m.eigenvalues[0]!.im }));
}

describe('a model scaled towards the ends of the double range', () => {
  const reference = summary(analyseModes(navion, { airspeed: AIRSPEED }).modes);

  it.each([1e-300, 1e-200, 1e200, 1e300])('scaled by %s: the same modes, damping ratios and scaled roots, and none inaccurate', (c) => {
    const result = analyseModes(scaled(c), { airspeed: AIRSPEED });
    const modes = summary(result.modes);
    expect(modes.map((m) => m.kind)).toEqual(reference.map((m) => m.kind));
    modes.forEach((m, k) => {
      const ref = reference[k]!;
      if (ref.zeta === null) expect(m.zeta).toBeNull();
      else expect(Math.abs(m.zeta! - ref.zeta)).toBeLessThan(1e-9 * Math.max(1, Math.abs(ref.zeta)));
      expect(Math.abs(m.re / c - ref.re)).toBeLessThanOrEqual(1e-9 * Math.hypot(ref.re, ref.im) + 1e-300);
      expect(Math.abs(m.im / c - ref.im)).toBeLessThanOrEqual(1e-9 * Math.hypot(ref.re, ref.im) + 1e-300);
    });
    expect(result.modes.filter((m) => m.inaccurate !== undefined)).toEqual([]);
  });

  it('an entry of 1e308 does not stop the analysis', () => {
    const A = navion.A.map((r) => r.slice());
    A[0]![1] = 1e308;
    const result = analyseModes({ ...navion, A }, { airspeed: AIRSPEED });
    for (const m of result.modes) for (const e of m.eigenvalues) expect(Number.isFinite(e.re) && Number.isFinite(e.im)).toBe(true);
  });
});

describe('lost accuracy is not evaluated, never a verdict', () => {
  // Symmetric, so kappa = 1, but with entries of 1e15 beside a root of 1.5 (closed form: the
  // roots are about -2e15 and det/(-2e15) = 1.5): rounding of order eps * 2e15 = 0.4 swamps it.
  const A = [
    [-1e15, 1e15],
    [1e15, -999999999999997],
  ];

  it('the mode is marked inaccurate, with the reason', () => {
    const result = analyseModes(stateSpace(['w', 'q'], A), { airspeed: 50 });
    const inaccurate = result.modes.filter((m) => m.inaccurate !== undefined);
    expect(inaccurate.length).toBeGreaterThan(0);
    expect(inaccurate[0]!.inaccurate).toMatch(/^accuracy lost: the root .* is known only to a relative error of .*; not evaluated$/);
  });

  it('every finding of that mode is not evaluated with the reason, in a check', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'modalgate-range-'));
    const model = path.join(dir, 'm.yaml');
    writeFileSync(model, `format: modalgate-model/1
aircraft: { name: Ill-conditioned test case, class: I }
units: SI
conditions:
  - id: c1
    phase: CR
    airspeed: 50
    stateSpace:
      states: [w, q]
      A: [[-1e15, 1e15], [1e15, -999999999999997]]
`);
    const outcome = await runCheck({ model, criteria: ['mil-f-8785c'], toolVersion: 't', command: [], generatedAt: '2026-12-01T12:00:00Z' });
    const sp = outcome.results.conditions[0]!.findings.filter((f) => f.mode === 'short_period');
    expect(sp.length).toBeGreaterThan(0);
    for (const f of sp) {
      expect(f.verdict).toBe('not_evaluated');
      expect(f.reason).toMatch(/^accuracy lost/);
    }
  });
});

describe('input values out of range', () => {
  it('mass: 5e-324 is exit 2 at the mass field, not an internal error at a matrix entry', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'modalgate-range-'));
    const model = path.join(dir, 'm.yaml');
    const sample = readFileSync(path.resolve(import.meta.dirname, '../../samples/ketra-kt4.yaml'), 'utf8');
    writeFileSync(model, sample.replace(/mass: 2350\b/, 'mass: 5e-324'));
    const r = await runCli('check', model, '--json', path.join(dir, 'r.json'));
    expect(r.code).toBe(2);
    expect(r.err).toMatch(new RegExp(`${model}:\\d+:\\d+: conditions\\[3\\]\\.nondimensional\\.mass: this value is too small to compute with: the state matrices built from the condition have A\\[u\\]\\[u\\] = -Infinity \\(expected a magnitude between 1e-150 and 1e\\+150, found 5e-324\\) \\[out_of_range\\]`));
    expect(r.err).not.toContain('internal error');
  });

  it('a model scaled by 1e200 is checked (no internal error)', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'modalgate-range-'));
    const model = path.join(dir, 'm.yaml');
    const rows = navion.A.map((r) => `[${r.map((x) => (x * 1e200).toExponential(15)).join(', ')}]`).join(', ');
    writeFileSync(model, `format: modalgate-model/1
aircraft: { name: Scaled test case, class: I }
units: SI
conditions:
  - id: c1
    phase: CR
    airspeed: ${AIRSPEED}
    stateSpace:
      states: [${navion.states.join(', ')}]
      A: [${rows}]
`);
    const r = await runCli('check', model, '--json', path.join(dir, 'r.json'));
    expect(r.err).not.toContain('internal error');
    expect([0, 1]).toContain(r.code);
  });
});
