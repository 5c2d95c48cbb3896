/** Turn zod's issues into InputIssues with file, line, column, expected and found. */
import type { z } from 'zod';
import { describeFound, formatPath, type InputIssue } from '../errors.js';
import type { StructuredText } from './structured-text.js';
import { valueAt } from './value-at.js';

export function issuesFromZod(error: z.ZodError, source: StructuredText): InputIssue[] {
  return error.issues.map((issue) => {
    const path = issue.path as PropertyKey[];
    const found = valueAt(source.value, path);
    const pos = source.locate(path);
    const base = { file: source.file, ...(pos ?? {}), field: formatPath(path), code: issue.code as string };
    switch (issue.code) {
      case 'invalid_type':
        return {
          ...base,
          message: found === undefined ? 'missing' : 'wrong type',
          expected: expectedWords(issue.expected as string),
          found: describeFound(found),
        };
      case 'invalid_value':
        return {
          ...base,
          message: found === undefined ? 'missing' : 'not one of the allowed values',
          expected: (issue as { values: unknown[] }).values.map((v) => JSON.stringify(v)).join(' | '),
          found: describeFound(found),
        };
      case 'unrecognized_keys': {
        // Point at the first unknown key rather than at the mapping that holds it.
        const keys = (issue as { keys: string[] }).keys;
        const keyPos = source.locateKey?.([...path, keys[0]!]) ?? pos;
        const field = keys.length === 1 ? formatPath([...path, keys[0]!]) : base.field;
        return { ...base, ...(keyPos ?? {}), field, message: `unknown field(s) ${keys.map((k) => `'${k}'`).join(', ')}`, code: 'unknown_field' };
      }
      case 'too_small':
      case 'too_big': {
        const limit = issue as unknown as { origin?: string; minimum?: number | bigint; maximum?: number | bigint; inclusive?: boolean };
        if (limit.origin === 'number') {
          const small = issue.code === 'too_small';
          const bound = small ? limit.minimum : limit.maximum;
          const op = small ? (limit.inclusive ? '>=' : '>') : (limit.inclusive ? '<=' : '<');
          return { ...base, message: small ? 'too small' : 'too large', expected: `a number ${op} ${String(bound)}`, found: describeFound(found) };
        }
        if (limit.origin === 'array' || limit.origin === 'string') {
          const small = issue.code === 'too_small';
          const bound = Number(small ? limit.minimum : limit.maximum);
          const unit = limit.origin === 'array' ? (bound === 1 ? 'item' : 'items') : bound === 1 ? 'character' : 'characters';
          return { ...base, message: small ? (limit.origin === 'array' ? 'too few items' : 'too short') : limit.origin === 'array' ? 'too many items' : 'too long', expected: `${small ? 'at least' : 'at most'} ${bound} ${unit}`, found: describeFound(found) };
        }
        return { ...base, message: issue.message, found: describeFound(found) };
      }
      default:
        return { ...base, message: issue.message, found: describeFound(found) };
    }
  });
}

function expectedWords(expected: string): string {
  switch (expected) {
    case 'number': return 'a finite number';
    case 'string': return 'text';
    case 'array': return 'a list';
    case 'object': return 'a mapping';
    default: return expected;
  }
}
