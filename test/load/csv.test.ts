/**
 * The CSV reader against the rules of RFC 4180 (Shafranovich, "Common Format and MIME Type for
 * Comma-Separated Values (CSV) Files", October 2005), section 2, rule by rule, plus the byte-order
 * mark that spreadsheet programs put before UTF-8 text (Unicode Standard, section 23.8, U+FEFF;
 * common practice for CSV export). Every cell keeps its line and column number.
 */
import { describe, expect, it } from 'vitest';
import { parseCsv } from '../../src/load/csv.js';

/** Cells as text, row by row. */
const texts = (input: string) => parseCsv(input).records.map((r) => r.cells.map((c) => c.text));

describe('parseCsv: records and fields (RFC 4180, section 2)', () => {
  const cases: [string, string, string[][]][] = [
    ['rule 1: records on separate lines, LF', 'a,b\n1,2\n', [['a', 'b'], ['1', '2']]],
    ['rule 1: records on separate lines, CRLF', 'a,b\r\n1,2\r\n', [['a', 'b'], ['1', '2']]],
    ['rule 2: the last record may have no line break', 'a,b\r\n1,2', [['a', 'b'], ['1', '2']]],
    ['rule 2: no line break, a CR at the very end is a line end', 'a,b\r\n1,2\r', [['a', 'b'], ['1', '2']]],
    ['rule 4: spaces are part of a field', 'a , b\n', [['a ', ' b']]],
    ['rule 4: a comma before the line end leaves an empty last field', 'a,b,\n', [['a', 'b', '']]],
    ['rule 5: fields may be quoted', '"a","b"\n', [['a', 'b']]],
    ['rule 6: commas and line breaks inside quotes', '"x,y","line 1\nline 2"\n', [['x,y', 'line 1\nline 2']]],
    ['rule 6: CRLF inside quotes is kept', '"a\r\nb",c\r\n', [['a\r\nb', 'c']]],
    ['rule 7: a doubled quote inside quotes is one quote', '"say ""hi""",2\n', [['say "hi"', '2']]],
    ['rule 7: a field of just a doubled quote pair is empty', '"",x\n', [['', 'x']]],
    ['a byte-order mark before the header is dropped (common practice)', '\ufeffcase,V\r\nc1,58\r\n', [['case', 'V'], ['c1', '58']]],
    ['blank lines hold no record (common practice: editors leave one at the end)', 'a\n\n1\n\n', [['a'], ['1']]],
    ['ragged rows are kept as written, for the caller to report', 'a,b,c\n1,2\n1,2,3,4\n', [['a', 'b', 'c'], ['1', '2'], ['1', '2', '3', '4']]],
  ];
  it.each(cases)('%s', (_, input, expected) => {
    const table = parseCsv(input);
    expect(table.problems).toEqual([]);
    expect(texts(input)).toEqual(expected);
  });

  it('keeps the line and column number of every cell, a quoted line break moving the lines on', () => {
    const table = parseCsv('\ufeffid,note,V\r\nc1,"two\r\nlines",58\r\nc2,,60\r\n');
    expect(table.records.map((r) => r.line)).toEqual([1, 2, 4]);
    const [, second, third] = table.records;
    expect(second!.cells.map((c) => [c.line, c.column, c.quoted])).toEqual([[2, 1, false], [2, 2, true], [3, 3, false]]);
    expect(third!.cells.map((c) => [c.line, c.column])).toEqual([[4, 1], [4, 2], [4, 3]]);
  });
});

describe('parseCsv: text that breaks the rules', () => {
  const cases: [string, string, { line: number; column: number; code: string; message: string }[]][] = [
    ['a quote inside an unquoted field (rule 5: such a field has no quotes)', 'a,b\n1,2"3\n', [{ line: 2, column: 2, code: 'csv_syntax', message: 'double quote inside an unquoted cell' }]],
    ['text after a closing quote (rule 7: inner quotes are doubled)', 'a,b\n"1"x,2\n', [{ line: 2, column: 1, code: 'csv_syntax', message: 'text after the closing quote of a quoted cell' }]],
    ['a quoted field left open', 'a,b\n1,"2\n3\n', [{ line: 2, column: 2, code: 'csv_syntax', message: 'quoted cell not closed before the end of the file' }]],
  ];
  it.each(cases)('%s', (_, input, expected) => {
    expect(parseCsv(input).problems.map(({ line, column, code, message }) => ({ line, column, code, message }))).toEqual(expected);
  });

  it('resynchronises after a bad quoted cell, so that the next cells keep their columns', () => {
    const table = parseCsv('"1"x,2,3\n');
    expect(table.records[0]!.cells.map((c) => [c.text, c.column])).toEqual([['1', 1], ['2', 2], ['3', 3]]);
  });
});
