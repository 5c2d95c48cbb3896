/**
 * One key figure against airspeed or altitude over a sweep. Every condition is a mark whose
 * shape is its verdict (grey dot pass, open diamond marginal, cross fail, open circle not
 * evaluated), so the chart reads without colour. Marks of one verdict form one path and
 * coincident marks are merged, so that ten thousand conditions stay a small SVG. The Level 1
 * boundary is drawn as a line only when one boundary holds for the whole sweep (its outside
 * hatched); where the bounds differ by condition, each condition's own Level 1 bound is a short
 * bar at its abscissa, so that the distance from mark to bar is the margin.
 */
import { scaleLinear } from 'd3-scale';
import type { Bound, Verdict } from '../../types.js';
import { plain } from '../view-format.js';
import {
  type Box, bottomAxis, clipPath, esc, frameRect, gridLines, haloText, leftAxis, levelPatterns, levelStroke, px, safeId, svgOpen,
} from './svg-kit.js';
import type { TrendPoint } from './trend-data.js';

const WIDTH = 330;
const HEIGHT = 176;
const BOX: Box = { left: 46, top: 8, width: 276, height: 124 };

export interface TrendChartSpec {
  id: string;
  /** accessible name of the chart */
  label: string;
  xLabel: string;
  yLabel: string;
  points: readonly TrendPoint[];
  /** the single Level 1 bound of the sweep, or null when there is none or several */
  boundary: Bound | null;
  /** draw each point's own Level 1 bound as a bar (used when the bounds differ) */
  perPointBounds: boolean;
}

export interface TrendChartOutput {
  svg: string;
  /** marks drawn after merging coincident ones */
  marks: number;
  /** boundary values left out because they lie far outside the data (said in the caption) */
  offChart: string[];
}

type MarkKind = Verdict | 'none';

/** Marks in draw order: the worst last, on top. */
const MARK_ORDER: readonly MarkKind[] = ['none', 'pass', 'not_evaluated', 'marginal', 'fail'];

/** Dots of a dense sweep are smaller, so that clusters stay readable. */
function markStyle(kind: MarkKind, dense: boolean): string {
  if (kind === 'pass') return `fill="none" stroke="#6e6e6e" stroke-width="${dense ? 2.2 : 4.2}" stroke-linecap="round"`;
  if (kind === 'none') return `fill="none" stroke="#b3b3b3" stroke-width="${dense ? 1.6 : 3}" stroke-linecap="round"`;
  return MARK_STYLE[kind];
}

const MARK_STYLE: Record<MarkKind, string> = {
  none: '',
  pass: '',
  not_evaluated: 'fill="#fff" stroke="#111" stroke-width="0.8"',
  marginal: 'fill="#fff" stroke="#111" stroke-width="0.9"',
  fail: 'fill="none" stroke="#000" stroke-width="1.4"',
};

const MARK_WORD: Record<MarkKind, string> = {
  none: 'no criterion', pass: 'pass', not_evaluated: 'not evaluated', marginal: 'marginal', fail: 'FAIL',
};

/** Path commands of one mark at (x, y), relative moves only, so the path stays short. */
function markPath(kind: MarkKind, x: number, y: number): string {
  switch (kind) {
    case 'none':
    case 'pass':
      return `M${px(x)} ${px(y)}h0`;
    case 'marginal':
      return `M${px(x)} ${px(y - 3.2)}l3.2 3.2-3.2 3.2-3.2-3.2z`;
    case 'fail':
      return `M${px(x - 2.6)} ${px(y - 2.6)}l5.2 5.2m0-5.2l-5.2 5.2`;
    case 'not_evaluated':
      return `M${px(x - 2.4)} ${px(y)}a2.4 2.4 0 1 0 4.8 0a2.4 2.4 0 1 0-4.8 0`;
  }
}

function extent(values: readonly number[]): [number, number] {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const v of values) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

/** A domain with room around a single value or a flat series. */
function padded([lo, hi]: [number, number]): [number, number] {
  if (hi > lo) return [lo, hi];
  const pad = Math.abs(lo) > 0 ? Math.abs(lo) * 0.1 : 1;
  return [lo - pad, hi + pad];
}

/** Up to this many points each get a hover target naming its condition. */
const HOVER_POINTS = 300;

export function trendChart(spec: TrendChartSpec): TrendChartOutput {
  const id = safeId(`trend-${spec.id}`);
  const [xlo, xhi] = padded(extent(spec.points.map((p) => p.x)));
  let [ylo, yhi] = padded(extent(spec.points.map((p) => p.y)));
  const span = yhi - ylo;
  const offChart: string[] = [];
  const lines: { value: number; side: 'min' | 'max' }[] = [];
  // A bound is drawn when it lies within reach of the data: the spread of the data or 60 % of
  // its magnitude, whichever is larger. Nearer than that it is what the reader must see; a
  // maximum far above (damping <= 2 over a sweep near 0.5) would only squash the marks.
  const reach = Math.max(span, 0.6 * Math.max(Math.abs(ylo), Math.abs(yhi)));
  const inReach = (v: number) => v >= ylo - reach && v <= yhi + reach;
  const bars: { x: number; value: number }[] = [];
  if (!spec.boundary && spec.perPointBounds) {
    const above = new Set<number>();
    const below = new Set<number>();
    for (const p of spec.points) {
      for (const v of [p.level1?.min, p.level1?.max]) {
        if (v === undefined) continue;
        if (inReach(v)) bars.push({ x: p.x, value: v });
        else (v > yhi ? above : below).add(v);
      }
    }
    const list = (values: Set<number>) => [...values].sort((a, b) => a - b).map((v) => plain(v)).join(', ');
    if (above.size > 0) offChart.push(`Level 1 bound${above.size === 1 ? '' : 's'} ${list(above)} lie${above.size === 1 ? 's' : ''} above the plotted range`);
    if (below.size > 0) offChart.push(`Level 1 bound${below.size === 1 ? '' : 's'} ${list(below)} lie${below.size === 1 ? 's' : ''} below the plotted range`);
    for (const b of bars) {
      ylo = Math.min(ylo, b.value);
      yhi = Math.max(yhi, b.value);
    }
  }
  for (const side of ['min', 'max'] as const) {
    const v = spec.boundary?.[side];
    if (v === undefined) continue;
    // A far boundary (a maximum damping of 2 over a sweep near 0.5) would squash the data.
    if (!inReach(v)) {
      offChart.push(`Level 1 ${side === 'min' ? 'minimum' : 'maximum'} ${plain(v)} lies ${v > yhi ? 'above' : 'below'} the plotted range`);
      continue;
    }
    lines.push({ value: v, side });
    ylo = Math.min(ylo, v);
    yhi = Math.max(yhi, v);
  }
  const x = scaleLinear().domain([xlo, xhi]).nice(6).range([BOX.left, BOX.left + BOX.width]);
  // Room at both ends after rounding, so that a mark at an extreme condition is not cut by the
  // frame and the axis does not run on to a round number far beyond the sweep.
  const [nxlo, nxhi] = x.domain() as [number, number];
  x.domain([nxlo - (nxhi - nxlo) * 0.03, nxhi + (nxhi - nxlo) * 0.03]);
  const y = scaleLinear().domain([ylo - (yhi - ylo) * 0.04, yhi + (yhi - ylo) * 0.04]).nice(5).range([BOX.top + BOX.height, BOX.top]);

  const parts: string[] = [svgOpen(WIDTH, HEIGHT, spec.label, 'chart-trend')];
  parts.push(`<defs>${levelPatterns(id)}${clipPath(`${id}-clip`, BOX)}</defs>`);
  parts.push(`<rect x="${BOX.left}" y="${BOX.top}" width="${BOX.width}" height="${BOX.height}" fill="#fff"/>`);
  parts.push(`<g clip-path="url(#${id}-clip)">`);
  for (const l of lines) {
    const yl = y(l.value);
    const top = l.side === 'min' ? yl : BOX.top;
    const height = l.side === 'min' ? BOX.top + BOX.height - yl : yl - BOX.top;
    if (height > 0) parts.push(`<rect class="outside-l1" x="${BOX.left}" y="${px(top)}" width="${BOX.width}" height="${px(height)}" fill="url(#${id}-unstable)"/>`);
  }
  parts.push(gridLines(BOX, x.ticks(6), x, y.ticks(5), y));
  for (const l of lines) {
    parts.push(`<line class="boundary" x1="${BOX.left}" x2="${BOX.left + BOX.width}" y1="${px(y(l.value))}" y2="${px(y(l.value))}" ${levelStroke(1)}/>`);
  }

  if (bars.length > 0) {
    const seen = new Set<string>();
    for (const b of bars) seen.add(`${Math.round(x(b.x) * 2) / 2},${Math.round(y(b.value) * 2) / 2}`);
    const d = [...seen].map((k) => {
      const [bx, by] = k.split(',').map(Number) as [number, number];
      return `M${px(bx - 4.5)} ${px(by)}h9`;
    });
    parts.push(`<path class="level1-bars" d="${d.join('')}" fill="none" stroke="#111" stroke-width="1.1"/>`);
  }

  const dense = spec.points.length > 400;
  const byKind = new Map<MarkKind, Set<string>>();
  for (const p of spec.points) {
    const kind: MarkKind = p.verdict ?? 'none';
    // Below what print or screen can separate: half a unit of the viewBox, a whole one among dense dots.
    const q = dense ? 1 : 2;
    const key = `${Math.round(x(p.x) * q) / q},${Math.round(y(p.y) * q) / q}`;
    let set = byKind.get(kind);
    if (!set) byKind.set(kind, (set = new Set()));
    set.add(key);
  }
  let marks = 0;
  for (const kind of MARK_ORDER) {
    const set = byKind.get(kind);
    if (!set || set.size === 0) continue;
    marks += set.size;
    const d: string[] = [];
    for (const key of set) {
      const [mx, my] = key.split(',').map(Number) as [number, number];
      d.push(markPath(kind, mx, my));
    }
    parts.push(`<path class="marks marks-${kind}" data-count="${set.size}" d="${d.join('')}" ${markStyle(kind, dense)}/>`);
  }
  // Each point names its condition on hover (screen); a sweep too large for one element per
  // point keeps the merged marks only, and the verdict matrix names its conditions.
  if (spec.points.length <= HOVER_POINTS) {
    parts.push('<g class="point-names">');
    for (const p of spec.points) {
      parts.push(`<circle cx="${px(x(p.x))}" cy="${px(y(p.y))}" r="4" fill="#fff" fill-opacity="0"><title>${esc(`${p.condition}: ${plain(p.y)} at ${plain(p.x)}`)}</title></circle>`);
    }
    parts.push('</g>');
  }
  parts.push('</g>');
  for (const l of lines) {
    const text = `Level 1 ${l.side === 'min' ? '\u2265' : '\u2264'} ${plain(l.value)}`;
    const yl = y(l.value);
    const ty = l.side === 'min' ? yl - 3 : yl + 10;
    parts.push(haloText(BOX.left + BOX.width - 3, Math.min(Math.max(ty, BOX.top + 9), BOX.top + BOX.height - 3), text, 'region-label', 'end'));
  }
  parts.push(frameRect(BOX));
  parts.push(bottomAxis({ box: BOX, ticks: x.ticks(6), map: x, label: spec.xLabel }));
  parts.push(leftAxis({ box: BOX, ticks: y.ticks(5), map: y, label: spec.yLabel }));

  // Legend: only the marks present, each with its word.
  let lx = BOX.left;
  const ly = HEIGHT - 6;
  for (const kind of [...MARK_ORDER].reverse()) {
    if (!byKind.get(kind)?.size) continue;
    parts.push(`<path d="${markPath(kind, lx + 3, ly - 3)}" ${markStyle(kind, false)}/><text x="${px(lx + 9)}" y="${px(ly)}">${esc(MARK_WORD[kind])}</text>`);
    lx += 16 + MARK_WORD[kind].length * 4.9;
  }
  if (lines.length > 0) {
    parts.push(`<rect x="${px(lx)}" y="${px(ly - 8)}" width="12" height="9" fill="url(#${id}-unstable)" stroke="#888" stroke-width="0.4"/><text x="${px(lx + 16)}" y="${px(ly)}">outside Level 1</text>`);
  } else if (bars.length > 0) {
    parts.push(`<path d="M${px(lx)} ${px(ly - 3)}h9" stroke="#111" stroke-width="1.1"/><text x="${px(lx + 13)}" y="${px(ly)}">its own Level 1 bound</text>`);
  }
  parts.push('</svg>');
  return { svg: parts.join(''), marks, offChart };
}
