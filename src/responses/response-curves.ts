/**
 * The curves the review document draws for each cockpit control, from the model (they are not
 * kept in the results): the step response of every output of the control for the first
 * STEP_DURATION seconds (full control where `max` is given, else a unit step of the input),
 * and the Bode diagram of its primary output (pitch: theta, roll: phi, yaw: beta) from the
 * transfer function of the results, phase on the branch the bandwidth figures use.
 */
import type { ConditionResponses, ControlAxis, FlightCondition, Mode, TransferFunction } from '../types.js';
import { DEFAULT_RANGE, logSpace, responseReader, sampleResponse, type FrequencyPoint } from './frequency-response.js';
import { pitchPhaseAnchor } from './pitch-anchor.js';
import { outputRow } from './output-rows.js';
import { stepResponse } from './step-response.js';
import { STEP_DURATION, STEP_INTERVAL } from './analyse-responses.js';

export const PRIMARY_OUTPUT: Readonly<Record<ControlAxis, string>> = { pitch: 'theta', roll: 'phi', yaw: 'beta' };

export interface StepCurve {
  output: string;
  unit: string;
  /** per time, in the output's unit */
  values: number[];
}

export interface ControlCurves {
  axis: ControlAxis;
  input: string;
  /** [input unit] the step size */
  stepSize: number;
  /** 'full control' or 'unit step' */
  stepKind: 'full control' | 'unit step';
  unit: string;
  /** [s] */
  times: number[];
  steps: StepCurve[];
  /** the primary output's Bode diagram, null when it has no transfer function */
  bode: { output: string; points: FrequencyPoint[] } | null;
}

/** Points of the Bode diagrams (per decade, over 0.01 to 100 rad/s). */
const BODE_PER_DECADE = 40;

export function responseCurves(condition: FlightCondition, responses: ConditionResponses, modes: readonly Pick<Mode, 'kind' | 'naturalFrequency'>[]): ControlCurves[] {
  const out: ControlCurves[] = [];
  const { system, airspeed } = condition;
  const steps = Math.round(STEP_DURATION / STEP_INTERVAL);
  for (const control of responses.controls) {
    const j = system.inputs.indexOf(control.input);
    if (j < 0) continue;
    const sign = control.signReversed ? -1 : 1;
    const b = system.B.map((row) => sign * row[j]!);
    const tfs = responses.transferFunctions.filter((t) => t.axis === control.axis);
    const rows = tfs.map((t) => outputRow(system, t.output, airspeed)).flatMap((r) => ('reason' in r ? [] : [r]));
    const size = control.max ?? 1;
    const response = stepResponse(system.A, b, rows.map((r) => ({ c: r.c, d: sign * r.d[j]! })), size, STEP_INTERVAL, steps);
    const primary = tfs.find((t) => t.output === PRIMARY_OUTPUT[control.axis]) ?? null;
    out.push({
      axis: control.axis,
      input: control.input,
      stepSize: size,
      stepKind: control.max !== null ? 'full control' : 'unit step',
      unit: control.unit,
      times: Array.from(response.times),
      steps: rows.map((r, i) => ({ output: r.name, unit: r.unit, values: Array.from(response.values[i]!) })),
      bode: primary && primary.gain !== 0 ? { output: primary.output, points: bodePoints(primary, control.axis, modes) } : null,
    });
  }
  return out;
}

function bodePoints(tf: TransferFunction, axis: ControlAxis, modes: readonly Pick<Mode, 'kind' | 'naturalFrequency'>[]): FrequencyPoint[] {
  const anchor = axis === 'pitch' ? pitchPhaseAnchor(modes)?.anchor : undefined;
  const reader = responseReader({ kind: 'zpk', transfer: { gain: tf.gain, zeros: tf.zeros, poles: tf.poles, delay: 0 } }, anchor ? { anchor } : {});
  const [lo, hi] = DEFAULT_RANGE;
  return sampleResponse(reader, logSpace(lo, hi, Math.round(Math.log10(hi / lo) * BODE_PER_DECADE) + 1));
}
