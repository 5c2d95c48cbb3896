/**
 * Map of the condition's poles in the s-plane with rays of constant damping ratio.
 * A pole lambda = -zeta omega_n +/- i omega_n sqrt(1 - zeta^2), so a ray from the origin at
 * angle acos(zeta) from the negative real axis holds every pole of damping ratio zeta
 * (common practice). Both axes share one scale so that the ray angles are true.
 * Slow poles (phugoid, spiral) crowd the origin; a second panel shows them enlarged.
 */
import { scaleLinear } from 'd3-scale';
import type { ConditionResult, ResultMode } from '../../types.js';
import { MODE_LABEL } from '../labels.js';
import {
  type Box, type ChartOutput, type Rect, bottomAxis, clipPath, esc, frameRect, haloText, leftAxis, overlaps, placeLabel, px,
  safeId, svgOpen, textWidth,
} from './svg-kit.js';

export const DAMPING_RAYS: readonly number[] = [0.1, 0.2, 0.35, 0.5, 0.7];

const HEIGHT = 240;
const MAIN: Box = { left: 40, top: 14, width: 330, height: 192 };
const ZOOM: Box = { left: 420, top: 14, width: 200, height: 192 };
const WIDTH_WITH_ZOOM = 640;
const WIDTH_ALONE = 390;
/** poles within this fraction of the largest |lambda| get the enlarged panel */
const SLOW_FRACTION = 0.08;

interface Domain {
  x: [number, number];
  y: [number, number];
}

/** Equal units per pixel on both axes, extending whichever span is short. */
function equalAspect(box: Box, xr: [number, number], yHalf: number): Domain {
  const xSpan = xr[1] - xr[0];
  const ySpan = 2 * yHalf;
  const scale = Math.max(xSpan / box.width, ySpan / box.height);
  const xPad = scale * box.width - xSpan;
  const yNew = (scale * box.height) / 2;
  // Spare width goes mostly to the stable side, where the poles are.
  return { x: [xr[0] - xPad * 0.8, xr[1] + xPad * 0.2], y: [-yNew, yNew] };
}

function panel(box: Box, domain: Domain, modes: ResultMode[], unlabelled: readonly ResultMode[], numberOf: (m: ResultMode) => number, id: string, hatchId: string, markerClass: string, title: string): string {
  const x = scaleLinear().domain(domain.x).range([box.left, box.left + box.width]);
  const y = scaleLinear().domain(domain.y).range([box.top + box.height, box.top]);
  const out: string[] = [`<g class="s-plane-panel">`];
  out.push(`<defs>${clipPath(`${id}-clip`, box)}</defs><g clip-path="url(#${id}-clip)">`);
  out.push(`<rect x="${px(box.left)}" y="${px(box.top)}" width="${px(box.width)}" height="${px(box.height)}" fill="#fff"/>`);
  // The unstable half-plane is hatched: a pole there diverges whatever its label says.
  const x0 = x(0);
  if (x0 < box.left + box.width) {
    out.push(`<rect x="${px(Math.max(x0, box.left))}" y="${px(box.top)}" width="${px(box.left + box.width - Math.max(x0, box.left))}" height="${px(box.height)}" fill="url(#${hatchId})"/>`);
  }
  const gx = x.ticks(6);
  const gy = y.ticks(6);
  out.push('<g class="grid">');
  for (const t of gx) out.push(`<line x1="${px(x(t))}" y1="${px(box.top)}" x2="${px(x(t))}" y2="${px(box.top + box.height)}"/>`);
  for (const t of gy) out.push(`<line x1="${px(box.left)}" y1="${px(y(t))}" x2="${px(box.left + box.width)}" y2="${px(y(t))}"/>`);
  out.push('</g>');
  out.push(`<line x1="${px(box.left)}" x2="${px(box.left + box.width)}" y1="${px(y(0))}" y2="${px(y(0))}" stroke="#555" stroke-width="0.7"/>`);
  out.push(`<line x1="${px(x0)}" x2="${px(x0)}" y1="${px(box.top)}" y2="${px(box.top + box.height)}" stroke="#111" stroke-width="1"/>`);
  const reach = Math.hypot(domain.x[0], Math.max(Math.abs(domain.y[0]), domain.y[1])) * 1.5;
  const taken: Rect[] = [];
  for (const zeta of DAMPING_RAYS) {
    const wd = Math.sqrt(1 - zeta * zeta);
    for (const sign of [1, -1]) {
      out.push(`<line class="damping-ray" x1="${px(x0)}" y1="${px(y(0))}" x2="${px(x(-zeta * reach))}" y2="${px(y(sign * wd * reach))}" stroke="#777" stroke-width="0.6" stroke-dasharray="3 2"/>`);
    }
  }
  // Poles first, so that nothing is written over one.
  const markers: string[] = [];
  for (const mode of modes) {
    for (const e of mode.eigenvalues) {
      const cx = x(e.re);
      const cy = y(e.im);
      taken.push({ x: cx - 4.5, y: cy - 4.5, w: 9, h: 9 });
      markers.push(
        `<g class="${markerClass} mark" data-mode="${esc(mode.kind)}"><path d="M${px(cx - 3.5)},${px(cy - 3.5)}L${px(cx + 3.5)},${px(cy + 3.5)}M${px(cx - 3.5)},${px(cy + 3.5)}L${px(cx + 3.5)},${px(cy - 3.5)}" stroke="#000" stroke-width="1.6" fill="none"/></g>`,
      );
    }
  }
  // Ray labels along the lower edge, where the rays fan out most; crowded ones are left out.
  for (const zeta of [...DAMPING_RAYS].reverse()) {
    const wd = Math.sqrt(1 - zeta * zeta);
    const t = Math.min(-domain.y[0] / wd, -domain.x[0] / zeta) * 0.9;
    const lx = x(-zeta * t);
    const ly = y(-wd * t) + 3;
    const text = `\u03b6 ${zeta}`;
    const r: Rect = { x: lx - textWidth(text, 7) / 2 - 2, y: ly - 7, w: textWidth(text, 7) + 4, h: 9 };
    if (r.x < box.left || taken.some((o) => overlaps(o, r))) continue;
    taken.push(r);
    out.push(haloText(lx, ly, text, 'ray-label', 'middle'));
  }
  // Each mode is named by its number in the key (the caption), beside its upper pole (a real
  // root: each root): a digit sits right by its pole where a name would crowd the next one.
  const labels: string[] = [];
  for (const mode of modes) {
    if (unlabelled.includes(mode)) continue;
    const upper = mode.eigenvalues.find((e) => e.im > 0);
    const anchors = upper ? [upper] : mode.eigenvalues;
    const text = String(numberOf(mode));
    for (const anchor of anchors) {
      const at = placeLabel(x(anchor.re), y(anchor.im), text, box, taken, 8.5);
      labels.push(haloText(at.x, at.y, text, 'mode-label', at.anchor));
    }
  }
  out.push(...markers, ...labels);
  out.push('</g>');
  out.push(frameRect(box));
  out.push(bottomAxis({ box, ticks: gx, map: x, label: 'Re \u03bb [1/s]' }));
  out.push(leftAxis({ box, ticks: gy, map: y, label: 'Im \u03bb [rad/s]' }));
  out.push(`<text x="${px(box.left)}" y="${px(box.top - 4)}" class="region-label">${esc(title)}</text>`);
  out.push('</g>');
  return out.join('');
}

export function sPlaneChart(condition: ConditionResult): ChartOutput {
  const modes = condition.modes.filter((m) => m.eigenvalues.length > 0);
  const poles = modes.flatMap((m) => m.eigenvalues);
  if (poles.length === 0) return { svg: null, caption: 'No eigenvalues for this condition: s-plane map not drawn.' };
  const id = safeId(`sp-map-${condition.id}`);
  const radius = Math.max(...poles.map((p) => Math.hypot(p.re, p.im)), 1e-6);
  const minRe = Math.min(0, ...poles.map((p) => p.re));
  const maxRe = Math.max(0, ...poles.map((p) => p.re));
  const maxIm = Math.max(...poles.map((p) => Math.abs(p.im)), radius * 0.25);
  const main = equalAspect(MAIN, [minRe * 1.12 - radius * 0.04, maxRe * 1.15 + radius * 0.12], maxIm * 1.15);

  const slowModes = modes.filter((m) => m.eigenvalues.every((e) => Math.hypot(e.re, e.im) < radius * SLOW_FRACTION));
  const slowPoles = slowModes.flatMap((m) => m.eigenvalues);
  const width = slowPoles.length > 0 ? WIDTH_WITH_ZOOM : WIDTH_ALONE;
  const parts: string[] = [svgOpen(width, HEIGHT, `Poles of condition ${condition.id} in the s-plane`, 'chart-s-plane')];
  parts.push(`<defs><pattern id="${id}-unstable" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(-45)"><rect width="8" height="8" fill="#fff"/><line x1="0" y1="0" x2="0" y2="8" stroke="#c4c4c4" stroke-width="0.8"/></pattern></defs>`);
  const numberOf = (m: ResultMode) => modes.indexOf(m) + 1;
  parts.push(panel(MAIN, main, modes, slowModes, numberOf, `${id}-main`, `${id}-unstable`, 'pole', slowPoles.length > 0 ? 'all poles (slow modes numbered at right)' : 'all poles'));
  const key = modes.map((m) => `${numberOf(m)} ${MODE_LABEL[m.kind]}`).join(', ');
  let caption = `Poles (\u00d7) numbered by mode: ${key}. Rays of constant damping ratio ${DAMPING_RAYS.join(', ')}; equal scales on both axes; right half-plane hatched (unstable).`;
  if (slowPoles.length > 0) {
    // Zero roots (heading, position) and vanishing ones would give the panel no extent at all.
    const r = Math.max(Math.max(...slowPoles.map((p) => Math.hypot(p.re, p.im))) * 1.25, radius * 0.01);
    const sMin = Math.min(0, ...slowPoles.map((p) => p.re));
    const sMax = Math.max(0, ...slowPoles.map((p) => p.re));
    const zoom = equalAspect(ZOOM, [Math.min(sMin * 1.2, -r * 0.5), Math.max(sMax * 1.3, r * 0.25)], r);
    parts.push(panel(ZOOM, zoom, slowModes, [], numberOf, `${id}-zoom`, `${id}-unstable`, 'pole-zoom', 'near the origin'));
    caption += ` Right panel: ${slowModes.map((m) => MODE_LABEL[m.kind]).join(', ')} enlarged.`;
  }
  parts.push('</svg>');
  return { svg: parts.join(''), caption };
}
