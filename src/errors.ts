/**
 * Errors with a place. An InputError is the user's to fix (exit code 2) and carries every
 * problem found in one pass; an InternalError is a broken invariant, i.e. a bug in modalgate
 * (exit code 3).
 */
import { visible } from './visible-text.js';

export interface InputIssue {
  /** file the problem is in (as the user named it) */
  file: string;
  /** 1-based line, when the place is known */
  line?: number;
  /** 1-based column, when the place is known */
  column?: number;
  /** dotted field path, e.g. `conditions[2].lateral.derivatives.Lp` ('' for the whole file) */
  field: string;
  /** what is wrong, in words */
  message: string;
  /** what was expected, e.g. `a finite number` */
  expected?: string;
  /** what was found, e.g. `"fast"` */
  found?: string;
  /** stable short code, e.g. `invalid_type`, `shape`, `duplicate_id` */
  code: string;
}

export class InputError extends Error {
  readonly issues: InputIssue[];

  constructor(issues: InputIssue[]) {
    if (issues.length === 0) throw new InternalError('InputError raised with no issues');
    super(issues.map(formatIssue).join('\n'));
    this.name = 'InputError';
    this.issues = issues;
  }
}

export class InternalError extends Error {
  constructor(message: string) {
    super(`internal error (a bug in modalgate, please report it): ${message}`);
    this.name = 'InternalError';
  }
}

/** The same problem found twice (e.g. once per criteria set) is reported once. */
export function dedupeIssues(issues: InputIssue[]): InputIssue[] {
  const seen = new Set<string>();
  return issues.filter((i) => {
    const key = `${i.file}:${i.line}:${i.column}:${i.field}:${i.message}:${i.code}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/**
 * `file:line:col: field: message (expected X, found Y) [code]`, on one line: every part may
 * hold text from the user's files, so each is made visible (visible-text.ts) and none can
 * break the line or act on the terminal.
 */
export function formatIssue(issue: InputIssue): string {
  const place = [visible(issue.file), issue.line, issue.column].filter((p) => p !== undefined).join(':');
  const field = issue.field ? `${visible(issue.field)}: ` : '';
  const parts: string[] = [];
  if (issue.expected !== undefined) parts.push(`expected ${visible(issue.expected)}`);
  if (issue.found !== undefined) parts.push(`found ${visible(issue.found)}`);
  const detail = parts.length > 0 ? ` (${parts.join(', ')})` : '';
  return `${place}: ${field}${visible(issue.message)}${detail} [${visible(issue.code)}]`;
}

/** Render a field path the way a user reads it: `conditions[2].A[1][0]`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out;
}

/** Short, printable rendering of a found value for an error message. */
export function describeFound(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 37)}...` : value);
  if (Array.isArray(value)) return `a list of ${value.length}`;
  if (typeof value === 'object') return 'a mapping';
  return String(value);
}
