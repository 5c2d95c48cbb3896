/**
 * What the level-region charts need, picked out of one condition's results: the aircraft's
 * point and, per level, the bounds of the findings that draw the regions. Charts never read
 * the criteria files: the regions are exactly the bounds the verdicts were judged against.
 */
import type { Bound, ConditionResult, Finding, Level, ResultMode, ModeKind, Quantity } from '../../types.js';

export const LEVELS: readonly Level[] = [1, 2, 3];

export function findingFor(condition: ConditionResult, mode: ModeKind, quantity: Quantity): Finding | undefined {
  const candidates = condition.findings.filter((f) => f.mode === mode && f.quantity === quantity);
  // Prefer a finding that actually carries bounds (a civil set may repeat a quantity unbounded).
  return candidates.find((f) => Object.keys(f.bounds).length > 0) ?? candidates[0];
}

export function modeOf(condition: ConditionResult, kind: ModeKind): ResultMode | undefined {
  return condition.modes.find((m) => m.kind === kind);
}

export function boundOf(finding: Finding | undefined, level: Level): Bound | undefined {
  return finding?.bounds[String(level) as '1' | '2' | '3'];
}

/** Per level, the constraints that shape the short-period region. */
export interface ShortPeriodLevel {
  level: Level;
  /** [1/(s^2 g)] */
  capMin?: number;
  /** [1/(s^2 g)] */
  capMax?: number;
  /** [rad/s] */
  omegaMin?: number;
}

export interface ShortPeriodData {
  levels: ShortPeriodLevel[];
  /** [g/rad] */
  nAlpha: number | null;
  /** [rad/s] */
  omega: number | null;
  cap: Finding | undefined;
  method: string | undefined;
}

/**
 * n/alpha of the point from omega_sp^2 / CAP, the definition of CAP (MIL-F-8785C 3.2.2.1.1):
 * the finding holds CAP and the mode holds omega_sp, so the point is exactly the judged one.
 */
export function shortPeriodData(condition: ConditionResult): ShortPeriodData {
  const cap = findingFor(condition, 'short_period', 'cap');
  const freq = findingFor(condition, 'short_period', 'natural_frequency');
  const mode = modeOf(condition, 'short_period');
  const levels: ShortPeriodLevel[] = [];
  for (const level of LEVELS) {
    const c = boundOf(cap, level);
    const w = boundOf(freq, level);
    if (!c && !w) continue;
    const entry: ShortPeriodLevel = { level };
    if (c?.min !== undefined) entry.capMin = c.min;
    if (c?.max !== undefined) entry.capMax = c.max;
    if (w?.min !== undefined) entry.omegaMin = w.min;
    levels.push(entry);
  }
  const omega = mode?.naturalFrequency ?? null;
  const capValue = cap?.value ?? null;
  const nAlpha = omega !== null && capValue !== null && capValue > 0 ? (omega * omega) / capValue : null;
  return { levels, nAlpha, omega, cap, method: cap?.method };
}

export interface DutchRollLevel {
  level: Level;
  zetaMin?: number;
  zetaMax?: number;
  /** [rad/s] */
  zetaOmegaMin?: number;
  /** [rad/s] */
  omegaMin?: number;
}

export interface DutchRollData {
  levels: DutchRollLevel[];
  /** [rad/s] */
  omega: number | null;
  zeta: number | null;
}

export function dutchRollData(condition: ConditionResult): DutchRollData {
  const zeta = findingFor(condition, 'dutch_roll', 'damping_ratio');
  const product = findingFor(condition, 'dutch_roll', 'damping_frequency_product');
  const freq = findingFor(condition, 'dutch_roll', 'natural_frequency');
  const mode = modeOf(condition, 'dutch_roll');
  const levels: DutchRollLevel[] = [];
  for (const level of LEVELS) {
    const z = boundOf(zeta, level);
    const zw = boundOf(product, level);
    const w = boundOf(freq, level);
    if (!z && !zw && !w) continue;
    const entry: DutchRollLevel = { level };
    if (z?.min !== undefined) entry.zetaMin = z.min;
    if (z?.max !== undefined) entry.zetaMax = z.max;
    if (zw?.min !== undefined) entry.zetaOmegaMin = zw.min;
    if (w?.min !== undefined) entry.omegaMin = w.min;
    levels.push(entry);
  }
  return { levels, omega: mode?.naturalFrequency ?? null, zeta: mode?.dampingRatio ?? null };
}
