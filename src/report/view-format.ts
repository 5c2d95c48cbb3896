/**
 * Number and unit presentation for the review document. Analysis hands over raw SI numbers;
 * this is the one place that decides digits, signs and unit spelling for the HTML and PDF.
 */
import type { Bound, Complex, LevelBounds } from '../types.js';
import { significantParts } from './significant.js';

const MINUS = '\u2212';
const SUPERSCRIPT: Record<string, string> = {
  '-': '\u207b', '0': '\u2070', '1': '\u00b9', '2': '\u00b2', '3': '\u00b3', '4': '\u2074',
  '5': '\u2075', '6': '\u2076', '7': '\u2077', '8': '\u2078', '9': '\u2079',
};

/** Absent or not-applicable figures print as an en dash, never as 0 or blank. */
export const NONE = '\u2013';

/**
 * `digits` significant figures with a typographic minus; very large or small magnitudes as
 * `1.23×10⁻⁵`; infinities spelled out, because a convergent mode has an infinite time to double.
 */
export function sig(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined) return NONE;
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return value > 0 ? '\u221e' : `${MINUS}\u221e`;
  if (value === 0) return '0';
  const parts = significantParts(value, digits);
  const body =
    'fixed' in parts
      ? parts.fixed
      : `${parts.mantissa}\u00d710${String(parts.exponent).split('').map((c) => SUPERSCRIPT[c] ?? c).join('')}`;
  return parts.negative ? `${MINUS}${body}` : body;
}

/**
 * Shortest form of a number to `digits` significant figures (`0.085`, `2`, `10`): for
 * published boundary values and axis ticks, where trailing zeros would claim a precision the
 * source does not have.
 */
export function plain(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined) return NONE;
  if (!Number.isFinite(value) || value === 0) return sig(value, digits);
  const abs = Math.abs(value);
  if (abs >= 1e5 || abs < 1e-3) return sig(value, digits);
  const text = String(Number(abs.toPrecision(digits)));
  return value < 0 ? `${MINUS}${text}` : text;
}

/** Like `sig`, with an explicit plus sign: margins read as "inside by" / "outside by". */
export function signedSig(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined) return NONE;
  const text = sig(value, digits);
  return value > 0 ? `+${text}` : text;
}

/** `−1.60 ± 2.40i` for a pair (positive imaginary part shown once), `−2.20` for a real root. */
export function eigenvalueText(eigenvalues: Complex[], digits = 4): string {
  const parts: string[] = [];
  for (const e of eigenvalues) {
    if (e.im === 0) parts.push(sig(e.re, digits));
    else if (e.im > 0) parts.push(`${sig(e.re, digits)} \u00b1 ${sig(e.im, digits)}i`);
  }
  return parts.length > 0 ? parts.join(', ') : NONE;
}

/** Unit strings from the results (`1/(s^2 g)`, `rad/s`, `-`) in print form. */
export function unitText(unit: string): string {
  const trimmed = unit.trim();
  if (trimmed === '' || trimmed === '-' || trimmed === '1') return '';
  return trimmed.replace(/\^2/g, '\u00b2').replace(/\^3/g, '\u00b3').replace(/\*/g, '\u00b7');
}

/** A value and its unit, with a thin space; dimensionless values stand alone. */
export function withUnit(value: number | null | undefined, unit: string, digits = 3): string {
  const text = sig(value, digits);
  const u = unitText(unit);
  return text === NONE || u === '' ? text : `${text}\u2009${u}`;
}

/** One level's bound: `0.35 … 1.30`, `≥ 0.04`, `≤ 1.4`, or an en dash when the level sets none. */
export function boundText(bound: Bound | undefined, digits = 3): string {
  if (!bound) return NONE;
  const hasMin = bound.min !== undefined;
  const hasMax = bound.max !== undefined;
  if (hasMin && hasMax) return `${plain(bound.min, digits)} \u2026 ${plain(bound.max, digits)}`;
  if (hasMin) return `\u2265 ${plain(bound.min, digits)}`;
  if (hasMax) return `\u2264 ${plain(bound.max, digits)}`;
  return NONE;
}

/** The three level columns of a findings row. */
export function levelBoundsText(bounds: LevelBounds): { l1: string; l2: string; l3: string } {
  return { l1: boundText(bounds['1']), l2: boundText(bounds['2']), l3: boundText(bounds['3']) };
}

/** `12 300 m`-style grouping is ambiguous across locales; a plain integer with a unit is not. */
export function lengthText(metres: number | null): string {
  if (metres === null) return 'not given';
  return `${Math.round(metres)}\u2009m`;
}

/** Report date from the ISO run time, in UTC so that two reviewers read the same date. */
export function dateText(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())} ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())} UTC`;
}

/**
 * The ASCII math of method notes and reasons (`omega_sp^2 / (n/alpha)`, `zeta omega_n`,
 * `|phi/beta|`) in the document's own symbols, so that no underscore name reaches the reader.
 */
export function mathText(text: string): string {
  return text
    .replace(/omega_sp/g, '\u03c9sp')
    .replace(/omega_n/g, '\u03c9n')
    .replace(/omega_d/g, '\u03c9d')
    .replace(/\bzeta\b/g, '\u03b6')
    .replace(/\bphi\b/g, '\u03c6')
    .replace(/\bbeta\b/g, '\u03b2')
    .replace(/\balpha\b/g, '\u03b1')
    .replace(/\btheta0\b/g, '\u03b80')
    .replace(/\^2\b/g, '\u00b2');
}
