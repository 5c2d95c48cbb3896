/** "Did you mean": the nearest known name by edit distance, case ignored (common practice for command lines). */
import { describe, expect, it } from 'vitest';
import { closestName, didYouMean } from '../src/did-you-mean.js';

const sets = ['civil-dynamic-stability', 'mil-f-8785c', 'programme-template'];

describe('closestName', () => {
  it.each([
    ['mil-f-8875c', 'mil-f-8785c'], // two digits swapped
    ['MIL-F-8785', 'mil-f-8785c'], // case and a dropped letter
    ['civil-dynamic-stabilty', 'civil-dynamic-stability'],
    ['far-25', null], // nothing near: no guess
  ])('%s -> %s', (typed, near) => {
    expect(closestName(typed, sets)).toBe(near);
  });
  it('says nothing when the name is exact or nothing is close', () => {
    expect(didYouMean('mil-f-8785c', sets)).toBe('');
    expect(didYouMean('xyz', sets)).toBe('');
    expect(didYouMean('mil-f-8875c', sets)).toBe(" (did you mean 'mil-f-8785c'?)");
  });
});
