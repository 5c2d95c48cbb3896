/**
 * Conditions from a CSV table beside the model file (an envelope sweep: one row per flight
 * condition). Each row becomes a condition in the written form, `common` first and the row's
 * cells on top, so that it can be checked exactly like a condition written in the model file.
 * Pure: the table's text comes in, rows and problems go out. Numbers are in the model file's
 * unit system, as everywhere in the file.
 *
 * Cells: a number is read strictly (spaces around it allowed; '12abc', '', NaN, Infinity are
 * not numbers); text is taken as written, spaces around it trimmed; a boolean is `true` or
 * `false`. An empty cell leaves its field out, which is an error for a required field and
 * absence for an optional one (a missing matrix entry is an error).
 */
import { describeFound, formatPath, type InputIssue } from '../errors.js';
import type { ModelProblem } from '../model/problem.js';
import { parseCsv, type CsvCell } from './csv.js';
import { readColumns, type ColumnTarget } from './table-columns.js';
import { valueAt } from './value-at.js';

export interface ConditionTableSpec {
  file: string;
  common?: Record<string, unknown> | undefined;
  columns: Record<string, string>;
  ignore?: string[] | undefined;
}

/** Where a problem at a condition field path belongs: a table cell (or row), or the model file. */
export type RowPlace =
  | { in: 'table'; line: number; column?: number; field: string }
  | { in: 'model'; path: (string | number)[]; field: string };

export interface TableRow {
  /** the condition in the written form, as if written in the model file */
  value: Record<string, unknown>;
  /** 1-based line of the row in the table */
  line: number;
  /** fields that could not be read from a cell (already reported) */
  unreadable: (string | number)[][];
  /** defaults applied while filling the row in, for the condition's notes */
  notes: string[];
  placeOf(path: readonly (string | number)[]): RowPlace;
}

export interface TableRead {
  rows: TableRow[];
  /** problems placed in the table */
  issues: InputIssue[];
  /** problems placed in the model file, by path from its root */
  problems: ModelProblem[];
  /** the columns read into every row: the field path each fills and its header */
  columns: { path: (string | number)[]; header: string }[];
}

/** Fields every condition needs; each must come from a column or from `common`. */
const REQUIRED = ['id', 'phase', 'airspeed'];

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

export function readConditionTable(spec: ConditionTableSpec, table: { path: string; text: string }): TableRead {
  const common = spec.common ?? {};
  const file = table.path;
  const issues: InputIssue[] = [];
  const problems: ModelProblem[] = [];
  const at = (line: number, column: number | undefined, field: string, rest: Omit<InputIssue, 'file' | 'line' | 'column' | 'field'>): InputIssue => ({
    file,
    line,
    ...(column !== undefined ? { column } : {}),
    field,
    ...rest,
  });

  const columns = readColumns(spec.columns, common);
  problems.push(...columns.problems.map((p) => ({ ...p, path: ['conditionTable', 'columns', p.field] })));
  const targets = columns.targets;
  for (const key of REQUIRED) {
    if (!(key in spec.columns) && common[key] === undefined) {
      problems.push({ path: ['conditionTable', 'columns'], message: `no column and no common value for '${key}'`, expected: `columns: { ${key}: <header> } or common: { ${key}: .. }`, found: 'neither', code: 'missing_field' });
    }
  }
  for (const t of targets) {
    if (typeof t.path[t.path.length - 1] !== 'number' && valueAt(common, t.path) !== undefined) {
      problems.push({ path: ['conditionTable', 'columns', t.field], message: `'${t.field}' is given both in common and as column '${t.header}'`, expected: 'one of them', found: 'both', code: 'conflict' });
    }
  }

  const csv = parseCsv(table.text);
  for (const p of csv.problems) issues.push(at(p.line, p.column, '', p));
  const [head, ...body] = csv.records;
  if (!head) {
    issues.push(at(1, undefined, '', { message: 'the table is empty', expected: 'a header line naming the columns, then one line per condition', found: 'nothing', code: 'empty_table' }));
    return { rows: [], issues, problems, columns: [] };
  }

  // Header: every column is mapped or ignored, and every mapped header is there.
  const headerIndex = new Map<string, number>();
  const ignored = new Set(spec.ignore ?? []);
  // A header whose mapping is wrong is still mapped: its problem is reported once, at the mapping.
  const mapped = new Set(Object.values(spec.columns));
  for (const cell of head.cells) {
    const name = cell.text.trim();
    const first = headerIndex.get(name);
    if (name === '') {
      issues.push(at(cell.line, cell.column, '', { message: 'empty column header', expected: 'a header name', found: 'nothing', code: 'header' }));
    } else if (first !== undefined) {
      issues.push(at(cell.line, cell.column, '', { message: `column header '${name}' is used twice (first in column ${first + 1})`, expected: 'unique headers', found: JSON.stringify(name), code: 'header' }));
    } else {
      headerIndex.set(name, cell.column - 1);
      if (!mapped.has(name) && !ignored.has(name)) {
        issues.push(at(cell.line, cell.column, '', { message: `column '${name}' is not mapped to a condition field`, expected: 'a field in conditionTable.columns, or the header in conditionTable.ignore', found: JSON.stringify(name), code: 'unknown_column' }));
      }
    }
  }
  const missing = targets.filter((t) => !headerIndex.has(t.header));
  for (const t of missing) {
    // placed at the mapping that names it; the table's header is not echoed (it may not be a table at all)
    problems.push({ path: ['conditionTable', 'columns', t.field], message: `column '${t.header}' is not in the header of ${file}`, expected: `a column headed ${JSON.stringify(t.header)}`, found: `${headerIndex.size} other column(s)`, code: 'missing_column' });
  }
  (spec.ignore ?? []).forEach((name, i) => {
    if (!headerIndex.has(name)) {
      problems.push({ path: ['conditionTable', 'ignore', i], message: `ignored column '${name}' is not in the header of ${file}`, expected: 'a header of the table', found: JSON.stringify(name), code: 'missing_column' });
    } else if (mapped.has(name)) {
      problems.push({ path: ['conditionTable', 'ignore', i], message: `column '${name}' is both mapped and ignored`, expected: 'one of them', found: 'both', code: 'conflict' });
    }
  });

  if (body.length === 0) {
    issues.push(at(head.line, undefined, '', { message: 'the table has a header but no rows', expected: 'one line per condition after the header', found: 'nothing', code: 'empty_table' }));
  }

  const usable = targets.filter((t) => headerIndex.has(t.header)).map((t) => ({ ...t, index: headerIndex.get(t.header)! }));
  const bases = zeroBases(usable, common);
  const notes = bases.map((b) => b.note);
  const rows: TableRow[] = [];
  for (const record of body) {
    if (record.cells.length !== head.cells.length) {
      const more = record.cells.length > head.cells.length;
      issues.push(at(record.line, more ? head.cells.length + 1 : record.cells.length, '', {
        message: `row has ${record.cells.length} cells, the header ${head.cells.length}`,
        expected: `${head.cells.length} cells`,
        found: `${record.cells.length} cells`,
        code: 'ragged_row',
      }));
      continue;
    }
    const value = structuredClone(common);
    for (const base of bases) setAt(value, base.path, base.zeros.map((row) => [...row]));
    const unreadable: (string | number)[][] = [];
    for (const t of usable) {
      const cell = record.cells[t.index]!;
      const read = readCell(cell.text, t.kind);
      if (read.ok) {
        if (read.value !== undefined || typeof t.path[t.path.length - 1] === 'number') setAt(value, t.path, read.value);
        continue;
      }
      unreadable.push(t.path);
      issues.push(at(cell.line, cell.column, t.field, { message: read.message, expected: read.expected, found: describeFound(cell.text), code: read.code }));
    }
    rows.push({ value, line: record.line, unreadable, notes, placeOf: (path) => placeInRow(path, usable, record.cells, common, record.line) });
  }
  // With a mapping wrong or a column missing, every row would repeat the consequences: the
  // cells are read, the rows not checked.
  const columnsRead = usable.map((t) => ({ path: t.path, header: t.header }));
  return { rows: problems.length > 0 || missing.length > 0 ? [] : rows, issues, problems, columns: columnsRead };
}

type CellRead = { ok: true; value: number | string | boolean | undefined } | { ok: false; message: string; expected: string; code: string };

function readCell(raw: string, kind: ColumnTarget['kind']): CellRead {
  const text = raw.trim();
  if (text === '') return { ok: true, value: undefined };
  switch (kind) {
    case 'number':
      return NUMBER.test(text) ? { ok: true, value: Number(text) } : { ok: false, message: 'not a number', expected: 'a decimal number, e.g. -0.045 or 1.2e-3', code: 'not_a_number' };
    case 'boolean':
      return text === 'true' || text === 'false' ? { ok: true, value: text === 'true' } : { ok: false, message: 'not true or false', expected: 'true | false', code: 'not_a_boolean' };
    case 'text':
      return { ok: true, value: text };
  }
}

/**
 * A matrix filled in entry by entry from the table needs every other entry: from `common` when
 * the matrix is given there, else 0, and that default is noted on every condition.
 */
function zeroBases(targets: ColumnTarget[], common: Record<string, unknown>): { path: (string | number)[]; zeros: number[][]; note: string }[] {
  const byMatrix = new Map<string, { path: (string | number)[]; entries: Set<string> }>();
  for (const t of targets) {
    if (typeof t.path[t.path.length - 1] !== 'number') continue;
    const path = t.path.slice(0, -2);
    const key = path.join('.');
    const entry = byMatrix.get(key) ?? { path, entries: new Set<string>() };
    entry.entries.add(t.path.slice(-2).join(','));
    byMatrix.set(key, entry);
  }
  const out: { path: (string | number)[]; zeros: number[][]; note: string }[] = [];
  for (const { path, entries } of byMatrix.values()) {
    if (valueAt(common, path) !== undefined) continue;
    const owner = path.slice(0, -1);
    const matrix = String(path[path.length - 1]);
    const [rowsName, colsName] = ({ A: ['states', 'states'], B: ['states', 'inputs'], C: ['outputs', 'states'], D: ['outputs', 'inputs'] } as Record<string, [string, string]>)[matrix]!;
    const rows = (valueAt(common, [...owner, rowsName]) as unknown[]).length;
    const cols = (valueAt(common, [...owner, colsName]) as unknown[]).length;
    const zeros = Array.from({ length: rows }, () => new Array<number>(cols).fill(0));
    out.push({ path, zeros, note: `${formatPath(path)}: ${rows * cols - entries.size} of ${rows * cols} entries are not table columns and were taken as 0` });
  }
  return out;
}

function placeInRow(path: readonly (string | number)[], targets: (ColumnTarget & { index: number })[], cells: CsvCell[], common: Record<string, unknown>, line: number): RowPlace {
  // A problem of the whole condition (e.g. its dynamics form) belongs to the row.
  if (path.length === 0) return { in: 'table', line, field: '' };
  // The cell that wrote this field, or the field that holds it.
  let best: (ColumnTarget & { index: number }) | undefined;
  for (const t of targets) {
    if (startsWith(path, t.path) && (!best || t.path.length > best.path.length)) best = t;
  }
  if (best) {
    const cell = cells[best.index]!;
    return { in: 'table', line: cell.line, column: cell.column, field: path.length === best.path.length ? best.field : formatPath(path) };
  }
  // A field from common, or the nearest part of common that holds it.
  for (let k = path.length; k > 0; k--) {
    const prefix = path.slice(0, k);
    if (valueAt(common, prefix) !== undefined && (k === path.length || !targets.some((t) => startsWith(t.path, path)))) {
      return { in: 'model', path: ['conditionTable', 'common', ...prefix], field: formatPath(['conditionTable', 'common', ...path]) };
    }
  }
  // A part of the condition made of several cells: its first cell.
  const inside = targets.find((t) => startsWith(t.path, path));
  if (inside) {
    const cell = cells[inside.index]!;
    return { in: 'table', line: cell.line, column: cell.column, field: formatPath(path) };
  }
  return { in: 'table', line, field: formatPath(path) };
}

function startsWith(path: readonly (string | number)[], prefix: readonly (string | number)[]): boolean {
  return prefix.length <= path.length && prefix.every((k, i) => path[i] === k);
}

function setAt(root: Record<string, unknown>, path: readonly (string | number)[], value: unknown): void {
  let node: Record<string | number, unknown> = root;
  for (const [i, key] of path.slice(0, -1).entries()) {
    const next = node[key];
    if (next === null || typeof next !== 'object') node[key] = typeof path[i + 1] === 'number' ? [] : {};
    node = node[key] as Record<string | number, unknown>;
  }
  node[path[path.length - 1]!] = value;
}
