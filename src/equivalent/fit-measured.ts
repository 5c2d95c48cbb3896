/**
 * Equivalent systems and bandwidth figures of a condition from its measured (or simulated)
 * frequency responses: pitch from q (with nz where given: common zeta and w), roll from p,
 * yaw from beta; bandwidth and phase delay from theta, or from q as theta = q/s. The data are
 * read on the fit grid (20 points per decade over 0.1 to 10 rad/s) by interpolation in log
 * frequency; a fit whose data do not cover the whole band is reported not valid. Pure.
 */
import type { ResponseFigures } from '../criteria/evaluators.js';
import { bandwidthFigures } from '../responses/bandwidth.js';
import { responseReader, type FrequencyPoint } from '../responses/frequency-response.js';
import type { EquivalentSystem, FlightCondition, MeasuredResponse } from '../types.js';
import { fitPitch, fitRoll, fitYaw, type FitChannel, type LoesFit } from './fit-loes.js';
import { toEquivalentSystem } from './equivalent-system.js';
import { FIT_BAND, logSpaced } from './response-samples.js';

export interface MeasuredFits {
  systems: EquivalentSystem[];
  responses: ResponseFigures | undefined;
  notes: string[];
}

export function fitMeasuredResponses(condition: FlightCondition): MeasuredFits {
  const measured = condition.frequencyResponses;
  const notes: string[] = [];
  const systems: EquivalentSystem[] = [];
  if (measured.length === 0) return { systems, responses: undefined, notes };
  const find = (output: string) => measured.find((m) => m.output === output);

  const q = find('q');
  const nz = find('nz');
  const tooFew = (m: MeasuredResponse, c: { channel: FitChannel }) => {
    if (c.channel.samples.frequency.length >= MIN_POINTS) return false;
    notes.push(`no ${m.output} equivalent system: the data (${m.file}) give fewer than ${MIN_POINTS} points of the ${FIT_BAND[0]} to ${FIT_BAND[1]} rad/s fit grid`);
    return true;
  };
  const qc = q ? channelOf(q) : undefined;
  if (q && qc && !tooFew(q, qc)) {
    const nzAll = nz && nz.input === q.input ? channelOf(nz) : undefined;
    const nzc = nzAll && nzAll.channel.samples.frequency.length >= MIN_POINTS ? nzAll : undefined;
    const fit = fitPitch({ q: qc.channel, ...(nzc ? { nz: nzc.channel } : {}) });
    systems.push(finish(fit, q.input, [qc.remark, nzc?.remark]));
    if (!nzc) notes.push('pitch equivalent system: q fitted alone (no nz response given), so 1/Ttheta2 may be unrealistic');
  }
  const p = find('p');
  const pc = p ? channelOf(p) : undefined;
  if (p && pc && !tooFew(p, pc)) {
    systems.push(finish(fitRoll(pc.channel), p.input, [pc.remark]));
  }
  const beta = find('beta');
  const bc = beta ? channelOf(beta) : undefined;
  if (beta && bc && !tooFew(beta, bc)) {
    systems.push(finish(fitYaw(bc.channel), beta.input, [bc.remark]));
  }

  const theta = find('theta');
  let responses: ResponseFigures | undefined;
  const attitude = theta ? pointsOf(theta) : q ? integrated(q) : undefined;
  if (attitude) {
    const figures = bandwidthFigures(
      { kind: 'points', points: attitude },
      { responseType: 'rate', anchor: { omega: attitude[0]!.omega, phase: -90 } },
    );
    const method = theta
      ? `theta/${theta.input} measured (${theta.file})`
      : `theta/${q!.input} = (q/${q!.input})/s from the measured q (${q!.file})`;
    responses = {
      pitch: {
        bandwidth: figures.bandwidth,
        phaseDelay: figures.phaseDelay,
        method,
        reasons: {
          ...(figures.reasons.bandwidth ? { bandwidth: figures.reasons.bandwidth } : {}),
          ...(figures.reasons.phaseDelay ? { phaseDelay: figures.reasons.phaseDelay } : {}),
        },
      },
    };
  }
  return { systems, responses, notes };
}

function finish(fit: LoesFit, input: string, coverage: (string | undefined)[]): EquivalentSystem {
  const system = toEquivalentSystem(fit, input, 'frequency response');
  const remarks = coverage.filter((r): r is string => r !== undefined);
  if (remarks.length === 0) return system;
  return { ...system, valid: false, remarks: [...system.remarks, ...remarks] };
}

function pointsOf(m: MeasuredResponse): FrequencyPoint[] {
  return m.frequency.map((omega, i) => ({ omega, gain: m.gain[i]!, phase: m.phase[i]! }));
}

/** theta = q / s: gain - 20 log10 w [dB], phase - 90 deg. */
function integrated(q: MeasuredResponse): FrequencyPoint[] {
  return q.frequency.map((omega, i) => ({ omega, gain: q.gain[i]! - 20 * Math.log10(omega), phase: q.phase[i]! - 90 }));
}

/** The response on the fit grid within the data's range, and a remark when that is less than the band. */
/** Fewest grid points a fit is made on. */
const MIN_POINTS = 8;

function channelOf(m: MeasuredResponse): { channel: FitChannel; remark?: string } {
  const reader = responseReader({ kind: 'points', points: pointsOf(m) });
  const [lo, hi] = reader.range;
  const grid = logSpaced(FIT_BAND[0], FIT_BAND[1]).filter((w) => w >= lo * (1 - 1e-9) && w <= hi * (1 + 1e-9));
  const covers = lo <= FIT_BAND[0] * (1 + 1e-9) && hi >= FIT_BAND[1] * (1 - 1e-9);
  const channel: FitChannel = {
    output: m.output,
    samples: { frequency: grid, gain: grid.map((w) => reader.gainAt(w)), phase: grid.map((w) => reader.phaseAt(w)) },
  };
  return covers
    ? { channel }
    : { channel, remark: `the ${m.output} data (${m.file}) cover ${lo.toPrecision(3)} to ${hi.toPrecision(3)} rad/s, not the whole ${FIT_BAND[0]} to ${FIT_BAND[1]} rad/s band` };
}
