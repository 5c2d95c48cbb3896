/** Small builders for Results objects, so each test states only what it is about. */
import type { ConditionResult, Finding, Mode, Results } from '../../src/types.js';

export function finding(over: Partial<Finding> & Pick<Finding, 'criterion' | 'verdict'>): Finding {
  return {
    set: 'test-set',
    title: over.criterion,
    mode: 'short_period',
    quantity: 'damping_ratio',
    value: 0.5,
    unit: '-',
    level: 1,
    margin: 0.1,
    bounds: { '1': { min: 0.3, max: 2 } },
    source: 'MIL-F-8785C 3.2.2.1.2 (from memory)',
    evidence: { class: 'memory', sources: [] },
    reason: '',
    ...over,
  };
}

export function mode(over: Partial<Mode> & Pick<Mode, 'kind'>): Mode {
  return {
    eigenvalues: [],
    naturalFrequency: null,
    dampingRatio: null,
    dampedFrequency: null,
    period: null,
    timeConstant: null,
    timeToHalf: null,
    timeToDouble: null,
    cyclesToHalf: null,
    basis: 'test',
    ambiguous: false,
    referenceState: 'q',
    shape: [],
    ...over,
  };
}

export function condition(over: Partial<ConditionResult> & Pick<ConditionResult, 'id'>): ConditionResult {
  return {
    phase: 'CR',
    category: 'B',
    notApplicable: [],
    responses: null,
    requiredLevel: 1,
    requiredLevelFrom: 'criteria default',
    airspeed: 120,
    altitude: 3000,
    form: 'stateSpace',
    subsystems: { longitudinal: ['u', 'w', 'q', 'theta'], lateral: [], kinematic: [], other: [] },
    coupling: 0,
    modes: [],
    findings: [],
    warnings: [],
    notes: [],
    ...over,
  };
}

export function results(over: Partial<Results> = {}): Results {
  return {
    format: 'modalgate-results/1',
    tool: { name: 'modalgate', version: '0.1.0' },
    generatedAt: '2026-01-01T00:00:00.000Z',
    command: ['modalgate', 'check', 'model.yaml'],
    inputs: [
      { role: 'model', path: '/a/model.yaml', sha256: 'aa'.repeat(32) },
      { role: 'criteria', path: '/a/criteria/set.yaml', sha256: 'bb'.repeat(32) },
    ],
    aircraft: { name: 'Test aircraft', class: 'II-L' },
    criteriaSets: [{ id: 'test-set', title: 'Test set', chain: ['test-set'], sources: [] }],
    contents: { modeShapes: true },
    summary: { pass: 0, marginal: 0, fail: 0, not_evaluated: 0 },
    conditions: [],
    ...over,
  };
}
