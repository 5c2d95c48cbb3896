/**
 * Text from the user's files (names, ids, notes, unknown keys, paths) on its way to a terminal
 * or a log: every character that a terminal would act on instead of showing is replaced by a
 * visible escape, so that a name cannot clear the screen, plant a link, recolour or reverse the
 * text, or print a line that looks like a summary or an error of modalgate's own.
 *
 * Escaped: the C0 controls (ESC, BEL, CR, LF, TAB, backspace, ...), DEL and the C1 controls
 * (U+0080-U+009F, 8-bit CSI and OSC among them) as `\xHH` (`\n`, `\r`, `\t` by name); the
 * bidirectional marks and overrides (U+061C, U+200E, U+200F, U+202A-U+202E, U+2066-U+2069) and
 * the line and paragraph separators (U+2028, U+2029) as `\uHHHH`. Everything else, accented
 * and non-Latin letters included, is shown as written.
 */

const UNSAFE = /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/g;

const NAMED: Record<string, string> = { '\n': '\\n', '\r': '\\r', '\t': '\\t' };

/** `text` with every control, bidirectional and separator character shown as an escape. */
export function visible(text: string): string {
  return text.replace(UNSAFE, (ch) => {
    const named = NAMED[ch];
    if (named) return named;
    const code = ch.charCodeAt(0);
    return code < 0x100 ? `\\x${code.toString(16).padStart(2, '0')}` : `\\u${code.toString(16).padStart(4, '0')}`;
  });
}

/** Each line of `text` made visible, the line breaks themselves kept (for text of several lines). */
export function visibleLines(text: string): string {
  return text.split('\n').map(visible).join('\n');
}

/** A copy of plain data (objects, arrays) with every string in it (keys too) made visible. */
export function visibleData<T>(value: T): T {
  return mapStrings(value) as T;
}

function mapStrings(value: unknown): unknown {
  if (typeof value === 'string') return visible(value);
  if (Array.isArray(value)) return value.map(mapStrings);
  if (value !== null && typeof value === 'object' && Object.getPrototypeOf(value) === Object.prototype) {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[visible(k)] = mapStrings(v);
    return out;
  }
  return value;
}
