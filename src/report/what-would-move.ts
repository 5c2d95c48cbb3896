/**
 * The "what would move it" rows of a finding (terminal and review document), and the numbers
 * that most often lead the failing and marginal findings of a sweep. Presentation only: the
 * figures come from src/sensitivity/.
 */
import type { ConditionResult, Finding, Sensitivity } from '../types.js';

export interface MoveRow {
  /** the number's place in the files */
  parameter: string;
  /** [file's unit] */
  now: number;
  /** [file's unit] the value that reaches the target, verified; null when not reachable alone */
  needed: number | null;
  change: number | null;
  /** needed / now [-] (between 0 and 2) */
  ratio: number | null;
  /** [file's unit] linear estimate of the change */
  estimate: number | null;
  /** level and verdict at the change (verified), or why there is none */
  reached: string;
}

export function moveRows(f: Finding): MoveRow[] {
  return (f.sensitivities ?? []).map((s) => {
    const t = s.toBoundary;
    if (t === null) return { parameter: s.parameter, now: s.current, needed: null, change: null, ratio: null, estimate: null, reached: s.reason ?? 'not reachable' };
    const level = t.verifiedLevel === null ? 'no level' : `Level ${t.verifiedLevel}`;
    return {
      parameter: s.parameter,
      now: s.current,
      needed: s.current + t.change,
      change: t.change,
      ratio: (s.current + t.change) / s.current,
      estimate: t.estimate,
      reached: `${level}, ${t.verifiedVerdict.replace('_', ' ')}`,
    };
  });
}

/** What the target of the rows is, in words. */
export function moveTarget(f: Finding): string {
  return f.verdict === 'marginal'
    ? 'each number alone, changed until the value leaves the marginal band (re-analysed)'
    : 'each number alone, changed until the value reaches the boundary of the required level (re-analysed)';
}

export interface DecidingNumber {
  /** the number, with the condition left out (`lateral.derivatives.Nr`, `column Cmalpha of t.csv`) */
  number: string;
  /** failing findings it leads (largest normalised influence) */
  leadsFail: number;
  /** marginal findings it leads */
  leadsMarginal: number;
  /** findings with it among their five */
  inTopFive: number;
  /** findings it brings to the target by itself */
  reachesAlone: number;
}

/** The numbers that most often lead the failing and marginal findings over the conditions, most first. */
export function decidingNumbers(conditions: readonly ConditionResult[], most = 8): DecidingNumber[] {
  const by = new Map<string, DecidingNumber>();
  const entry = (s: Sensitivity) => {
    const number = genericName(s.parameter);
    let e = by.get(number);
    if (e === undefined) {
      e = { number, leadsFail: 0, leadsMarginal: 0, inTopFive: 0, reachesAlone: 0 };
      by.set(number, e);
    }
    return e;
  };
  for (const c of conditions) {
    for (const f of c.findings) {
      if ((f.verdict !== 'fail' && f.verdict !== 'marginal') || !f.sensitivities?.length) continue;
      const lead = entry(f.sensitivities[0]!);
      if (f.verdict === 'fail') lead.leadsFail += 1;
      else lead.leadsMarginal += 1;
      for (const s of f.sensitivities) {
        const e = entry(s);
        e.inTopFive += 1;
        if (s.toBoundary !== null) e.reachesAlone += 1;
      }
    }
  }
  return [...by.values()]
    .filter((e) => e.leadsFail + e.leadsMarginal > 0)
    .sort((a, b) => b.leadsFail - a.leadsFail || b.leadsMarginal - a.leadsMarginal || b.inTopFive - a.inTopFive || a.number.localeCompare(b.number))
    .slice(0, most);
}

/** A number's name without its condition: the same derivative of every condition counts together. */
export function genericName(parameter: string): string {
  const row = /^conditions\[\d+\]\.(.+)$/.exec(parameter);
  if (row) return row[1]!;
  const cell = /^(.+):\d+:([^:]+)$/.exec(parameter);
  if (cell) return `column ${cell[2]} of ${cell[1]}`;
  return parameter;
}
