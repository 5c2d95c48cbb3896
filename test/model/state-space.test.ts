/** Shape checks name the matrix, the expected and the found size (design rule: check shapes when a model is built). */
import { describe, expect, it } from 'vitest';
import { blockDiagonal, buildStateSpace } from '../../src/model/state-space.js';

const A2 = [[-1, 0], [0, -2]];

function problems(parts: Parameters<typeof buildStateSpace>[0]): string[] {
  const built = buildStateSpace(parts, ['s']);
  return built.ok ? [] : built.problems.map((p) => `${p.path.join('.')}: ${p.message}`);
}

describe('buildStateSpace', () => {
  it.each([
    ['A rows', { states: ['u', 'w'], A: [[-1, 0]] }, 's.A: A has 1 row, expected 2 (one per state)'],
    ['A columns', { states: ['u', 'w'], A: [[-1, 0], [0]] }, 's.A.1: A row 2 has 1 entry, expected 2 (one per state)'],
    ['B rows', { states: ['u', 'w'], A: A2, inputs: ['de'], B: [[1]] }, 's.B: B has 1 row, expected 2 (one per state)'],
    ['B columns', { states: ['u', 'w'], A: A2, inputs: ['de'], B: [[1, 2], [3, 4]] }, 's.B: B has 2 columns, expected 1 (one per input)'],
    ['one B row short', { states: ['u', 'w'], A: A2, inputs: ['de', 'dT'], B: [[1, 2], [3]] }, 's.B.1: B row 2 has 1 entry, expected 2 (one per input)'],
    ['C columns', { states: ['u', 'w'], A: A2, outputs: ['y'], C: [[1]] }, 's.C.0: C row 1 has 1 entry, expected 2 (one per state)'],
    ['D shape', { states: ['u', 'w'], A: A2, inputs: ['de'], B: [[1], [0]], outputs: ['y'], C: [[1, 0]], D: [[0], [0]] }, 's.D: D has 2 rows, expected 1 (one per output)'],
    ['B without inputs', { states: ['u', 'w'], A: A2, B: [[1], [0]] }, 's.B: B is given but no inputs are named'],
    ['inputs without B', { states: ['u', 'w'], A: A2, inputs: ['de'] }, 's.inputs: inputs are named but B is missing'],
    ['a state twice', { states: ['u', 'u'], A: A2 }, "s.states.1: state 'u' is named twice (first at position 1)"],
  ])('%s', (_, parts, message) => {
    expect(problems(parts)).toEqual([message]);
  });

  it('fills the optional matrices with the sizes they must have (no inputs, no outputs)', () => {
    const built = buildStateSpace({ states: ['u', 'w'], A: A2 }, []);
    expect(built.ok && built.value).toEqual({ states: ['u', 'w'], A: A2, inputs: [], B: [[], []], outputs: [], C: [], D: [] });
  });
});

describe('blockDiagonal', () => {
  it('puts two subsystems side by side with zero coupling, one column per distinct input', () => {
    const a = { states: ['u', 'q'], A: [[1, 2], [3, 4]], inputs: ['de', 'dT'], B: [[1, 2], [3, 4]], outputs: ['y1'], C: [[1, 0]], D: [[0, 0]] };
    const b = { states: ['p'], A: [[5]], inputs: ['da', 'dT'], B: [[6, 7]], outputs: [], C: [], D: [] };
    expect(blockDiagonal(a, b)).toEqual({
      states: ['u', 'q', 'p'],
      A: [[1, 2, 0], [3, 4, 0], [0, 0, 5]],
      inputs: ['de', 'dT', 'da'],
      B: [[1, 2, 0], [3, 4, 0], [0, 7, 6]],
      outputs: ['y1'],
      C: [[1, 0, 0]],
      D: [[0, 0, 0]],
    });
  });
});
