/**
 * Gain and phase of a high-order response (the points fitted) and of its low-order equivalent
 * system (a dashed line) against frequency on a log axis: how well the equivalent system
 * stands for the response over the fit band.
 */
import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import type { EquivalentChannel, EquivalentSystem } from '../../types.js';
import { sig } from '../view-format.js';
import { type Box, type ChartOutput, bottomAxis, frameRect, gridLines, isOneTwoFive, leftAxis, legendSwatch, px, svgOpen } from './svg-kit.js';

const WIDTH = 330;
const HEIGHT = 300;
const GAIN: Box = { left: 48, top: 10, width: 266, height: 105 };
const PHASE: Box = { left: 48, top: 148, width: 266, height: 105 };

export function bodeOverlayChart(system: EquivalentSystem, channel: EquivalentChannel): ChartOutput {
  const w = channel.hos.frequency;
  if (w.length < 2) return { svg: null, caption: 'Too few points to draw.' };
  const x = scaleLog().domain([w[0]!, w[w.length - 1]!]).range([GAIN.left, GAIN.left + GAIN.width]);
  const gains = [...channel.hos.gain, ...channel.loes.gain].filter(Number.isFinite);
  const phases = [...channel.hos.phase, ...channel.loes.phase].filter(Number.isFinite);
  const yg = scaleLinear().domain([Math.min(...gains), Math.max(...gains)]).nice().range([GAIN.top + GAIN.height, GAIN.top]);
  const yp = scaleLinear().domain([Math.min(...phases), Math.max(...phases)]).nice().range([PHASE.top + PHASE.height, PHASE.top]);
  const xTicks = x.ticks().filter((t) => t >= w[0]! * 0.999 && t <= w[w.length - 1]! * 1.001);
  const parts: string[] = [svgOpen(WIDTH, HEIGHT, `Bode overlay of ${channel.output}/${system.input} and its equivalent system`, 'chart-bode')];
  const panel = (box: Box, y: typeof yg, hos: number[], loes: number[], label: string) => {
    parts.push(`<rect x="${box.left}" y="${box.top}" width="${box.width}" height="${box.height}" fill="#fff"/>`);
    parts.push(gridLines(box, xTicks, x, y.ticks(5), y));
    const path = line<number>()
      .x((_, i) => x(w[i]!))
      .y((v) => y(v));
    parts.push(`<path class="loes" d="${path(loes) ?? ''}" fill="none" stroke="#111" stroke-width="1.2" stroke-dasharray="5 3"/>`);
    for (let i = 0; i < w.length; i++) {
      parts.push(`<circle cx="${px(x(w[i]!))}" cy="${px(y(hos[i]!))}" r="1.7" fill="none" stroke="#111" stroke-width="0.8"/>`);
    }
    parts.push(frameRect(box));
    parts.push(leftAxis({ box, ticks: y.ticks(5), map: y, label }));
    parts.push(bottomAxis({ box, ticks: xTicks, map: x, label: box === PHASE ? '\u03c9 [rad/s]' : '', labelled: isOneTwoFive }));
  };
  panel(GAIN, yg, channel.hos.gain, channel.loes.gain, 'gain [dB]');
  panel(PHASE, yp, channel.hos.phase, channel.loes.phase, 'phase [deg]');
  parts.push(`<circle cx="${px(GAIN.left + 6)}" cy="${px(HEIGHT - 9)}" r="1.9" fill="none" stroke="#111" stroke-width="0.8"/>`);
  parts.push(`<text x="${px(GAIN.left + 14)}" y="${px(HEIGHT - 6)}">high-order response (fitted points)</text>`);
  parts.push(legendSwatch(GAIN.left + 170, HEIGHT - 6, '#fff', 'stroke="none"', ''));
  parts.push(`<line x1="${px(GAIN.left + 170)}" x2="${px(GAIN.left + 186)}" y1="${px(HEIGHT - 9)}" y2="${px(HEIGHT - 9)}" stroke="#111" stroke-width="1.2" stroke-dasharray="5 3"/>`);
  parts.push(`<text x="${px(GAIN.left + 190)}" y="${px(HEIGHT - 6)}">equivalent system</text>`);
  parts.push('</svg>');
  const validity = system.valid ? 'within the guidance' : 'beyond the guidance: NOT VALID';
  return {
    svg: parts.join(''),
    caption:
      `${channel.output}/${system.input}: the ${w.length} points the ${system.axis} equivalent system was fitted to and the fitted form; ` +
      `mismatch M ${sig(channel.mismatch)} against the guidance of ${system.mismatchGuidance} (${validity}).`,
  };
}
