/**
 * Where a value sits in JSON text, found by a small scanner instead of a second full parse:
 * every condition of a large sweep gets its line and column this way, at the cost of one pass
 * over the text. Each container's children are indexed once, when first asked for. The text
 * is known to be valid JSON (JSON.parse accepted it), so the scanner only skips, never judges.
 */

export interface JsonLocator {
  /** 1-based line and column of the value at `path`, or undefined when the path does not resolve */
  locate(path: readonly PropertyKey[]): { line: number; column: number } | undefined;
}

export function jsonLocator(text: string): JsonLocator {
  const children = new Map<number, Map<string, number>>();
  let lineStarts: number[] | undefined;

  const skipSpace = (i: number): number => {
    while (i < text.length) {
      const c = text.charCodeAt(i);
      if (c !== 0x20 && c !== 0x0a && c !== 0x0d && c !== 0x09) break;
      i++;
    }
    return i;
  };

  /** Offset just past the string that opens at `i`. */
  const skipString = (i: number): number => {
    i++;
    while (i < text.length) {
      const c = text.charCodeAt(i);
      if (c === 0x5c) i += 2;
      else if (c === 0x22) return i + 1;
      else i++;
    }
    return i;
  };

  /** Offset just past the value that starts at `i` (strings and brackets matched, scalars to the next delimiter). */
  const skipValue = (i: number): number => {
    const c = text.charCodeAt(i);
    if (c === 0x22) return skipString(i);
    if (c !== 0x7b && c !== 0x5b) {
      while (i < text.length && !isDelimiter(text.charCodeAt(i))) i++;
      return i;
    }
    let depth = 0;
    while (i < text.length) {
      const d = text.charCodeAt(i);
      if (d === 0x22) {
        i = skipString(i);
        continue;
      }
      if (d === 0x7b || d === 0x5b) depth++;
      else if (d === 0x7d || d === 0x5d) {
        depth--;
        if (depth === 0) return i + 1;
      }
      i++;
    }
    return i;
  };

  /** Keys (or indices, as text) of the container opening at `start`, each with its value's offset. */
  const indexOf = (start: number): Map<string, number> => {
    const known = children.get(start);
    if (known) return known;
    const out = new Map<string, number>();
    const isObject = text.charCodeAt(start) === 0x7b;
    let i = skipSpace(start + 1);
    let index = 0;
    while (i < text.length && text[i] !== '}' && text[i] !== ']') {
      let key = String(index++);
      if (isObject) {
        const end = skipString(i);
        key = JSON.parse(text.slice(i, end)) as string;
        i = skipSpace(skipSpace(end) + 1);
      }
      out.set(key, i);
      i = skipSpace(skipValue(i));
      if (text[i] === ',') i = skipSpace(i + 1);
    }
    children.set(start, out);
    return out;
  };

  const position = (offset: number) => {
    lineStarts ??= lineStartsOf(text);
    let lo = 0;
    let hi = lineStarts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (lineStarts[mid]! <= offset) lo = mid;
      else hi = mid - 1;
    }
    return { line: lo + 1, column: offset - lineStarts[lo]! + 1 };
  };

  return {
    locate(path) {
      let at = skipSpace(0);
      for (const key of path) {
        const c = text.charCodeAt(at);
        if (c !== 0x7b && c !== 0x5b) return undefined;
        const next = indexOf(at).get(String(key));
        if (next === undefined) return undefined;
        at = next;
      }
      return position(at);
    },
  };
}

/** , } ] and JSON white space end a number, true, false or null */
function isDelimiter(c: number): boolean {
  return c === 0x2c || c === 0x7d || c === 0x5d || c === 0x20 || c === 0x0a || c === 0x0d || c === 0x09;
}

function lineStartsOf(text: string): number[] {
  const starts = [0];
  for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) starts.push(i + 1);
  return starts;
}
