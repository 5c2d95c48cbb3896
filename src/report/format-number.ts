/** Number formatting of the terminal tables: plain ASCII (the review document has view-format.ts). */
import { significantParts } from './significant.js';

/** `digits` significant figures, plain notation for ordinary magnitudes, '-' for null. */
export function formatSig(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined) return '-';
  if (!Number.isFinite(value)) return value > 0 ? 'inf' : value < 0 ? '-inf' : 'NaN';
  if (value === 0) return '0';
  const parts = significantParts(value, digits);
  const sign = parts.negative ? '-' : '';
  if ('fixed' in parts) return `${sign}${parts.fixed}`;
  return `${sign}${parts.mantissa}e${parts.exponent < 0 ? '' : '+'}${parts.exponent}`;
}

/** `-2.51 ± 2.59i` for a pair, `-8.43` for a real root. */
export function formatEigenvalues(eigenvalues: { re: number; im: number }[], digits = 4): string {
  const out: string[] = [];
  for (const e of eigenvalues) {
    if (e.im === 0) out.push(formatSig(e.re, digits));
    else if (e.im > 0) out.push(`${formatSig(e.re, digits)} ± ${formatSig(e.im, digits)}i`);
  }
  return out.join(', ');
}
