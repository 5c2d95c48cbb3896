/**
 * A condition's responses to its cockpit controls, as the review document shows them: the
 * controls, the transfer-function table (zeros, poles, gain), the trade and bandwidth figures,
 * the time to bank, the roll-response figures (shown, no limit checked) and the charts (Bode
 * diagram of each control's primary output, step responses with the time-to-bank marks).
 */
import type { ControlCurves } from '../responses/response-curves.js';
import type { Complex, ConditionResult, ResponseFigure } from '../types.js';
import { bodeChart } from './charts/bode-chart.js';
import { stepChart, type BankMark } from './charts/step-chart.js';
import { safeId } from './charts/svg-kit.js';
import type { ChartView } from './report-view.js';
import { NONE, sig } from './view-format.js';

export interface ResponsesView {
  controls: { axis: string; input: string; unit: string; max: string; sense: string }[];
  /** every eigenvalue of A, shared by all the channels */
  poles: string;
  transferFunctions: { channel: string; gain: string; zeros: string; cancelling: string; relativeDegree: string }[];
  figures: { name: string; value: string; how: string }[];
  timeToBank: { angle: string; time: string }[];
  timeToBankReason: string | null;
  notes: string[];
  charts: ChartView[];
  curves: string;
}

const DEG = 180 / Math.PI;

export function responsesView(c: ConditionResult, curves: readonly ControlCurves[] | null): ResponsesView | null {
  const r = c.responses;
  if (r === null) return null;
  const poles = r.transferFunctions[0]?.poles ?? [];
  const figure = (name: string, f: ResponseFigure, unit = '') => ({
    name,
    value: f.value === null ? NONE : `${sig(f.value)}${unit ? ` ${unit}` : ''}`,
    how: f.value === null ? f.reason : f.method,
  });
  const figures = [
    figure('1/T\u03b82', r.figures.inverseTtheta2, 'rad/s'),
    figure('\u03c9\u03c6', r.figures.omegaPhi, 'rad/s'),
    figure('\u03b6\u03c6', r.figures.zetaPhi),
    figure('\u03c9\u03c6 / \u03c9d', r.figures.omegaPhiOverOmegaD),
  ];
  if (r.pitch) {
    const p = r.pitch;
    const bw = (name: string, value: number | null, key: keyof typeof p.reasons, unit: string, how: string) => ({
      name,
      value: value === null ? NONE : `${sig(value)} ${unit}`,
      how: value === null ? p.reasons[key] ?? 'undefined' : how,
    });
    figures.push(
      bw('pitch bandwidth', p.bandwidth, 'bandwidth', 'rad/s', `${p.bandwidthFrom ?? ''} bandwidth of \u03b8 / ${p.input}; ${p.method}`),
      bw('phase bandwidth', p.bandwidthPhase, 'bandwidthPhase', 'rad/s', 'phase -135 deg'),
      bw('gain bandwidth', p.bandwidthGain, 'bandwidthGain', 'rad/s', 'gain 6 dB above the gain at \u03c9180'),
      bw('\u03c9180', p.omega180, 'omega180', 'rad/s', 'phase -180 deg'),
      bw('phase delay \u03c4p', p.phaseDelay, 'phaseDelay', 's', '-(\u03a6(2\u03c9180) + 180 deg) / (2\u03c9180)'),
    );
  } else if (r.pitchReason) {
    figures.push({ name: 'pitch bandwidth', value: NONE, how: r.pitchReason });
  }
  if (r.roll) {
    figures.push(
      figure('p_osc / p_av', r.roll.rollRateOscillation),
      figure('\u03c8\u03b2', r.roll.sideslipPhase, 'deg'),
      { ...figure('adverse sideslip', r.roll.adverseSideslip), value: degrees(r.roll.adverseSideslip) },
      { ...figure('proverse sideslip', r.roll.proverseSideslip), value: degrees(r.roll.proverseSideslip) },
    );
  }

  const transferFunctions = r.transferFunctions.map((t) => {
    const own = t.zeros.filter((z) => !nearAny(z, poles));
    const cancelling = t.zeros.length - own.length;
    return {
      channel: `${t.output} / ${t.input} (${t.axis})`,
      gain: t.gain === 0 ? '0 (no path)' : sig(t.gain),
      zeros: own.length > 0 ? roots(own) : NONE,
      cancelling: cancelling > 0 ? String(cancelling) : '',
      relativeDegree: t.relativeDegree === null ? NONE : String(t.relativeDegree),
    };
  });

  const charts: ChartView[] = [];
  const id = safeId(c.id);
  for (const curve of curves ?? []) {
    if (curve.bode) {
      const title = `Bode diagram, ${curve.bode.output} / ${curve.input}`;
      charts.push({ id: `${id}-bode-${curve.axis}`, title, ...bodeChart(`${id}-${curve.axis}`, title, curve.bode.points, curve.axis === 'pitch' ? r.pitch : null) });
    }
    const marks = curve.axis === 'roll' ? bankMarks(c) : [];
    charts.push({ id: `${id}-step-${curve.axis}`, title: `Step responses, ${curve.axis} control ${curve.input}`, ...stepChart(id, curve, marks) });
  }

  return {
    controls: r.controls.map((k) => ({
      axis: k.axis,
      input: k.input,
      unit: k.unit,
      max: k.max === null ? 'not given' : `${sig(k.max)} ${k.unit}`,
      sense: k.signReversed ? 'reversed (model sign opposite to the pilot\u2019s)' : 'as in the model',
    })),
    poles: roots(poles),
    transferFunctions,
    figures,
    timeToBank: r.timeToBank.map((t) => ({ angle: `${sig(t.angle * DEG)} deg`, time: t.time === null ? `not reached in ${r.simulatedTime} s` : `${sig(t.time)} s` })),
    timeToBankReason: r.timeToBankReason,
    notes: r.notes,
    charts,
    curves: curves === null ? 'Charts of the responses are left out of this section.' : '',
  };
}

/** The time-to-bank requirements of the condition's findings: angle, Level 1 and 2 times, the time reached. */
function bankMarks(c: ConditionResult): BankMark[] {
  const out: BankMark[] = [];
  for (const f of c.findings) {
    if (f.quantity !== 'time_to_bank') continue;
    const angle = angleOf(f.method ?? '');
    if (angle === null) continue;
    const times: BankMark['times'] = [];
    for (const level of [1, 2] as const) {
      const max = f.bounds[String(level) as '1' | '2']?.max;
      if (typeof max === 'number') times.push({ level, time: max });
    }
    out.push({ angle, times, reached: f.value });
  }
  return out;
}

function angleOf(method: string): number | null {
  const m = /bank by (\d+(?:\.\d+)?) deg|change of (\d+(?:\.\d+)?) deg/.exec(method);
  const deg = m ? Number(m[1] ?? m[2]) : NaN;
  return Number.isFinite(deg) ? deg / DEG : null;
}

function degrees(f: ResponseFigure): string {
  return f.value === null ? NONE : `${sig(f.value * DEG)} deg`;
}

function nearAny(z: Complex, poles: readonly Complex[]): boolean {
  return poles.some((p) => Math.hypot(p.re - z.re, p.im - z.im) <= 1e-7 * Math.max(1, Math.hypot(p.re, p.im)));
}

function roots(list: readonly Complex[]): string {
  if (list.length === 0) return NONE;
  const out: string[] = [];
  for (const z of list) {
    if (z.im < 0) continue;
    // a root within 1e-9 of the origin is shown as 0 (the eigen-analysis leaves ~1e-14 there)
    const re = Math.abs(z.re) < 1e-9 ? 0 : z.re;
    out.push(z.im === 0 ? sig(re) : `${sig(re)} \u00b1 ${sig(z.im)}j`);
  }
  return out.join(', ');
}
