/**
 * A small CSV reader after RFC 4180 (quoted fields, doubled quotes inside them, CRLF or LF
 * line ends, a line break inside a quoted field), plus a leading UTF-8 byte-order mark, which
 * spreadsheet programs write. Every cell keeps its line and its column number, so that a
 * problem in a table can be placed the way a spreadsheet shows it. Pure: text in, records out.
 * A cell's text is kept exactly as written; what it means is the caller's business.
 */

export interface CsvCell {
  text: string;
  /** true when the cell was written in double quotes */
  quoted: boolean;
  /** 1-based line the cell starts on */
  line: number;
  /** 1-based column number (the cell's position in its record) */
  column: number;
}

export interface CsvRecord {
  /** 1-based line the record starts on */
  line: number;
  cells: CsvCell[];
}

export interface CsvProblem {
  line: number;
  column: number;
  message: string;
  expected?: string;
  found?: string;
  code: string;
}

export interface CsvTable {
  records: CsvRecord[];
  problems: CsvProblem[];
}

export function parseCsv(input: string): CsvTable {
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  const records: CsvRecord[] = [];
  const problems: CsvProblem[] = [];
  let line = 1;
  let i = 0;

  while (i < text.length) {
    const record: CsvRecord = { line, cells: [] };
    for (;;) {
      const cell: CsvCell = { text: '', quoted: false, line, column: record.cells.length + 1 };
      record.cells.push(cell);
      if (text[i] === '"') {
        cell.quoted = true;
        i++;
        let closed = false;
        let out = '';
        while (i < text.length) {
          const c = text[i]!;
          if (c === '"') {
            if (text[i + 1] === '"') {
              out += '"';
              i += 2;
              continue;
            }
            i++;
            closed = true;
            break;
          }
          if (c === '\n') line++;
          out += c;
          i++;
        }
        cell.text = out;
        if (!closed) {
          problems.push({ line: cell.line, column: cell.column, message: 'quoted cell not closed before the end of the file', expected: 'a closing "', found: 'end of file', code: 'csv_syntax' });
          break;
        }
        if (i < text.length && text[i] !== ',' && text[i] !== '\n' && !(text[i] === '\r' && (text[i + 1] === '\n' || i + 1 === text.length))) {
          problems.push({ line, column: cell.column, message: 'text after the closing quote of a quoted cell', expected: 'a comma or the end of the line', found: JSON.stringify(text[i]), code: 'csv_syntax' });
          // Resynchronise at the next delimiter so that the following cells keep their columns.
          while (i < text.length && text[i] !== ',' && text[i] !== '\n') i++;
        }
      } else {
        let end = i;
        while (end < text.length && text[end] !== ',' && text[end] !== '\n') end++;
        let raw = text.slice(i, end);
        if (raw.endsWith('\r') && (end === text.length || text[end] === '\n')) raw = raw.slice(0, -1);
        const quote = raw.indexOf('"');
        if (quote >= 0) {
          problems.push({ line, column: cell.column, message: 'double quote inside an unquoted cell', expected: 'the whole cell in double quotes, with inner quotes doubled ("")', found: JSON.stringify(raw), code: 'csv_syntax' });
        }
        cell.text = raw;
        i = end;
      }
      if (text[i] === ',') {
        i++;
        continue;
      }
      if (text[i] === '\r') i++;
      if (text[i] === '\n') {
        i++;
        line++;
      }
      break;
    }
    // A blank line holds no record (RFC 4180 has none; editors leave them at the end).
    const blank = record.cells.length === 1 && !record.cells[0]!.quoted && record.cells[0]!.text === '';
    if (!blank) records.push(record);
  }
  return { records, problems };
}
