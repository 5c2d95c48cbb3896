/**
 * Test fixture: the Navion general-aviation airplane, sea level, u0 = 176 ft/s (check values
 * only, never demo data). Sources: Nelson, Flight Stability and Automatic Control, 2nd ed.
 * (1998), ch. 4 (longitudinal) and ch. 5 (lateral), and the unrounded derivatives of Teper,
 * NASA CR-96008 (1969), which Nelson's tables round. Stability axes, theta0 = 0, US units
 * (ft, s, rad): eigenvalues do not depend on the length unit.
 */
import type { StateSpace } from '../../src/types.js';

/** [ft/s] Nelson ch. 4 */
export const U0 = 176;
/** [ft/s^2] Nelson ch. 4 */
export const G_FT = 32.2;
/** [m/ft] exact by definition (international foot) */
export const FT = 0.3048;

export interface LongitudinalDerivatives {
  Xu: number;
  Xw: number;
  Zu: number;
  Zw: number;
  Mu: number;
  Mw: number;
  Mwdot: number;
  Mq: number;
}

/** Nelson, 2nd ed., ch. 4 table (rounded). */
export const NELSON_LONGITUDINAL: LongitudinalDerivatives = {
  Xu: -0.045, Xw: 0.036, Zu: -0.369, Zw: -2.02, Mu: 0, Mw: -0.05, Mwdot: -0.0051, Mq: -2.05,
};

/** NASA CR-96008 (unrounded; Nelson's source). */
export const CR96008_LONGITUDINAL: LongitudinalDerivatives = {
  Xu: -0.0451, Xw: 0.03607, Zu: -0.3697, Zw: -2.0244, Mu: 0, Mw: -0.04997, Mwdot: -0.005165, Mq: -2.0767,
};

/**
 * States [u, w, q, theta]; Nelson ch. 4 equations: u' = Xu u + Xw w - g theta;
 * w' = Zu u + Zw w + u0 q; q' = (Mu + Mwdot Zu) u + (Mw + Mwdot Zw) w + (Mq + Mwdot u0) q;
 * theta' = q.
 */
export function longitudinalA(d: LongitudinalDerivatives): number[][] {
  return [
    [d.Xu, d.Xw, 0, -G_FT],
    [d.Zu, d.Zw, U0, 0],
    [d.Mu + d.Mwdot * d.Zu, d.Mw + d.Mwdot * d.Zw, d.Mq + d.Mwdot * U0, 0],
    [0, 0, 1, 0],
  ];
}

/** The A matrix as printed by Nelson, 2nd ed., ch. 4 (states u, w, q, theta). */
export const NELSON_PRINTED_LONGITUDINAL_A: number[][] = [
  [-0.045, 0.036, 0, -32.2],
  [-0.369, -2.02, 176, 0],
  [0.0019, -0.0396, -2.948, 0],
  [0, 0, 1, 0],
];

export interface LateralDerivatives {
  /** [ft/s^2] */
  Ybeta: number;
  Lbeta: number;
  Lp: number;
  Lr: number;
  Nbeta: number;
  Np: number;
  Nr: number;
}

/** NASA CR-96008 lateral set (Ybeta = u0 Yv, Yv = -0.2543 1/s; Yp = Yr = 0). */
export const CR96008_LATERAL: LateralDerivatives = {
  Ybeta: -44.76, Lbeta: -15.982, Lp: -8.402, Lr: 2.193, Nbeta: 4.495, Np: -0.3498, Nr: -0.7605,
};

/** Nelson, 2nd ed., ch. 5 set as commonly quoted. */
export const NELSON_LATERAL: LateralDerivatives = {
  Ybeta: -45.72, Lbeta: -15.97, Lp: -8.395, Lr: 2.19, Nbeta: 4.549, Np: -0.349, Nr: -0.76,
};

/**
 * States [beta, p, r, phi]; Nelson ch. 5 equations (Yp = Yr = 0):
 * beta' = (Ybeta/u0) beta - r + (g/u0) phi; p' = Lbeta beta + Lp p + Lr r;
 * r' = Nbeta beta + Np p + Nr r; phi' = p.
 */
export function lateralA(d: LateralDerivatives): number[][] {
  return [
    [d.Ybeta / U0, 0, -1, G_FT / U0],
    [d.Lbeta, d.Lp, d.Lr, 0],
    [d.Nbeta, d.Np, d.Nr, 0],
    [0, 1, 0, 0],
  ];
}

export function stateSpace(states: string[], A: number[][]): StateSpace {
  return { states, A, inputs: [], B: A.map(() => []), outputs: [], C: [], D: [] };
}

/** Block-diagonal combination of two models (no coupling terms). */
export function combine(a: StateSpace, b: StateSpace): StateSpace {
  const n = a.states.length;
  const m = b.states.length;
  const A = [
    ...a.A.map((row) => [...row, ...new Array<number>(m).fill(0)]),
    ...b.A.map((row) => [...new Array<number>(n).fill(0), ...row]),
  ];
  return stateSpace([...a.states, ...b.states], A);
}

export const LON_STATES = ['u', 'w', 'q', 'theta'];
export const LAT_STATES = ['beta', 'p', 'r', 'phi'];
export const navionLongitudinal = (d = CR96008_LONGITUDINAL): StateSpace => stateSpace(LON_STATES, longitudinalA(d));
export const navionLateral = (d = CR96008_LATERAL): StateSpace => stateSpace(LAT_STATES, lateralA(d));
