/**
 * Parse YAML or JSON text and keep a way back from a field path to its line and column, so
 * that schema problems can be reported at their place. JSON is parsed with JSON.parse (fast,
 * for large sweeps); positions of values are found by a small scanner over the JSON text, and
 * only a path that does not resolve (a missing field, placed at its nearest parent) or a key
 * to point at parses the text again with `yaml`.
 */
import { isMap, isSeq, LineCounter, parseDocument, visit, type Node, type Scalar } from 'yaml';
import { InputError, type InputIssue } from '../errors.js';
import { jsonLocator } from './json-positions.js';

export interface StructuredText {
  /** the parsed value; YAML's special floats (.nan, .inf) come through as numbers */
  value: unknown;
  file: string;
  /** 1-based line and column of the value at `path`, or of its nearest existing parent */
  locate(path: readonly PropertyKey[]): { line: number; column: number } | undefined;
  /** 1-based line and column of the key of the mapping entry at `path` (for unknown fields) */
  locateKey?(path: readonly PropertyKey[]): { line: number; column: number } | undefined;
  /** `file:line:col: ...` of what the YAML reader let pass (an unknown tag: its value is read as written) */
  warnings?: string[];
}

export function parseStructuredText(text: string, file: string): StructuredText {
  const isJson = /\.json$/i.test(file);
  if (isJson) {
    let value: unknown;
    try {
      value = JSON.parse(text);
    } catch (err) {
      // Fall through to the YAML parser, which reports a place for the syntax error.
      const doc = parseWithPositions(text, file);
      if (doc.errors.length > 0) throw new InputError(doc.errors);
      throw new InputError([jsonSyntaxIssue((err as Error).message, doc, file)]);
    }
    let lazy: ReturnType<typeof parseWithPositions> | undefined;
    const fast = jsonLocator(text);
    return {
      value,
      file,
      locate: (path) => {
        const found = fast.locate(path);
        if (found) return found;
        lazy ??= parseWithPositions(text, file);
        return lazy.locate(path);
      },
      locateKey: (path) => {
        lazy ??= parseWithPositions(text, file);
        return lazy.locateKey(path);
      },
    };
  }
  const doc = parseWithPositions(text, file);
  if (doc.errors.length > 0) throw new InputError(doc.errors);
  return { value: doc.value, file, locate: doc.locate, locateKey: doc.locateKey, ...(doc.warnings.length > 0 ? { warnings: doc.warnings } : {}) };
}

function parseWithPositions(text: string, file: string) {
  const lineCounter = new LineCounter();
  const doc = parseDocument(text, { lineCounter, prettyErrors: false, uniqueKeys: true });
  const errors: InputIssue[] = doc.errors.map((e) => {
    // With prettyErrors off, yaml leaves linePos unset: place the error from its offset.
    const pos = e.linePos?.[0] ?? lineCounter.linePos(e.pos[0]);
    if (/call stack/i.test(e.message)) return nestingIssue(text, file, lineCounter);
    return {
      file,
      ...(pos ? { line: pos.line, column: pos.col } : {}),
      field: '',
      message: `not valid YAML/JSON: ${e.message.split('\n')[0]}`,
      code: 'syntax',
    };
  });
  const value: unknown = errors.length === 0 ? toValue(doc, text, file, lineCounter) : undefined;
  const warnings = doc.warnings.map((w) => {
    const pos = w.linePos?.[0] ?? lineCounter.linePos(w.pos[0]);
    const text = /^Unresolved tag/i.test(w.message) ? `${w.message.split('\n')[0]}: modalgate does not know this YAML tag; the value is read as if it were not there` : w.message.split('\n')[0];
    return `${file}:${pos.line}:${pos.col}: ${text}`;
  });
  const locate = (path: readonly PropertyKey[]) => {
    let node: unknown = doc.contents;
    let best: Node | undefined = isNode(node) ? node : undefined;
    for (const key of path) {
      if (isMap(node)) {
        const pair = node.items.find((p) => (isNode(p.key) ? (p.key as { value?: unknown }).value : p.key) === key);
        if (!pair) break;
        // Point at the value when there is one, else at the key.
        node = pair.value ?? pair.key;
        if (isNode(pair.value)) best = pair.value;
        else if (isNode(pair.key)) best = pair.key;
      } else if (isSeq(node) && typeof key === 'number') {
        const item = node.items[key];
        if (item === undefined) break;
        node = item;
        if (isNode(item)) best = item;
      } else break;
    }
    if (!best?.range) return undefined;
    const pos = lineCounter.linePos(best.range[0]);
    return { line: pos.line, column: pos.col };
  };
  const locateKey = (path: readonly PropertyKey[]) => {
    const parent = path.slice(0, -1);
    const last = path[path.length - 1];
    let node: unknown = doc.contents;
    for (const key of parent) {
      if (isMap(node)) node = node.items.find((p) => (isNode(p.key) ? (p.key as { value?: unknown }).value : p.key) === key)?.value;
      else if (isSeq(node) && typeof key === 'number') node = node.items[key];
      else return undefined;
    }
    if (!isMap(node)) return undefined;
    const pair = node.items.find((p) => (isNode(p.key) ? (p.key as { value?: unknown }).value : p.key) === last);
    if (!pair || !isNode(pair.key) || !pair.key.range) return undefined;
    const pos = lineCounter.linePos(pair.key.range[0]);
    return { line: pos.line, column: pos.col };
  };
  return { value, errors, warnings, locate, locateKey, document: doc, linePos: (offset: number) => lineCounter.linePos(offset) };
}

/**
 * Text that YAML reads but JSON.parse refuses: place the problem at the JSON parser's offset
 * when it gives one, else at the first bare word that JSON does not allow (NaN, Infinity, ...).
 */
function jsonSyntaxIssue(message: string, doc: ReturnType<typeof parseWithPositions>, file: string): InputIssue {
  const offset = /at position (\d+)/.exec(message)?.[1];
  if (offset !== undefined) {
    const pos = doc.linePos(Number(offset));
    return { file, line: pos.line, column: pos.col, field: '', message: `not valid JSON: ${message}`, code: 'syntax' };
  }
  let bare: Scalar | undefined;
  visit(doc.document, {
    Scalar(_, node) {
      if (node.type === 'PLAIN' && !/^(-?\d+(\.\d+)?([eE][+-]?\d+)?|true|false|null)$/.test(node.source ?? String(node.value))) {
        bare = node;
        return visit.BREAK;
      }
      return undefined;
    },
  });
  if (bare?.range) {
    const pos = doc.linePos(bare.range[0]);
    const word = bare.source ?? String(bare.value);
    return { file, line: pos.line, column: pos.col, field: '', message: `not valid JSON: ${word} is not a JSON value`, found: word, code: 'syntax' };
  }
  return { file, field: '', message: `not valid JSON: ${message}`, code: 'syntax' };
}

const NESTED_TOO_DEEPLY = 'lists or mappings are nested too deeply to read (a model or criteria file needs fewer than 20 levels)';
/** Brackets open at once past which the place of a too-deep nesting is shown. */
const DEEP = 64;

/**
 * Too deep a nesting, placed at the bracket that opens level DEEP + 1 (where the stack gave out
 * depends on the machine; this place does not). Quotes are not tracked: a count that never
 * reaches DEEP places the problem at the start of the file.
 */
function nestingIssue(text: string, file: string, lineCounter: LineCounter): InputIssue {
  let depth = 0;
  let at = 0;
  for (let k = 0; k < text.length; k += 1) {
    const ch = text[k];
    if (ch === '[' || ch === '{') {
      depth += 1;
      if (depth > DEEP) {
        at = k;
        break;
      }
    } else if ((ch === ']' || ch === '}') && depth > 0) depth -= 1;
  }
  const pos = lineCounter.linePos(at);
  return { file, line: pos.line, column: pos.col, field: '', message: NESTED_TOO_DEEPLY, code: 'syntax' };
}

/** Alias expansions allowed while building the value: a real file has a handful; an "alias bomb" has billions. */
const MAX_ALIAS_COUNT = 1000;

/**
 * The document's value. A document whose aliases expand without bound (an "alias bomb") or that
 * nests deeper than the stack allows is bad input, reported at its first alias or at its start.
 */
function toValue(doc: ReturnType<typeof parseDocument>, text: string, file: string, lineCounter: LineCounter): unknown {
  try {
    return doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
  } catch (err) {
    const message = String((err as Error)?.message ?? err);
    if (/alias/i.test(message)) {
      let at: { line: number; col: number } | undefined;
      visit(doc, {
        Alias(_, node) {
          if (node.range) at = lineCounter.linePos(node.range[0]);
          return visit.BREAK;
        },
      });
      throw new InputError([
        {
          file,
          ...(at ? { line: at.line, column: at.col } : {}),
          field: '',
          message: `the aliases (*name) expand to too many values (more than ${MAX_ALIAS_COUNT}); write the values out, or use fewer aliases of aliases`,
          expected: `at most ${MAX_ALIAS_COUNT} alias expansions`,
          found: 'more',
          code: 'alias_limit',
        },
      ]);
    }
    if (err instanceof RangeError) throw new InputError([nestingIssue(text, file, lineCounter)]);
    throw err;
  }
}

function isNode(x: unknown): x is Node {
  return typeof x === 'object' && x !== null && 'range' in x;
}
