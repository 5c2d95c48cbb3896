/**
 * The change of one number that reaches the boundary, checked by running the whole pipeline
 * again at that change; a defective mode; a finding that no single number can fix.
 * Boundaries: the shipped MIL-F-8785C set (Class I, Category B and C values of its
 * paragraphs 3.2.1.2, 3.2.2.1.1, 3.3.1.1 and 3.3.1.2 as held in criteria/mil-f-8785c.yaml).
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { bandAround } from '../../src/criteria/verdict.js';
import type { Finding, ResolvedCriteriaSet } from '../../src/types.js';
import { FORMS, modelOf } from './models.js';
import { changed, checkText, sameFinding, shippedSet, type ModelText } from './pipeline.js';

let set: ResolvedCriteriaSet;
beforeAll(async () => {
  set = await shippedSet();
});

function stateSpaceModel(states: string[], A: number[][], phase = 'CR'): ModelText {
  return {
    model: {
      format: 'modalgate-model/1',
      aircraft: { name: 'Test T-2', class: 'I' },
      units: 'SI',
      conditions: [{ id: 'c1', phase, airspeed: 50, altitude: 1000, requiredLevel: 1, stateSpace: { states, A } }],
    },
  };
}

/** the band's width at the governing boundary of the required level (Level 1 here) */
function bandOf(finding: Finding): number {
  const bound = finding.bounds['1']!;
  const boundary = finding.value! < (bound.min ?? -Infinity) || bound.max === undefined ? bound.min! : Math.abs(finding.value! - (bound.min ?? -Infinity)) <= Math.abs(bound.max - finding.value!) ? bound.min! : bound.max;
  return bandAround(boundary, { quantity: finding.quantity, band: set.marginalBand });
}

describe('the change to the boundary, verified by re-analysis', () => {
  it('a failing finding moved by the change lands inside the required level, within the marginal band; a marginal one just out of the band', () => {
    let verified = 0;
    fc.assert(
      fc.property(fc.constantFrom(...FORMS), fc.array(fc.double({ min: 0.7, max: 1.3, noNaN: true }), { minLength: 40, maxLength: 40 }), (form, list) => {
        const input = modelOf(form, list);
        const results = checkText(input, set, 'issues');
        results.forEach((result, c) => {
          for (const finding of result.findings) {
            for (const s of finding.sensitivities ?? []) {
              if (s.toBoundary === null) {
                expect(s.reason).toMatch(/not reachable by this parameter alone|no longer identified/);
                continue;
              }
              const again = checkText(changed(input, s.parameter, s.current + s.toBoundary.change), set, 'none')[c]!;
              const moved = sameFinding(again.findings, result.findings, finding)!;
              expect(moved.value).toBeCloseTo(s.toBoundary.verifiedValue, 9);
              expect(moved.verdict).toBe(s.toBoundary.verifiedVerdict);
              expect(moved.level).toBe(s.toBoundary.verifiedLevel);
              const band = bandOf(finding);
              if (finding.verdict === 'fail') {
                expect(moved.verdict).toBe('marginal');
                expect(moved.margin!).toBeGreaterThanOrEqual(0);
                // within the marginal band, and within 5 % of its width of the boundary
                expect(moved.margin!).toBeLessThanOrEqual(0.05 * band);
              } else {
                expect(moved.verdict).toBe('pass');
                expect(moved.margin! - band).toBeLessThanOrEqual(0.05 * band);
              }
              // the change stays within the number's own sign and at most doubles it
              const ratio = (s.current + s.toBoundary.change) / s.current;
              expect(ratio).toBeGreaterThan(0);
              expect(ratio).toBeLessThanOrEqual(2);
              verified += 1;
            }
          }
        });
      }),
      { numRuns: 12, seed: 20261202 },
    );
    expect(verified).toBeGreaterThan(10);
  }, 120_000);

  it('a 2 x 2 Dutch-roll block: derivative and change against the closed form', () => {
    // v' = a v + b r (+ g phi), r' = c v + d r: the pair of this block has
    // zeta(d) = -(a + d) / (2 sqrt(a d - b c)) (linear algebra: trace and determinant), here
    // 0.0599 against the Class I Category B Level 1 minimum zeta of 0.08; roll (p) and bank
    // (phi) only feed the pair
    const [a, b, c, d] = [-0.05, -50, 0.02, -0.07];
    const input = stateSpaceModel(['v', 'r', 'p', 'phi'], [
      [a, b, 0, 9.8],
      [c, d, 0, 0],
      [0, 0, -4, 0],
      [0, 0, 1, 0],
    ]);
    const [result] = checkText(input, set, 'issues');
    const finding = result!.findings.find((f) => f.criterion === 'dutch-roll-damping-cat-b-c')!;
    expect(finding.verdict).toBe('fail');
    const W = Math.sqrt(a * d - b * c);
    expect(finding.value).toBeCloseTo(-(a + d) / (2 * W), 12);
    const nr = finding.sensitivities!.find((s) => s.parameter === 'conditions[0].stateSpace.A[1][1]')!;
    expect(nr.derivative).toBeCloseTo(-1 / (2 * W) + ((a + d) * a) / (4 * W ** 3), 9);
    // zeta(x) = z: (a + x)^2 = 4 z^2 (a x - b c), a quadratic in x; the root below d
    const dFor = (z: number) => {
      const [qb, qc] = [2 * a - 4 * z * z * a, a * a + 4 * z * z * b * c];
      return (-qb - Math.sqrt(qb * qb - 4 * qc)) / 2;
    };
    // the boundary 0.08, and 5 % of the marginal band (10 % of 0.08) beyond it
    const [z0, z1] = [0.08, 0.08 + 0.05 * 0.008];
    const t = nr.toBoundary!;
    expect(t.verifiedVerdict).toBe('marginal');
    expect(t.verifiedValue).toBeGreaterThanOrEqual(z0);
    expect(t.verifiedValue).toBeLessThanOrEqual(z1);
    expect(d + t.change).toBeCloseTo(dFor(t.verifiedValue), 9);
    expect(d + t.change).toBeLessThanOrEqual(dFor(z0));
    expect(d + t.change).toBeGreaterThanOrEqual(dFor(z1));
  });
});

describe('where a change cannot be given', () => {
  it('a defective short period (a Jordan block at -2): not defined, no large number', () => {
    const input = stateSpaceModel(['w', 'q', 'u', 'theta'], [
      [-2, 1, 0, 0],
      [0, -2, 0, 0],
      [0, 0, -0.02, -9.8],
      [0, 0, 0.002, 0],
    ]);
    const [result] = checkText(input, set, 'all');
    const damping = result!.findings.find((f) => f.criterion === 'short-period-damping-cat-b')!;
    expect(damping.sensitivities).toEqual([]);
    expect(damping.sensitivityNote).toMatch(/^not defined: the root -2\.000 is repeated or nearly so/);
  });

  it('a nearly defective one (the Jordan block perturbed by 1e-15) likewise', () => {
    const input = stateSpaceModel(['w', 'q', 'u', 'theta'], [
      [-2, 1, 0, 0],
      [1e-15, -2, 0, 0],
      [0, 0, -0.02, -9.8],
      [0, 0, 0.002, 0],
    ]);
    const [result] = checkText(input, set, 'all');
    const cap = result!.findings.find((f) => f.criterion === 'short-period-cap-cat-b')!;
    expect(cap.sensitivities).toEqual([]);
    expect(cap.sensitivityNote).toMatch(/^not defined/);
  });

  it('a roll mode ten times too slow: no single number within a sign change or doubling fixes it', () => {
    // roll root ~ A[p][p] = -0.07 (tau ~ 14.7 s) against the Class I Category B Level 1
    // maximum of 1.4 s; the Dutch roll and spiral barely touch it
    const input = stateSpaceModel(['v', 'p', 'r', 'phi'], [
      [-0.2, 0, -50, 9.8],
      [-0.001, -0.07, 0.01, 0],
      [0.02, -0.05, -0.3, 0],
      [0, 1, 0, 0],
    ]);
    const [result] = checkText(input, set, 'issues');
    const roll = result!.findings.find((f) => f.criterion === 'roll-time-constant-cat-b')!;
    expect(roll.verdict).toBe('fail');
    expect(roll.sensitivities!.length).toBe(5);
    expect(roll.sensitivities![0]!.parameter).toBe('conditions[0].stateSpace.A[1][1]');
    for (const s of roll.sensitivities!) {
      expect(s.toBoundary).toBeNull();
      expect(s.reason).toMatch(/^not reachable by this parameter alone: the linear estimate needs .* \((a change of sign|more than twice the number)\)/);
    }
  });
});
