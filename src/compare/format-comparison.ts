/**
 * The comparison as a terminal block. Every state is said in words and a symbol (worse, better,
 * added, removed); colour, when asked for, only repeats what the words say, so a log without
 * colour and a reader who cannot tell red from green lose nothing.
 */
import { formatSig } from '../report/format-number.js';
import type { Comparison, FindingChange, ModeFigureChange } from './compare-results.js';
import type { FigureChange } from './figure-change.js';
import { modeChangeItems, stabilityChangeText, type ModeFigure } from './mode-change-items.js';
import type { InputChange } from './input-changes.js';
import { visibleData } from '../visible-text.js';

/** Rows shown per list; a 10,000-condition sweep would otherwise flood the terminal. */
const listLimit = 25;
const modeLimit = 10;

const ansi = { red: '31', green: '32', yellow: '33', bold: '1', dim: '2' } as const;

/** Strings from the files compared are made visible first (visible-text.ts). */
export function formatComparisonText(written: Comparison, options: { color: boolean }): string {
  const c = visibleData(written);
  const paint = (code: keyof typeof ansi, text: string) => (options.color ? `\u001b[${ansi[code]}m${text}\u001b[0m` : text);
  const lines: string[] = [];
  const when = c.baseline.generatedAt ? `, run ${c.baseline.generatedAt}` : '';
  lines.push(paint('bold', `Compared with the baseline (modalgate ${c.baseline.toolVersion}${when})`));

  for (const f of c.inputs.files) lines.push(`  ${inputLine(f, paint)}`);
  if (c.inputs.files.length === 0) lines.push('  inputs: none recorded in either run');
  lines.push(`  model ${c.inputs.modelChanged ? paint('yellow', 'changed') : 'unchanged'}, criteria ${c.inputs.criteriaChanged ? paint('yellow', 'changed') : 'unchanged'}`);
  if (c.aircraftChanged) {
    const a = c.baseline.aircraft;
    lines.push(`  ${paint('yellow', '! aircraft differs')} from the baseline's ${a.name} (class ${a.class})`);
  }
  const n = c.counts;
  lines.push(`  conditions: ${c.conditions.common} in both, ${n.conditionsAdded} added, ${n.conditionsRemoved} removed`);
  lines.push(
    `  verdicts: ${paint(n.regressions > 0 ? 'red' : 'dim', `▼ ${n.regressions} worse`)}, ` +
      `${paint(n.improvements > 0 ? 'green' : 'dim', `▲ ${n.improvements} better`)}, = ${n.unchanged} unchanged, ` +
      `+ ${n.findingsAdded} new finding(s), - ${n.findingsRemoved} gone`,
  );

  const worse = c.findings.filter((f) => f.transition === 'regression');
  const better = c.findings.filter((f) => f.transition === 'improvement');
  if (worse.length > 0) {
    lines.push('', paint('red', `▼ Worse (${worse.length})`));
    lines.push(...capped(findingRows(worse, '▼', paint, 'red'), worse.length));
  }
  if (better.length > 0) {
    lines.push('', paint('green', `▲ Better (${better.length})`));
    lines.push(...capped(findingRows(better, '▲', paint, 'green'), better.length));
  }
  if (c.findingsAdded.length > 0) {
    lines.push('', `+ New findings (${c.findingsAdded.length})`);
    const rows = c.findingsAdded.map((f) => `  + ${f.condition}  ${f.criterion} ${f.quantity}: ${f.verdict}`);
    lines.push(...capped(rows, rows.length));
  }
  if (c.findingsRemoved.length > 0) {
    lines.push('', `- Findings no longer made (${c.findingsRemoved.length})`);
    const rows = c.findingsRemoved.map((f) => `  - ${f.condition}  ${f.criterion} ${f.quantity}: was ${f.verdict}`);
    lines.push(...capped(rows, rows.length));
  }
  if (c.conditions.added.length > 0) {
    lines.push('', `+ Conditions added (${c.conditions.added.length})`);
    const rows = c.conditions.added.map((p) => `  + ${p.id} (${p.phase}): ${countsText(p.summary)}`);
    lines.push(...capped(rows, rows.length));
  }
  if (c.conditions.removed.length > 0) {
    lines.push('', `- Conditions removed (${c.conditions.removed.length})`);
    const rows = c.conditions.removed.map((p) => `  - ${p.id} (${p.phase}): was ${countsText(p.summary)}`);
    lines.push(...capped(rows, rows.length));
  }
  if (c.criteria.added.length > 0) lines.push('', `+ Criteria added: ${c.criteria.added.join(', ')}`);
  if (c.criteria.removed.length > 0) lines.push('', `- Criteria removed: ${c.criteria.removed.join(', ')}`);
  if (c.criteriaSets.added.length > 0) lines.push(`+ Criteria sets added: ${c.criteriaSets.added.join(', ')}`);
  if (c.criteriaSets.removed.length > 0) lines.push(`- Criteria sets removed: ${c.criteriaSets.removed.join(', ')}`);
  if (c.evidenceChanges.length > 0) {
    lines.push('', `Boundary evidence changed (${c.evidenceChanges.length})`);
    lines.push(...c.evidenceChanges.map((e) => `  ${e.criterion}: ${e.baseline} -> ${e.current} (${e.findings} finding(s))`));
  }

  const moved = largestModeChanges(c.modes);
  if (moved.length > 0) {
    lines.push('', `Largest modal figure changes (up to ${modeLimit}, by relative change)`);
    lines.push(...moved);
  }
  if (worse.length === 0 && better.length === 0 && c.findingsAdded.length === 0 && c.findingsRemoved.length === 0) {
    lines.push('', '= No verdict changed.');
  }
  return lines.join('\n');
}

type Paint = (code: keyof typeof ansi, text: string) => string;

function inputLine(f: InputChange, paint: Paint): string {
  const short = (sha: string | null) => (sha ? sha.slice(0, 12) : '-');
  switch (f.status) {
    case 'same': return `= ${f.role} ${f.name}: same content`;
    case 'changed': return `${paint('yellow', '~')} ${f.role} ${f.name}: changed (sha256 ${short(f.baselineSha256)} -> ${short(f.currentSha256)})`;
    case 'renamed': return `= ${f.role} ${f.name}: same content as ${f.baselineName ?? 'a baseline file'} (renamed)`;
    case 'added': return `+ ${f.role} ${f.name}: not in the baseline`;
    case 'removed': return `- ${f.role} ${f.name}: only in the baseline`;
  }
}

function findingRows(list: FindingChange[], symbol: string, paint: Paint, code: keyof typeof ansi): string[] {
  const shown = list.slice(0, listLimit);
  const cells = shown.map((f) => [f.condition, `${f.criterion} ${f.quantity}`, `${f.verdict.baseline} -> ${f.verdict.current}`, `value ${figureText(f.value, f.unit)}`]);
  const widths = [0, 1, 2].map((i) => Math.max(...cells.map((row) => row[i]?.length ?? 0)));
  return cells.map((row) => `  ${paint(code, symbol)} ${row.map((cell, i) => (i < 3 ? cell.padEnd(widths[i] ?? 0) : cell)).join('  ')}`);
}

/** `0.41 -> 0.31 (-0.1, -24.4 %)`, with the unit when there is one. */
function figureText(f: FigureChange, unit: string): string {
  const u = unit && unit !== '-' ? ` ${unit}` : '';
  const head = `${formatSig(f.baseline)} -> ${formatSig(f.current)}${u}`;
  if (f.delta === null) return head;
  const sign = f.delta > 0 ? '+' : '';
  const rel = f.relative === null ? '' : `, ${f.relative > 0 ? '+' : ''}${(f.relative * 100).toFixed(1)} %`;
  return `${head} (${sign}${formatSig(f.delta)}${rel})`;
}

const FIGURE_LABEL: Record<ModeFigure, { label: string; unit: string }> = {
  naturalFrequency: { label: 'omega_n', unit: 'rad/s' },
  dampingRatio: { label: 'zeta', unit: '' },
  timeConstant: { label: 'time constant', unit: 's' },
  timeToDouble: { label: 'time to double', unit: 's' },
};

function largestModeChanges(modes: ModeFigureChange[]): string[] {
  const rows: { size: number; text: string }[] = [];
  for (const m of modes) {
    const where = `${m.condition} ${m.kind}${m.index > 0 ? ` #${m.index + 1}` : ''}`;
    if (m.presence !== 'both') {
      rows.push({ size: Number.POSITIVE_INFINITY, text: `  ${m.presence === 'added' ? '+' : '-'} ${where}: mode ${m.presence === 'added' ? 'new in this run' : 'only in the baseline'}` });
      continue;
    }
    for (const item of modeChangeItems(m)) {
      if (item.kind === 'stability') {
        rows.push({ size: item.size, text: `  ! ${where}: ${stabilityChangeText(item.to)} (was ${item.from})` });
        continue;
      }
      const { label, unit } = FIGURE_LABEL[item.figure];
      rows.push({ size: item.size, text: `  ~ ${where}: ${label} ${figureText(item.change, unit)}` });
    }
  }
  return rows
    .map((r, i) => ({ ...r, i }))
    .sort((a, b) => b.size - a.size || a.i - b.i)
    .slice(0, modeLimit)
    .map((r) => r.text);
}

function countsText(s: { pass: number; marginal: number; fail: number; not_evaluated: number }): string {
  return `${s.pass} pass, ${s.marginal} marginal, ${s.fail} fail, ${s.not_evaluated} not evaluated`;
}

/** At most listLimit rows, then how many were left out of `total`. */
function capped(rows: string[], total: number): string[] {
  const shown = rows.slice(0, listLimit);
  return total > shown.length ? [...shown, `  ... and ${total - shown.length} more`] : shown;
}
