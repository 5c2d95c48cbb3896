/**
 * Figures of the response to a step of full roll control from trim (other controls fixed):
 * - time to bank: the first time phi reaches each angle (MIL-F-8785C 3.3.4, time from the start
 *   of the command), between samples by cubic Hermite interpolation of phi and its rate;
 * - roll-rate oscillation p_osc / p_av from the first peaks p1 (maximum), p2 (minimum),
 *   p3 (maximum) of p: (p1 + p3 - 2 p2) / (p1 + p3 + 2 p2) for zeta_d <= 0.2, else
 *   (p1 - p2) / (p1 + p2) (MIL-F-8785C 3.3.2.2, as recalled: from memory);
 * - psi_beta = -(360 / T_d) t_1 deg, t_1 the time of the first local maximum of sideslip
 *   (the n = 1 case of psi_beta = -(360/T_d) t_n + (n - 1) 360 deg; definition from memory);
 * - the largest adverse (beta > 0 for a right roll: nose away from the turn) and proverse
 *   sideslip within max(2 s, T_d / 2) (MIL-F-8785C 3.3.2.4 window, from memory).
 * Peaks between samples come from a parabola through the three samples around each one.
 */
import type { BankTime, ConditionResponses, ResponseFigure } from '../types.js';
import { hermiteCrossing, type StepResponse } from './step-response.js';

const DEG = Math.PI / 180;

export function bankTimes(times: Float64Array, phi: Float64Array, rate: Float64Array, angles: readonly number[]): BankTime[] {
  return angles.map((angle) => {
    for (let k = 1; k < times.length; k += 1) {
      if (phi[k]! >= angle) {
        return { angle, time: hermiteCrossing(times[k - 1]!, times[k]!, phi[k - 1]!, phi[k]!, rate[k - 1]!, rate[k]!, angle) };
      }
    }
    return { angle, time: null };
  });
}

interface Peak {
  time: number;
  value: number;
  kind: 'max' | 'min';
}

/** Local extrema of the samples (after the first sample), refined by a parabola. */
function peaks(times: Float64Array, y: Float64Array): Peak[] {
  const out: Peak[] = [];
  for (let k = 1; k + 1 < y.length; k += 1) {
    const a = y[k - 1]!;
    const b = y[k]!;
    const c = y[k + 1]!;
    const isMax = b > a && b >= c;
    const isMin = b < a && b <= c;
    if (!isMax && !isMin) continue;
    const denominator = a - 2 * b + c;
    const shift = denominator !== 0 ? (0.5 * (a - c)) / denominator : 0;
    const h = times[k + 1]! - times[k]!;
    out.push({ time: times[k]! + shift * h, value: b - 0.25 * (a - c) * shift, kind: isMax ? 'max' : 'min' });
  }
  return out;
}

export function rollStepFigures(
  response: StepResponse,
  index: { p: number | null; beta: number | null },
  dutchRoll: { dampingRatio: number | null; period: number | null } | null,
): NonNullable<ConditionResponses['roll']> {
  const { times } = response;
  const duration = times[times.length - 1]!;
  let rollRateOscillation: ResponseFigure;
  if (index.p === null) rollRateOscillation = { value: null, reason: 'no p response' };
  else {
    const ps = peaks(times, response.values[index.p]!);
    const p1 = ps.findIndex((x) => x.kind === 'max');
    const p2 = p1 >= 0 ? ps.findIndex((x, i) => i > p1 && x.kind === 'min') : -1;
    const p3 = p2 >= 0 ? ps.findIndex((x, i) => i > p2 && x.kind === 'max') : -1;
    const zeta = dutchRoll?.dampingRatio ?? null;
    if (p1 < 0) rollRateOscillation = { value: 0, method: `p rises without a peak in ${duration} s: no oscillation, p_osc/p_av = 0` };
    else if (p2 < 0) rollRateOscillation = { value: 0, method: `p falls after its first peak without a second peak in ${duration} s: p_osc/p_av = 0` };
    else if (ps[p2]!.value <= 0) rollRateOscillation = { value: null, reason: `the roll rate reverses (p2 = ${ps[p2]!.value.toPrecision(3)} rad/s at ${ps[p2]!.time.toPrecision(3)} s): p_osc/p_av is not defined` };
    else if (zeta === null) rollRateOscillation = { value: null, reason: 'no Dutch-roll damping ratio to choose the form of p_osc/p_av' };
    else {
      const [a, b] = [ps[p1]!.value, ps[p2]!.value];
      if (zeta <= 0.2) {
        if (p3 < 0) rollRateOscillation = { value: null, reason: `no third peak of p in ${duration} s` };
        else {
          const c = ps[p3]!.value;
          rollRateOscillation = { value: (a + c - 2 * b) / (a + c + 2 * b), method: 'p_osc/p_av = (p1 + p3 - 2 p2) / (p1 + p3 + 2 p2), zeta_d <= 0.2' };
        }
      } else {
        rollRateOscillation = { value: (a - b) / (a + b), method: 'p_osc/p_av = (p1 - p2) / (p1 + p2), zeta_d > 0.2' };
      }
    }
  }

  let sideslipPhase: ResponseFigure = { value: null, reason: 'no beta response' };
  let adverseSideslip: ResponseFigure = { value: null, reason: 'no beta response' };
  let proverseSideslip: ResponseFigure = { value: null, reason: 'no beta response' };
  if (index.beta !== null) {
    const beta = response.values[index.beta]!;
    const period = dutchRoll?.period ?? null;
    if (period === null) sideslipPhase = { value: null, reason: 'no oscillatory Dutch roll (no period)' };
    else {
      const first = peaks(times, beta).find((x) => x.kind === 'max');
      sideslipPhase = first
        ? { value: (-360 / period) * first.time, method: `psi_beta = -(360/T_d) t_1, t_1 = ${first.time.toPrecision(3)} s the first local maximum of beta, T_d = ${period.toPrecision(3)} s` }
        : { value: null, reason: `beta has no local maximum in ${duration} s` };
    }
    const window = Math.max(2, period !== null ? period / 2 : 2);
    let adverse = 0;
    let proverse = 0;
    for (let k = 0; k < times.length && times[k]! <= window + 1e-12; k += 1) {
      adverse = Math.max(adverse, beta[k]!);
      proverse = Math.max(proverse, -beta[k]!);
    }
    const method = `largest within the first ${window.toPrecision(3)} s (max of 2 s and T_d/2) after the full roll-control step`;
    adverseSideslip = { value: adverse, method: `${method}; adverse = positive beta for a right roll` };
    proverseSideslip = { value: proverse, method: `${method}; proverse = negative beta for a right roll` };
  }
  return { rollRateOscillation, sideslipPhase, adverseSideslip, proverseSideslip };
}

/** The bank angles always given [rad]: 30, 45, 60 and 90 deg. */
export const STANDARD_BANK_ANGLES: readonly number[] = [30, 45, 60, 90].map((a) => a * DEG);
