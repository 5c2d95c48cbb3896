/**
 * Compare the results of this design iteration with those of an earlier one (the baseline):
 * which verdicts moved and which way, how far every figure moved, which conditions and
 * criteria came or went, and whether the model or the criteria files are not the ones checked
 * before. Pure: the caller reads the baseline file (see parseBaselineResults).
 */
import { countVerdicts } from '../results.js';
import type { ConditionResult, EvidenceClass, Finding, Level, ModeKind, Quantity, Results, Verdict, VerdictCounts } from '../types.js';
import { isRealMode, modeStability, type Stability } from '../modes/stability.js';
import { figureChange, type FigureChange } from './figure-change.js';
import { compareInputs, type InputsComparison } from './input-changes.js';
import { classifyTransition, concernOf, type TransitionKind } from './verdict-transition.js';

export { parseBaselineResults } from './parse-baseline.js';
export type { FigureChange } from './figure-change.js';
export type { InputChange, InputsComparison, InputStatus } from './input-changes.js';
export type { TransitionKind } from './verdict-transition.js';

/** One finding present in both runs for the same condition. */
export interface FindingChange {
  condition: string;
  criterion: string;
  mode: ModeKind;
  quantity: Quantity;
  /** unit of value and margin, as the current run gives it */
  unit: string;
  transition: TransitionKind;
  verdict: { baseline: Verdict; current: Verdict };
  /** evidence class of the boundary judged against, in each run */
  evidence: { baseline: EvidenceClass; current: EvidenceClass };
  /** best level reached in each run (null: none) */
  level: { baseline: Level | null; current: Level | null };
  /** [unit] the bounded figure */
  value: FigureChange;
  /** [unit] signed distance to the required level's boundary (positive = inside) */
  margin: FigureChange;
}

/** A finding present in one run only, within a condition present in both. */
export interface FindingPresence {
  condition: string;
  criterion: string;
  mode: ModeKind;
  quantity: Quantity;
  verdict: Verdict;
}

/** The modal figures of one mode in both runs, modes paired by kind and order of appearance. */
export interface ModeFigureChange {
  condition: string;
  kind: ModeKind;
  /** 0 for the first mode of this kind in the condition, 1 for the next, ... */
  index: number;
  /** 'added': only in the current run; 'removed': only in the baseline */
  presence: 'both' | 'added' | 'removed';
  /** [rad/s] omega_n */
  naturalFrequency: FigureChange;
  /** [-] zeta */
  dampingRatio: FigureChange;
  /** [s] time constant of a real convergent mode */
  timeConstant: FigureChange;
  /** [s] time to double of a divergent mode */
  timeToDouble: FigureChange;
  /** stability in each run (null where the mode is absent): a mode turning divergent is the change to read first */
  stability: { baseline: Stability | null; current: Stability | null };
  /** every root of the mode is real in both runs where present: zeta and omega_n say nothing of it */
  real: boolean;
}

/** A condition present in one run only, with the verdicts it carries there. */
export interface ConditionPresence {
  id: string;
  phase: string;
  summary: VerdictCounts;
}

export interface ComparisonCounts {
  /** findings whose verdict got worse (see classifyTransition) */
  regressions: number;
  improvements: number;
  unchanged: number;
  findingsAdded: number;
  findingsRemoved: number;
  conditionsAdded: number;
  conditionsRemoved: number;
}

export interface Comparison {
  /** what the baseline run was, to name it in the output */
  baseline: { toolVersion: string; generatedAt: string; aircraft: Results['aircraft'] };
  /** true when the aircraft name or class differs from the baseline's */
  aircraftChanged: boolean;
  inputs: InputsComparison;
  conditions: { added: ConditionPresence[]; removed: ConditionPresence[]; common: number };
  /** criterion ids found in one run's findings only (over all conditions) */
  criteria: { added: string[]; removed: string[] };
  /** criteria set ids in one run only */
  criteriaSets: { added: string[]; removed: string[] };
  /** criteria whose boundaries' evidence changed between the runs, with how many findings it concerns */
  evidenceChanges: { criterion: string; baseline: EvidenceClass; current: EvidenceClass; findings: number }[];
  /** every finding in both runs: regressions first (most concerning first), then improvements, then unchanged */
  findings: FindingChange[];
  findingsAdded: FindingPresence[];
  findingsRemoved: FindingPresence[];
  /** every mode of the conditions in both runs, in the current run's order */
  modes: ModeFigureChange[];
  counts: ComparisonCounts;
}

export function compareResults(current: Results, baseline: Results): Comparison {
  const baselineById = new Map<string, ConditionResult>();
  for (const c of baseline.conditions) if (!baselineById.has(c.id)) baselineById.set(c.id, c);
  const currentIds = new Set(current.conditions.map((c) => c.id));

  const findings: FindingChange[] = [];
  const findingsAdded: FindingPresence[] = [];
  const findingsRemoved: FindingPresence[] = [];
  const modes: ModeFigureChange[] = [];
  const added: ConditionPresence[] = [];
  let common = 0;

  for (const now of current.conditions) {
    const before = baselineById.get(now.id);
    if (before === undefined) {
      added.push(presenceOf(now));
      continue;
    }
    common += 1;
    const paired = pairFindings(now, before);
    findings.push(...paired.changes);
    findingsAdded.push(...paired.added);
    findingsRemoved.push(...paired.removed);
    modes.push(...pairModes(now, before));
  }
  const removed = baseline.conditions.filter((c) => !currentIds.has(c.id)).map(presenceOf);

  const ordered = orderFindings(findings);
  const tally = (kind: TransitionKind) => ordered.filter((f) => f.transition === kind).length;
  return {
    baseline: { toolVersion: baseline.tool.version, generatedAt: baseline.generatedAt, aircraft: { ...baseline.aircraft } },
    aircraftChanged: current.aircraft.name !== baseline.aircraft.name || current.aircraft.class !== baseline.aircraft.class,
    inputs: compareInputs(current.inputs, baseline.inputs),
    conditions: { added, removed, common },
    criteria: setDifference(criterionIds(current), criterionIds(baseline)),
    criteriaSets: setDifference(current.criteriaSets.map((s) => s.id), baseline.criteriaSets.map((s) => s.id)),
    evidenceChanges: evidenceChanges(ordered),
    findings: ordered,
    findingsAdded,
    findingsRemoved,
    modes,
    counts: {
      regressions: tally('regression'),
      improvements: tally('improvement'),
      unchanged: tally('unchanged'),
      findingsAdded: findingsAdded.length,
      findingsRemoved: findingsRemoved.length,
      conditionsAdded: added.length,
      conditionsRemoved: removed.length,
    },
  };
}

/**
 * Findings are matched by criterion, mode and quantity; should one condition hold the same
 * triple twice, the occurrences are paired in order.
 */
function pairFindings(now: ConditionResult, before: ConditionResult) {
  const keyed = (list: Finding[]) => {
    const counter = new Map<string, number>();
    return list.map((f) => {
      const base = `${f.criterion}\u0000${f.mode}\u0000${f.quantity}`;
      const n = counter.get(base) ?? 0;
      counter.set(base, n + 1);
      return { key: `${base}\u0000${n}`, finding: f };
    });
  };
  const beforeByKey = new Map(keyed(before.findings).map((k) => [k.key, k.finding]));
  const changes: FindingChange[] = [];
  const added: FindingPresence[] = [];
  const matched = new Set<string>();
  for (const { key, finding } of keyed(now.findings)) {
    const old = beforeByKey.get(key);
    if (old === undefined) {
      added.push(findingPresence(now.id, finding));
      continue;
    }
    matched.add(key);
    changes.push({
      condition: now.id,
      criterion: finding.criterion,
      mode: finding.mode,
      quantity: finding.quantity,
      unit: finding.unit,
      transition: classifyTransition(old.verdict, finding.verdict),
      verdict: { baseline: old.verdict, current: finding.verdict },
      evidence: { baseline: old.evidence.class, current: finding.evidence.class },
      level: { baseline: old.level, current: finding.level },
      value: figureChange(old.value, finding.value),
      margin: figureChange(old.margin, finding.margin),
    });
  }
  const removed = [...beforeByKey].filter(([key]) => !matched.has(key)).map(([, f]) => findingPresence(now.id, f));
  return { changes, added, removed };
}

/** Changes of boundary evidence, one row per criterion and pair of classes, in the order first met. */
function evidenceChanges(findings: readonly FindingChange[]): Comparison['evidenceChanges'] {
  const rows = new Map<string, Comparison['evidenceChanges'][number]>();
  for (const f of findings) {
    if (f.evidence.baseline === f.evidence.current) continue;
    const key = `${f.criterion}\u0000${f.evidence.baseline}\u0000${f.evidence.current}`;
    const row = rows.get(key);
    if (row) row.findings += 1;
    else rows.set(key, { criterion: f.criterion, baseline: f.evidence.baseline, current: f.evidence.current, findings: 1 });
  }
  return [...rows.values()];
}

function pairModes(now: ConditionResult, before: ConditionResult): ModeFigureChange[] {
  const byKind = (c: ConditionResult) => {
    const groups = new Map<ModeKind, ConditionResult['modes']>();
    for (const m of c.modes) groups.set(m.kind, [...(groups.get(m.kind) ?? []), m]);
    return groups;
  };
  const nowKinds = byKind(now);
  const beforeKinds = byKind(before);
  const kinds = [...nowKinds.keys(), ...[...beforeKinds.keys()].filter((k) => !nowKinds.has(k))];
  const out: ModeFigureChange[] = [];
  for (const kind of kinds) {
    const a = nowKinds.get(kind) ?? [];
    const b = beforeKinds.get(kind) ?? [];
    for (let i = 0; i < Math.max(a.length, b.length); i++) {
      const m = a[i];
      const o = b[i];
      out.push({
        condition: now.id,
        kind,
        index: i,
        presence: m && o ? 'both' : m ? 'added' : 'removed',
        naturalFrequency: figureChange(o?.naturalFrequency, m?.naturalFrequency),
        dampingRatio: figureChange(o?.dampingRatio, m?.dampingRatio),
        timeConstant: figureChange(o?.timeConstant, m?.timeConstant),
        timeToDouble: figureChange(o?.timeToDouble, m?.timeToDouble),
        stability: { baseline: o ? modeStability(o) : null, current: m ? modeStability(m) : null },
        real: (m === undefined || isRealMode(m)) && (o === undefined || isRealMode(o)),
      });
    }
  }
  return out;
}

const transitionOrder: Record<TransitionKind, number> = { regression: 0, improvement: 1, unchanged: 2 };

/** Regressions first, most concerning first; within a group the current run's order is kept. */
function orderFindings(changes: FindingChange[]): FindingChange[] {
  return changes
    .map((change, index) => ({ change, index }))
    .sort((x, y) => {
      const byKind = transitionOrder[x.change.transition] - transitionOrder[y.change.transition];
      if (byKind !== 0) return byKind;
      if (x.change.transition === 'regression') {
        const byConcern = concernOf(x.change.verdict.current) - concernOf(y.change.verdict.current);
        if (byConcern !== 0) return byConcern;
      }
      return x.index - y.index;
    })
    .map((x) => x.change);
}

function presenceOf(c: ConditionResult): ConditionPresence {
  return { id: c.id, phase: c.phase, summary: countVerdicts(c.findings) };
}

function findingPresence(condition: string, f: Finding): FindingPresence {
  return { condition, criterion: f.criterion, mode: f.mode, quantity: f.quantity, verdict: f.verdict };
}

function criterionIds(results: Results): string[] {
  const ids = new Set<string>();
  for (const c of results.conditions) for (const f of c.findings) ids.add(f.criterion);
  return [...ids];
}

function setDifference(current: string[], baseline: string[]): { added: string[]; removed: string[] } {
  const now = new Set(current);
  const before = new Set(baseline);
  return { added: [...now].filter((x) => !before.has(x)), removed: [...before].filter((x) => !now.has(x)) };
}
