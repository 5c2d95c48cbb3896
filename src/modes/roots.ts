/**
 * The roots of a model, block by block, each with its participation per state and per group.
 * A complex pair is kept once (positive imaginary part): its conjugate has the same
 * participation and the conjugate eigenvector.
 */
import type { Complex } from '../types.js';
import { eigenDecompose, participation, type ComplexVector } from './eigen.js';
import { stateGroup, type StateGroup } from './subsystems.js';
import { structuralBlocks, subMatrix } from './structural-blocks.js';

export interface Root {
  /** [1/s] eigenvalue, imaginary part >= 0 */
  value: Complex;
  oscillatory: boolean;
  /** states of the structural block the root belongs to (participation elsewhere is zero) */
  states: string[];
  /** right eigenvector over `states`, in the states' SI units */
  vector: ComplexVector;
  /** participation per state of `states`, summing to 1 */
  participation: number[];
  /** participation summed per state group */
  groupShare: Record<StateGroup, number>;
  /** [1/s] bound on the rounding error of `value` (eigen.ts) */
  errorBound: number;
}

export interface RootSet {
  roots: Root[];
  /**
   * [1/s] every eigenvalue as the solver gave it, conjugates included, block by block: the
   * spectrum of A (spectrum.ts), without computing it again
   */
  values: Complex[];
  warnings: string[];
}

/** Eigenvector conditioning above which participation factors are called uncertain. */
export const CONDITIONING_LIMIT = 1e6;

/** Imaginary parts below this fraction of |lambda| are rounding, not oscillation. */
const REAL_ROOT_TOLERANCE = 1e-10;

export function collectRoots(A: readonly (readonly number[])[], states: readonly string[]): RootSet {
  const roots: Root[] = [];
  const values: Complex[] = [];
  const warnings: string[] = [];
  for (const block of structuralBlocks(A)) {
    const blockStates = block.map((i) => states[i]!);
    const groups = blockStates.map(stateGroup);
    const system = eigenDecompose(subMatrix(A, block));
    if (system.left === null || system.conditioning > CONDITIONING_LIMIT) {
      warnings.push(
        `states ${blockStates.join(', ')}: eigenvectors nearly parallel (conditioning ${
          system.left === null ? 'infinite' : system.conditioning.toExponential(1)
        }): two roots are close to coalescing, so participation factors are uncertain`,
      );
    }
    values.push(...system.values);
    for (let j = 0; j < system.n; j += 1) {
      const value = system.values[j]!;
      const oscillatory = Math.abs(value.im) > REAL_ROOT_TOLERANCE * Math.hypot(value.re, value.im);
      if (oscillatory && value.im < 0) continue;
      const share = participation(system, j);
      const groupShare: Record<StateGroup, number> = { longitudinal: 0, lateral: 0, kinematic: 0, other: 0 };
      for (let k = 0; k < share.length; k += 1) groupShare[groups[k]!] += share[k]!;
      roots.push({
        value: oscillatory ? value : { re: value.re, im: 0 },
        oscillatory,
        states: blockStates,
        vector: system.right[j]!,
        participation: share,
        groupShare,
        errorBound: system.errorBound[j]!,
      });
    }
  }
  return { roots, values, warnings };
}

/** Of a split mode's two real roots, the one with the larger real part: it governs the response. */
export function leastStable(roots: readonly Root[]): Root {
  return roots.length === 2 && roots[1]!.value.re > roots[0]!.value.re ? roots[1]! : roots[0]!;
}
