import { describe, expect, it } from 'vitest';
import { compareResults } from '../../src/compare/compare-results.js';
import { formatComparisonText } from '../../src/compare/format-comparison.js';
import type { Verdict } from '../../src/types.js';
import { condition, finding, mode, results } from './results-fixture.js';

const stripAnsi = (s: string) => s.split('\u001b[').map((part, i) => (i === 0 ? part : part.replace(/^[0-9;]*m/, ''))).join('');

function pair(before: Verdict, after: Verdict, ids = ['CR-1']) {
  const make = (v: Verdict, value: number) =>
    results({
      conditions: ids.map((id) =>
        condition({ id, modes: [mode({ kind: 'dutch_roll', naturalFrequency: value * 4, dampingRatio: value })], findings: [finding({ criterion: 'dr-zeta', mode: 'dutch_roll', verdict: v, value })] }),
      ),
    });
  // Dutch-roll damping across the MIL-F-8785C 3.3.1.1 Level 1 minimum of 0.08 (value seen).
  return compareResults(make(after, 0.06), make(before, 0.1));
}

describe('formatComparisonText', () => {
  it('says a regression in words and symbols, with the figure change', () => {
    const text = formatComparisonText(pair('pass', 'fail'), { color: false });
    expect(text).toContain('verdicts: ▼ 1 worse, ▲ 0 better, = 0 unchanged');
    expect(text).toContain('▼ Worse (1)');
    expect(text).toMatch(/▼ CR-1 {2}dr-zeta damping_ratio {2}pass -> fail {2}value 0\.100 -> 0\.0600 \(-0\.0400, -40\.0 %\)/);
    expect(text).toContain('~ CR-1 dutch_roll: omega_n 0.400 -> 0.240 rad/s (-0.160, -40.0 %)');
  });

  it('writes no escape codes without colour, and colour adds nothing but escape codes', () => {
    const c = pair('fail', 'pass');
    const plain = formatComparisonText(c, { color: false });
    const coloured = formatComparisonText(c, { color: true });
    expect(plain).not.toContain('\u001b[');
    expect(coloured).toContain('\u001b[32m');
    expect(stripAnsi(coloured)).toBe(plain);
    expect(plain).toContain('▲ Better (1)');
  });

  it('says when nothing changed', () => {
    expect(formatComparisonText(pair('pass', 'pass'), { color: false })).toContain('= No verdict changed.');
  });

  it('caps long lists and says how many were left out', () => {
    const ids = Array.from({ length: 40 }, (_, i) => `C-${i}`);
    const text = formatComparisonText(pair('pass', 'fail', ids), { color: false });
    expect(text).toContain('▼ Worse (40)');
    expect(text).toContain('  ... and 15 more');
  });

  it('names changed input files with their hashes', () => {
    const base = results();
    const now = results({ inputs: [{ role: 'model', path: '/b/model.yaml', sha256: 'cc'.repeat(32) }, base.inputs[1]!] });
    const text = formatComparisonText(compareResults(now, base), { color: false });
    expect(text).toContain(`~ model model.yaml: changed (sha256 ${'aa'.repeat(6)} -> ${'cc'.repeat(6)})`);
    expect(text).toContain('= criteria set.yaml: same content');
    expect(text).toContain('model changed, criteria unchanged');
  });

  it('says a renamed file with the same content is no change', () => {
    const base = results();
    const now = results({ inputs: [{ ...base.inputs[0]!, path: '/b/model-v2.yaml' }, base.inputs[1]!] });
    const text = formatComparisonText(compareResults(now, base), { color: false });
    expect(text).toContain('= model model-v2.yaml: same content as model.yaml (renamed)');
    expect(text).toContain('model unchanged, criteria unchanged');
  });
});
