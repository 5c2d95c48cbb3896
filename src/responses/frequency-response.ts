/**
 * Frequency responses in one shape whatever they come from, for the report's Bode charts, the
 * bandwidth figures and the equivalent-system fits:
 * - `model`:  a linear channel, G(j omega) = c (j omega I - A)^-1 b + d, times e^(-j omega delay);
 * - `zpk`:    zeros, poles, gain and delay; the phase is the sum of the continuous angles of
 *             each factor, so it is unwrapped exactly, without sampling;
 * - `points`: sampled (frequency, gain, phase) as measured or simulated, read by linear
 *             interpolation in log frequency, phase unwrapped by continuity from the lowest point.
 * Gains are in dB (20 log10 |G|), phases in degrees, frequencies in rad/s.
 */
import { InternalError } from '../errors.js';
import type { Complex } from '../types.js';
import { channelValue } from './channel-value.js';
import type { LinearChannel } from './linear-channel.js';
import type { ZeroPoleGain } from './transfer-function.js';

export interface FrequencyPoint {
  /** [rad/s] */
  omega: number;
  /** [dB] 20 log10 |G| */
  gain: number;
  /** [deg] unwrapped */
  phase: number;
}

export type FrequencySource =
  | { kind: 'model'; channel: LinearChannel }
  | { kind: 'zpk'; transfer: ZeroPoleGain }
  | { kind: 'points'; points: readonly FrequencyPoint[] };

/**
 * Where the phase branch is pinned: the multiple of 360 deg is chosen so that the phase at
 * `omega` lies within 180 deg of `phase` (e.g. -90 deg at mid band for an attitude response
 * that looks like K/s there). Without it the phase at the lowest frequency is taken in
 * (-180, 180] (model and zpk) or as given (points).
 */
export interface PhaseAnchor {
  /** [rad/s] */
  omega: number;
  /** [deg] */
  phase: number;
}

/** Reads gain and unwrapped phase at any frequency of its range. */
export interface ResponseReader {
  /** [rad/s] lowest and highest frequency that can be read */
  range: [number, number];
  /** [dB] */
  gainAt(omega: number): number;
  /** [deg] */
  phaseAt(omega: number): number;
  /** frequencies [rad/s] where a crossing search should start (increasing) */
  grid: readonly number[];
}

/** The band of the charts and figures [rad/s]. */
export const DEFAULT_RANGE: [number, number] = [0.01, 100];
/** Grid density of the crossing search on model and zpk sources (per decade). */
const POINTS_PER_DECADE = 25;
/** Largest phase step [deg] between two grid points of a model source before the step is halved. */
const MAX_PHASE_STEP = 20;

export function responseReader(source: FrequencySource, options: { range?: [number, number]; anchor?: PhaseAnchor } = {}): ResponseReader {
  const range = options.range ?? DEFAULT_RANGE;
  let reader: ResponseReader;
  switch (source.kind) {
    case 'zpk':
      reader = zpkReader(source.transfer, range);
      break;
    case 'model':
      reader = modelReader(source.channel, range);
      break;
    case 'points':
      reader = pointsReader(source.points);
      break;
  }
  return options.anchor ? anchored(reader, options.anchor) : reader;
}

/** Gain and phase at each frequency (all within the reader's range). */
export function sampleResponse(reader: ResponseReader, omegas: readonly number[]): FrequencyPoint[] {
  return omegas.map((omega) => ({ omega, gain: reader.gainAt(omega), phase: reader.phaseAt(omega) }));
}

/** n frequencies spaced evenly in log from lo to hi [rad/s]. */
export function logSpace(lo: number, hi: number, n: number): number[] {
  if (n < 2) return [lo];
  const a = Math.log10(lo);
  const step = (Math.log10(hi) - a) / (n - 1);
  const out: number[] = [];
  for (let i = 0; i < n; i += 1) out.push(10 ** (a + step * i));
  out[n - 1] = hi;
  return out;
}

function searchGrid(range: [number, number]): number[] {
  const decades = Math.log10(range[1] / range[0]);
  return logSpace(range[0], range[1], Math.max(2, Math.ceil(decades * POINTS_PER_DECADE) + 1));
}

const DEG = 180 / Math.PI;

function zpkReader(t: ZeroPoleGain, range: [number, number]): ResponseReader {
  const sign = t.gain < 0 ? 180 : 0;
  const logK = 20 * Math.log10(Math.abs(t.gain));
  return {
    range,
    grid: searchGrid(range),
    gainAt(omega) {
      let ratio = 1;
      for (const z of t.zeros) ratio *= (omega - z.im) ** 2 + z.re * z.re;
      for (const p of t.poles) ratio /= (omega - p.im) ** 2 + p.re * p.re;
      return logK + 10 * Math.log10(ratio);
    },
    phaseAt(omega) {
      // each factor (j omega - r) has the continuous angle atan2(omega - Im r, -Re r)
      let angle = 0;
      for (const z of t.zeros) angle += Math.atan2(omega - z.im, -z.re);
      for (const p of t.poles) angle -= Math.atan2(omega - p.im, -p.re);
      return sign + angle * DEG - omega * t.delay * DEG;
    },
  };
}

function principal(g: Complex): number {
  return Math.atan2(g.im, g.re) * DEG;
}

function modelReader(channel: LinearChannel, range: [number, number]): ResponseReader {
  // Unwrap along a grid fine enough that no phase step exceeds MAX_PHASE_STEP; between grid
  // points the principal phase is put on the branch nearest the interpolated one.
  const omegas: number[] = [];
  const phases: number[] = [];
  const coarse = searchGrid(range);
  let last = principal(channelValue(channel, coarse[0]!));
  omegas.push(coarse[0]!);
  phases.push(last);
  for (let i = 1; i < coarse.length; i += 1) {
    const target = coarse[i]!;
    let lo = omegas[omegas.length - 1]!;
    while (lo < target) {
      let hi = target;
      let next = nearest(principal(channelValue(channel, hi)), last);
      for (let depth = 0; Math.abs(next - last) > MAX_PHASE_STEP && depth < 12; depth += 1) {
        hi = Math.sqrt(lo * hi);
        next = nearest(principal(channelValue(channel, hi)), last);
      }
      omegas.push(hi);
      phases.push(next);
      last = next;
      lo = hi;
    }
  }
  const guide = interpolator(omegas, phases);
  return {
    range,
    grid: omegas,
    gainAt: (omega) => {
      const g = channelValue(channel, omega);
      return 10 * Math.log10(g.re * g.re + g.im * g.im);
    },
    phaseAt: (omega) => nearest(principal(channelValue(channel, omega)), guide(omega)),
  };
}

function pointsReader(points: readonly FrequencyPoint[]): ResponseReader {
  if (points.length < 2) throw new InternalError('a sampled frequency response needs at least two points');
  for (let i = 1; i < points.length; i += 1) {
    if (!(points[i]!.omega > points[i - 1]!.omega)) throw new InternalError('sampled frequency response: frequencies must increase');
  }
  if (!(points[0]!.omega > 0)) throw new InternalError('sampled frequency response: frequencies must be positive');
  const omegas = points.map((p) => p.omega);
  const phases: number[] = [points[0]!.phase];
  for (let i = 1; i < points.length; i += 1) phases.push(nearest(points[i]!.phase, phases[i - 1]!));
  const gain = interpolator(omegas, points.map((p) => p.gain));
  const phase = interpolator(omegas, phases);
  return { range: [omegas[0]!, omegas[omegas.length - 1]!], grid: omegas, gainAt: gain, phaseAt: phase };
}

function anchored(reader: ResponseReader, anchor: PhaseAnchor): ResponseReader {
  const at = Math.min(Math.max(anchor.omega, reader.range[0]), reader.range[1]);
  const shift = 360 * Math.round((anchor.phase - reader.phaseAt(at)) / 360);
  if (shift === 0) return reader;
  return { ...reader, phaseAt: (omega) => reader.phaseAt(omega) + shift };
}

/** `value` plus the multiple of 360 that brings it nearest `reference` [deg]. */
export function nearest(value: number, reference: number): number {
  return value + 360 * Math.round((reference - value) / 360);
}

/** Piecewise-linear in log frequency; held flat beyond the ends. */
function interpolator(omegas: readonly number[], values: readonly number[]): (omega: number) => number {
  const logs = omegas.map((w) => Math.log(w));
  return (omega) => {
    const x = Math.log(omega);
    const last = logs.length - 1;
    if (x <= logs[0]!) return values[0]!;
    if (x >= logs[last]!) return values[last]!;
    let lo = 0;
    let hi = last;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (logs[mid]! <= x) lo = mid;
      else hi = mid;
    }
    const f = (x - logs[lo]!) / (logs[hi]! - logs[lo]!);
    return values[lo]! + f * (values[hi]! - values[lo]!);
  };
}
