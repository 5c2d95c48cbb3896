/**
 * Random models of an invented light aircraft (plausible numbers, our own) in every input
 * form: dimensional derivatives in SI (v form, unprimed with Ixz) and in US units (beta form,
 * primed), a state-space matrix, nondimensional coefficients, and conditions from a table.
 * Each number is the base value times a factor drawn by fast-check.
 */
import { TABLE, type ModelText } from './pipeline.js';

const LON = { Xu: -0.031, Xw: 0.058, Zu: -0.21, Zw: -2.05, Mw: -0.088, Mwdot: -0.0058, Mq: -2.55 };
const LAT = { Yv: -0.21, Lv: -0.118, Lp: -7.4, Lr: 1.75, Nv: 0.056, Np: -0.24, Nr: -0.92 };
const FT = 0.3048;

const head = (units: 'SI' | 'US') => ({ format: 'modalgate-model/1', aircraft: { name: 'Test T-1', class: 'I' }, units });
const scaled = <T extends Record<string, number>>(base: T, f: () => number): T =>
  Object.fromEntries(Object.entries(base).map(([k, v]) => [k, v * f()])) as T;
const factors = (list: number[]) => {
  let i = 0;
  return () => list[i++ % list.length]!;
};

export type Form = 'derivatives-si' | 'derivatives-us-beta' | 'state-space' | 'nondimensional' | 'table';
export const FORMS: Form[] = ['derivatives-si', 'derivatives-us-beta', 'state-space', 'nondimensional', 'table'];

export function modelOf(form: Form, list: number[]): ModelText {
  const f = factors(list);
  switch (form) {
    case 'derivatives-si':
      return {
        model: {
          ...head('SI'),
          conditions: [
            {
              id: 'c1', phase: 'CR', airspeed: 95 * f(), altitude: 3000, requiredLevel: 1,
              longitudinal: { theta0: 0.05 * f(), derivatives: { ...scaled(LON, f), Zwdot: -0.02 * f(), Zq: -1.1 * f(), Mu: 0.0004 * f() } },
              lateral: { primed: false, Ix: 3400 * f(), Iz: 6800 * f(), Ixz: 55 * f(), derivatives: { ...scaled(LAT, f), Yp: 0.3 * f(), Yr: 0.9 * f() } },
            },
          ],
        },
      };
    case 'derivatives-us-beta': {
      const V = 95 * f();
      const lon = scaled(LON, f);
      const lat = scaled(LAT, f);
      return {
        model: {
          ...head('US'),
          conditions: [
            {
              id: 'c1', phase: 'PA', airspeed: V / FT, altitude: 1000 / FT,
              longitudinal: { theta0: 0.02, derivatives: { Xu: lon.Xu, Xw: lon.Xw, Zu: lon.Zu, Zw: lon.Zw, Mu: 0.0002 * f(), Mw: lon.Mw * FT, Mwdot: lon.Mwdot * FT, Mq: lon.Mq } },
              lateral: {
                primed: true,
                derivatives: { Ybeta: (lat.Yv * V) / FT, Lbeta: lat.Lv * V, Nbeta: lat.Nv * V, Yp: 0, Yr: 0, Lp: lat.Lp, Lr: lat.Lr, Np: lat.Np, Nr: lat.Nr },
              },
            },
          ],
        },
      };
    }
    case 'state-space': {
      const g = 9.80665;
      const U = 46 * f();
      // longitudinal [u, w, q, theta] and lateral [v, p, r, phi] in the textbook arrangement (Nelson, 2nd ed., ch. 4 and 5)
      const lon = scaled(LON, f);
      const lat = scaled(LAT, f);
      const A = [
        [lon.Xu, lon.Xw, 0, -g, 0, 0, 0, 0],
        [lon.Zu, lon.Zw, U, 0, 0, 0, 0, 0],
        [lon.Mwdot * lon.Zu, lon.Mw + lon.Mwdot * lon.Zw, lon.Mq + lon.Mwdot * U, 0, 0, 0, 0, 0],
        [0, 0, 1, 0, 0, 0, 0, 0],
        [0, 0, 0, 0, lat.Yv, 0, -U, g],
        [0, 0, 0, 0, lat.Lv * U * 0.3, lat.Lp, lat.Lr, 0],
        [0, 0, 0, 0, lat.Nv * U * 0.2, lat.Np, lat.Nr, 0],
        [0, 0, 0, 0, 0, 1, 0, 0],
      ];
      return {
        model: { ...head('SI'), conditions: [{ id: 'c1', phase: 'PA', airspeed: U, altitude: 300, stateSpace: { states: ['u', 'w', 'q', 'theta', 'v', 'p', 'r', 'phi'], A } }] },
      };
    }
    case 'nondimensional':
      return {
        model: {
          ...head('SI'),
          conditions: [
            {
              id: 'c1', phase: 'CL', airspeed: 62 * f(), altitude: 1500,
              nondimensional: {
                mass: 2350 * f(),
                inertia: { Ix: 3400 * f(), Iy: 4900 * f(), Iz: 7600 * f(), Ixz: 55 * f() },
                geometry: { S: 16.3 * f(), cbar: 1.62 * f(), b: 10.4 * f() },
                theta0: 0.1 * f(),
                coefficients: scaled(
                  { CLtrim: 0.6, CD0: 0.031, CLalpha: 5.1, CDalpha: 0.3, CLq: 4.2, Cmalpha: -0.72, Cmalphadot: -5.2, Cmq: -14.5, CYbeta: -0.56, CYr: 0.2, Clbeta: -0.092, Clp: -0.49, Clr: 0.11, Cnbeta: 0.071, Cnp: -0.045, Cnr: -0.115 },
                  f,
                ),
              },
            },
          ],
        },
      };
    case 'table': {
      const rows = [0, 1].map((k) => [`r${k}`, 'CL', (55 + 20 * k) * f(), 500 + 1000 * k, -0.85 * f(), -15 * f(), 0.071 * f(), -0.115 * f()].join(','));
      return {
        model: {
          ...head('SI'),
          conditionTable: {
            file: TABLE,
            common: {
              requiredLevel: 1,
              nondimensional: {
                mass: 2350 * f(),
                inertia: { Ix: 3400, Iy: 4900, Iz: 7600, Ixz: 55 },
                geometry: { S: 16.3, cbar: 1.62, b: 10.4 },
                theta0: 0.02,
                coefficients: { CLtrim: 0.6, CD0: 0.031, CLalpha: 5.1 * f(), CDalpha: 0.3, CLq: 4.2, Cmalphadot: -5.2, CYbeta: -0.56, CYr: 0.2, Clbeta: -0.092 * f(), Clp: -0.49, Clr: 0.11, Cnp: -0.045 },
              },
            },
            columns: {
              id: 'case', phase: 'phase', airspeed: 'V', altitude: 'h',
              'nondimensional.coefficients.Cmalpha': 'Cmalpha', 'nondimensional.coefficients.Cmq': 'Cmq',
              'nondimensional.coefficients.Cnbeta': 'Cnbeta', 'nondimensional.coefficients.Cnr': 'Cnr',
            },
          },
        },
        table: ['case,phase,V,h,Cmalpha,Cmq,Cnbeta,Cnr', ...rows].join('\n') + '\n',
      };
    }
  }
}
