/**
 * Spot checks of the shipped criteria sets against the published tables, and of the evidence
 * each boundary carries. Values and evidence classes follow the sources named beside each row
 * (the source ids are those of the sets' own source lists): tu144-flight-data-report = Curry,
 * NASA contractor report on the Tu-144 flight data, Tables 5-7 (MIL-STD-1797A recommended
 * values); simulator-validation-notes = notes quoting the 1980 document; textbook-tables-10 =
 * a textbook reprint of the tables (older arrangement); lag-design-notes = Passold, UPF,
 * phugoid table adapted from MIL-F-8785C (1980). "memory": no retrievable text gives the value.
 */
import { describe, expect, it } from 'vitest';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import type { EvidenceClass, LevelBounds, ResolvedCriteriaSet } from '../../src/types.js';

const mil = (await loadCriteriaSet('mil-f-8785c')).set;

function criterion(set: ResolvedCriteriaSet, id: string) {
  const c = set.criteria.find((x) => x.id === id);
  if (!c) throw new Error(`no criterion ${id}`);
  return c;
}

type Classes = [EvidenceClass, EvidenceClass, EvidenceClass];
const S: Classes = ['secondary', 'secondary', 'secondary'];
const M: Classes = ['memory', 'memory', 'memory'];

describe('mil-f-8785c: values against MIL-F-8785C (5 Nov 1980)', () => {
  const rows: [id: string, levels: LevelBounds, evidence: Classes, paragraph: string][] = [
    // 3.2.2.1.2 short-period damping, Cat A and C: 0.35-1.30 / 0.25-2.00 (tu144 Table 5(b)) / >= 0.15 (from memory)
    ['short-period-damping-cat-a-c', { '1': { min: 0.35, max: 1.3 }, '2': { min: 0.25, max: 2 }, '3': { min: 0.15 } }, ['secondary', 'secondary', 'memory'], '3.2.2.1.2'],
    // 3.2.2.1.2 Cat B: 0.30-2.00 / 0.20-2.00 (tu144 Table 5(a)) / >= 0.15 (from memory)
    ['short-period-damping-cat-b', { '1': { min: 0.3, max: 2 }, '2': { min: 0.2, max: 2 }, '3': { min: 0.15 } }, ['secondary', 'secondary', 'memory'], '3.2.2.1.2'],
    // 3.2.2.1.1 CAP, Cat A 0.28-3.6 / 0.16-10; Level 3 outside Level 2 (from memory: Figure 1 not retrieved)
    ['short-period-cap-cat-a', { '1': { min: 0.28, max: 3.6 }, '2': { min: 0.16, max: 10 }, '3': {} }, M, '3.2.2.1.1'],
    // 3.2.2.1.1 CAP, Cat B 0.085-3.6 / 0.038-10 (from memory)
    ['short-period-cap-cat-b', { '1': { min: 0.085, max: 3.6 }, '2': { min: 0.038, max: 10 }, '3': {} }, M, '3.2.2.1.1'],
    // 3.2.2.1.1 CAP, Cat C 0.16-3.6 / 0.096-10 (from memory)
    ['short-period-cap-cat-c', { '1': { min: 0.16, max: 3.6 }, '2': { min: 0.096, max: 10 }, '3': {} }, M, '3.2.2.1.1'],
    // 3.2.2.1.1 minimum omega_sp, Cat A 1.0 / 0.6; Cat C Class I, II-C, IV 0.87 / 0.6; II-L, III 0.7 / 0.4 (from memory)
    ['short-period-frequency-cat-a', { '1': { min: 1 }, '2': { min: 0.6 }, '3': {} }, M, '3.2.2.1.1'],
    ['short-period-frequency-cat-c-light', { '1': { min: 0.87 }, '2': { min: 0.6 }, '3': {} }, M, '3.2.2.1.1'],
    ['short-period-frequency-cat-c-heavy', { '1': { min: 0.7 }, '2': { min: 0.4 }, '3': {} }, M, '3.2.2.1.1'],
    // 3.2.1.2 phugoid: zeta >= 0.04 / >= 0; Level 3 time to double >= 55 s (lag-design-notes); Levels 1-2 of the
    // time to double are this file's inference (memory)
    ['phugoid-damping', { '1': { min: 0.04 }, '2': { min: 0 }, '3': {} }, S, '3.2.1.2'],
    ['phugoid-time-to-double', { '1': { min: 55 }, '2': { min: 55 }, '3': { min: 55 } }, ['memory', 'memory', 'secondary'], '3.2.1.2'],
    // 3.3.1.2 roll-mode time constant (textbook Table 10.1; tu144 Table 6 for Class III)
    ['roll-time-constant-cat-a-light', { '1': { max: 1 }, '2': { max: 1.4 }, '3': { max: 10 } }, S, '3.3.1.2'],
    ['roll-time-constant-cat-a-heavy', { '1': { max: 1.4 }, '2': { max: 3 }, '3': { max: 10 } }, S, '3.3.1.2'],
    ['roll-time-constant-cat-b', { '1': { max: 1.4 }, '2': { max: 3 }, '3': { max: 10 } }, S, '3.3.1.2'],
    ['roll-time-constant-cat-c-light', { '1': { max: 1 }, '2': { max: 1.4 }, '3': { max: 10 } }, S, '3.3.1.2'],
    ['roll-time-constant-cat-c-heavy', { '1': { max: 1.4 }, '2': { max: 3 }, '3': { max: 10 } }, S, '3.3.1.2'],
    // 3.3.1.3 spiral minimum time to double (Table VIII): Level 1 by category in the notes quoting the 1980
    // edition, by class in the textbook; Level 2 12 s against a recollection of 8 s; Level 3 not found
    ['spiral-time-to-double-cat-a-light', { '1': { min: 12 }, '2': { min: 12 }, '3': { min: 4 } }, ['secondary', 'conflicting', 'memory'], '3.3.1.3'],
    ['spiral-time-to-double-cat-b-light', { '1': { min: 20 }, '2': { min: 12 }, '3': { min: 4 } }, ['secondary', 'conflicting', 'memory'], '3.3.1.3'],
    ['spiral-time-to-double-cat-c-light', { '1': { min: 20 }, '2': { min: 12 }, '3': { min: 4 } }, ['conflicting', 'conflicting', 'memory'], '3.3.1.3'],
    ['spiral-time-to-double-heavy-cat-b', { '1': { min: 20 }, '2': { min: 12 }, '3': { min: 4 } }, ['secondary', 'conflicting', 'memory'], '3.3.1.3'],
    ['spiral-time-to-double-heavy-cat-a-c', { '1': { min: 20 }, '2': { min: 12 }, '3': { min: 4 } }, ['conflicting', 'conflicting', 'memory'], '3.3.1.3'],
    // 3.3.1.1 Dutch roll (textbook Table 10.2, tu144 Table 7; the Class IV CO/GA row and the |phi/beta| rule: from memory)
    ['dutch-roll-damping-cat-a', { '1': { min: 0.19 }, '2': { min: 0.02 }, '3': { min: 0 } }, S, '3.3.1.1'],
    ['dutch-roll-damping-cat-a-co-ga-class-iv', { '1': { min: 0.4 }, '2': { min: 0.02 }, '3': { min: 0 } }, ['memory', 'secondary', 'secondary'], '3.3.1.1'],
    ['dutch-roll-damping-cat-b-c', { '1': { min: 0.08 }, '2': { min: 0.02 }, '3': { min: 0 } }, S, '3.3.1.1'],
    ['dutch-roll-damping-frequency-cat-a', { '1': { min: 0.35 }, '2': { min: 0.05 }, '3': { min: 0 } }, S, '3.3.1.1'],
    ['dutch-roll-damping-frequency-cat-b', { '1': { min: 0.15 }, '2': { min: 0.05 }, '3': { min: 0 } }, S, '3.3.1.1'],
    ['dutch-roll-damping-frequency-cat-c-light', { '1': { min: 0.15 }, '2': { min: 0.05 }, '3': { min: 0 } }, S, '3.3.1.1'],
    // tu144 Table 7(b), Class III, Category C: "1 / 0.08 / 0.10 / 0.4" (MIL-STD-1797A recommended value)
    ['dutch-roll-damping-frequency-cat-c-heavy', { '1': { min: 0.1 }, '2': { min: 0.05 }, '3': { min: 0 } }, S, '3.3.1.1'],
    ['dutch-roll-frequency-cat-a-light', { '1': { min: 1 }, '2': { min: 0.4 }, '3': { min: 0.4 } }, S, '3.3.1.1'],
    ['dutch-roll-frequency-cat-a-heavy', { '1': { min: 0.4 }, '2': { min: 0.4 }, '3': { min: 0.4 } }, S, '3.3.1.1'],
    ['dutch-roll-frequency-cat-b', { '1': { min: 0.4 }, '2': { min: 0.4 }, '3': { min: 0.4 } }, S, '3.3.1.1'],
    ['dutch-roll-frequency-cat-c-light', { '1': { min: 1 }, '2': { min: 0.4 }, '3': { min: 0.4 } }, S, '3.3.1.1'],
    ['dutch-roll-frequency-cat-c-heavy', { '1': { min: 0.4 }, '2': { min: 0.4 }, '3': { min: 0.4 } }, S, '3.3.1.1'],
    // 3.3.1.4 roll-spiral, Cat B and C: zeta omega > 0.5 / 0.3 / 0.15 rad/s (from memory)
    ['roll-spiral-coupling', { '1': { min: 0.5 }, '2': { min: 0.3 }, '3': { min: 0.15 } }, M, '3.3.1.4'],
    // 3.3.4 roll performance, time to bank after a full roll-control step: Classes I, II, IV from memory (the project's
    // reference table; Tables IXa-IXe not found); Class III from Table IXf as quoted in the thesis notes, medium speed range
    ['roll-performance-class-i-cat-a', { '1': { max: 1.3 }, '2': { max: 1.7 }, '3': { max: 2.6 } }, M, '3.3.4'],
    ['roll-performance-class-i-cat-b', { '1': { max: 1.7 }, '2': { max: 2.5 }, '3': { max: 3.4 } }, M, '3.3.4'],
    ['roll-performance-class-i-cat-c', { '1': { max: 1.3 }, '2': { max: 1.8 }, '3': { max: 2.6 } }, M, '3.3.4'],
    ['roll-performance-class-ii-cat-a', { '1': { max: 1.4 }, '2': { max: 1.9 }, '3': { max: 2.8 } }, M, '3.3.4'],
    ['roll-performance-class-ii-cat-b', { '1': { max: 1.9 }, '2': { max: 2.8 }, '3': { max: 3.8 } }, M, '3.3.4'],
    ['roll-performance-class-ii-l-cat-c', { '1': { max: 1.8 }, '2': { max: 2.5 }, '3': { max: 3.6 } }, M, '3.3.4'],
    ['roll-performance-class-ii-c-cat-c', { '1': { max: 1 }, '2': { max: 1.5 }, '3': { max: 2 } }, M, '3.3.4'],
    ['roll-performance-class-iii-cat-a', { '1': { max: 1.5 }, '2': { max: 2 }, '3': { max: 3 } }, S, '3.3.4'],
    ['roll-performance-class-iii-cat-b', { '1': { max: 2 }, '2': { max: 3.3 }, '3': { max: 5 } }, S, '3.3.4'],
    ['roll-performance-class-iii-cat-c', { '1': { max: 2.5 }, '2': { max: 4 }, '3': { max: 6 } }, S, '3.3.4'],
    ['roll-performance-class-iv-cat-a', { '1': { max: 1.3 }, '2': { max: 1.7 }, '3': { max: 2.6 } }, M, '3.3.4'],
    ['roll-performance-class-iv-cat-b', { '1': { max: 1.7 }, '2': { max: 2.5 }, '3': { max: 3.4 } }, M, '3.3.4'],
    ['roll-performance-class-iv-cat-c', { '1': { max: 1 }, '2': { max: 1.3 }, '3': { max: 2 } }, M, '3.3.4'],
    // 3.5.3 allowable equivalent time delay, each axis: 0.10 / 0.20 / 0.25 s (from memory)
    ['equivalent-time-delay-pitch', { '1': { max: 0.1 }, '2': { max: 0.2 }, '3': { max: 0.25 } }, M, '3.5.3'],
    ['equivalent-time-delay-roll', { '1': { max: 0.1 }, '2': { max: 0.2 }, '3': { max: 0.25 } }, M, '3.5.3'],
    ['equivalent-time-delay-yaw', { '1': { max: 0.1 }, '2': { max: 0.2 }, '3': { max: 0.25 } }, M, '3.5.3'],
  ];
  /** MIL-STD-1797A guidance regions held in the same set (see the next describe). */
  const guidance = ['pitch-bandwidth-phase-delay-cat-a', 'pitch-bandwidth-phase-delay-cat-c'];

  it.each(rows)('%s', (id, levels, evidence, paragraph) => {
    const c = criterion(mil, id);
    expect(c.levels).toEqual(levels);
    expect([c.evidence['1'].class, c.evidence['2'].class, c.evidence['3'].class]).toEqual(evidence);
    expect(c.source).toBe(`MIL-F-8785C ${paragraph}`);
  });

  it('holds no criterion beyond the rows checked above', () => {
    expect(mil.criteria.map((c) => c.id).sort()).toEqual([...rows.map((r) => r[0]), ...guidance].sort());
  });

  it('times the bank angle of each roll-performance row (3.3.4): 60 deg Class I A/B, 45 deg Class II A/B, 30 deg II-L C, 25 deg II-C C, 30 deg Class III, 90 deg Class IV A/B, 30 deg IV C (from memory; Class III: Table IXf)', () => {
    const angle = (id: string) => Math.round(((criterion(mil, `roll-performance-${id}`).params['bankAngle'] as number) * 180) / Math.PI);
    expect(['class-i-cat-a', 'class-i-cat-b', 'class-i-cat-c'].map(angle)).toEqual([60, 60, 30]);
    expect(['class-ii-cat-a', 'class-ii-cat-b', 'class-ii-l-cat-c', 'class-ii-c-cat-c'].map(angle)).toEqual([45, 45, 30, 25]);
    expect(['class-iii-cat-a', 'class-iii-cat-b', 'class-iii-cat-c'].map(angle)).toEqual([30, 30, 30]);
    expect(['class-iv-cat-a', 'class-iv-cat-b', 'class-iv-cat-c'].map(angle)).toEqual([90, 90, 30]);
    expect(criterion(mil, 'roll-performance-class-iv-cat-a').applies.phases).toEqual(['WD', 'AR', 'RC', 'RR', 'TF', 'AS', 'FF']);
    expect(mil.notes.join('\n')).toMatch(/Not covered by this set.*roll-rate\s+oscillation limits.*sideslip-excursion limits/s);
  });

  it('carries the |phi/beta| rise factors k = 0.014 / 0.009 / 0.005 and the Class III zeta cap 0.7 (3.3.1.1, from memory)', () => {
    for (const id of ['dutch-roll-damping-frequency-cat-a', 'dutch-roll-damping-frequency-cat-b', 'dutch-roll-damping-frequency-cat-c-light', 'dutch-roll-damping-frequency-cat-c-heavy']) {
      expect(criterion(mil, id).params).toEqual({
        phiBetaThreshold: 20,
        phiBetaK1: 0.014,
        phiBetaK2: 0.009,
        phiBetaK3: 0.005,
        zetaCap: 0.7,
        zetaCapClasses: 'III',
      });
    }
  });

  it('maps flight phases to categories (MIL-F-8785C 1.5)', () => {
    const byCategory = (cat: string) =>
      Object.entries(mil.phaseCategories)
        .filter(([, c]) => c === cat)
        .map(([p]) => p)
        .sort();
    expect(byCategory('A')).toEqual(['AR', 'AS', 'CO', 'FF', 'GA', 'RC', 'RR', 'TF', 'WD']);
    expect(byCategory('B')).toEqual(['AD', 'CL', 'CR', 'D', 'DE', 'ED', 'LO', 'RT']);
    expect(byCategory('C')).toEqual(['CT', 'L', 'PA', 'TO', 'WO']);
  });

  it('leaves out the unverified minimum n/alpha lines and says so', () => {
    expect(mil.notes.join('\n')).toMatch(/minimum n\/alpha lines .* left out/s);
    expect(mil.defaultRequiredLevel).toBe(1);
    expect(mil.marginalBand.relative).toBe(0.1);
  });
});

describe('civil-dynamic-stability: 14 CFR 23.181 and 25.181', () => {
  /** zeta for 1/10 amplitude in N cycles: zeta / sqrt(1 - zeta^2) = ln 10 / (2 pi N). */
  const zetaForTenthIn = (cycles: number) => {
    const x = Math.LN10 / (2 * Math.PI * cycles);
    return x / Math.sqrt(1 + x * x);
  };
  /** amplitude left after N cycles at damping ratio zeta */
  const amplitudeAfter = (cycles: number, zeta: number) => Math.exp((-2 * Math.PI * cycles * zeta) / Math.sqrt(1 - zeta * zeta));

  it('1/10 amplitude in 7 cycles is zeta 0.0523; in 13 cycles zeta 0.0282 (14 CFR 23.181)', () => {
    expect(zetaForTenthIn(7)).toBeCloseTo(0.0523, 4);
    expect(zetaForTenthIn(13)).toBeCloseTo(0.0282, 4);
    expect(amplitudeAfter(7, zetaForTenthIn(7))).toBeCloseTo(0.1, 12);
  });

  it('ships thresholds that meet the rule (rounded up, never below the exact value)', async () => {
    const { set } = await loadCriteriaSet('test/fixtures/criteria/part23-programme.yaml');
    const below = criterion(set, 'part23-dutch-roll-below-18000-ft');
    const above = criterion(set, 'part23-dutch-roll-at-or-above-18000-ft');
    expect(below.levels).toEqual({ '1': { min: 0.0523 } });
    expect(above.levels).toEqual({ '1': { min: 0.0282 } });
    expect(amplitudeAfter(7, 0.0523)).toBeLessThanOrEqual(0.1);
    expect(amplitudeAfter(13, 0.0282)).toBeLessThanOrEqual(0.1);
    expect(0.0523 - zetaForTenthIn(7)).toBeLessThan(1e-4);
    expect(0.0282 - zetaForTenthIn(13)).toBeLessThan(1e-4);
    // 18,000 ft x 0.3048 m/ft (exact by definition of the international foot)
    expect(below.applies.altitude?.below).toBeCloseTo(18000 * 0.3048, 9);
    expect(above.applies.altitude?.atOrAbove).toBeCloseTo(18000 * 0.3048, 9);
  });

  it('25.181 Dutch roll positively damped: zeta > 0 with the end point excluded, Level 1 only', async () => {
    const { set } = await loadCriteriaSet('test/fixtures/criteria/part25-programme.yaml');
    const dr = criterion(set, 'part25-dutch-roll-positively-damped');
    expect(dr.levels).toEqual({ '1': { min: 0 } });
    expect(dr.params['strictBounds']).toBe(true);
  });
});

describe('mil-f-8785c: bandwidth and phase-delay regions (MIL-STD-1797A 4.2.1.2 guidance, from memory, low)', () => {
  // Category A Level 1 roughly bandwidth >= 6.5 rad/s with tau_p <= 0.12 s; Category C
  // Level 1 roughly >= 2.5 rad/s; Level 2 to tau_p about 0.20 s (memory, low).
  it.each([
    ['pitch-bandwidth-phase-delay-cat-a', 'A', 6.5],
    ['pitch-bandwidth-phase-delay-cat-c', 'C', 2.5],
  ] as const)('%s', (id, category, bandwidth) => {
    const c = criterion(mil, id);
    expect(c.applies.categories).toEqual([category]);
    expect(c.quantity).toBe('pitch_bandwidth');
    expect(c.region?.against).toBe('pitch_phase_delay');
    expect(c.region?.levels['1']).toEqual([[bandwidth, 0], [bandwidth, 0.12], [100, 0.12], [100, 0]]);
    expect(c.region?.levels['2']).toEqual([[0, 0], [0, 0.2], [100, 0.2], [100, 0]]);
    expect(c.region?.levels['3']).toBe('any');
    expect([c.evidence['1'].class, c.evidence['2'].class, c.evidence['3'].class]).toEqual(['memory', 'memory', 'memory']);
    expect(c.source).toBe('MIL-STD-1797A 4.2.1.2 (guidance)');
    expect(c.region?.figure).toMatch(/to digitise/);
  });
});
