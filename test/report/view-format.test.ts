import { describe, expect, it } from 'vitest';
import { boundText, eigenvalueText, plain, sig, signedSig, unitText, withUnit } from '../../src/report/view-format.js';

// Printing conventions are common practice for engineering tables: fixed significant figures,
// a true minus sign, published limits without invented trailing zeros.
describe('sig', () => {
  it.each([
    [0.5547, 3, '0.555'],
    [2.8844, 3, '2.88'],
    [69.31, 3, '69.3'],
    [-100, 3, '\u2212100'],
    [9.996, 3, '10.0'],
    [0.0433, 3, '0.0433'],
    [0, 3, '0'],
    [1.2345e-5, 3, '1.23\u00d710\u207b\u2075'],
    [123456, 3, '1.23\u00d710\u2075'],
  ])('%d to %d figures is %s', (value, digits, text) => {
    expect(sig(value, digits)).toBe(text);
  });

  it('prints absent figures as an en dash and infinities as such', () => {
    expect(sig(null)).toBe('\u2013');
    expect(sig(Number.POSITIVE_INFINITY)).toBe('\u221e');
    expect(signedSig(0.25)).toBe('+0.250');
    expect(signedSig(-0.0096)).toBe('\u22120.00960');
  });
});

describe('bounds and units', () => {
  it('keeps published limits in their shortest form', () => {
    // MIL-F-8785C 3.2.2.1.2, Category B Level 1 band 0.30 to 2.00 (from memory)
    expect(boundText({ min: 0.3, max: 2 })).toBe('0.3 \u2026 2');
    // MIL-F-8785C 3.2.2.1.1, Category B Level 1 minimum CAP 0.085 (from memory)
    expect(boundText({ min: 0.085 })).toBe('\u2265 0.085');
    // MIL-F-8785C 3.3.1.2, roll-mode time constant Level 1 maximum 1.4 s (values seen)
    expect(boundText({ max: 1.4 })).toBe('\u2264 1.4');
    expect(boundText(undefined)).toBe('\u2013');
    expect(plain(0.0523)).toBe('0.0523');
  });

  it('spells units for print', () => {
    expect(unitText('1/(s^2 g)')).toBe('1/(s\u00b2 g)');
    expect(unitText('-')).toBe('');
    expect(withUnit(120, 'm/s', 4)).toBe('120.0\u2009m/s');
  });
});

describe('eigenvalueText', () => {
  it('shows a pair once with its positive imaginary part and real roots as they are', () => {
    // Nelson, Flight Stability and Automatic Control, 2nd ed., ch. 4: Navion short period -2.51 +/- 2.59i (from memory)
    expect(eigenvalueText([{ re: -2.51, im: 2.59 }, { re: -2.51, im: -2.59 }], 3)).toBe('\u22122.51 \u00b1 2.59i');
    // Nelson, 2nd ed., ch. 5: Navion roll -8.435 and spiral -0.0087 (seen in a reproduction)
    expect(eigenvalueText([{ re: -8.435, im: 0 }, { re: -0.0087, im: 0 }], 4)).toBe('\u22128.435, \u22120.008700');
  });
});
