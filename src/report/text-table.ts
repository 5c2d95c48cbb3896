/** Plain-text tables for the terminal: columns padded to width, numbers right-aligned. */

export interface TextColumn {
  header: string;
  align?: 'left' | 'right';
}

/** `cells` are plain text; `decorate` may wrap a cell in colour codes after padding. */
export function textTable(
  columns: TextColumn[],
  rows: string[][],
  decorate?: (row: number, col: number, padded: string) => string,
): string {
  const widths = columns.map((c, j) => Math.max(c.header.length, ...rows.map((r) => (r[j] ?? '').length)));
  const pad = (text: string, j: number) =>
    columns[j]?.align === 'right' ? text.padStart(widths[j] ?? 0) : text.padEnd(widths[j] ?? 0);
  const lines = [
    columns.map((c, j) => pad(c.header, j)).join('  ').trimEnd(),
    widths.map((w) => '-'.repeat(w)).join('  '),
    ...rows.map((r, i) =>
      r
        .map((cell, j) => {
          const padded = pad(cell, j);
          return decorate ? decorate(i, j, padded) : padded;
        })
        .join('  ')
        .trimEnd(),
    ),
  ];
  return lines.join('\n');
}
