/**
 * Number formatting for the basis sentences of an identification: three significant digits,
 * no exponent. Written out by hand because the sentences are built for every root of every
 * condition of a sweep and the general-purpose formatters dominated the analysis time.
 */
import type { Complex } from '../types.js';

const POWERS = [1, 10, 100, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/** Three significant digits, trailing zeros dropped: 3.61, 0.00876, 114, 23500. */
export function formatNumber(x: number): string {
  if (x === 0) return '0';
  if (!Number.isFinite(x)) return String(x);
  const size = Math.abs(x);
  let decimals = 2 - Math.floor(Math.log10(size));
  if (decimals < 0 || decimals >= POWERS.length) return String(Number(x.toPrecision(3)));
  let digits = Math.round(size * POWERS[decimals]!);
  if (digits >= 1000) {
    // log10 rounded down across a power of ten: one digit too many
    digits = Math.round(digits / 10);
    decimals -= 1;
  }
  while (decimals > 0 && digits % 10 === 0) {
    digits /= 10;
    decimals -= 1;
  }
  let text = String(digits);
  if (decimals < 0) text += '0'.repeat(-decimals);
  if (decimals > 0) {
    if (text.length <= decimals) text = '0'.repeat(decimals - text.length + 1) + text;
    text = `${text.slice(0, text.length - decimals)}.${text.slice(text.length - decimals)}`;
  }
  return x < 0 ? `-${text}` : text;
}

export function formatRoot(z: Complex): string {
  return z.im === 0 ? formatNumber(z.re) : `${formatNumber(z.re)} ± ${formatNumber(Math.abs(z.im))}i`;
}

/** A share in whole per cent: `92 %`. */
export function pct(share: number): string {
  return `${Math.round(share * 100)} %`;
}
