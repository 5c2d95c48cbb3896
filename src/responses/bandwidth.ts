/**
 * Bandwidth and phase delay of an attitude response to the pilot's control (Hoh's bandwidth
 * criterion, MIL-STD-1797A 4.2.1.2 and its guidance; definitions as in the reference notes of
 * the project):
 * - omega180: the lowest frequency where the phase falls through -180 deg;
 * - phase bandwidth: the lowest frequency where the phase falls through -135 deg (45 deg margin);
 * - gain bandwidth: the frequency below omega180 where the gain is 6 dB above the gain at
 *   omega180 (6 dB margin);
 * - bandwidth: the lesser of the two for a rate-response type, the phase bandwidth for an
 *   attitude-command type (and the phase bandwidth where the gain bandwidth is undefined);
 * - phase delay tau_p = -(Phi(2 omega180) + 180 deg) / (2 omega180) with Phi in rad (the
 *   published form writes 57.3 deg/rad).
 * Works on any FrequencySource (model, zpk or sampled points); each figure that cannot be
 * found in the band is null with the reason.
 */
import type { BandwidthFigures } from '../types.js';
import { responseReader, type FrequencySource, type PhaseAnchor, type ResponseReader } from './frequency-response.js';

export type ResponseType = BandwidthFigures['responseType'];
export type { BandwidthFigures };

export interface BandwidthOptions {
  responseType: ResponseType;
  /** [rad/s] band to search (model and zpk sources); default 0.01 to 100 rad/s */
  range?: [number, number];
  anchor?: PhaseAnchor;
}

/** Crossings are refined to this relative width in frequency. */
const RELATIVE_TOLERANCE = 1e-10;
const GAIN_MARGIN_DB = 6;
const DEG = 180 / Math.PI;

export function bandwidthFigures(source: FrequencySource, options: BandwidthOptions): BandwidthFigures {
  const reader = responseReader(source, { ...(options.range ? { range: options.range } : {}), ...(options.anchor ? { anchor: options.anchor } : {}) });
  return bandwidthFromReader(reader, options.responseType);
}

export function bandwidthFromReader(reader: ResponseReader, responseType: ResponseType): BandwidthFigures {
  const reasons: BandwidthFigures['reasons'] = {};
  const [lo, hi] = reader.range;
  const band = `${lo} to ${hi} rad/s`;
  const phase = (w: number) => reader.phaseAt(w);

  const omega180 = fallingThrough(reader, phase, -180);
  if (omega180 === 'below at start') reasons.omega180 = `the phase is already below -180 deg at ${lo} rad/s`;
  else if (omega180 === null) reasons.omega180 = `the phase does not reach -180 deg from ${band}`;
  const w180 = typeof omega180 === 'number' ? omega180 : null;

  const phaseBw = fallingThrough(reader, phase, -135);
  if (phaseBw === 'below at start') reasons.bandwidthPhase = `the phase is already below -135 deg at ${lo} rad/s`;
  else if (phaseBw === null) reasons.bandwidthPhase = `the phase does not reach -135 deg from ${band}`;
  const bandwidthPhase = typeof phaseBw === 'number' ? phaseBw : null;

  let bandwidthGain: number | null = null;
  if (w180 === null) {
    reasons.bandwidthGain = 'undefined without omega180';
  } else {
    const target = reader.gainAt(w180) + GAIN_MARGIN_DB;
    bandwidthGain = gainCrossingBelow(reader, w180, target);
    if (bandwidthGain === null) reasons.bandwidthGain = `the gain does not rise ${GAIN_MARGIN_DB} dB above its value at omega180 between ${lo} rad/s and omega180`;
  }

  let phaseDelay: number | null = null;
  if (w180 === null) {
    reasons.phaseDelay = 'undefined without omega180';
  } else if (2 * w180 > hi) {
    reasons.phaseDelay = `2 omega180 (${round(2 * w180)} rad/s) lies beyond ${hi} rad/s`;
  } else {
    phaseDelay = -(reader.phaseAt(2 * w180) + 180) / DEG / (2 * w180);
  }

  let bandwidth: number | null = null;
  let bandwidthFrom: BandwidthFigures['bandwidthFrom'] = null;
  if (responseType === 'rate' && bandwidthPhase !== null && bandwidthGain !== null) {
    bandwidthFrom = bandwidthGain < bandwidthPhase ? 'gain' : 'phase';
    bandwidth = Math.min(bandwidthGain, bandwidthPhase);
  } else if (bandwidthPhase !== null) {
    bandwidthFrom = 'phase';
    bandwidth = bandwidthPhase;
  } else {
    reasons.bandwidth = 'no phase bandwidth';
  }
  return { omega180: w180, bandwidthPhase, bandwidthGain, bandwidth, bandwidthFrom, phaseDelay, range: [lo, hi], responseType, reasons };
}

/** The lowest frequency where f falls through `level` (f >= level before, < after). */
function fallingThrough(reader: ResponseReader, f: (w: number) => number, level: number): number | null | 'below at start' {
  const grid = reader.grid;
  let prevW = grid[0]!;
  let prev = f(prevW) - level;
  if (prev < 0) return 'below at start';
  for (let i = 1; i < grid.length; i += 1) {
    const w = grid[i]!;
    const value = f(w) - level;
    if (value < 0) return refine((x) => f(x) - level, prevW, prev, w, value);
    prevW = w;
    prev = value;
  }
  return null;
}

/** The highest frequency below `top` where the gain falls through `target` (rising towards low frequency). */
function gainCrossingBelow(reader: ResponseReader, top: number, target: number): number | null {
  const g = (w: number) => reader.gainAt(w) - target;
  const grid = reader.grid.filter((w) => w < top);
  let hiW = top;
  let hiV = g(top);
  for (let i = grid.length - 1; i >= 0; i -= 1) {
    const w = grid[i]!;
    const value = g(w);
    if (value >= 0) return refine(g, w, value, hiW, hiV);
    hiW = w;
    hiV = value;
  }
  return null;
}

/**
 * A root of f between a (f(a) = fa >= 0) and b (f(b) = fb < 0), by the Illinois variant of
 * regula falsi in log frequency (Dowell and Jarratt, BIT 11, 1971): as sure as bisection, far
 * fewer evaluations. On sampled points f is linear in log frequency between two samples, so
 * the first step is exact.
 */
function refine(f: (w: number) => number, a: number, fa: number, b: number, fb: number): number {
  let x0 = Math.log(a);
  let x1 = Math.log(b);
  let f0 = fa;
  let f1 = fb;
  if (f0 === 0) return a;
  let side = 0;
  for (let k = 0; k < 100 && Math.abs(x1 - x0) > RELATIVE_TOLERANCE; k += 1) {
    const x = (x0 * f1 - x1 * f0) / (f1 - f0);
    const fx = f(Math.exp(x));
    if (fx === 0) return Math.exp(x);
    if (fx > 0) {
      x0 = x;
      f0 = fx;
      if (side === 1) f1 /= 2;
      side = 1;
    } else {
      x1 = x;
      f1 = fx;
      if (side === -1) f0 /= 2;
      side = -1;
    }
    if (Math.abs(fx) < 1e-12) return Math.exp(x);
  }
  return Math.exp((x0 + x1) / 2);
}

function round(x: number): string {
  return x.toPrecision(4);
}
