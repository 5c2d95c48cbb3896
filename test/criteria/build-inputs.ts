/**
 * Test inputs as plain objects of the src/types.ts model: modes built by hand from their
 * roots with the formulas of the trade (omega_n = |lambda|, zeta = -Re/|lambda|, tau = -1/lambda;
 * common practice), so these tests do not depend on the modes module.
 */
import type { Complex, FlightCondition, ModalAnalysis, Mode, ModeKind, StateShare } from '../../src/types.js';

export function modeFromRoots(kind: ModeKind, roots: Complex[], shape: StateShare[] = []): Mode {
  const divergent = roots.some((r) => r.re > 0);
  const pair = roots.length === 2 && roots[0]!.im !== 0;
  let naturalFrequency: number | null = null;
  let dampingRatio: number | null = null;
  if (pair) {
    naturalFrequency = Math.hypot(roots[0]!.re, roots[0]!.im);
    dampingRatio = -roots[0]!.re / naturalFrequency;
  } else if (roots.length === 2) {
    const [a, b] = [roots[0]!.re, roots[1]!.re];
    if (a * b > 0) {
      naturalFrequency = Math.sqrt(a * b);
      dampingRatio = -(a + b) / (2 * naturalFrequency);
    }
  }
  const single = roots.length === 1 ? roots[0]! : undefined;
  const maxRe = Math.max(...roots.map((r) => r.re));
  const minAbsRe = Math.min(...roots.map((r) => Math.abs(r.re)));
  return {
    kind,
    eigenvalues: roots,
    naturalFrequency,
    dampingRatio,
    dampedFrequency: pair ? Math.abs(roots[0]!.im) : null,
    period: pair ? (2 * Math.PI) / Math.abs(roots[0]!.im) : null,
    timeConstant: single ? -1 / single.re : null,
    timeToHalf: divergent ? null : Math.LN2 / minAbsRe,
    timeToDouble: divergent ? Math.LN2 / maxRe : null,
    cyclesToHalf: pair && !divergent ? (Math.LN2 / (2 * Math.PI)) * (Math.abs(roots[0]!.im) / -roots[0]!.re) : null,
    basis: 'built by hand in the test',
    ambiguous: false,
    referenceState: shape[0]?.state ?? 'x',
    shape,
  };
}

export const pairOf = (re: number, im: number): Complex[] => [
  { re, im: Math.abs(im) },
  { re, im: -Math.abs(im) },
];

/** A pair with the given damping ratio and natural frequency [rad/s]. */
export function pairFrom(zeta: number, omega: number): Complex[] {
  return pairOf(-zeta * omega, omega * Math.sqrt(Math.max(0, 1 - zeta * zeta)));
}

export function share(state: string, magnitude: number): StateShare {
  return { state, magnitude, phase: 0, participation: 0 };
}

export function analysisOf(modes: Mode[]): ModalAnalysis {
  return {
    subsystems: { longitudinal: ['u', 'w', 'q', 'theta'], lateral: ['beta', 'p', 'r', 'phi'], kinematic: [], other: [] },
    coupling: 0,
    decoupled: true,
    modes,
    warnings: [],
  };
}

export function conditionOf(fields: Partial<FlightCondition> & { phase: string }): FlightCondition {
  return {
    id: 'c1',
    airspeed: 100,
    altitude: 1000,
    requiredLevel: null,
    nAlpha: null,
    theta0: 0,
    form: 'stateSpace',
    system: { states: [], A: [], inputs: [], B: [], outputs: [], C: [], D: [] },
    liftData: null,
    controls: {},
    frequencyResponses: [],
    notes: [],
    place: { file: 'test-model.yaml', line: 3, column: 5 },
    ...fields,
  };
}
