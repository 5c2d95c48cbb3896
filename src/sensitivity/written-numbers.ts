/**
 * The numbers of a condition as written: which of them the modes can depend on, what each is
 * called in the user's files, and the written condition with one of them changed. Pure.
 */
import { formatPath } from '../errors.js';
import type { WrittenNaming, WrittenSource } from '../types.js';

export type NumberPath = readonly (string | number)[];

export interface WrittenNumber {
  path: NumberPath;
  /** `conditions[2].lateral.derivatives.Nr`, `table.csv:14:Nr`, `conditionTable.common.lateral.Ix` */
  name: string;
  /** [file's unit] */
  value: number;
}

/**
 * Fields that never reach the state matrix or the figures computed from the modes: the
 * required level, the input, output and feedthrough matrices, cockpit controls and measured
 * responses.
 */
const NOT_DYNAMICS = new Set(['requiredLevel', 'B', 'C', 'D', 'controls', 'frequencyResponses']);

/** Every finite number of the written condition that can move a mode, in the order written. */
export function writtenNumbers(source: WrittenSource): WrittenNumber[] {
  const out: WrittenNumber[] = [];
  const walk = (node: unknown, path: (string | number)[]): void => {
    if (typeof node === 'number') {
      if (Number.isFinite(node)) out.push({ path: [...path], name: nameOf(source.naming, path), value: node });
      return;
    }
    if (Array.isArray(node)) {
      node.forEach((item, i) => walk(item, [...path, i]));
      return;
    }
    if (node === null || typeof node !== 'object') return;
    for (const [key, item] of Object.entries(node)) {
      if (NOT_DYNAMICS.has(key)) continue;
      walk(item, [...path, key]);
    }
  };
  walk(source.condition, []);
  return out;
}

/** The name of the number at `path` of the written condition, as the user finds it. */
export function nameOf(naming: WrittenNaming, path: NumberPath): string {
  if (naming.in === 'model') return formatPath([...naming.prefix, ...path]);
  const column = naming.columns.find((c) => c.path.length === path.length && c.path.every((k, i) => path[i] === k));
  if (column !== undefined) return `${naming.file}:${naming.line}:${column.header}`;
  return formatPath(['conditionTable', 'common', ...path]);
}

/** A copy of the written condition with the number at `path` replaced (only that path is copied). */
export function withNumber(condition: Record<string, unknown>, path: NumberPath, value: number): Record<string, unknown> {
  const copy = (node: unknown, depth: number): unknown => {
    if (depth === path.length) return value;
    const key = path[depth]!;
    if (Array.isArray(node)) {
      const next = [...node];
      next[key as number] = copy(node[key as number], depth + 1);
      return next;
    }
    const record = node as Record<string, unknown>;
    return { ...record, [key]: copy(record[key as string], depth + 1) };
  };
  return copy(condition, 0) as Record<string, unknown>;
}
