/**
 * Bode diagram of a control's primary output: gain [dB] above, phase [deg] below, on one log
 * frequency axis (0.01 to 100 rad/s). For the pitch attitude the bandwidth figures are marked:
 * the -135 and -180 deg phase lines, omega180, the phase and gain bandwidths. Black lines on
 * white, dashes for reference lines: readable in greyscale.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import type { FrequencyPoint } from '../../responses/frequency-response.js';
import type { PitchBandwidth } from '../../types.js';
import { sig } from '../view-format.js';
import { type Box, type ChartOutput, bottomAxis, clipPath, frameRect, gridLines, haloText, isOneTwoFive, leftAxis, px, safeId, svgOpen } from './svg-kit.js';

const WIDTH = 330;
const HEIGHT = 300;
const GAIN: Box = { left: 46, top: 10, width: 268, height: 105 };
const PHASE: Box = { left: 46, top: 140, width: 268, height: 115 };

export function bodeChart(id: string, title: string, points: readonly FrequencyPoint[], pitch: PitchBandwidth | null): ChartOutput {
  if (points.length < 2) return { svg: null, caption: `${title}: no frequency response.` };
  const cid = safeId(`bode-${id}`);
  const x = scaleLog().domain([points[0]!.omega, points[points.length - 1]!.omega]).range([GAIN.left, GAIN.left + GAIN.width]);
  const finite = points.filter((p) => Number.isFinite(p.gain) && Number.isFinite(p.phase));
  const gains = finite.map((p) => p.gain);
  const phases = finite.map((p) => p.phase);
  const g = scaleLinear().domain([Math.min(...gains), Math.max(...gains)]).nice(5).range([GAIN.top + GAIN.height, GAIN.top]);
  const lo = Math.min(...phases, pitch ? -200 : Infinity);
  const hi = Math.max(...phases);
  const ph = scaleLinear().domain([Math.floor(lo / 90) * 90, Math.ceil(hi / 90) * 90]).range([PHASE.top + PHASE.height, PHASE.top]);
  const xTicks = decadeTicks(x.domain() as [number, number]);
  const phaseTicks = range90(ph.domain() as [number, number]);
  const gainLine = line<FrequencyPoint>().x((p) => x(p.omega)).y((p) => g(p.gain));
  const phaseLine = line<FrequencyPoint>().x((p) => x(p.omega)).y((p) => ph(p.phase));

  const parts: string[] = [svgOpen(WIDTH, HEIGHT, title, 'chart-bode')];
  parts.push(`<defs>${clipPath(`${cid}-g`, GAIN)}${clipPath(`${cid}-p`, PHASE)}</defs>`);
  parts.push(gridLines(GAIN, xTicks.filter(isOneTwoFive), (v) => x(v), g.ticks(5), (v) => g(v)));
  parts.push(gridLines(PHASE, xTicks.filter(isOneTwoFive), (v) => x(v), phaseTicks, (v) => ph(v)));
  if (pitch) {
    for (const level of [-135, -180]) {
      parts.push(`<line x1="${px(PHASE.left)}" x2="${px(PHASE.left + PHASE.width)}" y1="${px(ph(level))}" y2="${px(ph(level))}" stroke="#111" stroke-width="0.8" stroke-dasharray="4 3"/>`);
    }
    const marks: [number | null, string, Box][] = [
      [pitch.omega180, '\u03c9180', PHASE],
      [pitch.bandwidthPhase, '\u03c9BW,phase', PHASE],
      [pitch.bandwidthGain, '\u03c9BW,gain', GAIN],
    ];
    for (const [w, label, box] of marks) {
      if (w === null || w < x.domain()[0]! || w > x.domain()[1]!) continue;
      parts.push(`<line x1="${px(x(w))}" x2="${px(x(w))}" y1="${px(box.top)}" y2="${px(box.top + box.height)}" stroke="#555" stroke-width="0.8" stroke-dasharray="1.5 2"/>`);
      parts.push(haloText(x(w) + 2, box.top + 10 + (label === '\u03c9180' ? 12 : 0), label, 'mode-label'));
    }
  }
  parts.push(`<g clip-path="url(#${cid}-g)"><path d="${gainLine(finite) ?? ''}" fill="none" stroke="#111" stroke-width="1.4"/></g>`);
  parts.push(`<g clip-path="url(#${cid}-p)"><path d="${phaseLine(finite) ?? ''}" fill="none" stroke="#111" stroke-width="1.4"/></g>`);
  parts.push(frameRect(GAIN), frameRect(PHASE));
  parts.push(leftAxis({ box: GAIN, ticks: g.ticks(5), map: (v) => g(v), label: 'gain [dB]' }));
  parts.push(leftAxis({ box: PHASE, ticks: phaseTicks, map: (v) => ph(v), label: 'phase [deg]' }));
  parts.push(bottomAxis({ box: PHASE, ticks: xTicks, map: (v) => x(v), label: 'frequency \u03c9 [rad/s]', labelled: (v) => isDecade(v) }));
  parts.push('</svg>');
  const figures = pitch
    ? ` Bandwidth ${sig(pitch.bandwidth)} rad/s (${pitch.bandwidthFrom ?? 'none'}), \u03c9180 ${sig(pitch.omega180)} rad/s, phase delay ${sig(pitch.phaseDelay)} s; dashed lines at -135 and -180 deg.`
    : '';
  return { svg: parts.join(''), caption: `${title}, in the pilot's sense of the control.${figures}` };
}

function decadeTicks([lo, hi]: [number, number]): number[] {
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(lo)); e <= Math.ceil(Math.log10(hi)); e += 1) {
    for (const m of [1, 2, 5]) {
      const v = m * 10 ** e;
      if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

function isDecade(v: number): boolean {
  return Math.abs(Math.log10(v) - Math.round(Math.log10(v))) < 1e-9;
}

function range90([lo, hi]: [number, number]): number[] {
  const step = hi - lo > 540 ? 180 : 90;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi; v += step) out.push(v);
  return out;
}
