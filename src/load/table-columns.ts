/**
 * The `columns` mapping of a condition table: condition field path -> CSV column header.
 * A field path is written the way the field appears in a condition, dotted
 * (`longitudinal.derivatives.Xu`, `nondimensional.inertia.Ix`), and a matrix entry names its
 * row and column by state, input or output name (`stateSpace.A[u][w]`, `lateral.stateSpace.B[p][da]`),
 * never by position; the names come from the lists given in `common`.
 */
import { conditionSchema } from './model-schema.js';
import { kindOf, schemaAt } from './schema-field.js';
import { valueAt } from './value-at.js';

export interface ColumnTarget {
  /** the field path as written in `columns` */
  field: string;
  /** the CSV column header it reads */
  header: string;
  /** where the value goes in the condition, matrix indices resolved */
  path: (string | number)[];
  kind: 'number' | 'text' | 'boolean';
}

/** A problem with one entry of `columns`, by its field path as written. */
export interface ColumnProblem {
  field: string;
  message: string;
  expected?: string;
  found?: string;
  code: string;
}

/** Which names label the rows and the columns of each matrix of a state-space model. */
const MATRIX_AXES: Record<string, [string, string]> = {
  A: ['states', 'states'],
  B: ['states', 'inputs'],
  C: ['outputs', 'states'],
  D: ['outputs', 'inputs'],
};

const SEGMENT = /^([A-Za-z_][A-Za-z0-9_]*)((?:\[[^[\]]+\])*)$/;

export function readColumns(columns: Record<string, string>, common: Record<string, unknown>): { targets: ColumnTarget[]; problems: ColumnProblem[] } {
  const targets: ColumnTarget[] = [];
  const problems: ColumnProblem[] = [];
  for (const [field, header] of Object.entries(columns)) {
    const read = readTarget(field, common);
    if ('problem' in read) problems.push({ field, ...read.problem });
    else targets.push({ field, header, path: read.path, kind: read.kind });
  }
  return { targets, problems };
}

type Read = { path: (string | number)[]; kind: ColumnTarget['kind'] } | { problem: Omit<ColumnProblem, 'field'> };

function readTarget(field: string, common: Record<string, unknown>): Read {
  const keys: string[] = [];
  let indices: string[] = [];
  const segments = field.split('.');
  for (const [n, segment] of segments.entries()) {
    const m = SEGMENT.exec(segment);
    if (!m) return { problem: { message: `field path '${field}' not understood`, expected: 'names joined by dots, a matrix entry as M[row name][column name]', found: JSON.stringify(field), code: 'column_field' } };
    keys.push(m[1]!);
    const brackets = m[2] ? m[2].slice(1, -1).split('][') : [];
    if (brackets.length > 0 && n < segments.length - 1) {
      return { problem: { message: `field path '${field}': only the last part may carry [row][column]`, expected: 'M[row name][column name] at the end', found: JSON.stringify(field), code: 'column_field' } };
    }
    indices = brackets;
  }
  const schema = schemaAt(conditionSchema, keys);
  if (!schema) return { problem: { message: `no condition field '${keys.join('.')}'`, expected: 'a field of a written condition, e.g. airspeed, longitudinal.derivatives.Xu, stateSpace.A[u][w]', found: JSON.stringify(field), code: 'column_field' } };
  const kind = kindOf(schema);
  if (kind === 'matrix') return matrixEntry(field, keys, indices, common);
  if (indices.length > 0) return { problem: { message: `'${keys.join('.')}' is not a matrix`, expected: 'no [..] after a single value', found: JSON.stringify(field), code: 'column_field' } };
  if (kind === 'other') {
    return { problem: { message: `'${field}' holds a list or a mapping, which one table cell cannot`, expected: 'a single number, text or true/false; put lists (e.g. the states) in common', found: JSON.stringify(field), code: 'column_field' } };
  }
  return { path: keys, kind };
}

function matrixEntry(field: string, keys: string[], indices: string[], common: Record<string, unknown>): Read {
  const matrix = keys[keys.length - 1]!;
  const axes = MATRIX_AXES[matrix];
  if (!axes || indices.length !== 2) {
    return { problem: { message: `a matrix entry is written ${matrix}[row name][column name]`, expected: `${keys.join('.')}[row][column]`, found: JSON.stringify(field), code: 'column_field' } };
  }
  const owner = keys.slice(0, -1);
  const path: (string | number)[] = [...keys];
  for (const [k, axis] of axes.entries()) {
    const listPath = [...owner, axis];
    const names = valueAt(common, listPath);
    const where = `common.${listPath.join('.')}`;
    if (!Array.isArray(names)) {
      return { problem: { message: `${matrix} entries are named by ${axis}, but ${where} is not given`, expected: `${where}: [..] in conditionTable.common`, found: 'nothing', code: 'column_field' } };
    }
    const index = names.indexOf(indices[k]);
    if (index < 0) {
      return { problem: { message: `'${indices[k]}' is not one of the ${axis} in ${where}`, expected: names.map(String).join(', '), found: JSON.stringify(indices[k]), code: 'column_field' } };
    }
    path.push(index);
  }
  return { path, kind: 'number' };
}

