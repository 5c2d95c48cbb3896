/**
 * Structural blocks of a state matrix: the strongly connected components of its dependency
 * graph (state j feeds state i when A[i][j] is not exactly zero). Ordering the states block by
 * block makes A block triangular, so every eigenvalue belongs to one block and its left x right
 * eigenvector product (the participation) lies entirely in that block. Analysing the blocks
 * one by one is therefore exact, cheaper than the whole matrix, and it keeps repeated roots of
 * separate blocks (e.g. heading and position integrators, all at zero) from making the
 * eigenvector matrix of the whole model defective.
 */

/** Blocks as lists of state indices (ascending within a block), in no particular order. */
export function structuralBlocks(A: readonly (readonly number[])[]): number[][] {
  const n = A.length;
  // plain arrays: for the handful of states of a model they are cheaper to make than typed ones
  const index: number[] = new Array<number>(n).fill(-1);
  const low: number[] = new Array<number>(n).fill(0);
  const onStack: boolean[] = new Array<boolean>(n).fill(false);
  const stack: number[] = [];
  const blocks: number[][] = [];
  let counter = 0;

  // Tarjan's algorithm; the recursion depth is at most the number of states.
  const visit = (v: number): void => {
    index[v] = counter;
    low[v] = counter;
    counter += 1;
    stack.push(v);
    onStack[v] = true;
    for (let w = 0; w < n; w += 1) {
      if (w === v || A[w]![v] === 0) continue; // edge v -> w: w depends on v
      if (index[w]! < 0) {
        visit(w);
        if (low[w]! < low[v]!) low[v] = low[w]!;
      } else if (onStack[w] && index[w]! < low[v]!) {
        low[v] = index[w]!;
      }
    }
    if (low[v] === index[v]) {
      const block: number[] = [];
      let w: number;
      do {
        w = stack.pop()!;
        onStack[w] = false;
        block.push(w);
      } while (w !== v);
      block.sort((a, b) => a - b);
      blocks.push(block);
    }
  };

  for (let v = 0; v < n; v += 1) if (index[v]! < 0) visit(v);
  return blocks;
}

/** The square sub-matrix of A on the given state indices. */
export function subMatrix(A: readonly (readonly number[])[], indices: readonly number[]): number[][] {
  return indices.map((i) => indices.map((j) => A[i]![j]!));
}
