/**
 * The states a channel can see: those the input reaches through the nonzero entries of A and b,
 * and, of those, the ones that reach the output through A and c. Ordering the states as
 * (unreached | reached and seen | reached, unseen) makes the model block triangular, so the
 * transfer function is that of the middle block alone, and the Rosenbrock system matrix
 * [[sI - A, -b], [c, d]] has the determinant det(sI - A_left_out) x det(middle pencil): the
 * eigenvalues of the states left out are invariant zeros that cancel poles exactly (Rosenbrock,
 * State-space and Multivariable Theory, 1970, ch. 3, decoupling zeros). Working on the middle
 * block keeps those cancellations exact instead of numerically near, and is cheaper.
 */
import type { LinearChannel } from './linear-channel.js';

export interface ChannelStates {
  /** states that take part in the input-output behaviour (ascending indices) */
  kept: number[];
  /** states the input does not reach (ascending) */
  unreached: number[];
  /** states the input reaches that do not reach the output (ascending) */
  unseen: number[];
}

export function channelStates(channel: LinearChannel): ChannelStates {
  const { n, A, b, c } = channel;
  const reached = new Array<boolean>(n).fill(false);
  const stack: number[] = [];
  for (let i = 0; i < n; i += 1) if (b[i] !== 0) {
    reached[i] = true;
    stack.push(i);
  }
  while (stack.length > 0) {
    const j = stack.pop()!;
    for (let i = 0; i < n; i += 1) if (!reached[i] && A[i * n + j] !== 0) {
      reached[i] = true;
      stack.push(i);
    }
  }
  const seen = new Array<boolean>(n).fill(false);
  for (let i = 0; i < n; i += 1) if (reached[i] && c[i] !== 0) {
    seen[i] = true;
    stack.push(i);
  }
  while (stack.length > 0) {
    const i = stack.pop()!;
    for (let j = 0; j < n; j += 1) if (reached[j] && !seen[j] && A[i * n + j] !== 0) {
      seen[j] = true;
      stack.push(j);
    }
  }
  const kept: number[] = [];
  const unreached: number[] = [];
  const unseen: number[] = [];
  for (let i = 0; i < n; i += 1) (!reached[i] ? unreached : seen[i] ? kept : unseen).push(i);
  return { kept, unreached, unseen };
}
