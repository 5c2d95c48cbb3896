/** Eigenvalues only, block by block (see structural-blocks.ts for why blocks are exact). */
import type { Complex } from '../types.js';
import { eigenvalues } from './eigen.js';
import { structuralBlocks, subMatrix } from './structural-blocks.js';

export function spectrum(A: readonly (readonly number[])[]): Complex[] {
  const out: Complex[] = [];
  for (const block of structuralBlocks(A)) out.push(...eigenvalues(subMatrix(A, block)));
  return out;
}
