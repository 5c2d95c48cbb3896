/**
 * A frequency-response CSV file beside the model: a header row naming the columns, then one
 * row per frequency. Pure: the file's text in, the response (rad/s, dB, deg unwrapped) or
 * every problem out, each placed as file:line:column of the cell (the column as a spreadsheet
 * counts it), all at once.
 */
import { unwrapDegrees } from '../equivalent/response-samples.js';
import type { InputIssue } from '../errors.js';
import type { MeasuredResponse } from '../types.js';
import { parseCsv, type CsvCell } from './csv.js';
import type { WrittenFrequencyResponse } from './model-schema.js';

const DEG = 180 / Math.PI;

export function readFrequencyResponse(
  spec: WrittenFrequencyResponse,
  file: { path: string; text: string },
): { response: MeasuredResponse; issues: [] } | { response: null; issues: InputIssue[] } {
  const issues: InputIssue[] = [];
  const at = (line: number, column: number, field: string, message: string, expected: string, found: string, code: string) =>
    issues.push({ file: file.path, line, column, field, message, expected, found, code });
  const table = parseCsv(file.text);
  for (const p of table.problems) {
    issues.push({ file: file.path, line: p.line, column: p.column, field: 'csv', message: p.message, ...(p.expected ? { expected: p.expected } : {}), ...(p.found ? { found: p.found } : {}), code: p.code });
  }
  const [header, ...rows] = table.records;
  if (!header) {
    at(1, 1, 'header', 'the frequency-response file is empty', `a header row naming ${Object.values(spec.columns).join(', ')}`, 'nothing', 'missing');
    return { response: null, issues };
  }
  const index: Record<'frequency' | 'gain' | 'phase', number> = { frequency: -1, gain: -1, phase: -1 };
  for (const key of ['frequency', 'gain', 'phase'] as const) {
    const name = spec.columns[key];
    index[key] = header.cells.findIndex((c) => c.text.trim() === name);
    if (index[key] < 0) {
      at(header.line, 1, `columns.${key}`, `no column '${name}' in the header`, header.cells.map((c) => c.text.trim()).join(', '), name, 'unknown_column');
    }
  }
  if (issues.length > 0) return { response: null, issues };

  const frequency: number[] = [];
  const gain: number[] = [];
  const phase: number[] = [];
  let previous: { value: number; line: number } | null = null;
  for (const row of rows) {
    if (row.cells.length === 1 && row.cells[0]!.text.trim() === '') continue; // blank line
    const read = (key: 'frequency' | 'gain' | 'phase'): number | null => {
      const cell: CsvCell | undefined = row.cells[index[key]];
      const text = cell?.text.trim() ?? '';
      const value = text === '' ? NaN : Number(text);
      if (!Number.isFinite(value)) {
        at(row.line, index[key] + 1, spec.columns[key], `not a number`, `a finite number (${spec.units[key]})`, text === '' ? 'an empty cell' : JSON.stringify(text), 'not_a_number');
        return null;
      }
      return value;
    };
    const w = read('frequency');
    const g = read('gain');
    const p = read('phase');
    if (w !== null) {
      if (!(w > 0)) {
        at(row.line, index.frequency + 1, spec.columns.frequency, 'frequency must be positive', `> 0 ${spec.units.frequency}`, String(w), 'out_of_range');
      } else if (previous !== null && !(w > previous.value)) {
        at(row.line, index.frequency + 1, spec.columns.frequency, `frequencies must increase (line ${previous.line} has ${previous.value})`, `> ${previous.value} ${spec.units.frequency}`, String(w), 'not_increasing');
      } else {
        previous = { value: w, line: row.line };
      }
    }
    if (g !== null && spec.units.gain === 'ratio' && !(g > 0)) {
      at(row.line, index.gain + 1, spec.columns.gain, 'a gain ratio must be positive', '> 0', String(g), 'out_of_range');
    }
    if (w === null || g === null || p === null) continue;
    frequency.push(spec.units.frequency === 'Hz' ? 2 * Math.PI * w : w);
    gain.push(spec.units.gain === 'ratio' ? 20 * Math.log10(g) : g);
    phase.push(spec.units.phase === 'rad' ? p * DEG : p);
  }
  if (issues.length === 0 && frequency.length < 2) {
    at(header.line, 1, 'rows', 'a frequency response needs at least two rows', 'two or more rows of numbers', `${frequency.length}`, 'too_few_rows');
  }
  if (issues.length > 0) return { response: null, issues };
  return {
    response: { input: spec.input, output: spec.output, frequency, gain, phase: unwrapDegrees(phase), file: spec.file },
    issues: [],
  };
}
