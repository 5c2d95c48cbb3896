/**
 * Responses of one condition to its cockpit controls, after the modes: transfer functions of
 * each control to its outputs, trade figures, pitch bandwidth and phase delay, and the full
 * roll-control step (time to bank, roll-rate oscillation, sideslip). Pure: no file, clock or
 * randomness. The curves (step and frequency responses) are not kept here; the report computes
 * them from the same functions (response-curves.ts).
 */
import type { Complex, ConditionResponses, ControlAxis, FlightCondition, ModalAnalysis, Mode, PitchBandwidth, TransferFunction } from '../types.js';
import { spectrum } from '../modes/spectrum.js';
import { bandwidthFigures } from './bandwidth.js';
import { controlChannels, type ControlChannels } from './control-channels.js';
import { responseReader, DEFAULT_RANGE, type PhaseAnchor } from './frequency-response.js';
import { bankTimes, rollStepFigures, STANDARD_BANK_ANGLES } from './roll-step-figures.js';
import { stepResponse } from './step-response.js';
import { pitchPhaseAnchor } from './pitch-anchor.js';
import { inverseTtheta2, rollNumerator } from './trade-figures.js';

/** [s] simulated time and sample interval of the step responses */
export const STEP_DURATION = 10;
export const STEP_INTERVAL = 0.05;

const AXES: readonly ControlAxis[] = ['pitch', 'roll', 'yaw'];

export interface ResponseOptions {
  /** [rad] bank angles to time besides 30, 45, 60 and 90 deg (e.g. those the criteria name) */
  bankAngles?: readonly number[];
}

export function analyseResponses(condition: FlightCondition, analysis: ModalAnalysis, options: ResponseOptions = {}): ConditionResponses | null {
  const named = AXES.filter((a) => condition.controls[a] !== undefined);
  if (named.length === 0) return null;
  const poles = allPoles(condition, analysis);
  const byAxis = new Map<ControlAxis, ControlChannels>();
  const notes: string[] = [];
  // the channels share A: the spectra of its blocks are worked out once
  const spectra = new Map<string, Complex[]>();
  for (const axis of named) {
    const channels = controlChannels(condition, axis, condition.controls[axis]!, poles, spectra);
    byAxis.set(axis, channels);
    notes.push(...channels.notes);
  }

  const transferFunctions: TransferFunction[] = [];
  for (const c of byAxis.values()) {
    for (const ch of c.channels) {
      transferFunctions.push({
        axis: c.axis,
        input: c.control.input,
        output: ch.output.name,
        outputUnit: ch.output.unit,
        gain: ch.transfer.full.gain,
        zeros: ch.transfer.full.zeros,
        poles: ch.transfer.full.poles,
        relativeDegree: ch.transfer.relativeDegree,
      });
    }
  }

  const shortPeriod = modeOf(analysis, 'short_period');
  const dutchRoll = modeOf(analysis, 'dutch_roll');
  const pitch = byAxis.get('pitch');
  const roll = byAxis.get('roll');
  const q = pitch?.channels.find((c) => c.output.name === 'q');
  const phi = roll?.channels.find((c) => c.output.name === 'phi');
  const numerator = phi
    ? rollNumerator(phi.transfer.reduced.zeros, dutchRoll?.naturalFrequency ?? null)
    : { omegaPhi: { value: null, reason: 'no phi / roll control response' }, zetaPhi: { value: null, reason: 'no phi / roll control response' }, ratio: { value: null, reason: 'no phi / roll control response' } };
  const figures: ConditionResponses['figures'] = {
    inverseTtheta2: q ? inverseTtheta2(q.transfer.reduced.zeros, shortPeriod?.naturalFrequency ?? null) : { value: null, reason: 'no q / pitch control response' },
    omegaPhi: numerator.omegaPhi,
    zetaPhi: numerator.zetaPhi,
    omegaPhiOverOmegaD: numerator.ratio,
  };

  // pitch bandwidth from theta / pitch control
  let pitchFigures: PitchBandwidth | null = null;
  let pitchReason: string | null = null;
  const theta = pitch?.channels.find((c) => c.output.name === 'theta');
  if (!pitch) pitchReason = 'no pitch control';
  else if (!theta) pitchReason = 'no theta response to the pitch control';
  else if (theta.transfer.reduced.gain === 0) pitchReason = 'theta does not respond to the pitch control';
  else pitchFigures = pitchBandwidth(pitch.control.input, theta.transfer.reduced, analysis.modes);

  // full roll-control step
  let timeToBank: ConditionResponses['timeToBank'] = [];
  let timeToBankReason: string | null = null;
  let rollFigures: ConditionResponses['roll'] = null;
  if (!roll) timeToBankReason = 'no roll control';
  else if (roll.control.max === null) timeToBankReason = `the roll control ${roll.control.input} has no max (full control travel): the full-control step cannot be made`;
  else if (!phi) timeToBankReason = 'no phi response to the roll control';
  else {
    const outputs = roll.channels.map((c) => ({ c: c.output.c, d: roll.sign * c.output.d[condition.system.inputs.indexOf(roll.control.input)]! }));
    const step = stepResponse(condition.system.A, roll.b, outputs, roll.control.max, STEP_INTERVAL, Math.round(STEP_DURATION / STEP_INTERVAL));
    const at = (name: string) => {
      const i = roll.channels.findIndex((c) => c.output.name === name);
      return i >= 0 ? i : null;
    };
    const iPhi = at('phi')!;
    const angles = uniqueAngles([...STANDARD_BANK_ANGLES, ...(options.bankAngles ?? [])]);
    timeToBank = bankTimes(step.times, step.values[iPhi]!, step.rates[iPhi]!, angles);
    rollFigures = rollStepFigures(step, { p: at('p'), beta: at('beta') }, dutchRoll ? { dampingRatio: dutchRoll.dampingRatio, period: dutchRoll.period } : null);
    notes.push(`roll control: full-control step of ${roll.control.max} ${roll.control.unit} from trim, other controls fixed, ${STEP_DURATION} s simulated`);
  }

  return {
    controls: [...byAxis.values()].map((c) => ({ axis: c.axis, input: c.control.input, unit: c.control.unit, max: c.control.max, signReversed: c.sign === -1 })),
    transferFunctions,
    figures,
    pitch: pitchFigures,
    pitchReason,
    timeToBank,
    timeToBankReason,
    simulatedTime: STEP_DURATION,
    roll: rollFigures,
    curves: `not stored in the results: the report draws step responses (0 to ${STEP_DURATION} s) and frequency responses (${DEFAULT_RANGE[0]} to ${DEFAULT_RANGE[1]} rad/s) from the model`,
    notes,
  };
}

/**
 * Bandwidth of theta / pitch control, the phase branch pinned at mid band (pitch-anchor.ts).
 * The response type follows from the phase there: within 45 deg of 0 it is attitude-command
 * (flat gain), else rate response.
 */
function pitchBandwidth(input: string, transfer: ConditionResponsesTransfer, modes: readonly Mode[]): PitchBandwidth {
  const pinned = pitchPhaseAnchor(modes);
  const anchor: PhaseAnchor | undefined = pinned?.anchor;
  let how = pinned?.how ?? `phase taken in (-180, 180] deg at ${DEFAULT_RANGE[0]} rad/s (no short period to pin it by)`;
  const source = { kind: 'zpk' as const, transfer };
  let responseType: 'rate' | 'attitude' = 'rate';
  if (anchor) {
    const mid = responseReader(source, { anchor }).phaseAt(anchor.omega);
    if (Math.abs(mid) < 45) responseType = 'attitude';
    how += `; ${responseType === 'rate' ? 'rate-response type (phase near -90 deg there)' : 'attitude-command type (phase near 0 deg there)'}`;
  } else {
    how += '; rate-response type assumed';
  }
  const f = bandwidthFigures(source, { responseType, ...(anchor ? { anchor } : {}) });
  return {
    input,
    output: 'theta',
    omega180: f.omega180,
    bandwidthPhase: f.bandwidthPhase,
    bandwidthGain: f.bandwidthGain,
    bandwidth: f.bandwidth,
    bandwidthFrom: f.bandwidthFrom,
    phaseDelay: f.phaseDelay,
    responseType,
    method: `${how}; bandwidth = ${responseType === 'rate' ? 'lesser of phase and gain bandwidth' : 'phase bandwidth'}`,
    range: f.range,
    reasons: f.reasons,
  };
}

type ConditionResponsesTransfer = ControlChannels['channels'][number]['transfer']['reduced'];

function modeOf(analysis: ModalAnalysis, kind: Mode['kind']): Mode | null {
  return analysis.modes.find((m) => m.kind === kind) ?? null;
}

function allPoles(condition: FlightCondition, analysis: ModalAnalysis): Complex[] {
  const fromModes = analysis.modes.flatMap((m) => m.eigenvalues);
  return fromModes.length === condition.system.states.length ? fromModes : spectrum(condition.system.A);
}

function uniqueAngles(angles: readonly number[]): number[] {
  const out: number[] = [];
  for (const a of [...angles].sort((x, y) => x - y)) if (!out.some((b) => Math.abs(b - a) < 1e-9)) out.push(a);
  return out;
}
