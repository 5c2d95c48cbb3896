/**
 * Nondimensional stability coefficients to dimensional, mass-normalised derivatives, stability
 * axes (Nelson, Flight Stability and Automatic Control, 2nd ed., summary tables of the
 * longitudinal derivatives in ch. 4 and the lateral-directional derivatives in ch. 5).
 * With Q = 1/2 rho u0^2 [Pa], S [m^2], cbar, b [m], m [kg], Iy, Ix, Iz [kg m^2]:
 *   Xu = -(CDu + 2 CD0) Q S / (m u0)          Xw = -(CDalpha - CL0) Q S / (m u0)
 *   Zu = -(CLu + 2 CL0) Q S / (m u0)          Zw = -(CLalpha + CD0) Q S / (m u0)
 *   Zwdot = -CLalphadot (cbar / 2u0) Q S / (m u0)   Zq = -CLq (cbar / 2u0) Q S / m
 *   Mu = Cmu Q S cbar / (u0 Iy)               Mw = Cmalpha Q S cbar / (u0 Iy)
 *   Mwdot = Cmalphadot (cbar / 2u0) Q S cbar / (u0 Iy)   Mq = Cmq (cbar / 2u0) Q S cbar / Iy
 *   Ybeta = CYbeta Q S / m    Yp, Yr = CYp, CYr (b / 2u0) Q S / m
 *   Lbeta = Clbeta Q S b / Ix  Lp, Lr = Clp, Clr (b / 2u0) Q S b / Ix   (N likewise with Iz)
 *   controls: Xd = -CDd Q S / m, Zd = -CLd Q S / m, Md = Cmd Q S cbar / Iy,
 *             Yd = CYd Q S / m, Ld = Cld Q S b / Ix, Nd = Cnd Q S b / Iz.
 * CL0 here is the lift coefficient of the reference (trim) flight condition, as in Nelson;
 * CDu, CLu, Cmu are u0 times the derivative with respect to u, Nelson's convention.
 */
import type { LiftData } from '../types.js';
import type { ControlDerivatives } from './control-derivatives.js';
import type { LateralDerivatives } from './lateral-derivatives.js';
import type { LongitudinalDerivatives } from './longitudinal-derivatives.js';
import type { ModelProblem } from './problem.js';

export interface NondimensionalInput {
  /** [kg] */
  mass: number;
  /** [kg m^2] */
  inertia: { Ix: number; Iy: number; Iz: number; Ixz: number };
  /** [m^2], [m], [m] */
  geometry: { S: number; cbar: number; b: number };
  coefficients: Partial<Record<string, number>>;
  controls: Record<string, Partial<Record<string, number>>>;
  /** [m/s] */
  airspeed: number;
  /** [kg/m^3] */
  density: number;
  /** [m/s^2] */
  gravity: number;
  /** [rad] */
  theta0: number;
}

export const NONDIMENSIONAL_LONGITUDINAL_REQUIRED = ['CD0', 'CLalpha', 'CDalpha', 'Cmalpha', 'Cmalphadot', 'Cmq'] as const;
const LONGITUDINAL_OPTIONAL = ['CDu', 'CLu', 'Cmu', 'CLq', 'CLalphadot'] as const;
export const NONDIMENSIONAL_LATERAL_REQUIRED = ['CYbeta', 'Clbeta', 'Clp', 'Clr', 'Cnbeta', 'Cnp', 'Cnr'] as const;
const LATERAL_OPTIONAL = ['CYp', 'CYr'] as const;

export interface DimensionalSet {
  longitudinal: { derivatives: LongitudinalDerivatives; controls: ControlDerivatives } | null;
  lateral: { derivatives: LateralDerivatives; controls: ControlDerivatives } | null;
  liftData: LiftData | null;
  /** [Pa] */
  dynamicPressure: number;
  notes: string[];
}

export function dimensionalFromCoefficients(
  input: NondimensionalInput,
  path: (string | number)[],
): { ok: true; value: DimensionalSet } | { ok: false; problems: ModelProblem[] } {
  const c = input.coefficients;
  const has = (k: string) => c[k] !== undefined;
  const longitudinalGiven = [...NONDIMENSIONAL_LONGITUDINAL_REQUIRED, ...LONGITUDINAL_OPTIONAL, 'CL0', 'CLtrim'].some(has);
  const lateralGiven = [...NONDIMENSIONAL_LATERAL_REQUIRED, ...LATERAL_OPTIONAL].some(has);
  const problems: ModelProblem[] = [];
  const coefficientsPath = [...path, 'coefficients'];
  const missingOf = (keys: readonly string[], form: string) => {
    const missing = keys.filter((k) => !has(k));
    if (missing.length > 0) {
      problems.push({ path: coefficientsPath, message: `missing ${missing.length === 1 ? 'coefficient' : 'coefficients'} ${missing.join(', ')} (needed for the ${form})`, expected: keys.join(', '), code: 'missing_derivative' });
    }
  };
  if (!longitudinalGiven && !lateralGiven) {
    missingOf([...NONDIMENSIONAL_LONGITUDINAL_REQUIRED, ...NONDIMENSIONAL_LATERAL_REQUIRED], 'nondimensional form (longitudinal and/or lateral-directional set)');
  }
  if (longitudinalGiven) missingOf(NONDIMENSIONAL_LONGITUDINAL_REQUIRED, 'longitudinal set');
  if (lateralGiven) missingOf(NONDIMENSIONAL_LATERAL_REQUIRED, 'lateral-directional set');
  if (has('CL0') && has('CLtrim')) {
    problems.push({ path: [...coefficientsPath, 'CLtrim'], message: 'CL0 and CLtrim both given; they name the same trim lift coefficient', expected: 'one of CL0, CLtrim', code: 'conflict' });
  }
  for (const [inputName, coefficients] of Object.entries(input.controls)) {
    for (const [k, v] of Object.entries(coefficients)) {
      if (v === undefined) continue;
      const longitudinal = ['CL', 'CD', 'Cm'].includes(k);
      if (longitudinal ? !longitudinalGiven : !lateralGiven) {
        problems.push({ path: [...path, 'controls', inputName, k], message: `control coefficient ${k} needs the ${longitudinal ? 'longitudinal' : 'lateral-directional'} coefficients, which are not given`, code: 'missing_derivative' });
      }
    }
  }
  if (problems.length > 0) return { ok: false, problems };

  const notes: string[] = [];
  const { mass: m, inertia, geometry, airspeed: u0, density, gravity: g, theta0 } = input;
  const { S, cbar, b } = geometry;
  const Q = 0.5 * density * u0 * u0;
  const QS = Q * S;
  const weight = m * g;
  const zeroed = (keys: readonly string[]) => {
    const absent = keys.filter((k) => !has(k));
    if (absent.length > 0) notes.push(`${absent.join(', ')} not given: taken as 0`);
  };
  const v = (k: string) => c[k] ?? 0;

  let longitudinal: DimensionalSet['longitudinal'] = null;
  let liftData: LiftData | null = null;
  if (longitudinalGiven) {
    zeroed(LONGITUDINAL_OPTIONAL);
    let CL0 = c['CL0'] ?? c['CLtrim'];
    if (CL0 === undefined) {
      CL0 = (weight * Math.cos(theta0)) / QS;
      notes.push(`trim lift coefficient not given: CL0 = W cos(theta0) / (Q S) = ${CL0.toPrecision(4)} (steady straight flight)`);
    }
    const Iy = inertia.Iy;
    const qc = cbar / (2 * u0);
    const derivatives: LongitudinalDerivatives = {
      Xu: (-(v('CDu') + 2 * v('CD0')) * QS) / (m * u0),
      Xw: (-(v('CDalpha') - CL0) * QS) / (m * u0),
      Xq: 0,
      Zu: (-(v('CLu') + 2 * CL0) * QS) / (m * u0),
      Zw: (-(v('CLalpha') + v('CD0')) * QS) / (m * u0),
      Zwdot: (-v('CLalphadot') * qc * QS) / (m * u0),
      Zq: (-v('CLq') * qc * QS) / m,
      Mu: (v('Cmu') * QS * cbar) / (u0 * Iy),
      Mw: (v('Cmalpha') * QS * cbar) / (u0 * Iy),
      Mwdot: (v('Cmalphadot') * qc * QS * cbar) / (u0 * Iy),
      Mq: (v('Cmq') * qc * QS * cbar) / Iy,
    };
    notes.push('Xq taken as 0 (no drag-due-to-pitch-rate coefficient in the nondimensional form)');
    const controls: ControlDerivatives = new Map();
    for (const [name, k] of Object.entries(input.controls)) {
      if (k.CL === undefined && k.CD === undefined && k.Cm === undefined) continue;
      controls.set(name, { X: (-(k.CD ?? 0) * QS) / m, Z: (-(k.CL ?? 0) * QS) / m, M: ((k.Cm ?? 0) * QS * cbar) / Iy });
    }
    longitudinal = { derivatives, controls };
    liftData = { dynamicPressure: Q, wingArea: S, weight, liftCurveSlope: v('CLalpha') };
  }

  let lateral: DimensionalSet['lateral'] = null;
  if (lateralGiven) {
    zeroed(LATERAL_OPTIONAL);
    const { Ix, Iz } = inertia;
    const rb = b / (2 * u0);
    const derivatives: LateralDerivatives = {
      form: 'beta',
      Ys: (v('CYbeta') * QS) / m,
      Yp: (v('CYp') * rb * QS) / m,
      Yr: (v('CYr') * rb * QS) / m,
      Ls: (v('Clbeta') * QS * b) / Ix,
      Lp: (v('Clp') * rb * QS * b) / Ix,
      Lr: (v('Clr') * rb * QS * b) / Ix,
      Ns: (v('Cnbeta') * QS * b) / Iz,
      Np: (v('Cnp') * rb * QS * b) / Iz,
      Nr: (v('Cnr') * rb * QS * b) / Iz,
    };
    const controls: ControlDerivatives = new Map();
    for (const [name, k] of Object.entries(input.controls)) {
      if (k.CY === undefined && k.Cl === undefined && k.Cn === undefined) continue;
      controls.set(name, { Y: ((k.CY ?? 0) * QS) / m, L: ((k.Cl ?? 0) * QS * b) / Ix, N: ((k.Cn ?? 0) * QS * b) / Iz });
    }
    lateral = { derivatives, controls };
  }
  return { ok: true, value: { longitudinal, lateral, liftData, dynamicPressure: Q, notes } };
}
