/**
 * What changed in one mode between two runs, in the order a reviewer must read it: a mode
 * that turns divergent (or stable) is said as that, alone, since its figures cannot be
 * compared across the change of sign; otherwise the figures that describe the mode (omega_n and
 * zeta of an oscillation; the time constant or time to double of a real root).
 */
import type { Stability } from '../modes/stability.js';
import type { ModeFigureChange } from './compare-results.js';
import type { FigureChange } from './figure-change.js';

export type ModeFigure = 'naturalFrequency' | 'dampingRatio' | 'timeConstant' | 'timeToDouble';

export type ModeChangeItem =
  | { kind: 'stability'; from: Stability; to: Stability; size: number }
  | { kind: 'figure'; figure: ModeFigure; change: FigureChange; size: number };

export function modeChangeItems(m: ModeFigureChange): ModeChangeItem[] {
  const { baseline, current } = m.stability;
  if (baseline !== null && current !== null && baseline !== current) {
    return [{ kind: 'stability', from: baseline, to: current, size: Number.POSITIVE_INFINITY }];
  }
  const figures: ModeFigure[] = m.real ? ['timeConstant', 'timeToDouble'] : ['naturalFrequency', 'dampingRatio'];
  const out: ModeChangeItem[] = [];
  for (const figure of figures) {
    const change = m[figure];
    if (change.relative === null || change.relative === 0) continue;
    out.push({ kind: 'figure', figure, change, size: Math.abs(change.relative) });
  }
  return out;
}

/** "turns divergent", "turns convergent", "becomes neutral". */
export function stabilityChangeText(to: Stability): string {
  return to === 'neutral' ? 'becomes neutrally stable' : `turns ${to}`;
}
