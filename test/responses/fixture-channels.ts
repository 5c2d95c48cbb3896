/**
 * The channels of test/fixtures/responses/channel-fixtures.json (written by
 * make-channel-fixtures.py beside it with python-control 0.10.2 and scipy 1.17.1).
 */
import { readFileSync } from 'node:fs';
import type { Complex } from '../../src/types.js';
import { linearChannel, type LinearChannel } from '../../src/responses/linear-channel.js';

interface FixtureModel {
  states: string[];
  inputs: string[];
  A: number[][];
  B: number[][];
  outputs?: string[];
  C?: number[][];
  D?: number[][];
}

export interface FixtureChannel {
  model: string;
  input: string;
  output: string;
  identicallyZero?: true;
  zeros: Complex[];
  poles: Complex[];
  gain: number;
  omegas: number[];
  gainDb: number[];
  phaseDeg: number[];
  times: number[];
  step: number[];
}

const fixture = JSON.parse(readFileSync(new URL('../fixtures/responses/channel-fixtures.json', import.meta.url), 'utf8')) as {
  models: Record<string, FixtureModel>;
  channels: FixtureChannel[];
};

export const FIXTURE_CHANNELS = fixture.channels;
export const FIXTURE_MODELS = fixture.models;

export function channelOfFixture(f: FixtureChannel): LinearChannel {
  const m = fixture.models[f.model]!;
  const j = m.inputs.indexOf(f.input);
  const b = m.B.map((row) => row[j]!);
  let c: number[];
  let d = 0;
  if (m.outputs && m.outputs.includes(f.output)) {
    const i = m.outputs.indexOf(f.output);
    c = m.C![i]!;
    d = m.D![i]![j]!;
  } else {
    const i = m.states.indexOf(f.output);
    c = m.states.map((_, k) => (k === i ? 1 : 0));
  }
  return linearChannel(m.A, b, c, d);
}

/** Every root of `expected` matched to a distinct root of `actual` within tol x max(1, |root|). */
export function sameRoots(actual: readonly Complex[], expected: readonly Complex[], tol: number): string | null {
  if (actual.length !== expected.length) return `${actual.length} roots, expected ${expected.length}`;
  const left = [...actual];
  for (const e of expected) {
    let best = -1;
    let dist = Infinity;
    left.forEach((a, i) => {
      const dd = Math.hypot(a.re - e.re, a.im - e.im);
      if (dd < dist) {
        dist = dd;
        best = i;
      }
    });
    if (dist > tol * Math.max(1, Math.hypot(e.re, e.im))) return `no root near ${e.re} ${e.im >= 0 ? '+' : '-'} ${Math.abs(e.im)}j (nearest off by ${dist})`;
    left.splice(best, 1);
  }
  return null;
}
