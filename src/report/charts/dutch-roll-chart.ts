/**
 * Dutch roll damping ratio against undamped natural frequency, with the level regions.
 * A level holds where zeta >= zeta_min, zeta omega_n >= (zeta omega_n)_min and
 * omega_n >= omega_min (MIL-F-8785C 3.3.1.1); the product limit is the hyperbola
 * zeta = (zeta omega_n)_min / omega_n.
 */
import { scaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';
import type { ConditionResult } from '../../types.js';
import { sig } from '../view-format.js';
import { dutchRollData, type DutchRollLevel } from './chart-data.js';
import {
  type Box, type ChartOutput, bottomAxis, clipPath, frameRect, gridLines, haloText, leftAxis,
  crossesAny, levelFill, levelLegend, levelPatterns, levelStroke, overlaps, placeLabel, type Polyline, px, type Rect, safeId, svgOpen, textWidth,
} from './svg-kit.js';

const WIDTH = 330;
const HEIGHT = 262;
const BOX: Box = { left: 44, top: 10, width: 270, height: 190 };
const SAMPLES = 240;

/** Lowest damping ratio of the level at omega_n [rad/s]; +inf where omega_n is below the level's minimum. */
export function dutchRollFloor(l: DutchRollLevel, omega: number): number {
  if (l.omegaMin !== undefined && omega < l.omegaMin) return Number.POSITIVE_INFINITY;
  const fromProduct = l.zetaOmegaMin !== undefined ? l.zetaOmegaMin / omega : Number.NEGATIVE_INFINITY;
  return Math.max(l.zetaMin ?? Number.NEGATIVE_INFINITY, fromProduct);
}

export function dutchRollChart(condition: ConditionResult): ChartOutput {
  const data = dutchRollData(condition);
  if (data.levels.length === 0) {
    return { svg: null, caption: 'No Dutch roll damping or frequency finding for this condition: chart not drawn.' };
  }
  if (data.omega === null || data.zeta === null) {
    return { svg: null, caption: 'No identified Dutch roll mode for this condition: chart not drawn.' };
  }
  const id = safeId(`dr-${condition.id}`);
  const omega = data.omega;
  const zeta = data.zeta;
  const omegaMins = data.levels.map((l) => l.omegaMin ?? 0);
  const zetaMins = data.levels.map((l) => l.zetaMin ?? 0);
  const x = scaleLinear().domain([0, Math.max(2.5, omega * 1.3, ...omegaMins.map((w) => w * 1.5))]).nice().range([BOX.left, BOX.left + BOX.width]);
  const y = scaleLinear().domain([Math.min(0, zeta * 1.2), Math.max(0.4, zeta * 1.3, ...zetaMins.map((z) => z * 2))]).nice().range([BOX.top + BOX.height, BOX.top]);
  const [xlo, xhi] = x.domain() as [number, number];
  const [ylo, yhi] = y.domain() as [number, number];
  const start = Math.max(xlo, xhi / 1000);
  const samples = Array.from({ length: SAMPLES + 1 }, (_, i) => start + ((xhi - start) * i) / SAMPLES);
  const clampY = (v: number) => Math.min(Math.max(v, ylo), yhi);
  const ceiling = (l: DutchRollLevel) => Math.min(l.zetaMax ?? yhi, yhi);

  const parts: string[] = [svgOpen(WIDTH, HEIGHT, `Dutch roll damping ratio against frequency, condition ${condition.id}`, 'chart-dutch-roll')];
  parts.push(`<defs>${levelPatterns(id)}${clipPath(`${id}-clip`, BOX)}</defs>`);
  parts.push(`<rect x="${BOX.left}" y="${BOX.top}" width="${BOX.width}" height="${BOX.height}" fill="#fff"/>`);
  const drawOrder = [...data.levels].sort((a, b) => b.level - a.level);
  const lines: Polyline[] = [];
  parts.push(`<g clip-path="url(#${id}-clip)">`);
  for (const l of drawOrder) {
    const region = area<number>()
      .defined((w) => dutchRollFloor(l, w) < ceiling(l))
      .x((w) => x(w))
      .y0((w) => y(clampY(dutchRollFloor(l, w))))
      .y1(() => y(ceiling(l)));
    parts.push(`<path class="region region-l${l.level}" d="${region(samples) ?? ''}" fill="${levelFill(id, l.level)}" stroke="none"/>`);
  }
  parts.push(gridLines(BOX, x.ticks(7), x, y.ticks(), y));
  for (const l of drawOrder) {
    const style = levelStroke(l.level);
    const edge = line<number>()
      .defined((w) => Number.isFinite(dutchRollFloor(l, w)))
      .x((w) => x(w))
      .y((w) => y(clampY(dutchRollFloor(l, w))));
    const from = l.omegaMin ?? start;
    const along = [from, ...samples.filter((w) => w > from)];
    parts.push(`<path class="boundary" d="${edge(along) ?? ''}" fill="none" ${style}/>`);
    lines.push(along.filter((w) => Number.isFinite(dutchRollFloor(l, w))).map((w) => [x(w), y(clampY(dutchRollFloor(l, w)))] as const));
    if (l.omegaMin !== undefined) {
      const y0 = y(clampY(dutchRollFloor(l, l.omegaMin)));
      parts.push(`<line class="boundary" x1="${px(x(l.omegaMin))}" x2="${px(x(l.omegaMin))}" y1="${px(y0)}" y2="${px(y(ceiling(l)))}" ${style}/>`);
      lines.push([[x(l.omegaMin), y0], [x(l.omegaMin), y(ceiling(l))]]);
    }
  }
  parts.push('</g>');
  parts.push(frameRect(BOX));
  parts.push(bottomAxis({ box: BOX, ticks: x.ticks(7), map: x, label: '\u03c9nd [rad/s]' }));
  parts.push(leftAxis({ box: BOX, ticks: y.ticks(), map: y, label: '\u03b6d [\u2013]' }));

  const cx = x(omega);
  const cy = y(clampY(zeta));
  const taken: Rect[] = [{ x: cx - 5, y: cy - 5, w: 10, h: 10 }];
  // the point is named by its condition; its figures are in the caption
  const pointText = condition.id;
  const pointAt = placeLabel(cx, cy, pointText, BOX, taken, 8.5, lines);

  // Each level is named inside its own part of the plane (less the better level's part),
  // at the first abscissa from the right where the label fits clear of the point.
  for (const l of data.levels) {
    const inner = data.levels.find((m) => m.level === l.level - 1);
    const text = `Level ${l.level}`;
    const w = textWidth(text);
    for (const frac of [0.84, 0.7, 0.56, 0.42, 0.28]) {
      const at = xlo + (xhi - xlo) * frac;
      const lo = dutchRollFloor(l, at);
      if (!Number.isFinite(lo)) continue;
      const hi = inner ? Math.min(ceiling(l), dutchRollFloor(inner, at)) : ceiling(l);
      const top = y(clampY(hi));
      const bottom = y(clampY(lo));
      const r: Rect = { x: x(at) - w / 2, y: (top + bottom) / 2 - 6, w, h: 11 };
      if (bottom - top < 13 || taken.some((t) => overlaps(t, r)) || crossesAny(r, lines)) continue;
      taken.push(r);
      parts.push(haloText(x(at), (top + bottom) / 2 + 3, text, 'region-label', 'middle'));
      break;
    }
  }
  const worstLevel = [...data.levels].sort((a, b) => b.level - a.level)[0]!;
  const open = (l: DutchRollLevel) => l.zetaMin === undefined && l.zetaMax === undefined && l.zetaOmegaMin === undefined && l.omegaMin === undefined;
  parts.push(`<g class="aircraft-point mark"><circle cx="${px(cx)}" cy="${px(cy)}" r="4" fill="#000" stroke="#fff" stroke-width="1.2"/></g>`);
  parts.push(haloText(pointAt.x, pointAt.y, pointText, 'point-label', pointAt.anchor));

  parts.push(levelLegend(id, data.levels.map((l) => ({ level: l.level, open: open(l) })), open(worstLevel) ? null : worstLevel.level, HEIGHT - 20, WIDTH));
  parts.push('</svg>');
  return {
    svg: parts.join(''),
    caption: `Dutch roll damping ratio against frequency; each level requires \u03b6d, \u03b6d\u00b7\u03c9nd (a hyperbola here) and \u03c9nd at or above its limits. Point ${condition.id}: \u03c9nd ${sig(omega)} rad/s, \u03b6d ${sig(zeta)}, \u03b6d\u00b7\u03c9nd ${sig(zeta * omega)} rad/s.`,
  };
}
