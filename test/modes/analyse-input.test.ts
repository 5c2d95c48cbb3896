import { describe, expect, it } from 'vitest';
import { analyseModes } from '../../src/modes/analyse.js';
import { InternalError } from '../../src/errors.js';
import { stateSpace } from './navion-fixture.js';

// The model builder guarantees a well-formed StateSpace; a malformed one reaching the modal
// analysis is a bug, reported as an InternalError with the offending detail.
describe('analyseModes rejects malformed models as internal errors', () => {
  it.each([
    ['no states', stateSpace([], []), 1, /no states/],
    ['duplicate names', stateSpace(['p', 'p'], [[-1, 0], [0, -2]]), 1, /duplicate state names: p, p/],
    ['wrong A size', stateSpace(['p', 'r'], [[-1, 0]]), 1, /A must be 2 x 2 for states p, r/],
    ['non-finite entry', stateSpace(['p', 'r'], [[-1, Number.NaN], [0, -2]]), 1, /A\[p\]\[r\] is not finite/],
    ['bad airspeed', stateSpace(['p'], [[-1]]), 0, /airspeed must be a positive number of m\/s, got 0/],
  ])('%s', (_name, system, airspeed, message) => {
    expect(() => analyseModes(system, { airspeed })).toThrow(InternalError);
    expect(() => analyseModes(system, { airspeed })).toThrow(message);
  });
});
