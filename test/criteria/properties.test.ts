/**
 * Properties (fast-check): more damping never worsens a lower-bound damping verdict; a set
 * that extends another without changing anything gives the same findings.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateCondition } from '../../src/criteria/evaluate.js';
import { resolveCriteriaChain } from '../../src/criteria/resolve.js';
import type { AircraftClass, Level, Mode, ModeKind, Verdict } from '../../src/types.js';
import { analysisOf, conditionOf, modeFromRoots, pairFrom, share } from './build-inputs.js';
import { parsedFile } from './criteria-text.js';

const milText = readFileSync(new URL('../../criteria/mil-f-8785c.yaml', import.meta.url), 'utf8');
const milFile = parsedFile(milText, 'criteria/mil-f-8785c.yaml');

const rank: Record<Verdict, number> = { pass: 0, marginal: 1, fail: 2, not_evaluated: 3 };
const levelRank = (l: Level | null) => l ?? 4;

/** A one-criterion set with nested lower bounds m1 >= m2 >= m3 on the damping ratio. */
function lowerBoundSet(m1: number, m2: number, m3: number, relative: number) {
  const text = `
format: modalgate-criteria/1
id: lower-bound
title: Lower bounds only
requiredLevel: 1
marginalBand: { relative: ${relative}, absolute: { damping_ratio: 0.01 } }
phaseCategories: { CR: B }
criteria:
  - id: dr-damping
    title: Dutch-roll damping
    mode: dutch_roll
    quantity: damping_ratio
    applies: {}
    levels: { "1": { min: ${m1} }, "2": { min: ${m2} }, "3": { min: ${m3} } }
    source: { document: property test, paragraph: "-" }
    evidence: [{ class: memory }]
    note: ""
`;
  return resolveCriteriaChain([parsedFile(text, 'lower-bound.yaml')]);
}

describe('properties', () => {
  it('raising the damping of a mode never worsens a lower-bound damping verdict or level', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -0.2, max: 1.5, noNaN: true }), { minLength: 3, maxLength: 3 }),
        fc.double({ min: -0.5, max: 0.99, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        fc.constantFrom<Level>(1, 2, 3),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        (mins, zeta, raise, omega, required, relative) => {
          const [m1, m2, m3] = [...mins].sort((a, b) => b - a) as [number, number, number];
          const set = lowerBoundSet(m1, m2, m3, relative);
          const judgeAt = (z: number) =>
            evaluateCondition({
              aircraftClass: 'I',
              condition: conditionOf({ phase: 'CR', requiredLevel: required }),
              analysis: analysisOf([modeFromRoots('dutch_roll', pairFrom(z, omega))]),
              set,
            }).findings[0]!;
          const lower = judgeAt(zeta);
          const higher = judgeAt(Math.min(0.999, zeta + raise));
          expect(rank[higher.verdict]).toBeLessThanOrEqual(rank[lower.verdict]);
          expect(levelRank(higher.level)).toBeLessThanOrEqual(levelRank(lower.level));
        },
      ),
      { numRuns: 300 },
    );
  });

  it('a set that extends MIL-F-8785C with no changes gives the same findings as MIL-F-8785C', () => {
    const child = parsedFile(
      'format: modalgate-criteria/1\nid: same-as-parent\ntitle: Nothing changed\nextends: mil-f-8785c\n',
      'same-as-parent.yaml',
    );
    const parent = resolveCriteriaChain([milFile]);
    const extended = resolveCriteriaChain([milFile, child]);
    const phases = Object.keys(parent.phaseCategories);
    const kinds: ModeKind[] = ['short_period', 'phugoid', 'dutch_roll', 'roll_spiral'];
    const modeArb = fc
      .tuple(fc.constantFrom(...kinds), fc.double({ min: -0.3, max: 1.2, noNaN: true }), fc.double({ min: 0.05, max: 8, noNaN: true }))
      .map(([kind, zeta, omega]): Mode => modeFromRoots(kind, pairFrom(Math.min(zeta, 0.999), omega), [share('beta', 1), share('phi', 2)]));
    const realArb = fc
      .tuple(fc.constantFrom<ModeKind>('roll', 'spiral'), fc.double({ min: -10, max: 0.5, noNaN: true }))
      .map(([kind, re]): Mode => modeFromRoots(kind, [{ re, im: 0 }]));
    fc.assert(
      fc.property(
        fc.constantFrom(...phases),
        fc.constantFrom<AircraftClass>('I', 'II-L', 'II-C', 'III', 'IV'),
        fc.array(fc.oneof(modeArb, realArb), { maxLength: 6 }),
        fc.option(fc.constantFrom<Level>(1, 2, 3), { nil: null }),
        (phase, aircraftClass, modes, requiredLevel) => {
          const condition = conditionOf({ phase, requiredLevel, nAlpha: 12 });
          const analysis = analysisOf(modes);
          const a = evaluateCondition({ aircraftClass, condition, analysis, set: parent });
          const b = evaluateCondition({ aircraftClass, condition, analysis, set: extended });
          expect(b.findings).toEqual(a.findings);
          expect(b.requiredLevel).toBe(a.requiredLevel);
          expect(b.category).toBe(a.category);
        },
      ),
      { numRuns: 200 },
    );
  });
});
