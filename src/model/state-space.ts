/**
 * A state-space model from its written matrices, with every shape checked and named:
 * A n x n, B n x m, C p x n, D p x m, where n, m, p count the named states, inputs, outputs.
 */
import type { StateSpace } from '../types.js';
import type { Built, ModelProblem } from './problem.js';

export interface StateSpaceParts {
  states: string[];
  A: number[][];
  inputs?: string[] | undefined;
  B?: number[][] | undefined;
  outputs?: string[] | undefined;
  C?: number[][] | undefined;
  D?: number[][] | undefined;
}

type Path = (string | number)[];

export function buildStateSpace(parts: StateSpaceParts, path: Path): Built<StateSpace> {
  const problems: ModelProblem[] = [];
  const inputs = parts.inputs ?? [];
  const outputs = parts.outputs ?? [];
  problems.push(...duplicateNames(parts.states, 'state', [...path, 'states']));
  problems.push(...duplicateNames(inputs, 'input', [...path, 'inputs']));
  problems.push(...duplicateNames(outputs, 'output', [...path, 'outputs']));

  const n = parts.states.length;
  const m = inputs.length;
  const p = outputs.length;
  problems.push(...checkShape(parts.A, 'A', n, n, 'state', 'state', [...path, 'A']));

  if (parts.B !== undefined && parts.inputs === undefined) {
    problems.push({ path: [...path, 'B'], message: 'B is given but no inputs are named', expected: 'inputs: [..] with one name per column of B', code: 'missing_names' });
  } else if (parts.B === undefined && m > 0) {
    problems.push({ path: [...path, 'inputs'], message: 'inputs are named but B is missing', expected: `B with ${n} rows and ${m} columns`, code: 'missing_matrix' });
  } else if (parts.B !== undefined) {
    problems.push(...checkShape(parts.B, 'B', n, m, 'state', 'input', [...path, 'B']));
  }

  if (parts.C !== undefined && parts.outputs === undefined) {
    problems.push({ path: [...path, 'C'], message: 'C is given but no outputs are named', expected: 'outputs: [..] with one name per row of C', code: 'missing_names' });
  } else if (parts.C === undefined && p > 0) {
    problems.push({ path: [...path, 'outputs'], message: 'outputs are named but C is missing', expected: `C with ${p} rows and ${n} columns`, code: 'missing_matrix' });
  } else if (parts.C !== undefined) {
    problems.push(...checkShape(parts.C, 'C', p, n, 'output', 'state', [...path, 'C']));
  }
  if (parts.D !== undefined) {
    if (parts.outputs === undefined) {
      problems.push({ path: [...path, 'D'], message: 'D is given but no outputs are named', expected: 'outputs: [..] with one name per row of D', code: 'missing_names' });
    } else {
      problems.push(...checkShape(parts.D, 'D', p, m, 'output', 'input', [...path, 'D']));
    }
  }
  if (problems.length > 0) return { ok: false, problems };

  return {
    ok: true,
    value: {
      states: [...parts.states],
      A: copy(parts.A),
      inputs: [...inputs],
      B: parts.B ? copy(parts.B) : zeros(n, m),
      outputs: [...outputs],
      C: parts.C ? copy(parts.C) : zeros(p, n),
      // Feedthrough is optional by contract: none written means none.
      D: parts.D ? copy(parts.D) : zeros(p, m),
    },
    notes: [],
  };
}

function checkShape(M: number[][], label: string, rows: number, cols: number, rowWhat: string, colWhat: string, path: Path): ModelProblem[] {
  if (M.length !== rows) {
    return [{ path, message: `${label} has ${M.length} ${plural(M.length, 'row')}, expected ${rows} (one per ${rowWhat})`, expected: `${rows} x ${cols}`, found: `${M.length} ${plural(M.length, 'row')}`, code: 'shape' }];
  }
  const widths = new Set(M.map((row) => row.length));
  const [width] = widths;
  if (widths.size === 1 && width !== cols && rows > 1) {
    return [{ path, message: `${label} has ${width} ${plural(width!, 'column')}, expected ${cols} (one per ${colWhat})`, expected: `${rows} x ${cols}`, found: `${rows} x ${width}`, code: 'shape' }];
  }
  const out: ModelProblem[] = [];
  M.forEach((row, i) => {
    if (row.length !== cols) {
      out.push({ path: [...path, i], message: `${label} row ${i + 1} has ${row.length} ${plural(row.length, 'entry', 'entries')}, expected ${cols} (one per ${colWhat})`, expected: `${rows} x ${cols}`, found: `${row.length} ${plural(row.length, 'entry', 'entries')}`, code: 'shape' });
    }
  });
  return out;
}

function duplicateNames(names: string[], what: string, path: Path): ModelProblem[] {
  const seen = new Map<string, number>();
  const out: ModelProblem[] = [];
  names.forEach((name, i) => {
    const first = seen.get(name);
    if (first === undefined) seen.set(name, i);
    else out.push({ path: [...path, i], message: `${what} '${name}' is named twice (first at position ${first + 1})`, expected: `unique ${what} names`, code: 'duplicate_name' });
  });
  return out;
}

function plural(k: number, one: string, many = `${one}s`): string {
  return k === 1 ? one : many;
}

export function zeros(rows: number, cols: number): number[][] {
  // A plain loop: Array.from over an array-like is several times slower, and sweeps call this often.
  const out: number[][] = [];
  for (let i = 0; i < rows; i++) out.push(new Array<number>(cols).fill(0));
  return out;
}

function copy(M: number[][]): number[][] {
  return M.map((row) => [...row]);
}

/**
 * Two subsystems side by side with zero coupling: states, inputs and outputs concatenated
 * (an input named in both keeps one column), A and C block-diagonal.
 */
export function blockDiagonal(first: StateSpace, second: StateSpace): StateSpace {
  const states = [...first.states, ...second.states];
  const inputs = [...first.inputs, ...second.inputs.filter((u) => !first.inputs.includes(u))];
  const outputs = [...first.outputs, ...second.outputs];
  const n1 = first.states.length;
  const p1 = first.outputs.length;
  const A = zeros(states.length, states.length);
  const B = zeros(states.length, inputs.length);
  const C = zeros(outputs.length, states.length);
  const D = zeros(outputs.length, inputs.length);
  const place = (part: StateSpace, rowOffset: number, outOffset: number) => {
    const col = part.inputs.map((u) => inputs.indexOf(u));
    part.A.forEach((row, i) => row.forEach((a, j) => (A[rowOffset + i]![rowOffset + j] = a)));
    part.B.forEach((row, i) => row.forEach((b, j) => (B[rowOffset + i]![col[j]!] = b)));
    part.C.forEach((row, i) => row.forEach((c, j) => (C[outOffset + i]![rowOffset + j] = c)));
    part.D.forEach((row, i) => row.forEach((d, j) => (D[outOffset + i]![col[j]!] = d)));
  };
  place(first, 0, 0);
  place(second, n1, p1);
  return { states, A, inputs, B, outputs, C, D };
}
