/**
 * Comparison with the baseline run -> the "Changes since the baseline" section: what the
 * baseline was, whether the model and criteria files are the ones checked before (by sha256),
 * conditions added and removed, verdict transitions (regressions first, as compareResults
 * orders them), figures that moved with an unchanged verdict, and the largest modal changes.
 */
import { modeChangeItems, stabilityChangeText, type ModeFigure } from '../../compare/mode-change-items.js';
import type { Comparison, FindingChange, ModeFigureChange } from '../../compare/compare-results.js';
import type { FigureChange } from '../../compare/figure-change.js';
import type { InputChange } from '../../compare/input-changes.js';
import type { VerdictCounts } from '../../types.js';
import { MODE_LABEL, QUANTITY_LABEL, QUANTITY_UNIT } from '../labels.js';
import type { ComparisonView, PresenceRow, TransitionRow } from '../report-view.js';
import { verdictMark } from '../verdict-marks.js';
import { dateText, NONE, sig, signedSig, unitText } from '../view-format.js';

/** Rows per list: a sweep can move thousands of findings; the results files hold them all. */
export const COMPARISON_LIMITS = { transitions: 60, moved: 25, presence: 30, conditions: 30, modes: 12 };

const KIND: Record<FindingChange['transition'], { symbol: string; word: string; kind: string }> = {
  regression: { symbol: '\u25bc', word: 'worse', kind: 'worse' },
  improvement: { symbol: '\u25b2', word: 'better', kind: 'better' },
  unchanged: { symbol: '=', word: 'same', kind: 'same' },
};

const STATUS: Record<InputChange['status'], string> = {
  same: '= same content',
  changed: '~ changed',
  renamed: '= same content, renamed',
  added: '+ not in the baseline',
  removed: '\u2212 only in the baseline',
};

function shortSha(sha: string | null): string {
  return sha ? sha.slice(0, 12) : NONE;
}

function levelText(l: 1 | 2 | 3 | null): string {
  return l === null ? 'none' : `L${l}`;
}

/** `+0.012 (+3.1 %)`; the relative part only where the baseline is not 0. */
export function deltaText(change: FigureChange): string {
  if (change.delta === null) {
    if (change.baseline === null && change.current === null) return NONE;
    return change.baseline === null ? 'now has a value' : 'value gone';
  }
  if (change.delta === 0) return '0';
  // No-break spaces: a narrow column must not leave "%)" alone on a line.
  const rel = change.relative === null ? '' : `\u00a0(${signedSig(change.relative * 100, 2)}\u202f%)`;
  return `${signedSig(change.delta)}${rel}`;
}

function transitionRow(f: FindingChange, anchorOf: (id: string) => string | null): TransitionRow {
  const k = KIND[f.transition];
  const unit = unitText(f.unit || QUANTITY_UNIT[f.quantity]);
  return {
    kind: k.kind,
    symbol: k.symbol,
    word: k.word,
    condition: f.condition,
    anchor: anchorOf(f.condition),
    criterion: f.criterion,
    quantity: QUANTITY_LABEL[f.quantity],
    unit,
    from: verdictMark(f.verdict.baseline),
    to: verdictMark(f.verdict.current),
    level: f.level.baseline === f.level.current ? levelText(f.level.current) : `${levelText(f.level.baseline)} \u2192 ${levelText(f.level.current)}`,
    value: `${sig(f.value.baseline)} \u2192 ${sig(f.value.current)}`,
    delta: deltaText(f.value),
    margin: `${signedSig(f.margin.baseline)} \u2192 ${signedSig(f.margin.current)}`,
  };
}

function countsText(s: VerdictCounts): string {
  return `${s.fail} fail, ${s.marginal} marginal, ${s.not_evaluated} not evaluated, ${s.pass} pass`;
}

function moreText(total: number, shown: number, what: string): string | null {
  return total > shown ? `\u2026 and ${total - shown} more ${what}, in the terminal summary and the results files.` : null;
}

function movedMagnitude(f: FindingChange): number {
  if (f.value.relative !== null) return Math.abs(f.value.relative);
  return f.value.baseline !== f.value.current ? Number.POSITIVE_INFINITY : 0;
}

const FIGURE_TEXT: Record<ModeFigure, { figure: string; unit: string }> = {
  naturalFrequency: { figure: '\u03c9n', unit: 'rad/s' },
  dampingRatio: { figure: '\u03b6', unit: '' },
  timeConstant: { figure: 'T', unit: 's' },
  timeToDouble: { figure: 't\u2082', unit: 's' },
};

function modeChanges(modes: readonly ModeFigureChange[], limit: number): ComparisonView['modeChanges'] {
  const rows: { size: number; order: number; row: ComparisonView['modeChanges'][number] }[] = [];
  modes.forEach((m, order) => {
    const mode = `${MODE_LABEL[m.kind]}${m.index > 0 ? ` #${m.index + 1}` : ''}`;
    if (m.presence !== 'both') {
      rows.push({ size: Number.POSITIVE_INFINITY, order, row: { condition: m.condition, mode, figure: 'mode', change: m.presence === 'added' ? 'new in this run' : 'only in the baseline', relative: NONE } });
      return;
    }
    for (const item of modeChangeItems(m)) {
      if (item.kind === 'stability') {
        rows.push({ size: item.size, order, row: { condition: m.condition, mode, figure: 'stability', change: `${item.from} \u2192 ${item.to}: ${stabilityChangeText(item.to)}`, relative: NONE } });
        continue;
      }
      const { figure, unit } = FIGURE_TEXT[item.figure];
      const change = item.change;
      rows.push({
        size: item.size,
        order,
        row: {
          condition: m.condition, mode, figure: unit ? `${figure} [${unit}]` : figure,
          change: `${sig(change.baseline)} \u2192 ${sig(change.current)} (${signedSig(change.delta)})`,
          relative: `${signedSig((change.relative ?? 0) * 100, 2)}\u202f%`,
        },
      });
    }
  });
  return rows.sort((a, b) => b.size - a.size || a.order - b.order).slice(0, limit).map((r) => r.row);
}

export function comparisonView(c: Comparison, anchorOf: (conditionId: string) => string | null, limits = COMPARISON_LIMITS): ComparisonView {
  const changed = c.findings.filter((f) => f.transition !== 'unchanged');
  const moved = c.findings
    .filter((f) => f.transition === 'unchanged' && movedMagnitude(f) > 0)
    .map((f, i) => ({ f, i, size: movedMagnitude(f) }))
    .sort((a, b) => b.size - a.size || a.i - b.i)
    .map((x) => x.f);
  const presence = (list: Comparison['findingsAdded']): PresenceRow[] =>
    list.slice(0, limits.presence).map((p) => ({ condition: p.condition, criterion: p.criterion, quantity: QUANTITY_LABEL[p.quantity], mark: verdictMark(p.verdict) }));
  const n = c.counts;
  const criteriaChanges = [
    ...(c.criteria.added.length > 0 ? [`criteria judged now but not in the baseline: ${c.criteria.added.join(', ')}`] : []),
    ...(c.criteria.removed.length > 0 ? [`criteria judged in the baseline only: ${c.criteria.removed.join(', ')}`] : []),
    ...(c.criteriaSets.added.length > 0 ? [`criteria sets added: ${c.criteriaSets.added.join(', ')}`] : []),
    ...(c.criteriaSets.removed.length > 0 ? [`criteria sets removed: ${c.criteriaSets.removed.join(', ')}`] : []),
    ...c.evidenceChanges.map((e) => `boundary evidence of ${e.criterion}: ${e.baseline} \u2192 ${e.current} (${e.findings} finding${e.findings === 1 ? '' : 's'})`),
  ];
  const presenceTotal = c.findingsAdded.length + c.findingsRemoved.length;
  const presenceShown = Math.min(c.findingsAdded.length, limits.presence) + Math.min(c.findingsRemoved.length, limits.presence);
  const condTotal = c.conditions.added.length + c.conditions.removed.length;
  const condShown = Math.min(c.conditions.added.length, limits.conditions) + Math.min(c.conditions.removed.length, limits.conditions);
  return {
    baseline: {
      date: c.baseline.generatedAt ? dateText(c.baseline.generatedAt) : 'not recorded',
      toolVersion: c.baseline.toolVersion,
      aircraft: `${c.baseline.aircraft.name}, Class ${c.baseline.aircraft.class}`,
    },
    aircraftChanged: c.aircraftChanged,
    model: c.inputs.modelChanged ? 'changed' : 'unchanged (same content)',
    criteria: c.inputs.criteriaChanged ? 'changed' : 'unchanged (same content)',
    inputs: c.inputs.files.map((f) => ({
      role: f.role,
      name: f.baselineName ? `${f.name} (was ${f.baselineName})` : f.name,
      status: STATUS[f.status],
      baselineSha: shortSha(f.baselineSha256),
      currentSha: shortSha(f.currentSha256),
    })),
    summary: [
      `\u25bc ${n.regressions} worse`,
      `\u25b2 ${n.improvements} better`,
      `= ${n.unchanged} unchanged`,
      `+ ${n.findingsAdded} new findings`,
      `\u2212 ${n.findingsRemoved} findings gone`,
      `conditions: ${c.conditions.common} in both, ${n.conditionsAdded} added, ${n.conditionsRemoved} removed`,
    ],
    conditionsAdded: c.conditions.added.slice(0, limits.conditions).map((p) => ({ id: p.id, summary: `${p.phase}: ${countsText(p.summary)}` })),
    conditionsRemoved: c.conditions.removed.slice(0, limits.conditions).map((p) => ({ id: p.id, summary: `${p.phase}: was ${countsText(p.summary)}` })),
    conditionsMore: moreText(condTotal, condShown, 'conditions added or removed'),
    transitions: changed.slice(0, limits.transitions).map((f) => transitionRow(f, anchorOf)),
    transitionsMore: moreText(changed.length, limits.transitions, 'verdict changes'),
    moved: moved.slice(0, limits.moved).map((f) => transitionRow(f, anchorOf)),
    movedMore: moreText(moved.length, limits.moved, 'figures that moved'),
    findingsAdded: presence(c.findingsAdded),
    findingsRemoved: presence(c.findingsRemoved),
    presenceMore: moreText(presenceTotal, presenceShown, 'findings added or gone'),
    criteriaChanges,
    modeChanges: modeChanges(c.modes, limits.modes),
    nothingChanged: changed.length === 0 && moved.length === 0 && presenceTotal === 0 && condTotal === 0,
  };
}
