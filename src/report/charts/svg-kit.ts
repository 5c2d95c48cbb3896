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
  out.push(`<text class="axis-label" transform="translate(${px(x - 30)},${px(cy)}) rotate(-90)" text-anchor="middle">${esc(a.label)}</text>`);
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
  return text.length * size * 0.56;
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

/**
 * Place a label beside a point: try right-above, right-below, left-above, left-below and take
 * the first that stays inside the frame and clear of what is already placed; else nudge down.
 */
export function placeLabel(px0: number, py0: number, text: string, box: Box, taken: Rect[], size = 8.5): { x: number; y: number; anchor: 'start' | 'end' } {
  const w = textWidth(text, size);
  const h = size + 2;
  const options: { x: number; y: number; anchor: 'start' | 'end' }[] = [
    { x: px0 + 6, y: py0 - 5, anchor: 'start' },
    { x: px0 + 6, y: py0 + h + 2, anchor: 'start' },
    { x: px0 - 6, y: py0 - 5, anchor: 'end' },
    { x: px0 - 6, y: py0 + h + 2, anchor: 'end' },
  ];
  const rectOf = (o: { x: number; y: number; anchor: 'start' | 'end' }): Rect => ({ x: o.anchor === 'start' ? o.x : o.x - w, y: o.y - size, w, h });
  const inside = (r: Rect) => r.x >= box.left + 2 && r.x + r.w <= box.left + box.width - 2 && r.y >= box.top + 2 && r.y + r.h <= box.top + box.height - 2;
  for (let shift = 0; shift < 6; shift++) {
    for (const o of options) {
      const moved = { ...o, y: o.y + shift * h };
      const r = rectOf(moved);
      if (inside(r) && !taken.some((t) => overlaps(t, r))) {
        taken.push(r);
        return moved;
      }
    }
  }
  const fallback = options.find((o) => inside(rectOf(o))) ?? options[0]!;
  taken.push(rectOf(fallback));
  return fallback;
}

export function legendSwatch(x: number, y: number, fill: string, stroke: string, text: string): string {
  return (
    `<rect x="${px(x)}" y="${px(y - 7)}" width="14" height="9" fill="${fill}" ${stroke}/>` +
    `<text x="${px(x + 18)}" y="${px(y)}">${esc(text)}</text>`
  );
}
