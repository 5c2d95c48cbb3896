/**
 * Phase delay against pitch bandwidth with the level regions of the criteria file (one
 * polygon per level) and the point of each condition: one condition in its own section, all
 * of a sweep on one chart in the envelope summary.
 */
import { scaleLinear } from 'd3-scale';
import type { ConditionResult, Finding } from '../../types.js';
import { sig } from '../view-format.js';
import {
  type Box, type ChartOutput, bottomAxis, clipPath, frameRect, gridLines, haloText, leftAxis, legendSwatch, levelFill,
  levelPatterns, levelStroke, placeLabel, px, type Rect, safeId, svgOpen,
} from './svg-kit.js';

const WIDTH = 330;
const HEIGHT = 250;
const BOX: Box = { left: 48, top: 10, width: 266, height: 190 };

/** The region finding of a condition (pitch bandwidth judged with phase delay), if any. */
export function bandwidthFinding(c: ConditionResult): Finding | undefined {
  return c.findings.find((f) => f.quantity === 'pitch_bandwidth' && f.region !== undefined);
}

export function bandwidthChart(conditions: readonly ConditionResult[], label: string): ChartOutput {
  const points = conditions
    .map((c) => ({ c, f: bandwidthFinding(c) }))
    .filter((p): p is { c: ConditionResult; f: Finding } => p.f !== undefined);
  const first = points[0]?.f;
  if (!first || !first.region) return { svg: null, caption: 'No bandwidth / phase-delay finding: chart not drawn.' };
  const drawn = points.filter((p) => p.f.value !== null && p.f.against?.value !== null && p.f.against?.value !== undefined);
  const regions = first.region;
  const xs = drawn.map((p) => p.f.value!);
  const ys = drawn.map((p) => p.f.against!.value!);
  const edgesX = Object.values(regions).flatMap((r) => (r === 'any' ? [] : r.map((v) => v[0]))).filter((v) => v < 50);
  const edgesY = Object.values(regions).flatMap((r) => (r === 'any' ? [] : r.map((v) => v[1])));
  const x = scaleLinear().domain([0, Math.max(10, ...xs.map((v) => v * 1.2), ...edgesX.map((v) => v * 1.4))]).nice().range([BOX.left, BOX.left + BOX.width]);
  const y = scaleLinear().domain([0, Math.max(0.25, ...ys.map((v) => v * 1.2), ...edgesY.map((v) => v * 1.2))]).nice().range([BOX.top + BOX.height, BOX.top]);
  const id = safeId(`bw-${label}`);
  const parts: string[] = [svgOpen(WIDTH, HEIGHT, `Pitch phase delay against bandwidth, ${label}`, 'chart-bandwidth')];
  parts.push(`<defs>${levelPatterns(id)}${clipPath(`${id}-clip`, BOX)}</defs>`);
  // outside every polygon: white; then Level 3, 2, 1 painted over one another
  parts.push(`<rect x="${BOX.left}" y="${BOX.top}" width="${BOX.width}" height="${BOX.height}" fill="#fff"/>`);
  parts.push(`<g clip-path="url(#${id}-clip)">`);
  const levels = (['3', '2', '1'] as const).map((k) => ({ level: Number(k), region: regions[k] }));
  for (const { level, region } of levels) {
    const d = region === 'any'
      ? `M${px(BOX.left)},${px(BOX.top)}h${px(BOX.width)}v${px(BOX.height)}h${px(-BOX.width)}Z`
      : `M${region.map(([a, b]) => `${px(x(a))},${px(y(b))}`).join('L')}Z`;
    parts.push(`<path class="region region-l${level}" d="${d}" fill="${levelFill(id, level)}" ${region === 'any' ? 'stroke="none"' : levelStroke(level)}/>`);
  }
  parts.push('</g>');
  parts.push(gridLines(BOX, x.ticks(6), x, y.ticks(5), y));
  parts.push(frameRect(BOX));
  parts.push(bottomAxis({ box: BOX, ticks: x.ticks(6), map: x, label: 'pitch bandwidth \u03c9BW [rad/s]' }));
  parts.push(leftAxis({ box: BOX, ticks: y.ticks(5), map: y, label: 'phase delay \u03c4p [s]' }));
  const taken: Rect[] = [];
  const many = drawn.length > 8;
  for (const { c, f } of drawn) {
    const cx = x(Math.min(f.value!, x.domain()[1]!));
    const cy = y(Math.min(f.against!.value!, y.domain()[1]!));
    parts.push(`<circle cx="${px(cx)}" cy="${px(cy)}" r="${many ? 2.2 : 4}" fill="#000" stroke="#fff" stroke-width="1"/>`);
    if (!many) {
      const text = `${c.id}: ${sig(f.value)} rad/s, ${sig(f.against!.value)} s`;
      const at = placeLabel(cx, cy, text, BOX, taken);
      parts.push(haloText(at.x, at.y, text, 'point-label', at.anchor));
    }
  }
  let lx = BOX.left;
  for (const level of [1, 2, 3]) {
    parts.push(legendSwatch(lx, HEIGHT - 6, levelFill(id, level), levelStroke(level), `Level ${level}`));
    lx += 58;
  }
  parts.push('</svg>');
  const missing = points.length - drawn.length;
  return {
    svg: parts.join(''),
    caption:
      `Phase delay against bandwidth of \u03b8 to the pitch control, with the level regions of criterion ${first.criterion} (${first.source}; from the criteria file, ` +
      `evidence ${first.evidence.class}). ${drawn.length} condition(s) drawn${missing > 0 ? `, ${missing} without a bandwidth or phase delay (see their findings)` : ''}.`,
  };
}
