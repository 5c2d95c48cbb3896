/**
 * The one significant-figures rule of every output. The terminal and the review document
 * spell the parts their own way (plain ASCII there; typographic minus and superscripts here).
 */

export type SignificantParts =
  | { negative: boolean; fixed: string }
  | { negative: boolean; mantissa: string; exponent: number };

/**
 * A finite, nonzero number to `digits` significant figures: fixed notation for magnitudes
 * from 1e-3 up to 1e5, else a mantissa and a decimal exponent.
 */
export function significantParts(value: number, digits: number): SignificantParts {
  const negative = value < 0;
  const abs = Math.abs(value);
  if (abs >= 1e5 || abs < 1e-3) {
    const [mantissa, exponent] = abs.toExponential(digits - 1).split('e') as [string, string];
    return { negative, mantissa, exponent: Number(exponent) };
  }
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
  let fixed = abs.toFixed(decimals);
  // toFixed can round up to a new decade (9.996 -> "10.00"): keep the significant count.
  if (Math.floor(Math.log10(Number(fixed))) > Math.floor(Math.log10(abs)) && decimals > 0) {
    fixed = abs.toFixed(decimals - 1);
  }
  return { negative, fixed };
}
