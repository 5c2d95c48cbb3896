/**
 * Low-order equivalent systems fitted to high-order frequency responses (MIL-STD-1797A
 * appendix discussion of 4.2.1.2; forms from memory, high for structure):
 *   pitch  q/Fes  = K (s + 1/Ttheta2) e^(-tau s) / (s^2 + 2 zeta w s + w^2)
 *          nz/Fes = Kn e^(-tau_n s) / (same denominator)      (fitted with q, common zeta and w)
 *   roll   p/Fas  = K e^(-tau s) / (s + 1/T_R)
 *   yaw    beta/Frp = K e^(-tau s) / (s^2 + 2 zeta_d w_d s + w_d^2)   (reduced Dutch-roll form)
 * The mismatch of the reference (gain dB, phase deg, weight 0.01745) is minimised by a bounded
 * Levenberg-Marquardt from a fixed grid of starting points (each given a few iterations, the
 * best few then run to convergence); the best end point is kept. Low-
 * frequency dynamics the short-term form leaves out (e.g. the phugoid) may be held at their
 * high-order values as fixed factors. Pure: no I/O, no clock, no randomness.
 */
import type { Complex } from '../types.js';
import { boundedLeastSquares } from './bounded-least-squares.js';
import { logResponse, type Term } from './loes-terms.js';
import { MISMATCH_GUIDANCE, PHASE_WEIGHT } from './mismatch.js';
import type { ResponseSamples } from './response-samples.js';

export type EquivalentAxis = 'pitch' | 'roll' | 'yaw';

/** How the pitch fit treated 1/Ttheta2. */
export type PitchMethod = 'q-and-nz' | 'q-with-fixed-ttheta2' | 'q-only';

export const FORMS = {
  pitch: 'q/Fes = K (s + 1/Ttheta2) e^(-tau s) / (s^2 + 2 zeta w s + w^2)',
  pitchNz: 'nz/Fes = Kn e^(-tau_n s) / (s^2 + 2 zeta w s + w^2)',
  roll: 'p/Fas = K e^(-tau s) / (s + 1/T_R)',
  yaw: 'beta/Frp = K e^(-tau s) / (s^2 + 2 zeta_d w_d s + w_d^2)',
} as const;

/** Roots held at their high-order values in one response's equivalent form (not fitted). */
export interface FixedDynamics {
  zeros: Complex[];
  poles: Complex[];
  /** what they are, for the record (e.g. "phugoid poles and the 1/Ttheta1 zero of the model") */
  description: string;
}

export interface FitChannel {
  /** output name, e.g. q, nz, p, beta */
  output: string;
  samples: ResponseSamples;
  fixed?: FixedDynamics;
}

export interface ChannelFit {
  output: string;
  /** [-] high-frequency gain coefficient K of the form (unit of output per unit of input) */
  gain: number;
  /** [s] */
  timeDelay: number;
  /** M over this channel's points */
  mismatch: number;
  points: number;
  /** the high-order samples the fit used (phase in the branch the fit used) */
  samples: ResponseSamples;
  /** the equivalent system at the same frequencies */
  fitted: ResponseSamples;
  fixed?: FixedDynamics;
}

export interface LoesFit {
  axis: EquivalentAxis;
  form: string;
  method: PitchMethod | 'p-only' | 'beta-only';
  /** pitch { gain, inverseTtheta2 [1/s], dampingRatio, naturalFrequency [rad/s] };
   *  roll { gain, rollTimeConstant [s] }; yaw { gain, dampingRatio, naturalFrequency [rad/s] } */
  parameters: Record<string, number>;
  /** [s] tau of the primary response (q, p or beta) */
  timeDelay: number;
  /** the largest channel mismatch M */
  mismatch: number;
  /** guidance the mismatch is held against */
  mismatchGuidance: number;
  /** [rad/s] */
  frequencyRange: [number, number];
  /** points per channel */
  points: number;
  valid: boolean;
  /** why the fit is not valid, or what limits it (empty for a clean fit) */
  remarks: string[];
  channels: ChannelFit[];
  /** starting points tried */
  starts: number;
}

interface ParameterSpec {
  name: string;
  lower: number;
  upper: number;
  starts: number[];
  /** a gain parameter [dB], started from the mean gain difference instead of a grid */
  gainOf?: number;
  /** reaching this bound says the form does not suit the response (not the delay's 0) */
  boundMatters: boolean;
}

interface Problem {
  params: ParameterSpec[];
  channels: { channel: FitChannel; terms: Term[]; tauIndex: number; gainIndex: number }[];
}

const PITCH_BOUNDS = {
  inverseTtheta2: [0.02, 20],
  zeta: [0.02, 5],
  omega: [0.2, 40],
  tau: [0, 1],
} as const;

export interface PitchFitInput {
  q: FitChannel;
  /** normal acceleration response; with it q and nz are fitted together (common zeta, w) */
  nz?: FitChannel;
  /** [1/s] airframe 1/Ttheta2; with it (and no nz) 1/Ttheta2 is held at this value */
  fixedInverseTtheta2?: number;
  /** override the choice: fit q alone even when nz or the airframe value is there */
  method?: PitchMethod;
}

/** Fit the pitch form; the method is q-and-nz where nz is given, else fixed 1/Ttheta2 where known, else q alone. */
export function fitPitch(input: PitchFitInput): LoesFit {
  const method: PitchMethod =
    input.method ?? (input.nz ? 'q-and-nz' : input.fixedInverseTtheta2 !== undefined ? 'q-with-fixed-ttheta2' : 'q-only');
  if (method === 'q-and-nz' && !input.nz) throw new RangeError('fitPitch: q-and-nz needs the nz response');
  if (method === 'q-with-fixed-ttheta2' && input.fixedInverseTtheta2 === undefined) {
    throw new RangeError('fitPitch: q-with-fixed-ttheta2 needs the airframe 1/Ttheta2');
  }
  const fixed = method === 'q-with-fixed-ttheta2' ? input.fixedInverseTtheta2! : undefined;
  const params: ParameterSpec[] = [
    { name: 'gainDb', lower: -400, upper: 400, starts: [], gainOf: 0, boundMatters: true },
    fixed !== undefined
      ? { name: 'inverseTtheta2', lower: fixed, upper: fixed, starts: [fixed], boundMatters: false }
      : { name: 'inverseTtheta2', lower: PITCH_BOUNDS.inverseTtheta2[0], upper: PITCH_BOUNDS.inverseTtheta2[1], starts: [0.6, 1.8], boundMatters: true },
    { name: 'dampingRatio', lower: PITCH_BOUNDS.zeta[0], upper: PITCH_BOUNDS.zeta[1], starts: [0.4, 0.9], boundMatters: true },
    { name: 'naturalFrequency', lower: PITCH_BOUNDS.omega[0], upper: PITCH_BOUNDS.omega[1], starts: [1.5, 3, 6], boundMatters: true },
    { name: 'timeDelay', lower: PITCH_BOUNDS.tau[0], upper: PITCH_BOUNDS.tau[1], starts: [0.06], boundMatters: false },
  ];
  const qTerms: Term[] = [
    { kind: 'gain', p: 0 },
    { kind: 'first', p: 1, power: 1 },
    { kind: 'second', zeta: 2, omega: 3, power: -1 },
    { kind: 'delay', p: 4 },
  ];
  const channels: Problem['channels'] = [{ channel: input.q, terms: withFixed(qTerms, input.q), tauIndex: 4, gainIndex: 0 }];
  if (method === 'q-and-nz') {
    params.push({ name: 'nzGainDb', lower: -400, upper: 400, starts: [], gainOf: 1, boundMatters: true });
    params.push({ name: 'nzTimeDelay', lower: PITCH_BOUNDS.tau[0], upper: PITCH_BOUNDS.tau[1], starts: [0.05], boundMatters: false });
    const nzTerms: Term[] = [
      { kind: 'gain', p: 5 },
      { kind: 'second', zeta: 2, omega: 3, power: -1 },
      { kind: 'delay', p: 6 },
    ];
    channels.push({ channel: input.nz!, terms: withFixed(nzTerms, input.nz!), tauIndex: 6, gainIndex: 5 });
  }
  const best = fitProblem({ params, channels });
  const x = best.x;
  return finish('pitch', FORMS.pitch, method, best, { params, channels }, {
    gain: best.channelGains[0]!,
    inverseTtheta2: x[1]!,
    dampingRatio: x[2]!,
    naturalFrequency: x[3]!,
  });
}

/** Fit the roll form p/Fas = K e^(-tau s)/(s + 1/T_R). */
export function fitRoll(p: FitChannel): LoesFit {
  const params: ParameterSpec[] = [
    { name: 'gainDb', lower: -400, upper: 400, starts: [], gainOf: 0, boundMatters: true },
    { name: 'inverseRollTimeConstant', lower: 0.02, upper: 50, starts: [0.5, 2, 6], boundMatters: true },
    { name: 'timeDelay', lower: 0, upper: 1, starts: [0.02, 0.12], boundMatters: false },
  ];
  const terms: Term[] = [
    { kind: 'gain', p: 0 },
    { kind: 'first', p: 1, power: -1 },
    { kind: 'delay', p: 2 },
  ];
  const problem: Problem = { params, channels: [{ channel: p, terms: withFixed(terms, p), tauIndex: 2, gainIndex: 0 }] };
  const best = fitProblem(problem);
  return finish('roll', FORMS.roll, 'p-only', best, problem, {
    gain: best.channelGains[0]!,
    rollTimeConstant: 1 / best.x[1]!,
  });
}

/** Fit the reduced Dutch-roll form beta/Frp = K e^(-tau s)/(s^2 + 2 zeta_d w_d s + w_d^2). */
export function fitYaw(beta: FitChannel): LoesFit {
  const params: ParameterSpec[] = [
    { name: 'gainDb', lower: -400, upper: 400, starts: [], gainOf: 0, boundMatters: true },
    { name: 'dampingRatio', lower: 0.005, upper: 5, starts: [0.1, 0.4], boundMatters: true },
    { name: 'naturalFrequency', lower: 0.2, upper: 20, starts: [0.8, 1.6, 3.2], boundMatters: true },
    { name: 'timeDelay', lower: 0, upper: 1, starts: [0.02, 0.1], boundMatters: false },
  ];
  const terms: Term[] = [
    { kind: 'gain', p: 0 },
    { kind: 'second', zeta: 1, omega: 2, power: -1 },
    { kind: 'delay', p: 3 },
  ];
  const problem: Problem = { params, channels: [{ channel: beta, terms: withFixed(terms, beta), tauIndex: 3, gainIndex: 0 }] };
  const best = fitProblem(problem);
  return finish('yaw', FORMS.yaw, 'beta-only', best, problem, {
    gain: best.channelGains[0]!,
    dampingRatio: best.x[1]!,
    naturalFrequency: best.x[2]!,
  });
}

function withFixed(terms: Term[], channel: FitChannel): Term[] {
  return channel.fixed ? [...terms, { kind: 'fixed', zeros: channel.fixed.zeros, poles: channel.fixed.poles }] : terms;
}

interface BestFit {
  x: number[];
  cost: number;
  /** per channel: the phase branch [deg] taken off the high-order phase (360 k, plus 180 for K < 0) */
  offsets: number[];
  /** per channel: signed K */
  channelGains: number[];
  starts: number;
}

const SQRT_W = Math.sqrt(PHASE_WEIGHT);

/**
 * Multi-start fit. Each channel's high-order phase is first put in the branch of the form:
 * shifted by 360 k so that its lowest-frequency phase lies in (-180, 180], and by a further
 * 180 deg (K < 0) when that phase is nearer +-180 than 0. Where the sign is not clear (45 to 135
 * deg off), both signs are tried.
 */
function fitProblem(problem: Problem): BestFit {
  const offsetChoices = problem.channels.map(({ channel }) => phaseOffsets(channel.samples.phase[0] ?? 0));
  const offsetCombos = cartesian(offsetChoices);
  const gridSpecs = problem.params.map((p) => (p.gainOf !== undefined ? [0] : p.starts));
  const grid = cartesian(gridSpecs);
  // every start runs a few iterations; the most promising few are then run to convergence
  const scouts: { offsets: number[]; x: number[]; cost: number; order: number }[] = [];
  let starts = 0;
  for (const offsets of offsetCombos) {
    const lsq = leastSquaresOf(problem, offsets);
    for (const start of grid) {
      const x0 = [...start];
      // gains start at the mean gain difference of their channel with the gain at 0 dB
      for (const c of problem.channels) {
        const model = logResponse(c.terms, x0, c.channel.samples.frequency);
        const g = c.channel.samples.gain;
        x0[c.gainIndex] = g.reduce((s, v, i) => s + v - model.gain[i]!, 0) / Math.max(g.length, 1);
      }
      const scout = boundedLeastSquares(lsq, x0, { maxIterations: SCOUT_ITERATIONS });
      scouts.push({ offsets, x: scout.x, cost: scout.cost, order: starts++ });
    }
  }
  scouts.sort((a, b) => a.cost - b.cost || a.order - b.order);
  let best: BestFit | null = null;
  for (const scout of scouts.slice(0, FINALISTS)) {
    const result = boundedLeastSquares(leastSquaresOf(problem, scout.offsets), scout.x, { maxIterations: 200 });
    if (best === null || result.cost < best.cost * (1 - 1e-9)) {
      best = {
        x: result.x,
        cost: result.cost,
        offsets: scout.offsets,
        channelGains: problem.channels.map((c, ci) => {
          const sign = Math.abs((((scout.offsets[ci]! % 360) + 360) % 360) - 180) < 1e-9 ? -1 : 1;
          return sign * Math.pow(10, result.x[c.gainIndex]! / 20);
        }),
        starts: 0,
      };
    }
  }
  return { ...best!, starts };
}

/** Iterations each starting point is given before the best few are run to convergence. */
const SCOUT_ITERATIONS = 6;
const FINALISTS = 3;

function leastSquaresOf(problem: Problem, offsets: readonly number[]) {
  return {
    lower: problem.params.map((p) => p.lower),
    upper: problem.params.map((p) => p.upper),
    evaluate: (x: readonly number[]) => residuals(problem, offsets, x),
  };
}

function residuals(problem: Problem, offsets: readonly number[], x: readonly number[]) {
  const m = x.length;
  let rows = 0;
  for (const c of problem.channels) rows += 2 * c.channel.samples.frequency.length;
  const r = new Float64Array(rows);
  const jac = new Float64Array(rows * m);
  let row = 0;
  problem.channels.forEach((c, ci) => {
    const s = c.channel.samples;
    const model = logResponse(c.terms, x, s.frequency);
    const offset = offsets[ci]!;
    for (let i = 0; i < s.frequency.length; i++) {
      r[row] = s.gain[i]! - model.gain[i]!;
      r[row + 1] = SQRT_W * (s.phase[i]! - offset - model.phase[i]!);
      const base = row * m;
      for (let k = 0; k < m; k++) {
        jac[base + k] = -model.dGain[i * m + k]!;
        jac[base + m + k] = -SQRT_W * model.dPhase[i * m + k]!;
      }
      row += 2;
    }
  });
  return { residuals: r, jacobian: jac };
}

/** Candidate phase branches [deg] for a response whose lowest-frequency phase is `phi0`. */
function phaseOffsets(phi0: number): number[] {
  const k = Math.round(phi0 / 360);
  const r = phi0 - 360 * k; // in [-180, 180]
  const positive = 360 * k;
  const negative = 360 * k + (r >= 0 ? 180 : -180);
  const away = Math.abs(r);
  if (away <= 45) return [positive];
  if (away >= 135) return [negative];
  return [positive, negative];
}

function cartesian<T>(lists: readonly T[][]): T[][] {
  return lists.reduce<T[][]>((acc, list) => acc.flatMap((prefix) => list.map((v) => [...prefix, v])), [[]]);
}

function finish(
  axis: EquivalentAxis,
  form: string,
  method: LoesFit['method'],
  best: BestFit,
  problem: Problem,
  parameters: Record<string, number>,
): LoesFit {
  const remarks: string[] = [];
  const channels: ChannelFit[] = problem.channels.map((c, ci) => {
    const s = c.channel.samples;
    const model = logResponse(c.terms, best.x, s.frequency);
    const phase = s.phase.map((p) => p - best.offsets[ci]!);
    let m = 0;
    for (let i = 0; i < s.frequency.length; i++) {
      const dg = s.gain[i]! - model.gain[i]!;
      const dp = phase[i]! - model.phase[i]!;
      m += dg * dg + PHASE_WEIGHT * dp * dp;
    }
    const sign = best.channelGains[ci]! < 0 ? 180 : 0;
    return {
      output: c.channel.output,
      gain: best.channelGains[ci]!,
      timeDelay: best.x[c.tauIndex]!,
      mismatch: m,
      points: s.frequency.length,
      samples: { frequency: [...s.frequency], gain: [...s.gain], phase: phase.map((p) => p + sign) },
      fitted: { frequency: [...s.frequency], gain: Array.from(model.gain), phase: Array.from(model.phase, (p) => p + sign) },
      ...(c.channel.fixed ? { fixed: c.channel.fixed } : {}),
    };
  });
  const worst = Math.max(...channels.map((c) => c.mismatch));
  for (const c of channels) {
    if (!(c.mismatch <= MISMATCH_GUIDANCE)) {
      remarks.push(`mismatch of ${c.output} ${c.mismatch.toPrecision(3)} is beyond the guidance of ${MISMATCH_GUIDANCE}`);
    }
  }
  problem.params.forEach((p, k) => {
    if (!p.boundMatters || p.lower === p.upper) return;
    const v = best.x[k]!;
    const span = p.upper - p.lower;
    if (v <= p.lower + 1e-6 * span || v >= p.upper - 1e-6 * span) {
      remarks.push(`${p.name} ended on its bound (${v <= p.lower + 1e-6 * span ? p.lower : p.upper}): the form does not suit this response`);
    }
  });
  const tauSpec = problem.params[problem.channels[0]!.tauIndex]!;
  if (best.x[problem.channels[0]!.tauIndex]! >= tauSpec.upper - 1e-9) {
    remarks.push(`time delay ended on its upper bound (${tauSpec.upper} s)`);
  }
  const frequencies = problem.channels.flatMap((c) => c.channel.samples.frequency);
  return {
    axis,
    form,
    method,
    parameters,
    timeDelay: best.x[problem.channels[0]!.tauIndex]!,
    mismatch: worst,
    mismatchGuidance: MISMATCH_GUIDANCE,
    frequencyRange: [Math.min(...frequencies), Math.max(...frequencies)],
    points: problem.channels[0]!.channel.samples.frequency.length,
    valid: remarks.length === 0,
    remarks,
    channels,
    starts: best.starts,
  };
}
