/**
 * Longitudinal small-perturbation equations from dimensional stability derivatives, stability
 * axes, states [u, w, q, theta] (Nelson, Flight Stability and Automatic Control, 2nd ed.,
 * ch. 4, with theta0 kept; Etkin & Reid, Dynamics of Flight, 3rd ed., ch. 4):
 *   u' = Xu u + Xw w + Xq q - g cos(theta0) theta + Xd d
 *   (1 - Zwdot) w' = Zu u + Zw w + (u0 + Zq) q - g sin(theta0) theta + Zd d
 *   q' = Mu u + Mw w + Mwdot w' + Mq q + Md d        (w' substituted)
 *   theta' = q
 * Units are those of the written file (consistent ft-s or m-s); conversion to SI is a separate step.
 */
import type { StateSpace } from '../types.js';
import type { ControlDerivatives } from './control-derivatives.js';
import { zeros } from './state-space.js';

export const LONGITUDINAL_REQUIRED = ['Xu', 'Xw', 'Zu', 'Zw', 'Mu', 'Mw', 'Mwdot', 'Mq'] as const;
export const LONGITUDINAL_OPTIONAL = ['Xq', 'Zwdot', 'Zq'] as const;
export const LONGITUDINAL_KNOWN: readonly string[] = [...LONGITUDINAL_REQUIRED, ...LONGITUDINAL_OPTIONAL];

export type LongitudinalDerivatives = Record<(typeof LONGITUDINAL_REQUIRED)[number], number> &
  Partial<Record<(typeof LONGITUDINAL_OPTIONAL)[number], number>>;

export interface LongitudinalTrim {
  /** [length/s] trim airspeed along the stability x axis */
  u0: number;
  /** [length/s^2] */
  g: number;
  /** [rad] trim pitch attitude */
  theta0: number;
}

export function longitudinalFromDerivatives(
  d: LongitudinalDerivatives,
  controls: ControlDerivatives,
  trim: LongitudinalTrim,
): { system: StateSpace; notes: string[] } {
  const notes: string[] = [];
  const absent = LONGITUDINAL_OPTIONAL.filter((k) => d[k] === undefined);
  if (absent.length > 0) notes.push(`${absent.join(', ')} not given: taken as 0`);
  const Xq = d.Xq ?? 0;
  const Zwdot = d.Zwdot ?? 0;
  const Zq = d.Zq ?? 0;
  const { u0, g, theta0 } = trim;
  const k = 1 / (1 - Zwdot);
  // w' row, before substitution into q'
  const wRow = [k * d.Zu, k * d.Zw, k * (u0 + Zq), -k * g * Math.sin(theta0)];
  const A = [
    [d.Xu, d.Xw, Xq, -g * Math.cos(theta0)],
    wRow,
    [d.Mu + d.Mwdot * wRow[0]!, d.Mw + d.Mwdot * wRow[1]!, d.Mq + d.Mwdot * wRow[2]!, d.Mwdot * wRow[3]!],
    [0, 0, 1, 0],
  ];
  const inputs = [...controls.keys()];
  const B = zeros(4, inputs.length);
  inputs.forEach((input, j) => {
    const c = controls.get(input)!;
    const unset = ['X', 'Z', 'M'].filter((letter) => c[letter] === undefined);
    if (unset.length > 0) notes.push(`${unset.map((letter) => letter + input).join(', ')} not given: taken as 0`);
    const Zd = k * (c['Z'] ?? 0);
    B[0]![j] = c['X'] ?? 0;
    B[1]![j] = Zd;
    B[2]![j] = (c['M'] ?? 0) + d.Mwdot * Zd;
  });
  return { system: { states: ['u', 'w', 'q', 'theta'], A, inputs, B, outputs: [], C: [], D: zeros(0, inputs.length) }, notes };
}
