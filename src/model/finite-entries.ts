/**
 * A model built from finite inputs can still hold a non-finite entry: a mass of 5e-324 makes
 * every force derivative divided by it infinite. That is the input's fault, not a bug, so it is
 * reported at the input field most likely to blame (the written number farthest from 1 in
 * magnitude), with the matrix entry it broke. Pure.
 */
import type { StateSpace } from '../types.js';
import type { ModelProblem } from './problem.js';

type Path = (string | number)[];

/** Written numbers beyond these magnitudes are named as the likely cause. */
const TINY = 1e-150;
const HUGE = 1e150;

/** The problem with the first non-finite entry of A or B, or undefined when all are finite. */
export function nonFiniteEntry(system: StateSpace, written: unknown, path: Path): ModelProblem | undefined {
  const entry = firstNonFinite(system);
  if (entry === undefined) return undefined;
  const suspect = extremeNumber(written, path);
  const broke = `${entry.name} = ${entry.value}`;
  if (suspect) {
    return {
      path: suspect.path,
      message: `this value is too ${Math.abs(suspect.value) < 1 ? 'small' : 'large'} to compute with: the state matrices built from the condition have ${broke}`,
      expected: `a magnitude between ${TINY} and ${HUGE}`,
      found: String(suspect.value),
      code: 'out_of_range',
    };
  }
  return { path, message: `the state matrices built from these values have ${broke}: a value is out of range`, expected: 'finite matrix entries', found: String(entry.value), code: 'out_of_range' };
}

function firstNonFinite(system: StateSpace): { name: string; value: number } | undefined {
  for (const [label, matrix, columns] of [['A', system.A, system.states], ['B', system.B, system.inputs]] as const) {
    for (let i = 0; i < matrix.length; i += 1) {
      const row = matrix[i]!;
      for (let j = 0; j < row.length; j += 1) {
        if (!Number.isFinite(row[j]!)) return { name: `${label}[${system.states[i]}][${columns[j]}]`, value: row[j]! };
      }
    }
  }
  return undefined;
}

/** The written nonzero number of most extreme magnitude (outside TINY..HUGE), with its path. */
function extremeNumber(value: unknown, path: Path): { path: Path; value: number } | undefined {
  let best: { path: Path; value: number; score: number } | undefined;
  const visit = (v: unknown, at: Path) => {
    if (typeof v === 'number') {
      if (v === 0 || !Number.isFinite(v)) return;
      const m = Math.abs(v);
      if (m >= TINY && m <= HUGE) return;
      const score = Math.abs(Math.log10(m));
      if (!best || score > best.score) best = { path: at, value: v, score };
    } else if (Array.isArray(v)) v.forEach((x, i) => visit(x, [...at, i]));
    else if (v !== null && typeof v === 'object') for (const [k, x] of Object.entries(v)) visit(x, [...at, k]);
  };
  visit(value, path);
  return best ? { path: best.path, value: best.value } : undefined;
}
