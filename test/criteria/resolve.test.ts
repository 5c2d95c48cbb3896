/**
 * resolveCriteriaChain: inheritance, overrides by id, drops with reasons, additions, set-level
 * settings, and the defaults it records. Inline files; the numbers are arbitrary test data
 * except where a source is named.
 */
import { describe, expect, it } from 'vitest';
import { resolveCriteriaChain } from '../../src/criteria/resolve.js';
import { InputError } from '../../src/errors.js';
import { parsedFile } from './criteria-text.js';

const base = parsedFile(
  `format: modalgate-criteria/1
id: base
title: Base set
requiredLevel: 2
marginalBand: { relative: 0.1, absolute: { damping_ratio: 0.01 } }
phaseCategories: { CR: B, PA: C }
notes: Base notes.
criteria:
  - id: sp-damping
    title: Short-period damping
    mode: short_period
    quantity: damping_ratio
    applies: { categories: [B] }
    levels:
      "1": { min: 0.30, max: 2.00 }
      "2": { min: 0.20, max: 2.00 }
      "3": { min: 0.15 }
    params: { a: 1 }
    source: { document: MIL-F-8785C, paragraph: "3.2.2.1.2" }
    evidence: [{ class: memory }]
    note: Base note.
  - id: roll-tc
    title: Roll-mode time constant
    mode: roll
    quantity: time_constant
    applies: {}
    levels: { "1": { max: 1.4 }, "2": { max: 3.0 }, "3": { max: 10 } }
    source: { document: MIL-F-8785C, paragraph: "3.3.1.2" }
    evidence: [{ class: memory }]
    note: ""
`,
  'base.yaml',
);

const child = (body: string) =>
  parsedFile(`format: modalgate-criteria/1\nid: child\ntitle: Child set\nextends: base.yaml\n${body}`, 'child.yaml');

function messageOf(fn: () => unknown): string {
  try {
    fn();
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }
  throw new Error('no error');
}

describe('resolveCriteriaChain', () => {
  it('a single file resolves to itself', () => {
    const set = resolveCriteriaChain([base]);
    expect(set).toMatchObject({ id: 'base', chain: ['base'], files: ['base.yaml'], defaultRequiredLevel: 2 });
    // the absolute band of time_constant is not set in base.yaml: the default is recorded
    expect(set.notes).toEqual(['Base notes.', expect.stringMatching(/^Absolute marginal band .* time_constant 0\.05/)]);
    expect(set.marginalBand.relative).toBe(0.1);
    expect(set.criteria.map((c) => [c.id, c.set, c.source])).toEqual([
      ['sp-damping', 'base', 'MIL-F-8785C 3.2.2.1.2'],
      ['roll-tc', 'base', 'MIL-F-8785C 3.3.1.2'],
    ]);
  });

  it('an override replaces the levels it names, keeps the others, merges params and records who changed it', () => {
    const set = resolveCriteriaChain([
      base,
      child(`overrides:
  - id: sp-damping
    levels: { "1": { min: 0.4, max: 2.0 } }
    params: { b: 2 }
    note: Raised for ride quality.
`),
    ]);
    const sp = set.criteria.find((c) => c.id === 'sp-damping')!;
    expect(sp.levels).toEqual({ '1': { min: 0.4, max: 2 }, '2': { min: 0.2, max: 2 }, '3': { min: 0.15 } });
    expect(sp.params).toEqual({ a: 1, b: 2 });
    expect(sp.set).toBe('child');
    expect(sp.source).toBe('MIL-F-8785C 3.2.2.1.2 (bounds changed by set child)');
    expect(sp.note).toBe('Raised for ride quality.\n\n_Changed by set child: Level 1 bounds, params, note._');
    expect(set.criteria.find((c) => c.id === 'roll-tc')!.set).toBe('base');
  });

  it('drop keeps the reason; new criteria are added after the inherited ones', () => {
    const set = resolveCriteriaChain([
      base,
      child(`drop:
  - { id: roll-tc, reason: fly-by-wire roll command }
criteria:
  - id: own
    title: Own criterion
    mode: spiral
    quantity: time_to_double
    applies: {}
    levels: { "1": { min: 30 } }
    source: { document: Programme spec, paragraph: "2" }
    evidence: [{ class: memory }]
    note: ""
`),
    ]);
    expect(set.criteria.map((c) => c.id)).toEqual(['sp-damping', 'own']);
    expect(set.dropped).toEqual([{ id: 'roll-tc', reason: 'fly-by-wire roll command', by: 'child' }]);
  });

  it('set-level settings inherit and can be overridden; notes collect root first', () => {
    const set = resolveCriteriaChain([
      base,
      child(`requiredLevel: 1
marginalBand: { relative: 0.2 }
phaseCategories: { TO: C }
notes: Child notes.
`),
    ]);
    expect(set).toMatchObject({ id: 'child', title: 'Child set', chain: ['base', 'child'], defaultRequiredLevel: 1 });
    expect(set.marginalBand.relative).toBe(0.2);
    expect(set.marginalBand.absolute['damping_ratio']).toBe(0.01);
    expect(set.phaseCategories).toEqual({ CR: 'B', PA: 'C', TO: 'C' });
    expect(set.notes.slice(0, 2)).toEqual(['Base notes.', 'Child notes.']);
  });

  it('defaults applied are recorded in the notes, never silent', () => {
    const bare = parsedFile(
      `format: modalgate-criteria/1
id: bare
title: Bare
phaseCategories: { CR: B }
criteria:
  - id: c
    title: c
    mode: roll
    quantity: time_constant
    applies: {}
    levels: { "1": { max: 1 } }
    source: { document: d, paragraph: p }
    evidence: [{ class: memory }]
    note: ""
`,
      'bare.yaml',
    );
    const set = resolveCriteriaChain([bare]);
    expect(set.defaultRequiredLevel).toBe(1);
    expect(set.marginalBand.relative).toBe(0.1);
    expect(set.notes).toEqual([
      'No file of this criteria chain sets `requiredLevel`: Level 1 is required where the model gives no level.',
      'No file of this criteria chain sets `marginalBand.relative`: the default of 10 % of the governing boundary is used.',
      'Absolute marginal band (used where a boundary is 0) not set for time_constant: defaults time_constant 0.05 (SI units).',
    ]);
  });

  it.each([
    [
      'a new criterion reusing a parent id',
      `criteria:
  - { id: roll-tc, title: t, mode: roll, quantity: time_constant, applies: {}, levels: { "1": { max: 1 } }, source: { document: d, paragraph: p }, evidence: [{ class: memory }], note: "" }
`,
      "child.yaml:6:11: criteria[0].id: criterion 'roll-tc' is already defined by set 'base': change it under overrides (found \"roll-tc\") [duplicate_id]",
    ],
    [
      'overriding and dropping the same criterion',
      `overrides:
  - { id: roll-tc, note: x }
drop:
  - { id: roll-tc, reason: y }
`,
      "child.yaml:6:11: overrides[0].id: criterion 'roll-tc' is both overridden and dropped in this file [override_and_drop]",
    ],
    [
      'an override that loosens Level 1 past Level 2',
      `overrides:
  - id: sp-damping
    levels: { "1": { min: 0.1, max: 2.0 } }
`,
      "child.yaml:7:20: overrides[0].levels.1: criterion 'sp-damping': Level 1 minimum 0.1 is looser than the Level 2 minimum 0.2 [conflicting_bounds]",
    ],
  ])('rejects %s', (_what, body, message) => {
    expect(messageOf(() => resolveCriteriaChain([base, child(body)]))).toBe(message);
  });
});
