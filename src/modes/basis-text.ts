/**
 * The words of an identification's basis: which roots, how their participation splits over
 * state groups and states, how fast the mode is among its axis. Numbers have three
 * significant digits and no exponent; the formatter is written out by hand because the
 * sentences are built for every root of every condition of a sweep and the general-purpose
 * formatters dominated the analysis time. The text is plain ASCII ('+/-', not the plus-minus
 * sign): one non-ASCII character makes V8 store a whole string, and every JSON line holding
 * it, with two bytes per character, which doubled the memory of a large sweep's results.
 */
import type { Complex } from '../types.js';
import { leastStable, type Root } from './roots.js';
import type { StateGroup } from './subsystems.js';

export const GROUP_WORDS: Record<StateGroup, string> = {
  longitudinal: 'longitudinal',
  lateral: 'lateral-directional',
  kinematic: 'kinematic',
  other: 'other-state',
};

const GROUP_ORDER: readonly StateGroup[] = ['longitudinal', 'lateral', 'kinematic', 'other'];

const WHOLLY = Object.fromEntries(
  GROUP_ORDER.map((group) => [group, `100 % ${GROUP_WORDS[group]} participation`]),
) as Record<StateGroup, string>;


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
  return z.im === 0 ? formatNumber(z.re) : `${formatNumber(z.re)} +/- ${formatNumber(Math.abs(z.im))}i`;
}

/** A share in whole per cent: `92 %`. */
export function pct(share: number): string {
  return `${Math.round(share * 100)} %`;
}

/** "fastest of 3 lateral-directional modes", by characteristic frequency. */
export function frequencyRank(frequencies: readonly number[], p: number, axisWords: string): string {
  const count = frequencies.length;
  if (count === 1) return `the only ${axisWords} mode found`;
  let faster = 0;
  for (const f of frequencies) if (f > frequencies[p]!) faster += 1;
  const place = faster === 0 ? 'fastest' : faster === count - 1 ? 'slowest' : `${ordinal(faster + 1)} fastest`;
  return `${place} of ${count} ${axisWords} modes`;
}

/** |phi/beta| of the Dutch roll eigenvector, beta = v / V when the state is v. */
export function bankToSideslip(root: Root, airspeed: number): string {
  const size = (state: string): number | null => {
    const k = root.states.indexOf(state);
    return k < 0 ? null : Math.hypot(root.vector.re[k]!, root.vector.im[k]!);
  };
  const phi = size('phi');
  const beta = size('beta') ?? (size('v') === null ? null : size('v')! / airspeed);
  if (phi === null || beta === null || beta === 0) return '';
  return `; |phi/beta| ${formatNumber(phi / beta)}${root.states.includes('beta') ? '' : ` (beta = v/V, V = ${formatNumber(airspeed)} m/s)`}`;
}

export function formLabel(roots: readonly Root[]): string {
  const lead = leastStable(roots);
  if (roots.length === 2) {
    const other = lead === roots[0] ? roots[1]! : roots[0]!;
    return `two real roots (split) ${formatRoot(lead.value)}, ${formatRoot(other.value)}; shape and participation of ${formatRoot(lead.value)}`;
  }
  const z = lead.value;
  if (lead.oscillatory) return `oscillatory pair ${formatRoot(z)} (${formatNumber(magnitude(z))} rad/s)`;
  return `real root ${formatRoot(z)}`;
}

export function rootSummary(root: Root): string {
  // the (at most three) states above 10 %, largest first, without sorting every state
  let first = -1;
  let second = -1;
  let third = -1;
  const share = root.participation;
  for (let k = 0; k < share.length; k += 1) {
    const x = share[k]!;
    if (x < 0.1) continue;
    if (first < 0 || x > share[first]!) {
      third = second;
      second = first;
      first = k;
    } else if (second < 0 || x > share[second]!) {
      third = second;
      second = k;
    } else if (third < 0 || x > share[third]!) {
      third = k;
    }
  }
  let named = first < 0 ? 'none above 10 %' : `${root.states[first]} ${pct(share[first]!)}`;
  if (second >= 0) named += `, ${root.states[second]} ${pct(share[second]!)}`;
  if (third >= 0) named += `, ${root.states[third]} ${pct(share[third]!)}`;
  return `${groupSummary(root)}; dominant ${named}`;
}

export function groupSummary(root: Root): string {
  let text = '';
  // the usual case, a root wholly in one group, without formatting
  for (const group of GROUP_ORDER) if (root.groupShare[group] >= 0.995) return WHOLLY[group];
  for (const group of GROUP_ORDER) {
    const share = root.groupShare[group];
    if (share < 0.005) continue;
    text += `${text === '' ? '' : ', '}${pct(share)} ${GROUP_WORDS[group]}`;
  }
  return `${text} participation`;
}

function magnitude(z: Complex): number {
  return Math.hypot(z.re, z.im);
}

function ordinal(k: number): string {
  const tail = k % 100 >= 11 && k % 100 <= 13 ? 'th' : (['th', 'st', 'nd', 'rd'][k % 10] ?? 'th');
  return `${k}${tail}`;
}
