/**
 * Small SVG building blocks shared by the charts: escaping, axes, hatch patterns and the
 * chart frame. The style is ours: thin black lines, grey fills and hatching that survive a
 * greyscale printer, every region named in words.
 */
import { plain } from '../view-format.js';

export interface ChartOutput {
  /** inline SVG, or null when the data to draw are missing */
  svg: string | null;
  /** one or two sentences: what is shown, or why nothing is */
  caption: string;
}

export interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

/** Text and attribute escaping for anything that came from the user's files. */
export function esc(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

/** Two decimals are plenty for screen and print coordinates and keep the SVG small. */
export function px(value: number): string {
  return (Math.round(value * 100) / 100).toString();
}

/** Ids must be unique in the whole HTML document, which holds many charts. */
export function safeId(text: string): string {
  return text.replace(/[^A-Za-z0-9_-]/g, '_');
}

/**
 * Fills for level regions, lightest for the best level: Level 1 a flat light grey, Level 2
 * diagonal hatching, Level 3 a dot screen. Read without colour, they stay distinct.
 */
export function levelPatterns(prefix: string): string {
  return [
    `<pattern id="${prefix}-l2" patternUnits="userSpaceOnUse" width="6" height="6" patternTransform="rotate(45)">`,
    '<rect width="6" height="6" fill="#ffffff"/><line x1="0" y1="0" x2="0" y2="6" stroke="#8a8a8a" stroke-width="1.1"/></pattern>',
    `<pattern id="${prefix}-l3" patternUnits="userSpaceOnUse" width="5" height="5">`,
    '<rect width="5" height="5" fill="#ffffff"/><circle cx="2.5" cy="2.5" r="0.7" fill="#8a8a8a"/></pattern>',
    `<pattern id="${prefix}-unstable" patternUnits="userSpaceOnUse" width="8" height="8" patternTransform="rotate(-45)">`,
    '<rect width="8" height="8" fill="#ffffff"/><line x1="0" y1="0" x2="0" y2="8" stroke="#c4c4c4" stroke-width="0.8"/></pattern>',
  ].join('');
}

export function levelFill(prefix: string, level: number): string {
  if (level === 1) return '#dedede';
  return `url(#${prefix}-l${level === 2 ? 2 : 3})`;
}

/** Boundary line style per level: Level 1 solid, Level 2 dashed, Level 3 dotted. */
export function levelStroke(level: number): string {
  if (level === 1) return 'stroke="#111" stroke-width="1.3"';
  if (level === 2) return 'stroke="#111" stroke-width="1" stroke-dasharray="5 3"';
  return 'stroke="#111" stroke-width="0.9" stroke-dasharray="1.5 2.5"';
}

export interface AxisSpec {
  box: Box;
  ticks: number[];
  map: (v: number) => number;
  label: string;
  /** which tick values get a number printed (log axes label 1-2-5 only) */
  labelled?: (v: number) => boolean;
}

export function bottomAxis(a: AxisSpec): string {
  const y = a.box.top + a.box.height;
  const out: string[] = [`<g class="axis axis-x">`];
  for (const t of a.ticks) {
    const x = a.map(t);
    out.push(`<line x1="${px(x)}" y1="${px(y)}" x2="${px(x)}" y2="${px(y + 3)}" stroke="#111"/>`);
    if (!a.labelled || a.labelled(t)) {
      out.push(`<text x="${px(x)}" y="${px(y + 12)}" text-anchor="middle">${esc(plain(t, 3))}</text>`);
    }
  }
  out.push(`<text class="axis-label" x="${px(a.box.left + a.box.width / 2)}" y="${px(y + 25)}" text-anchor="middle">${esc(a.label)}</text>`);
  out.push('</g>');
  return out.join('');
}

export function leftAxis(a: AxisSpec): string {
  const x = a.box.left;
  const out: string[] = [`<g class="axis axis-y">`];
  for (const t of a.ticks) {
    const y = a.map(t);
    out.push(`<line x1="${px(x - 3)}" y1="${px(y)}" x2="${px(x)}" y2="${px(y)}" stroke="#111"/>`);
    if (!a.labelled || a.labelled(t)) {
      out.push(`<text x="${px(x - 5)}" y="${px(y + 3)}" text-anchor="end">${esc(plain(t, 3))}</text>`);
    }
  }
  const cy = a.box.top + a.box.height / 2;
  // the axis title clears the widest tick number
  const widest = Math.max(0, ...a.ticks.filter((t) => !a.labelled || a.labelled(t)).map((t) => textWidth(plain(t, 3), 8.5)));
  const titleX = Math.max(8, Math.min(x - 30, x - 5 - widest - 5));
  out.push(`<text class="axis-label" transform="translate(${px(titleX)},${px(cy)}) rotate(-90)" text-anchor="middle">${esc(a.label)}</text>`);
  out.push('</g>');
  return out.join('');
}

/** Log-axis ticks worth a number: the 1, 2 and 5 of each decade. */
export function isOneTwoFive(v: number): boolean {
  const mantissa = v / 10 ** Math.floor(Math.log10(v) + 1e-9);
  return [1, 2, 5].some((m) => Math.abs(mantissa - m) < 1e-6);
}

/** Light grid under the regions' boundaries; drawn before them so boundaries stay on top. */
export function gridLines(box: Box, xTicks: number[], xMap: (v: number) => number, yTicks: number[], yMap: (v: number) => number): string {
  const out: string[] = ['<g class="grid">'];
  for (const t of xTicks) out.push(`<line x1="${px(xMap(t))}" y1="${px(box.top)}" x2="${px(xMap(t))}" y2="${px(box.top + box.height)}"/>`);
  for (const t of yTicks) out.push(`<line x1="${px(box.left)}" y1="${px(yMap(t))}" x2="${px(box.left + box.width)}" y2="${px(yMap(t))}"/>`);
  out.push('</g>');
  return out.join('');
}

export function frameRect(box: Box): string {
  return `<rect class="frame" x="${px(box.left)}" y="${px(box.top)}" width="${px(box.width)}" height="${px(box.height)}" fill="none" stroke="#111" stroke-width="0.8"/>`;
}

export function clipPath(id: string, box: Box): string {
  return `<clipPath id="${id}"><rect x="${px(box.left)}" y="${px(box.top)}" width="${px(box.width)}" height="${px(box.height)}"/></clipPath>`;
}

/** Opening tag with the chart's own small stylesheet, so the SVG reads the same pasted elsewhere. */
export function svgOpen(width: number, height: number, label: string, cls: string): string {
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" class="chart ${cls}" viewBox="0 0 ${width} ${height}" ` +
    `width="${width}" height="${height}" role="img" aria-label="${esc(label)}" font-family="DejaVu Sans, Liberation Sans, Arial, sans-serif" font-size="8.5">` +
    '<style>.grid line{stroke:#cfcfcf;stroke-width:0.5}.axis text{fill:#111}.axis-label{font-size:9px}' +
    '.region-label{font-size:8.5px;font-weight:bold;fill:#111}.mode-label{font-size:8px;fill:#111}' +
    '.point-label{font-size:8.5px;font-weight:bold;fill:#000}.ray-label{font-size:7px;fill:#555}</style>'
  );
}

/**
 * A label on a white backing box, so hatching never makes text unreadable. A box rather
 * than a stroked halo: Chromium prints stroked text as outlines, which bloats the PDF.
 */
export function haloText(x: number, y: number, text: string, cls: string, anchor = 'start'): string {
  const size = cls === 'ray-label' ? 7 : 8.5;
  const w = textWidth(text, size) + 2;
  const left = anchor === 'middle' ? x - w / 2 : anchor === 'end' ? x - w + 1 : x - 1;
  return (
    `<rect class="label-back" x="${px(left)}" y="${px(y - size + 0.5)}" width="${px(w)}" height="${px(size + 2)}" fill="#fff" fill-opacity="0.88"/>` +
    `<text x="${px(x)}" y="${px(y)}" text-anchor="${anchor}" class="${cls}">${esc(text)}</text>`
  );
}

/** Rough width of a label [px] at the charts' 8-9 px type, enough to keep labels inside the frame. */
export function textWidth(text: string, size = 8.5): number {
  // 0.6 em a character covers the bold DejaVu labels too, so no label is cut at the frame
  return text.length * size * 0.6;
}

export interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
}

export function overlaps(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.w && b.x < a.x + a.w && a.y < b.y + b.h && b.y < a.y + a.h;
}

/** A drawn line in chart pixels, as a polyline: a label must not cross it. */
export type Polyline = readonly (readonly [number, number])[];

function segmentHitsRect(a: readonly [number, number], b: readonly [number, number], r: Rect): boolean {
  // Liang-Barsky clipping of the segment against the rectangle
  let t0 = 0;
  let t1 = 1;
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const edges: [number, number][] = [[-dx, a[0] - r.x], [dx, r.x + r.w - a[0]], [-dy, a[1] - r.y], [dy, r.y + r.h - a[1]]];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
    } else {
      const t = q / p;
      if (p < 0) t0 = Math.max(t0, t);
      else t1 = Math.min(t1, t);
      if (t0 > t1) return false;
    }
  }
  return true;
}

export function crossesAny(r: Rect, lines: readonly Polyline[]): boolean {
  for (const l of lines) for (let i = 1; i < l.length; i++) if (segmentHitsRect(l[i - 1]!, l[i]!, r)) return true;
  return false;
}

/**
 * Place a label beside a point: around it at two distances (right, left, above, below and the
 * four diagonals), taking the first spot inside the frame, clear of what is already placed and
 * crossing none of `lines`; failing that, the spot inside the frame that hits the fewest of
 * them. A label never leaves its point for another's neighbourhood.
 */
export function placeLabel(
  px0: number, py0: number, text: string, box: Box, taken: Rect[], size = 8.5, lines: readonly Polyline[] = [],
): { x: number; y: number; anchor: 'start' | 'end' | 'middle' } {
  const w = textWidth(text, size);
  const h = size + 2;
  type Spot = { x: number; y: number; anchor: 'start' | 'end' | 'middle' };
  const options: Spot[] = [];
  for (const d of [6, 14]) {
    options.push(
      { x: px0 + d, y: py0 - 4, anchor: 'start' },
      { x: px0 + d, y: py0 + h + 1, anchor: 'start' },
      { x: px0 - d, y: py0 - 4, anchor: 'end' },
      { x: px0 - d, y: py0 + h + 1, anchor: 'end' },
      { x: px0, y: py0 - d, anchor: 'middle' },
      { x: px0, y: py0 + d + h - 2, anchor: 'middle' },
      { x: px0 + d, y: py0 + 3, anchor: 'start' },
      { x: px0 - d, y: py0 + 3, anchor: 'end' },
    );
  }
  const rectOf = (o: Spot): Rect => ({ x: o.anchor === 'start' ? o.x - 1 : o.anchor === 'end' ? o.x - w - 1 : o.x - w / 2 - 1, y: o.y - size, w: w + 2, h });
  const inside = (r: Rect) => r.x >= box.left + 1 && r.x + r.w <= box.left + box.width - 1 && r.y >= box.top + 1 && r.y + r.h <= box.top + box.height - 1;
  let best: { o: Spot; cost: number } | null = null;
  for (const o of options) {
    const r = rectOf(o);
    if (!inside(r)) continue;
    const cost = taken.filter((t) => overlaps(t, r)).length * 10 + (crossesAny(r, lines) ? 1 : 0);
    if (cost === 0) {
      taken.push(r);
      return o;
    }
    if (best === null || cost < best.cost) best = { o, cost };
  }
  const chosen = best?.o ?? options[0]!;
  taken.push(rectOf(chosen));
  return chosen;
}

/**
 * A legend row: swatches one after the other by their text widths, wrapping to the next line
 * (`lineHeight` below) when the width would be passed, so no entry is cut at the edge.
 * Returns the SVG and the number of lines used.
 */
export function legendRow(items: readonly { swatch: (x: number, y: number) => string; text: string; swatchWidth?: number }[], x0: number, y0: number, maxRight: number, lineHeight = 12): { svg: string; lines: number } {
  const out: string[] = [];
  let x = x0;
  let y = y0;
  let lines = 1;
  for (const item of items) {
    const width = (item.swatchWidth ?? 18) + textWidth(item.text, 8.5) + 10;
    if (x > x0 && x + width > maxRight) {
      x = x0;
      y += lineHeight;
      lines += 1;
    }
    out.push(item.swatch(x, y));
    x += width;
  }
  return { svg: out.join(''), lines };
}

export function legendSwatch(x: number, y: number, fill: string, stroke: string, text: string): string {
  return (
    `<rect x="${px(x)}" y="${px(y - 7)}" width="14" height="9" fill="${fill}" ${stroke}/>` +
    `<text x="${px(x + 18)}" y="${px(y)}">${esc(text)}</text>`
  );
}

/**
 * The legend of a level-region chart: a swatch per level (an open level says "any value"),
 * "outside Level N" only when the worst level sets a bound, and the aircraft's point.
 */
export function levelLegend(prefix: string, levels: readonly { level: number; open: boolean }[], outsideOf: number | null, y: number, width: number): string {
  const items = [...levels].sort((a, b) => a.level - b.level).map((l) => {
    const text = l.open ? `Level ${l.level} (any value)` : `Level ${l.level}`;
    return { text, swatch: (x: number, yy: number) => legendSwatch(x, yy, levelFill(prefix, l.level), levelStroke(l.level), text) };
  });
  if (outsideOf !== null) {
    const text = `outside Level ${outsideOf}`;
    items.push({ text, swatch: (x, yy) => legendSwatch(x, yy, '#fff', 'stroke="#111" stroke-width="0.6"', text) });
  }
  items.push({
    text: 'aircraft',
    swatch: (x, yy) => `<g class="legend-point"><circle cx="${px(x + 7)}" cy="${px(yy - 3)}" r="3.5" fill="#000"/><text x="${px(x + 18)}" y="${px(yy)}">aircraft</text></g>`,
  });
  return legendRow(items, 8, y, width - 4).svg;
}
