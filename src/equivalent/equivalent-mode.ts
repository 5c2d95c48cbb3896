/**
 * The figures of an equivalent system put in the shape of a mode, so that the modal criteria
 * (short-period damping and CAP, roll-mode time constant, Dutch-roll damping and frequency)
 * judge them exactly as they judge the raw roots: pitch -> short period, roll -> roll mode,
 * yaw -> Dutch roll.
 */
import type { Complex, ControlAxisName, EquivalentSystem, Mode, ModeKind } from '../types.js';

export const AXIS_MODE: Record<ControlAxisName, ModeKind> = { pitch: 'short_period', roll: 'roll', yaw: 'dutch_roll' };

export function modeAxis(kind: ModeKind): ControlAxisName | null {
  return kind === 'short_period' ? 'pitch' : kind === 'roll' ? 'roll' : kind === 'dutch_roll' ? 'yaw' : null;
}

/** One line saying where the figures come from, for the finding's basis. */
export function equivalentBasis(system: EquivalentSystem): string {
  const how =
    system.method === 'q-and-nz'
      ? 'q and nz fitted together'
      : system.method === 'q-with-fixed-ttheta2'
        ? '1/Ttheta2 held at the airframe value'
        : system.method === 'q-only'
          ? 'q alone'
          : system.method;
  const validity = system.valid ? '' : ', NOT VALID';
  return `equivalent system: ${system.axis}, ${how}, M ${system.mismatch.toPrecision(3)} (guidance ${system.mismatchGuidance})${validity}`;
}

export function equivalentMode(system: EquivalentSystem): Mode {
  const kind = AXIS_MODE[system.axis];
  const basis = equivalentBasis(system);
  if (system.axis === 'roll') {
    const T = system.parameters['rollTimeConstant']!;
    const root = -1 / T;
    return blank(kind, basis, [{ re: root, im: 0 }], {
      timeConstant: T,
      timeToHalf: root < 0 ? Math.LN2 / -root : null,
      timeToDouble: root > 0 ? Math.LN2 / root : null,
    });
  }
  const zeta = system.parameters['dampingRatio']!;
  const omega = system.parameters['naturalFrequency']!;
  if (zeta < 1) {
    const wd = omega * Math.sqrt(1 - zeta * zeta);
    const re = -zeta * omega;
    return blank(kind, basis, [{ re, im: wd }, { re, im: -wd }], {
      naturalFrequency: omega,
      dampingRatio: zeta,
      dampedFrequency: wd,
      period: (2 * Math.PI) / wd,
      timeToHalf: re < 0 ? Math.LN2 / -re : null,
      timeToDouble: re > 0 ? Math.LN2 / re : null,
      cyclesToHalf: re < 0 ? (Math.LN2 / (2 * Math.PI)) * (wd / -re) : null,
    });
  }
  // overdamped: two real roots -omega (zeta +- sqrt(zeta^2 - 1))
  const r = omega * Math.sqrt(zeta * zeta - 1);
  const slow = -zeta * omega + r;
  return blank(kind, basis, [{ re: slow, im: 0 }, { re: -zeta * omega - r, im: 0 }], {
    naturalFrequency: omega,
    dampingRatio: zeta,
    timeToHalf: slow < 0 ? Math.LN2 / -slow : null,
  });
}

function blank(kind: ModeKind, basis: string, eigenvalues: Complex[], figures: Partial<Mode>): Mode {
  return {
    kind,
    eigenvalues,
    naturalFrequency: null,
    dampingRatio: null,
    dampedFrequency: null,
    period: null,
    timeConstant: null,
    timeToHalf: null,
    timeToDouble: null,
    cyclesToHalf: null,
    basis,
    ambiguous: false,
    referenceState: '',
    shape: [],
    ...figures,
  };
}
