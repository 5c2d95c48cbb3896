/**
 * Criteria on augmented aircraft: the equivalent-system figures through the modal criteria,
 * the equivalent time delay (MIL-F-8785C 3.5.3) and the bandwidth / phase-delay region.
 */
import { describe, expect, it } from 'vitest';
import { evaluateCondition } from '../../src/criteria/evaluate.js';
import type { ResponseFigures } from '../../src/criteria/evaluators.js';
import { insidePolygon, relativeMargin } from '../../src/criteria/level-regions.js';
import { STANDARD_GRAVITY } from '../../src/criteria/derived-figures.js';
import { fitPitch } from '../../src/equivalent/fit-loes.js';
import { toEquivalentSystem } from '../../src/equivalent/equivalent-system.js';
import { logSpacedCount, samplesFromComplex } from '../../src/equivalent/response-samples.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import type { EquivalentSystem, Finding } from '../../src/types.js';
import { analysisOf, conditionOf, modeFromRoots, pairFrom } from './build-inputs.js';
import { responseAt } from '../equivalent/rational.js';

const mil = (await loadCriteriaSet('mil-f-8785c')).set;

/** The reference's check-vector HOS (computed vector): fit K 0.866, 1/Ttheta2 1.40, zeta 0.632, w 2.95, tau 0.123 s, M 1.41. */
function referenceFit(): EquivalentSystem {
  const w = logSpacedCount(0.1, 10, 30);
  const h = w.map((x) =>
    responseAt([{ num: [1, 1.25], den: [1, 4.2, 9] }, { num: [400], den: [1, 28, 400] }, { num: [1], den: [1 / 15, 1] }], x),
  );
  return toEquivalentSystem(fitPitch({ q: { output: 'q', samples: samplesFromComplex(w, h) }, method: 'q-only' }), 'Fes', 'model');
}

/** Computed vector of the reference for K(s+1.25)e^(-0.1s)/(s(s^2+4.2s+9)): phase bw 3.202, gain bw 3.895, tau_p 0.077 s. */
const bandwidthCase: ResponseFigures = {
  pitch: { bandwidth: 3.202, phaseDelay: 0.077, method: 'theta/Fes from the model', reasons: {} },
};

function evaluate(phase: string, options: { equivalents?: EquivalentSystem[]; responses?: ResponseFigures } = {}) {
  return evaluateCondition({
    aircraftClass: 'IV',
    condition: conditionOf({ phase, airspeed: 100 }),
    analysis: analysisOf([modeFromRoots('short_period', pairFrom(0.7, 3.0))]),
    set: mil,
    ...(options.equivalents ? { equivalentSystems: options.equivalents } : {}),
    ...(options.responses ? { responseFigures: options.responses } : {}),
  });
}

const byId = (findings: Finding[], id: string) => findings.filter((f) => f.criterion === id);

describe('equivalent-system figures through the modal criteria', () => {
  const fit = referenceFit();
  const result = evaluate('PA', { equivalents: [fit] });

  it('judges the short-period damping on the raw roots and on the equivalent system, and says which', () => {
    const [raw, equivalent] = byId(result.findings, 'short-period-damping-cat-a-c');
    expect(raw!.value).toBeCloseTo(0.7, 12);
    expect(raw!.basis).toBeUndefined();
    expect(equivalent!.value).toBeCloseTo(0.632, 3);
    expect(equivalent!.basis).toBe('equivalent system: pitch, q alone, M 1.41 (guidance 10)');
    expect(equivalent!.verdict).toBe('pass'); // 0.35..1.30 at Level 1 (MIL-F-8785C 3.2.2.1.2, from memory)
  });

  it('CAP of the equivalent system uses n/alpha = (V/g)(1/Ttheta2)', () => {
    const [, equivalent] = byId(result.findings, 'short-period-cap-cat-c');
    const w = fit.parameters['naturalFrequency']!;
    const nAlpha = (100 / STANDARD_GRAVITY) * fit.parameters['inverseTtheta2']!; // closed form of the reference
    expect(equivalent!.value).toBeCloseTo((w * w) / nAlpha, 12);
    expect(equivalent!.method).toContain('n/alpha = (V/g)(1/Ttheta2)');
  });

  it('judges the equivalent time delay: 0.123 s is Level 2 against 0.10 / 0.20 / 0.25 s (3.5.3)', () => {
    const [delay] = byId(result.findings, 'equivalent-time-delay-pitch');
    expect(delay!.value).toBeCloseTo(0.123, 3);
    expect(delay!.level).toBe(2);
    expect(delay!.verdict).toBe('fail');
    expect(delay!.basis).toContain('equivalent system: pitch');
  });

  it('shows but does not judge the figures of a fit that is not valid', () => {
    const bad: EquivalentSystem = { ...fit, valid: false, mismatch: 42, remarks: ['mismatch of q 42.0 is beyond the guidance of 10'] };
    const out = evaluate('PA', { equivalents: [bad] });
    const [delay] = byId(out.findings, 'equivalent-time-delay-pitch');
    expect(delay!.verdict).toBe('not_evaluated');
    expect(delay!.value).toBeCloseTo(0.123, 3);
    expect(delay!.level).toBeNull();
    expect(delay!.reason).toBe('the equivalent system is not valid (mismatch of q 42.0 is beyond the guidance of 10): its figure is shown, not judged');
    expect(delay!.basis).toContain('NOT VALID');
  });

  it('a condition without controls makes no augmented finding and changes nothing else', () => {
    const plain = evaluate('PA');
    expect(plain.findings.some((f) => f.quantity === 'equivalent_time_delay' || f.quantity === 'pitch_bandwidth')).toBe(false);
    expect(plain.findings.some((f) => f.basis !== undefined)).toBe(false);
    const listed = plain.notApplicable.map((n) => n.criterion);
    expect(listed).toContain('roll-spiral-coupling'); // as before: no roll-spiral mode
    expect(listed.filter((id) => id.startsWith('equivalent-time-delay') || id.startsWith('pitch-bandwidth'))).toEqual([]);
    // the raw-root findings are the same with or without the equivalent system beside them
    expect(result.findings.filter((f) => f.basis === undefined)).toEqual(plain.findings);
  });
});

describe('bandwidth / phase-delay region', () => {
  it('Category C: (3.202 rad/s, 0.077 s) lies in the Level 1 region (bandwidth >= 2.5, tau_p <= 0.12 s, memory)', () => {
    const [f] = byId(evaluate('PA', { responses: bandwidthCase }).findings, 'pitch-bandwidth-phase-delay-cat-c');
    expect(f!.value).toBe(3.202);
    expect(f!.against).toEqual({ quantity: 'pitch_phase_delay', value: 0.077, unit: 's' });
    expect(f!.level).toBe(1);
    expect(f!.verdict).toBe('pass');
    // nearest edge: bandwidth 2.5 rad/s, (3.202 - 2.5) / 3.202 (by hand)
    expect(f!.margin).toBeCloseTo((3.202 - 2.5) / 3.202, 12);
  });

  it('Category A: the same point reaches Level 2 only (bandwidth below 6.5 rad/s): fail', () => {
    const [f] = byId(evaluate('CO', { responses: bandwidthCase }).findings, 'pitch-bandwidth-phase-delay-cat-a');
    expect(f!.level).toBe(2);
    expect(f!.verdict).toBe('fail');
    expect(f!.reason).toBe('Level 2 reached, Level 1 required (outside the Level 1 region)');
  });

  it('a point within 10 % of the required region edge is marginal', () => {
    const near: ResponseFigures = { pitch: { bandwidth: 2.6, phaseDelay: 0.05, method: 'test', reasons: {} } };
    const [f] = byId(evaluate('PA', { responses: near }).findings, 'pitch-bandwidth-phase-delay-cat-c');
    expect(f!.verdict).toBe('marginal');
    expect(f!.margin).toBeCloseTo(0.1 / 2.6, 12);
  });

  it('a missing figure is not evaluated, with the reason', () => {
    const none: ResponseFigures = {
      pitch: { bandwidth: 4.389, phaseDelay: null, method: 'test', reasons: { phaseDelay: 'the phase does not reach -180 deg in the band: no phase delay' } },
    };
    const [f] = byId(evaluate('PA', { responses: none }).findings, 'pitch-bandwidth-phase-delay-cat-c');
    expect(f!.verdict).toBe('not_evaluated');
    expect(f!.reason).toBe('the phase does not reach -180 deg in the band: no phase delay');
  });
});

describe('polygon geometry', () => {
  const square: [number, number][] = [[0, 0], [0, 1], [2, 1], [2, 0]];
  it('inside, outside and on an edge', () => {
    expect(insidePolygon(square, 1, 0.5)).toBe(true);
    expect(insidePolygon(square, 3, 0.5)).toBe(false);
    expect(insidePolygon(square, 2, 0.5)).toBe(true);
    expect(insidePolygon(square, 0, 0)).toBe(true);
  });
  it('relative margin: the smallest fractional move of one figure to the edge', () => {
    // (1.5, 0.5): x to 2 is 1/3 of 1.5; y to 1 or 0 is 1 of 0.5 (by hand)
    expect(relativeMargin(square, 1.5, 0.5)).toBeCloseTo(1 / 3, 12);
    expect(relativeMargin(square, 3, 0.5)).toBeCloseTo(-1 / 3, 12);
    expect(relativeMargin('any', 3, 0.5)).toBe(Infinity);
  });
});
