/**
 * The verdict matrix of a sweep: conditions down, numbered criteria across, one verdict per
 * cell as a symbol and a letter so that it reads in greyscale. A small sweep lists every
 * condition in file order; a large one lists only the conditions with an issue, worst first,
 * up to a cap, and says how many it left out.
 */
import type { ConditionResult, Finding, Verdict } from '../../types.js';
import { byConcern, hasIssue } from '../condition-status.js';
import { MODE_LABEL } from '../labels.js';
import type { EnvelopeMatrixView, MatrixCell, MatrixChunk, MatrixRow } from '../report-view.js';
import { verdictMark, worstVerdict } from '../verdict-marks.js';
import { lengthText, sig, unitText, withUnit } from '../view-format.js';
import { type CriterionColumn, criterionKey } from './criterion-columns.js';

export interface MatrixLimits {
  /** up to this many conditions, every one is a row */
  listAllUpTo: number;
  /** above it, at most this many rows (conditions with issues, worst first) */
  rowCap: number;
  /** numbered columns per table, so that a table fits the width of the page */
  columnsPerTable: number;
}

export const MATRIX_LIMITS: MatrixLimits = { listAllUpTo: 40, rowCap: 50, columnsPerTable: 24 };

const LETTER: Record<Verdict, string> = { pass: 'P', marginal: 'M', fail: 'F', not_evaluated: 'N' };

/** Symbol and letter of a verdict, e.g. "✗F": the pair a matrix cell shows. */
export function cellText(v: Verdict): string {
  return `${verdictMark(v).symbol}${LETTER[v]}`;
}

function cellOf(c: ConditionResult, col: CriterionColumn, byKey: Map<string, Finding[]>): MatrixCell {
  const found = byKey.get(col.key);
  if (found && found.length > 0) {
    const verdict = worstVerdict(found.map((f) => f.verdict));
    const f = found.find((x) => x.verdict === verdict) ?? found[0]!;
    const value = f.value === null ? 'no value' : `${sig(f.value)}${unitText(f.unit) ? ` ${unitText(f.unit)}` : ''}`;
    return { text: cellText(verdict), cls: verdictMark(verdict).cls, state: verdict, title: `${col.id}: ${value}, ${verdictMark(verdict).word}`, criterion: col.id };
  }
  const na = c.notApplicable.find((n) => criterionKey(n.set, n.criterion) === col.key);
  if (na) return { text: '\u00b7', cls: 'v-na', state: 'not_applicable', title: `${col.id} not applicable: ${na.reason}`, criterion: col.id };
  return { text: '', cls: 'v-unapplied', state: 'not_applied', title: '', criterion: col.id };
}

function rowOf(c: ConditionResult, anchor: string | null, columns: readonly CriterionColumn[]): MatrixRow {
  const byKey = new Map<string, Finding[]>();
  for (const f of c.findings) {
    const key = criterionKey(f.set, f.criterion);
    byKey.set(key, [...(byKey.get(key) ?? []), f]);
  }
  return {
    id: c.id,
    anchor,
    phase: c.phase,
    airspeed: withUnit(c.airspeed, 'm/s', 3),
    altitude: c.altitude === null ? '\u2013' : lengthText(c.altitude),
    cells: columns.map((col) => cellOf(c, col, byKey)),
    mark: verdictMark(worstVerdict(c.findings.map((f) => f.verdict))),
  };
}

function chunksOf(columns: readonly CriterionColumn[], rows: readonly MatrixRow[], perTable: number): MatrixChunk[] {
  const chunks: MatrixChunk[] = [];
  // Even tables rather than one full and one nearly empty.
  const size = Math.max(1, Math.ceil(columns.length / Math.max(1, Math.ceil(columns.length / perTable))));
  for (let start = 0; start < columns.length; start += size) {
    const cols = columns.slice(start, start + size);
    const groups: { label: string; span: number }[] = [];
    for (const col of cols) {
      const label = MODE_LABEL[col.mode];
      const last = groups[groups.length - 1];
      if (last && last.label === label) last.span += 1;
      else groups.push({ label, span: 1 });
    }
    chunks.push({
      groups,
      columns: cols.map((c) => ({ number: c.number, id: c.id, title: c.title })),
      rows: rows.map((r) => ({ ...r, cells: r.cells.slice(start, start + size) })),
    });
  }
  return chunks;
}

export function verdictMatrix(
  conditions: readonly ConditionResult[],
  columns: readonly CriterionColumn[],
  anchorOf: (index: number) => string | null,
  limits: MatrixLimits = MATRIX_LIMITS,
): EnvelopeMatrixView {
  let chosen: number[];
  let scope: string;
  let more: string | null = null;
  if (conditions.length <= limits.listAllUpTo) {
    chosen = conditions.map((_, i) => i);
    scope = `Every condition, in the order of the model file (${conditions.length}).`;
  } else {
    const issues = byConcern(conditions, conditions.map((_, i) => i).filter((i) => hasIssue(conditions[i]!)));
    const clean = conditions.length - issues.length;
    chosen = issues.slice(0, limits.rowCap);
    scope =
      issues.length === 0
        ? `None of the ${conditions.length} conditions has a fail, marginal or not-evaluated finding: no row to list.`
        : `Only the ${issues.length} of ${conditions.length} conditions with a fail, marginal or not-evaluated finding, worst first; ` +
          `the ${clean} whose findings all pass are not listed.`;
    if (issues.length > chosen.length) {
      more = `\u2026 and ${issues.length - chosen.length} more conditions with issues, not listed here (the worst-case table below covers every condition; the results file lists them all).`;
    }
  }
  const rows = chosen.map((i) => rowOf(conditions[i]!, anchorOf(i), columns));
  return { scope, chunks: chunksOf(columns, rows, limits.columnsPerTable), more };
}
