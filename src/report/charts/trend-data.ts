/**
 * The key modal figures of a sweep, one series per figure and axis (airspeed or altitude):
 * the value each condition was judged on, the verdict it got, and the Level 1 boundary when
 * one boundary holds for every condition. Picked from the results only, so a point is exactly
 * the judged figure.
 */
import type { Bound, ConditionResult, Finding, ResultMode, ModeKind, Quantity, Verdict } from '../../types.js';
import { worstVerdict } from '../verdict-marks.js';

export interface KeyFigure {
  key: string;
  title: string;
  /** axis label with the unit in brackets */
  axis: string;
  mode: ModeKind;
  /** the bounded quantity whose findings carry the figure; null for a figure no criterion judges */
  quantity: Quantity | null;
  /** the figure from the mode when no finding carries it (null: only findings carry it) */
  fromMode: ((m: ResultMode) => number | null) | null;
  /** the figure from the condition's other results (e.g. its responses) when neither gives it */
  fromCondition?: (c: ConditionResult) => number | null;
  /** a figure only some models give (responses to cockpit controls): no chart when no condition has it */
  optional?: true;
}

export const KEY_FIGURES: readonly KeyFigure[] = [
  { key: 'sp-damping', title: 'Short-period damping ratio', axis: '\u03b6sp [\u2013]', mode: 'short_period', quantity: 'damping_ratio', fromMode: (m) => m.dampingRatio },
  { key: 'sp-cap', title: 'Control anticipation parameter', axis: 'CAP [1/(s\u00b2\u00b7g)]', mode: 'short_period', quantity: 'cap', fromMode: null },
  { key: 'dr-damping', title: 'Dutch roll damping ratio', axis: '\u03b6d [\u2013]', mode: 'dutch_roll', quantity: 'damping_ratio', fromMode: (m) => m.dampingRatio },
  { key: 'dr-frequency', title: 'Dutch roll frequency', axis: '\u03c9nd [rad/s]', mode: 'dutch_roll', quantity: 'natural_frequency', fromMode: (m) => m.naturalFrequency },
  { key: 'roll-tau', title: 'Roll-mode time constant', axis: '\u03c4R [s]', mode: 'roll', quantity: 'time_constant', fromMode: (m) => m.timeConstant },
  { key: 'time-to-bank', title: 'Time to bank (roll performance)', axis: 't to bank [s]', mode: 'roll', quantity: 'time_to_bank', fromMode: null, optional: true },
  {
    key: 'pitch-bandwidth',
    title: 'Pitch attitude bandwidth',
    axis: '\u03c9BW,\u03b8 [rad/s]',
    mode: 'short_period',
    quantity: null,
    fromMode: null,
    fromCondition: (c) => c.responses?.pitch?.bandwidth ?? null,
    optional: true,
  },
];

export type TrendAxis = 'airspeed' | 'altitude';

export interface TrendPoint {
  /** [m/s] or [m] */
  x: number;
  /** [SI unit of the figure] */
  y: number;
  /** worst verdict of the findings on this figure; null when no criterion judged it */
  verdict: Verdict | null;
  /** Level 1 bound of the finding behind the verdict (null when none) */
  level1: Bound | null;
  /** the condition the point is, named on hover */
  condition: string;
}

export interface BoundaryUse {
  bound: Bound;
  criteria: string[];
}

export interface TrendSeries {
  points: TrendPoint[];
  /** conditions with no finite value of the figure (or no altitude, on the altitude axis) */
  missing: number;
  /** the same series against altitude (conditions without an altitude left out) */
  byAltitude: { points: TrendPoint[]; missing: number };
  /** distinct Level 1 bounds over the sweep, with the criteria that set them */
  boundaries: BoundaryUse[];
}

function boundKey(b: Bound): string {
  return `${b.min ?? ''}|${b.max ?? ''}`;
}

/** One pass over the sweep gives the series against airspeed and against altitude. */
export function trendSeries(conditions: readonly ConditionResult[], figure: KeyFigure): TrendSeries {
  const points: TrendPoint[] = [];
  const altitudePoints: TrendPoint[] = [];
  const boundaries = new Map<string, BoundaryUse>();
  let missing = 0;
  let altitudeMissing = 0;
  for (const c of conditions) {
    const findings: Finding[] = [];
    for (const f of c.findings) if (f.mode === figure.mode && f.quantity === figure.quantity) findings.push(f);
    for (const f of findings) {
      const b = f.bounds['1'];
      if (!b || (b.min === undefined && b.max === undefined)) continue;
      const key = boundKey(b);
      const use = boundaries.get(key);
      if (!use) boundaries.set(key, { bound: { ...b }, criteria: [f.criterion] });
      else if (!use.criteria.includes(f.criterion)) use.criteria.push(f.criterion);
    }
    let y: number | null = findings.find((f) => f.value !== null && Number.isFinite(f.value))?.value ?? null;
    if (y === null && figure.fromMode) {
      const mode = c.modes.find((m) => m.kind === figure.mode);
      y = mode ? figure.fromMode(mode) : null;
    }
    if (y === null && figure.fromCondition) y = figure.fromCondition(c);
    if (y === null || !Number.isFinite(y)) {
      missing += 1;
      altitudeMissing += 1;
      continue;
    }
    const verdict = findings.length > 0 ? worstVerdict(findings.map((f) => f.verdict)) : null;
    const judged = findings.find((f) => f.verdict === verdict && f.bounds['1']);
    const level1 = judged?.bounds['1'] ?? null;
    points.push({ x: c.airspeed, y, verdict, level1, condition: c.id });
    if (c.altitude === null) altitudeMissing += 1;
    else altitudePoints.push({ x: c.altitude, y, verdict, level1, condition: c.id });
  }
  return { points, missing, byAltitude: { points: altitudePoints, missing: altitudeMissing }, boundaries: [...boundaries.values()] };
}

/** True when the altitudes of the sweep differ, so that a chart against altitude says something. */
export function altitudesVary(conditions: readonly ConditionResult[]): boolean {
  let first: number | null = null;
  for (const c of conditions) {
    if (c.altitude === null) continue;
    if (first === null) first = c.altitude;
    else if (c.altitude !== first) return true;
  }
  return false;
}
