/** The change of one figure (a finding value, a natural frequency, a damping ratio). */

export interface FigureChange {
  /** value in the baseline run, null when absent or not finite there */
  baseline: number | null;
  /** value in the current run, null when absent or not finite */
  current: number | null;
  /** current - baseline [unit of the figure], null unless both are finite */
  delta: number | null;
  /** delta / |baseline| [-], null unless both are finite and the baseline is not 0 */
  relative: number | null;
}

/**
 * Infinite values are treated like absent ones: the results JSON writes them as null, so a
 * convergent mode's infinite time to double in memory and its null in a baseline file are the
 * same figure.
 */
export function figureChange(baseline: number | null | undefined, current: number | null | undefined): FigureChange {
  const b = finiteOrNull(baseline);
  const c = finiteOrNull(current);
  const delta = b !== null && c !== null ? c - b : null;
  const relative = delta !== null && b !== null && b !== 0 ? delta / Math.abs(b) : null;
  return { baseline: b, current: c, delta, relative };
}

/** True when the figure appeared, disappeared or moved at all. */
export function figureMoved(change: FigureChange): boolean {
  if (change.baseline === null || change.current === null) return change.baseline !== change.current;
  return change.delta !== 0;
}

function finiteOrNull(x: number | null | undefined): number | null {
  return typeof x === 'number' && Number.isFinite(x) ? x : null;
}
