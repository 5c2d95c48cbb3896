/**
 * The whole pipeline on a published worked example: model file -> modes -> findings.
 * Source: Nelson, Flight Stability and Automatic Control, 2nd ed. (1998), ch. 4 (longitudinal)
 * and ch. 5 (lateral) worked examples, derivatives of Teper, NASA CR-96008 (1969).
 * Published roots: short period -2.51 +/- 2.59i, phugoid -0.017 +/- 0.213i (from memory);
 * Dutch roll -0.487 +/- 2.335i, roll -8.435, spiral -0.0087 (seen in a reproduction).
 */
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCheck } from '../src/check.js';
import type { ConditionResult, ModeKind } from '../src/types.js';

const model = path.resolve(import.meta.dirname, 'fixtures/navion/navion-us.yaml');

async function navion() {
  return runCheck({ model, criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-12-01T00:00:00Z' });
}

function root(c: ConditionResult, kind: ModeKind) {
  const mode = c.modes.find((m) => m.kind === kind);
  if (!mode) throw new Error(`no ${kind}`);
  return mode.eigenvalues[0]!;
}

describe('pipeline: Navion worked example (Nelson 2nd ed. ch. 4-5; NASA CR-96008)', () => {
  it('finds and names the five modes with the published roots', async () => {
    const { results } = await navion();
    const cruise = results.conditions[0]!;
    expect(cruise.modes.map((m) => m.kind).sort()).toEqual(['dutch_roll', 'phugoid', 'roll', 'short_period', 'spiral']);
    // ch. 4: short period -2.51 +/- 2.59i (from memory; CR-96008 set gives -2.5105 +/- 2.5919i)
    expect(root(cruise, 'short_period').re).toBeCloseTo(-2.51, 2);
    expect(Math.abs(root(cruise, 'short_period').im)).toBeCloseTo(2.59, 2);
    // ch. 4: phugoid -0.017 +/- 0.213i (from memory)
    expect(root(cruise, 'phugoid').re).toBeCloseTo(-0.017, 3);
    expect(Math.abs(root(cruise, 'phugoid').im)).toBeCloseTo(0.213, 3);
    // ch. 5: Dutch roll -0.487 +/- 2.335i, roll -8.435, spiral -0.0087 (seen)
    expect(root(cruise, 'dutch_roll').re).toBeCloseTo(-0.487, 3);
    expect(Math.abs(root(cruise, 'dutch_roll').im)).toBeCloseTo(2.335, 2);
    expect(root(cruise, 'roll').re).toBeCloseTo(-8.435, 2);
    expect(root(cruise, 'spiral').re / -0.0087).toBeGreaterThan(0.95);
    expect(root(cruise, 'spiral').re / -0.0087).toBeLessThan(1.05);
  });

  it('as Class I: cruise (Category B) and approach (Category C) meet Level 1 on every finding', async () => {
    // Worked by hand from the roots above with MIL-F-8785C: short-period zeta 0.696 (B: 0.30-2.0,
    // C: 0.35-1.30); CAP = 3.608^2 / (176 * 2.0244 / 32.2) = 13.02 / 11.07 = 1.18 (0.085/0.16 to 3.6);
    // omega_sp 3.61 >= 0.87 (C); phugoid zeta 0.080 >= 0.04; roll tau = 1/8.435 = 0.119 s <= 1.4 (B)
    // and <= 1.0 (C, Class I); spiral convergent; Dutch roll zeta 0.204 >= 0.08, zeta*omega 0.487
    // >= 0.15, omega 2.385 >= 0.4 (B) and >= 1.0 (C, Class I).
    const { results } = await navion();
    const [cruise, approach] = results.conditions;
    expect(cruise!.category).toBe('B');
    expect(approach!.category).toBe('C');
    for (const c of [cruise!, approach!]) {
      expect(c.findings.length).toBeGreaterThanOrEqual(9);
      for (const f of c.findings) expect({ id: f.criterion, level: f.level, verdict: f.verdict }).toEqual({ id: f.criterion, level: 1, verdict: 'pass' });
    }
    const cap = cruise!.findings.find((f) => f.quantity === 'cap')!;
    expect(cap.value).toBeCloseTo(1.18, 2);
    expect(cap.method).toMatch(/A\[w,w\]/);
    expect(results.summary).toEqual({ pass: cruise!.findings.length + approach!.findings.length, marginal: 0, fail: 0, not_evaluated: 0 });
  });
});

describe('runCheck hooks for writing results as they come', () => {
  const sample = path.resolve(import.meta.dirname, '../samples/ketra-kt4.yaml');
  const request = { model: sample, criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-12-02T00:00:00Z' };

  it('announces the head first, hands over every result in order, keeps only what is asked and still counts all', async () => {
    const full = await runCheck(request);
    const seen: string[] = [];
    let head: unknown;
    const outcome = await runCheck({
      ...request,
      onStart: (h, total) => {
        expect(seen).toEqual([]); // before any condition
        expect(total).toBe(4);
        head = h;
      },
      onCondition: (r) => seen.push(r.id),
      keep: (r) => r.findings.some((f) => f.verdict === 'fail'),
    });
    const { summary, conditions, ...fullHead } = full.results;
    expect(head).toEqual(fullHead);
    expect(seen).toEqual(conditions.map((c) => c.id));
    expect(outcome.conditionCount).toBe(4);
    expect(outcome.results.conditions.map((c) => c.id)).toEqual(['approach-300m', 'climb-1500m']);
    expect(outcome.results.summary).toEqual(summary); // 34 pass, 1 marginal, 3 fail over all four
  });
});

