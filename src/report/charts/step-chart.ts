/**
 * Step responses of one cockpit control: one small panel per output (each with its own axis
 * and unit; angles and rates shown in deg and deg/s), the first seconds after the step. For
 * the roll control the time-to-bank requirements are marked on the bank-angle panel as points
 * (the required angle at the Level 1 and 2 times), with the time the model takes.
 */
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import type { ControlCurves } from '../../responses/response-curves.js';
import { sig } from '../view-format.js';
import { type Box, type ChartOutput, bottomAxis, clipPath, frameRect, gridLines, haloText, leftAxis, px, safeId, svgOpen } from './svg-kit.js';

export interface BankMark {
  /** [rad] */
  angle: number;
  /** [s] required time per level */
  times: { level: number; time: number }[];
  /** [s] the model's time, null when not reached */
  reached: number | null;
}

const WIDTH = 330;
const PANEL_HEIGHT = 70;
const GAP = 22;
const LEFT = 50;
const PLOT_WIDTH = 264;
const DEG = 180 / Math.PI;

const SHOWN: Readonly<Record<string, { scale: number; unit: string }>> = {
  rad: { scale: DEG, unit: 'deg' },
  'rad/s': { scale: DEG, unit: 'deg/s' },
};

export function stepChart(id: string, curves: ControlCurves, marks: readonly BankMark[]): ChartOutput {
  if (curves.steps.length === 0) return { svg: null, caption: `No outputs of the ${curves.axis} control to draw.` };
  const cid = safeId(`step-${id}-${curves.axis}`);
  const height = 10 + curves.steps.length * (PANEL_HEIGHT + GAP) + 10;
  const x = scaleLinear().domain([0, curves.times[curves.times.length - 1]!]).range([LEFT, LEFT + PLOT_WIDTH]);
  const parts: string[] = [svgOpen(WIDTH, height, `Step responses to the ${curves.axis} control`, 'chart-step')];
  const clips: string[] = [];
  const bodies: string[] = [];
  curves.steps.forEach((s, i) => {
    const box: Box = { left: LEFT, top: 10 + i * (PANEL_HEIGHT + GAP), width: PLOT_WIDTH, height: PANEL_HEIGHT };
    const shown = SHOWN[s.unit] ?? { scale: 1, unit: s.unit };
    const values = s.values.map((v) => v * shown.scale);
    const bankPanel = curves.axis === 'roll' && s.output === 'phi';
    const extra = bankPanel ? marks.map((m) => m.angle * DEG) : [];
    const y = scaleLinear().domain([Math.min(0, ...values, ...extra), Math.max(0, ...values, ...extra)]).nice(4).range([box.top + box.height, box.top]);
    clips.push(clipPath(`${cid}-${i}`, box));
    bodies.push(gridLines(box, x.ticks(10), (v) => x(v), y.ticks(4), (v) => y(v)));
    const path = line<number>().x((_, k) => x(curves.times[k]!)).y((v) => y(v));
    bodies.push(`<g clip-path="url(#${cid}-${i})"><path d="${path(values) ?? ''}" fill="none" stroke="#111" stroke-width="1.3"/></g>`);
    if (bankPanel) {
      for (const m of marks) {
        const yy = y(m.angle * DEG);
        for (const t of m.times) {
          if (t.time > x.domain()[1]!) continue;
          // open square at Level 1, open circle at Level 2: the requirement to reach (angle, time)
          bodies.push(t.level === 1
            ? `<rect x="${px(x(t.time) - 3)}" y="${px(yy - 3)}" width="6" height="6" fill="#fff" stroke="#111" stroke-width="1.1"/>`
            : `<circle cx="${px(x(t.time))}" cy="${px(yy)}" r="3" fill="#fff" stroke="#111" stroke-width="1.1"/>`);
        }
        const last = m.times[m.times.length - 1];
        if (last && last.time <= x.domain()[1]!) {
          bodies.push(haloText(x(last.time) + 6, yy + 3, `${sig(m.angle * DEG)} deg by ${m.times.map((t) => `L${t.level} ${sig(t.time)} s`).join(', ')}`, 'mode-label'));
        }
        if (m.reached !== null) bodies.push(`<line x1="${px(x(m.reached))}" x2="${px(x(m.reached))}" y1="${px(yy - 5)}" y2="${px(yy + 5)}" stroke="#111" stroke-width="1.6"/>`);
      }
    }
    bodies.push(frameRect(box));
    bodies.push(leftAxis({ box, ticks: y.ticks(4), map: (v) => y(v), label: `${s.output} [${shown.unit}]` }));
    if (i === curves.steps.length - 1) bodies.push(bottomAxis({ box, ticks: x.ticks(10), map: (v) => x(v), label: 'time after the step [s]' }));
  });
  parts.push(`<defs>${clips.join('')}</defs>`, ...bodies, '</svg>');
  const step = `${curves.stepKind === 'full control' ? 'full control' : 'a unit step'}, ${curves.input} = ${sig(curves.stepSize)} ${curves.unit}, from trim, other controls fixed`;
  const markWords = marks.length > 0 ? ' Squares (Level 1) and circles (Level 2) mark the required bank angle at the required time; the short bar, when the model reaches it.' : '';
  return { svg: parts.join(''), caption: `Step of the ${curves.axis} control (${step}), pilot's sense.${markWords}` };
}
