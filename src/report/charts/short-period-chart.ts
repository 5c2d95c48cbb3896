/**
 * Short-period frequency against n/alpha on log-log axes, with the level regions of the
 * condition's category. A CAP limit is the straight line omega_sp = sqrt(CAP n/alpha)
 * (MIL-F-8785C 3.2.2.1.1, CAP = omega_sp^2 / (n/alpha)); a minimum omega_sp is a horizontal line.
 */
import { scaleLog } from 'd3-scale';
import { area, line } from 'd3-shape';
import type { ConditionResult } from '../../types.js';
import { sig } from '../view-format.js';
import { shortPeriodData, type ShortPeriodLevel } from './chart-data.js';
import {
  type Box, type ChartOutput, bottomAxis, clipPath, gridLines, frameRect, haloText, isOneTwoFive, leftAxis,
  crossesAny, levelFill, levelLegend, levelPatterns, levelStroke, overlaps, placeLabel, type Polyline, px, type Rect, safeId, svgOpen, textWidth,
} from './svg-kit.js';

const WIDTH = 330;
const HEIGHT = 262;
const BOX: Box = { left: 44, top: 10, width: 270, height: 190 };
const SAMPLES = 160;

/** [rad/s] lower edge of a level's band at n/alpha: the higher of the CAP line and omega_min. */
export function lowerEdge(l: ShortPeriodLevel, nAlpha: number, floor = 0): number {
  const fromCap = l.capMin !== undefined ? Math.sqrt(l.capMin * nAlpha) : floor;
  return Math.max(fromCap, l.omegaMin ?? floor, floor);
}

/** [rad/s] upper edge of a level's band at n/alpha. */
export function upperEdge(l: ShortPeriodLevel, nAlpha: number, ceiling = Number.POSITIVE_INFINITY): number {
  return l.capMax !== undefined ? Math.min(Math.sqrt(l.capMax * nAlpha), ceiling) : ceiling;
}

function decadeBelow(v: number): number {
  return 10 ** Math.floor(Math.log10(v) + 1e-9);
}

function decadeAbove(v: number): number {
  return 10 ** Math.ceil(Math.log10(v) - 1e-9);
}

export function shortPeriodChart(condition: ConditionResult): ChartOutput {
  const data = shortPeriodData(condition);
  if (data.levels.length === 0) {
    return { svg: null, caption: 'No short-period CAP or frequency finding for this condition: chart not drawn.' };
  }
  if (data.nAlpha === null || data.omega === null) {
    return {
      svg: null,
      caption: 'Short-period point unavailable (no identified short period or no CAP value): chart not drawn.',
    };
  }
  const id = safeId(`sp-${condition.id}`);
  const nAlpha = data.nAlpha;
  const omega = data.omega;

  const x = scaleLog().domain([decadeBelow(Math.min(1, nAlpha / 2)), decadeAbove(Math.max(100, nAlpha * 2))]).range([BOX.left, BOX.left + BOX.width]);
  const [xlo, xhi] = x.domain() as [number, number];
  const caps = data.levels.flatMap((l) => [l.capMin, l.capMax]).filter((c): c is number => c !== undefined);
  const omegas = data.levels.map((l) => l.omegaMin).filter((w): w is number => w !== undefined);
  const yMinCandidate = Math.min(omega / 2, ...caps.map((c) => Math.sqrt(c * xlo)), ...omegas.map((w) => w / 2));
  const yMaxCandidate = Math.max(omega * 2, ...caps.map((c) => Math.sqrt(c * xhi)));
  const y = scaleLog().domain([decadeBelow(yMinCandidate), decadeAbove(yMaxCandidate)]).range([BOX.top + BOX.height, BOX.top]);
  const [ylo, yhi] = y.domain() as [number, number];

  const samples = Array.from({ length: SAMPLES + 1 }, (_, i) => xlo * (xhi / xlo) ** (i / SAMPLES));
  const parts: string[] = [svgOpen(WIDTH, HEIGHT, `Short-period frequency against n/alpha, condition ${condition.id}`, 'chart-short-period')];
  parts.push(`<defs>${levelPatterns(id)}${clipPath(`${id}-clip`, BOX)}</defs>`);
  parts.push(`<rect x="${BOX.left}" y="${BOX.top}" width="${BOX.width}" height="${BOX.height}" fill="#fff"/>`);

  // Worst level first so that better levels paint over it; each region is then read by its fill.
  const drawOrder = [...data.levels].sort((a, b) => b.level - a.level);
  const lines: Polyline[] = [];
  parts.push(`<g clip-path="url(#${id}-clip)">`);
  for (const l of drawOrder) {
    const band = area<number>()
      .defined((n) => lowerEdge(l, n, ylo) < upperEdge(l, n, yhi))
      .x((n) => x(n))
      .y0((n) => y(lowerEdge(l, n, ylo)))
      .y1((n) => y(upperEdge(l, n, yhi)));
    parts.push(`<path class="region region-l${l.level}" d="${band(samples) ?? ''}" fill="${levelFill(id, l.level)}" stroke="none"/>`);
  }
  parts.push(gridLines(BOX, x.ticks(), x, y.ticks(), y));
  for (const l of drawOrder) {
    const style = levelStroke(l.level);
    for (const cap of [l.capMin, l.capMax]) {
      if (cap === undefined) continue;
      const boundary = line<number>().x((n) => x(n)).y((n) => y(Math.sqrt(cap * n)));
      parts.push(`<path class="boundary" d="${boundary([xlo, xhi]) ?? ''}" fill="none" ${style}/>`);
      lines.push([[x(xlo), y(Math.sqrt(cap * xlo))], [x(xhi), y(Math.sqrt(cap * xhi))]]);
    }
    if (l.omegaMin !== undefined) {
      parts.push(`<line class="boundary" x1="${px(BOX.left)}" x2="${px(BOX.left + BOX.width)}" y1="${px(y(l.omegaMin))}" y2="${px(y(l.omegaMin))}" ${style}/>`);
      lines.push([[BOX.left, y(l.omegaMin)], [BOX.left + BOX.width, y(l.omegaMin)]]);
    }
  }
  parts.push('</g>');
  parts.push(frameRect(BOX));
  parts.push(bottomAxis({ box: BOX, ticks: x.ticks(), map: x, label: 'n/\u03b1 [g/rad]', labelled: isOneTwoFive }));
  parts.push(leftAxis({ box: BOX, ticks: y.ticks(), map: y, label: '\u03c9sp [rad/s]', labelled: isOneTwoFive }));

  const cx = x(nAlpha);
  const cy = y(omega);
  const taken: Rect[] = [{ x: cx - 5, y: cy - 5, w: 10, h: 10 }];
  // the point is named by its condition; its figures are in the caption
  const pointText = condition.id;
  const pointAt = placeLabel(cx, cy, pointText, BOX, taken, 8.5, lines);

  // Region names where a level's own band (less the better level's) is widest on screen,
  // clear of the point and its label, so that no region is known by its fill alone.
  for (const l of data.levels) {
    const inner = data.levels.find((m) => m.level === l.level - 1);
    let best: { n: number; mid: number; gap: number } | null = null;
    for (const n of samples.slice(12, -12)) {
      const lo = lowerEdge(l, n, ylo);
      const hi = upperEdge(l, n, yhi);
      if (lo >= hi) continue;
      const slivers: [number, number][] = [];
      if (inner) {
        const ilo = Math.min(Math.max(lowerEdge(inner, n, ylo), lo), hi);
        const ihi = Math.max(Math.min(upperEdge(inner, n, yhi), hi), lo);
        if (ilo < ihi) slivers.push([lo, ilo], [ihi, hi]);
        else slivers.push([lo, hi]);
      } else slivers.push([lo, hi]);
      for (const [a, b] of slivers) {
        const gap = y(a) - y(b);
        const mid = (y(a) + y(b)) / 2;
        const w = textWidth(`Level ${l.level}`);
        const r: Rect = { x: x(n) - w / 2, y: mid - 6, w, h: 11 };
        if (gap > 13 && !taken.some((t) => overlaps(t, r)) && !crossesAny(r, lines) && (best === null || gap > best.gap)) best = { n, mid, gap };
      }
    }
    if (best) {
      const w = textWidth(`Level ${l.level}`);
      taken.push({ x: x(best.n) - w / 2, y: best.mid - 6, w, h: 11 });
      parts.push(haloText(x(best.n), best.mid + 3, `Level ${l.level}`, 'region-label', 'middle'));
    }
  }
  // "Outside" the worst level exists only where that level sets a bound: a level the criteria
  // leave open (any value) covers the rest of the plane, and nothing is drawn as outside it.
  const worstLevel = [...data.levels].sort((a, b) => b.level - a.level)[0]!;
  const worst = worstLevel.level;
  const outside = worstLevel.capMin !== undefined || worstLevel.capMax !== undefined || worstLevel.omegaMin !== undefined;

  parts.push(`<g class="aircraft-point mark"><circle cx="${px(cx)}" cy="${px(cy)}" r="4" fill="#000" stroke="#fff" stroke-width="1.2"/></g>`);
  parts.push(haloText(pointAt.x, pointAt.y, pointText, 'point-label', pointAt.anchor));

  parts.push(levelLegend(id, data.levels.map((l) => ({ level: l.level, open: l.capMin === undefined && l.capMax === undefined && l.omegaMin === undefined })), outside ? worst : null, HEIGHT - 20, WIDTH));
  parts.push('</svg>');

  const capText = data.cap?.value !== null && data.cap?.value !== undefined ? sig(data.cap.value) : '\u2013';
  const method = data.method ? ` n/\u03b1: ${data.method}.` : '';
  return {
    svg: parts.join(''),
    caption: `Short period against n/\u03b1 with the level regions of ${condition.category ? `Category ${condition.category}` : 'the condition'}; lines are \u03c9sp = \u221a(CAP\u00b7n/\u03b1) at the CAP limits and the minimum \u03c9sp.${outside ? '' : ` Level ${worst} sets no bound here: any value reaches it.`} Point ${condition.id}: n/\u03b1 ${sig(nAlpha)}, \u03c9sp ${sig(omega)} rad/s, CAP ${capText} 1/(s\u00b2\u00b7g).${method}`,
  };
}
