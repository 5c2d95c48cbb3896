/**
 * Regions of a two-figure criterion (e.g. pitch bandwidth and phase delay judged together):
 * which level's polygon holds a point, and how far the point is from the boundary of the
 * required level. A point on an edge is inside.
 */
import type { Level, LevelRegions } from '../types.js';
import { LEVELS, levelKey } from './level-bounds.js';

export type Polygon = readonly (readonly [number, number])[];
export type ExpandedRegions = Record<'1' | '2' | '3', Polygon | 'any'>;

/** Every level's region, a level left out holding the region of the next better one. */
export function expandRegions(regions: LevelRegions): ExpandedRegions {
  let previous: Polygon | 'any' = 'any';
  const out = {} as ExpandedRegions;
  for (const level of LEVELS) {
    const key = levelKey(level);
    previous = regions.levels[key] ?? previous;
    out[key] = previous;
  }
  return out;
}

/** Point in polygon by the crossing rule; points on an edge count as inside. */
export function insidePolygon(polygon: Polygon, x: number, y: number): boolean {
  if (!Number.isFinite(x) || !Number.isFinite(y)) return false;
  let inside = false;
  const n = polygon.length;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const [xi, yi] = polygon[i]!;
    const [xj, yj] = polygon[j]!;
    if (onSegment(xi, yi, xj, yj, x, y)) return true;
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

function onSegment(x1: number, y1: number, x2: number, y2: number, x: number, y: number): boolean {
  const cross = (x2 - x1) * (y - y1) - (y2 - y1) * (x - x1);
  const scale = Math.max(Math.abs(x2 - x1), Math.abs(y2 - y1), 1e-300);
  if (Math.abs(cross) > 1e-12 * scale * Math.max(Math.abs(x2 - x1) + Math.abs(y2 - y1), 1e-300)) return false;
  return x >= Math.min(x1, x2) - 1e-12 && x <= Math.max(x1, x2) + 1e-12 && y >= Math.min(y1, y2) - 1e-12 && y <= Math.max(y1, y2) + 1e-12;
}

export function inRegion(region: Polygon | 'any', x: number, y: number): boolean {
  return region === 'any' || insidePolygon(region, x, y);
}

/** The best level whose region holds (x, y); null when none. */
export function levelInRegions(regions: ExpandedRegions, x: number, y: number): Level | null {
  for (const level of LEVELS) if (inRegion(regions[levelKey(level)], x, y)) return level;
  return null;
}

/**
 * Relative margin of (x, y) to the boundary of `region`: the smallest fractional change of one
 * figure alone (x by x(1 +- m), or y by y(1 +- m)) that takes the point across the boundary;
 * positive inside, negative outside, Infinity when no such change crosses it (e.g. 'any').
 * [-], a fraction of the figure's own value.
 */
export function relativeMargin(region: Polygon | 'any', x: number, y: number): number {
  if (region === 'any') return Infinity;
  const inside = insidePolygon(region, x, y);
  let nearest = Infinity;
  const n = region.length;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const [xi, yi] = region[i]!;
    const [xj, yj] = region[j]!;
    // crossing of the horizontal line through the point (x moves)
    if ((yi - y) * (yj - y) <= 0 && yi !== yj && x !== 0) {
      const xc = xi + ((y - yi) * (xj - xi)) / (yj - yi);
      nearest = Math.min(nearest, Math.abs(xc - x) / Math.abs(x));
    }
    // crossing of the vertical line through the point (y moves)
    if ((xi - x) * (xj - x) <= 0 && xi !== xj && y !== 0) {
      const yc = yi + ((x - xi) * (yj - yi)) / (xj - xi);
      nearest = Math.min(nearest, Math.abs(yc - y) / Math.abs(y));
    }
  }
  return inside ? nearest : -nearest;
}
