/**
 * Lateral-directional small-perturbation equations from dimensional stability derivatives,
 * stability axes with trim pitch attitude theta0 (Nelson, Flight Stability and Automatic
 * Control, 2nd ed., ch. 5; Etkin & Reid, Dynamics of Flight, 3rd ed., ch. 4).
 * beta form, states [beta, p, r, phi]:
 *   beta' = (Ybeta/u0) beta + (Yp/u0) p - (1 - Yr/u0) r + (g cos(theta0)/u0) phi + (Yd/u0) d
 * v form, states [v, p, r, phi]:
 *   v' = Yv v + Yp p + (Yr - u0) r + g cos(theta0) phi + Yd d
 * both forms:
 *   p' = L_x x + Lp p + Lr r + Ld d,  r' = N_x x + Np p + Nr r + Nd d   (L, N primed here)
 *   phi' = p + tan(theta0) r        (Euler kinematics linearised about wings level)
 */
import type { StateSpace } from '../types.js';
import type { ControlDerivatives } from './control-derivatives.js';
import { missingDerivatives } from './control-derivatives.js';
import { primeMomentPair, type Inertias } from './inertia-coupling.js';
import type { ModelProblem } from './problem.js';
import { zeros } from './state-space.js';

export const LATERAL_KNOWN: readonly string[] = ['Yv', 'Ybeta', 'Yp', 'Yr', 'Lv', 'Lbeta', 'Lp', 'Lr', 'Nv', 'Nbeta', 'Np', 'Nr'];

export type SideslipForm = 'v' | 'beta';

export interface LateralDerivatives {
  form: SideslipForm;
  /** Yv [1/s] or Ybeta [length/s^2] */
  Ys: number;
  /** Lv [1/(length s)] or Lbeta [1/s^2] */
  Ls: number;
  /** Nv [1/(length s)] or Nbeta [1/s^2] */
  Ns: number;
  /** [length/s] */
  Yp: number;
  /** [length/s] */
  Yr: number;
  /** [1/s] */
  Lp: number;
  Lr: number;
  Np: number;
  Nr: number;
}

export interface LateralTrim {
  /** [length/s] */
  u0: number;
  /** [length/s^2] */
  g: number;
  /** [rad] */
  theta0: number;
}

/** Which sideslip form a derivative set uses; mixing v and beta derivatives is an error. */
export function readLateralDerivatives(
  d: Record<string, number | undefined>,
  path: (string | number)[],
): { ok: true; value: LateralDerivatives } | { ok: false; problems: ModelProblem[] } {
  const vKeys = ['Yv', 'Lv', 'Nv'].filter((k) => d[k] !== undefined);
  const betaKeys = ['Ybeta', 'Lbeta', 'Nbeta'].filter((k) => d[k] !== undefined);
  if (vKeys.length > 0 && betaKeys.length > 0) {
    return {
      ok: false,
      problems: [{
        path,
        message: `v-form and beta-form sideslip derivatives mixed (${[...vKeys, ...betaKeys].join(', ')})`,
        expected: 'Yv, Lv, Nv or Ybeta, Lbeta, Nbeta',
        code: 'mixed_forms',
      }],
    };
  }
  const form: SideslipForm = betaKeys.length > 0 ? 'beta' : 'v';
  const s = form === 'v' ? ['Yv', 'Lv', 'Nv'] : ['Ybeta', 'Lbeta', 'Nbeta'];
  const required = vKeys.length + betaKeys.length === 0 ? [['Yv', 'Ybeta'], 'Yp', 'Yr', ['Lv', 'Lbeta'], 'Lp', 'Lr', ['Nv', 'Nbeta'], 'Np', 'Nr'] : [s[0]!, 'Yp', 'Yr', s[1]!, 'Lp', 'Lr', s[2]!, 'Np', 'Nr'];
  const missing = missingDerivatives(d, required, `lateral-directional ${form} form`, path);
  if (missing.length > 0) return { ok: false, problems: missing };
  const get = (k: string) => d[k]!;
  return {
    ok: true,
    value: { form, Ys: get(s[0]!), Ls: get(s[1]!), Ns: get(s[2]!), Yp: get('Yp'), Yr: get('Yr'), Lp: get('Lp'), Lr: get('Lr'), Np: get('Np'), Nr: get('Nr') },
  };
}

/**
 * The lateral state-space model. With `coupling` given, the L and N derivatives are unprimed
 * and are primed here, once; with null they are used as they are.
 */
export function lateralFromDerivatives(
  d: LateralDerivatives,
  controls: ControlDerivatives,
  trim: LateralTrim,
  coupling: Inertias | null,
): { system: StateSpace; notes: string[] } {
  const notes: string[] = [];
  const prime = (L: number, N: number) => (coupling ? primeMomentPair(L, N, coupling) : { L, N });
  const s = prime(d.Ls, d.Ns);
  const p = prime(d.Lp, d.Np);
  const r = prime(d.Lr, d.Nr);
  const { u0, g, theta0 } = trim;
  const sideRow =
    d.form === 'beta'
      ? [d.Ys / u0, d.Yp / u0, -(1 - d.Yr / u0), (g * Math.cos(theta0)) / u0]
      : [d.Ys, d.Yp, d.Yr - u0, g * Math.cos(theta0)];
  const A = [sideRow, [s.L, p.L, r.L, 0], [s.N, p.N, r.N, 0], [0, 1, Math.tan(theta0), 0]];
  const inputs = [...controls.keys()];
  const B = zeros(4, inputs.length);
  inputs.forEach((input, j) => {
    const c = controls.get(input)!;
    const unset = ['Y', 'L', 'N'].filter((letter) => c[letter] === undefined);
    if (unset.length > 0) notes.push(`${unset.map((letter) => letter + input).join(', ')} not given: taken as 0`);
    const moments = prime(c['L'] ?? 0, c['N'] ?? 0);
    const Y = c['Y'] ?? 0;
    B[0]![j] = d.form === 'beta' ? Y / u0 : Y;
    B[1]![j] = moments.L;
    B[2]![j] = moments.N;
  });
  const states = [d.form === 'beta' ? 'beta' : 'v', 'p', 'r', 'phi'];
  return { system: { states, A, inputs, B, outputs: [], C: [], D: zeros(0, inputs.length) }, notes };
}
