/**
 * Evidence of the shipped boundaries: every boundary read in a text names a source its set
 * lists; the values changed after checking them against their sources are pinned with those
 * sources; the values no retrievable text gives stay `memory` and the set's notes list them;
 * a programme's override states the evidence of its new value or is shown as programme-set.
 *
 * Sources (ids of the shipped source lists): tu144-flight-data-report = T. J. Curry, NASA
 * contractor report on the Tu-144 flight data, Tables 5-7 (MIL-STD-1797A recommended values);
 * simulator-validation-notes = notes quoting the 1980 MIL-F-8785C; textbook-tables-10 = a
 * textbook reprint of the tables, laid out the older way (by Class for the spiral).
 */
import { describe, expect, it } from 'vitest';
import { checkSourceIdsAgree } from '../../src/criteria/evidence.js';
import { resolveCriteriaChain } from '../../src/criteria/resolve.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import type { Evidence, ResolvedCriteriaSet } from '../../src/types.js';
import { parsedFile } from './criteria-text.js';

const shipped: [name: string, set: ResolvedCriteriaSet][] = [
  ['mil-f-8785c', (await loadCriteriaSet('mil-f-8785c')).set],
  ['programme-template', (await loadCriteriaSet('programme-template')).set],
  // the civil set resolves only once a programme sets the heavily-damped threshold
  ['civil-dynamic-stability (Part 23 use)', (await loadCriteriaSet('test/fixtures/criteria/part23-programme.yaml')).set],
  ['civil-dynamic-stability (Part 25 use)', (await loadCriteriaSet('test/fixtures/criteria/part25-programme.yaml')).set],
];
const mil = shipped[0]![1];

function criterion(set: ResolvedCriteriaSet, id: string) {
  const c = set.criteria.find((x) => x.id === id);
  if (!c) throw new Error(`no criterion ${id}`);
  return c;
}

function allEvidence(set: ResolvedCriteriaSet): [where: string, e: Evidence][] {
  return set.criteria.flatMap((c) => [
    ...(['1', '2', '3'] as const).map((k): [string, Evidence] => [`${c.id} Level ${k}`, c.evidence[k]]),
    ...c.paramEvidence.map((p): [string, Evidence] => [`${c.id} params ${p.params.join(',')}`, p]),
  ]);
}

describe('shipped sets: every boundary read in a text names a source the set lists', () => {
  it.each(shipped)('%s', (_name, set) => {
    const kinds = new Map(set.sources.map((s) => [s.id, s.kind]));
    for (const [where, e] of allEvidence(set)) {
      for (const cite of e.cites) expect(kinds.has(cite.source), `${where} cites ${cite.source}`).toBe(true);
      if (e.class === 'secondary') {
        expect(e.cites.some((c) => kinds.get(c.source) !== 'recollection'), where).toBe(true);
      }
      if (e.class === 'published') {
        expect(e.cites.some((c) => kinds.get(c.source) === 'primary' && c.at !== undefined), where).toBe(true);
      }
      if (e.class === 'conflicting') {
        expect(e.cites.length, where).toBeGreaterThanOrEqual(2);
        for (const c of e.cites) expect(c.value, `${where}: ${c.source}`).toBeDefined();
      }
    }
  });

  it('the military set has no published boundary: only its cover page was retrieved', () => {
    expect(allEvidence(mil).filter(([, e]) => e.class === 'published')).toEqual([]);
    expect(mil.sources.find((s) => s.id === 'mil-f-8785c-1980')).toMatchObject({ kind: 'primary' });
  });

  it('the civil rules are published: read in the regulation text at the paragraph cited (14 CFR 23.181, 25.181)', () => {
    const part23 = shipped[2]![1];
    expect(criterion(part23, 'part23-dutch-roll-below-18000-ft').evidence['1']).toMatchObject({
      class: 'published',
      cites: [{ source: 'cfr-14-23-181', at: '23.181(b)(1)' }],
    });
    // Levels 2 and 3 hold the Level 1 bounds, and so its evidence
    const c = criterion(part23, 'part23-dutch-roll-at-or-above-18000-ft');
    expect(c.evidence['3']).toBe(c.evidence['1']);
  });
});

describe('values changed after checking them against their sources', () => {
  it('Dutch-roll zeta omega_n, Level 1, Category C, Classes II-L and III: 0.10 rad/s (tu144 Table 7(b))', () => {
    const c = criterion(mil, 'dutch-roll-damping-frequency-cat-c-heavy');
    expect(c.applies).toEqual({ categories: ['C'], classes: ['II-L', 'III'] });
    expect(c.levels['1']).toEqual({ min: 0.1 });
    expect(c.evidence['1']).toMatchObject({
      class: 'secondary',
      cites: [{ source: 'tu144-flight-data-report', at: 'Table 7(b), Class III, Category C', quote: '1 / 0.08 / 0.10 / 0.4' }],
    });
    // Category B and the light classes of Category C keep 0.15 (tu144 Table 7(a); textbook Table 10.2)
    expect(criterion(mil, 'dutch-roll-damping-frequency-cat-b').levels['1']).toEqual({ min: 0.15 });
    expect(criterion(mil, 'dutch-roll-damping-frequency-cat-c-light').levels['1']).toEqual({ min: 0.15 });
    expect(mil.criteria.some((x) => x.id === 'dutch-roll-damping-frequency-cat-b-c')).toBe(false);
  });

  it.each(['spiral-time-to-double-cat-c-light', 'spiral-time-to-double-heavy-cat-a-c'])(
    '%s, Level 1: 20 s kept against 12 s, conflicting, both sources named (Table VIII)',
    (id) => {
      const e = criterion(mil, id).evidence['1'];
      expect(e.class).toBe('conflicting');
      expect(e.cites.map((c) => [c.source, c.value])).toEqual([
        ['textbook-tables-10', 20],
        ['simulator-validation-notes', 12],
      ]);
      expect(criterion(mil, id).levels['1']).toEqual({ min: 20 });
    },
  );

  it('spiral Category B keeps 20 s at Level 1, secondary: the two sources agree', () => {
    for (const id of ['spiral-time-to-double-cat-b-light', 'spiral-time-to-double-heavy-cat-b']) {
      expect(criterion(mil, id).levels['1']).toEqual({ min: 20 });
      expect(criterion(mil, id).evidence['1']).toMatchObject({ class: 'secondary', cites: [{ source: 'simulator-validation-notes', at: 'Table VIII' }, { source: 'textbook-tables-10' }] });
    }
  });

  it('spiral Level 2: 12 s kept against a recollection of 8 s, conflicting', () => {
    for (const c of mil.criteria.filter((x) => x.mode === 'spiral')) {
      expect(c.levels['2'], c.id).toEqual({ min: 12 });
      expect(c.evidence['2'].class).toBe('conflicting');
      expect(c.evidence['2'].cites.map((x) => [x.source, x.value])).toEqual([
        ['textbook-tables-10', 12],
        ['recalled-table-viii', 8],
      ]);
    }
    expect(mil.sources.find((s) => s.id === 'recalled-table-viii')?.kind).toBe('recollection');
  });

  it('where sources disagree on a minimum, the strictest value cited is the one kept', () => {
    for (const c of mil.criteria) {
      for (const k of ['1', '2', '3'] as const) {
        const e = c.evidence[k];
        if (e.class !== 'conflicting') continue;
        const values = e.cites.map((x) => x.value).filter((v): v is number => typeof v === 'number');
        const bound = c.levels[k];
        if (bound?.min !== undefined) expect(bound.min, `${c.id} Level ${k}`).toBe(Math.max(...values));
        if (bound?.max !== undefined) expect(bound.max, `${c.id} Level ${k}`).toBe(Math.min(...values));
      }
    }
  });

  it('the set notes say which values a programme should confirm first', () => {
    const notes = mil.notes.join('\n');
    expect(notes).toMatch(/confirm in the document first/);
    expect(notes).toMatch(/Spiral minimum time to double, Level 1/);
    expect(notes).toMatch(/Level 2: 12 s kept; one recollection of the 1980 table\s+gives 8 s/);
    expect(notes).toMatch(/Classes II-L and III: 0\.10 rad\/s/);
  });
});

describe('values no retrievable text gives stay memory, and are listed', () => {
  it('short-period Level 3 minimum 0.15', () => {
    for (const id of ['short-period-damping-cat-a-c', 'short-period-damping-cat-b']) {
      expect(criterion(mil, id).levels['3']).toEqual({ min: 0.15 });
      expect(criterion(mil, id).evidence['3'].class).toBe('memory');
    }
  });

  it('Class IV Category A Dutch-roll damping 0.4 in CO and GA', () => {
    const c = criterion(mil, 'dutch-roll-damping-cat-a-co-ga-class-iv');
    expect(c.levels['1']).toEqual({ min: 0.4 });
    expect(c.evidence['1'].class).toBe('memory');
  });

  it('the omega_n^2 |phi/beta| rise and the Class III zeta cap', () => {
    for (const c of mil.criteria.filter((x) => x.quantity === 'damping_frequency_product' && x.mode === 'dutch_roll')) {
      expect(c.paramEvidence.map((p) => [p.class, p.params])).toEqual([
        ['memory', ['phiBetaThreshold', 'phiBetaK1', 'phiBetaK2', 'phiBetaK3', 'zetaCap', 'zetaCapClasses']],
      ]);
    }
  });

  it('the coupled roll-spiral limits', () => {
    const c = criterion(mil, 'roll-spiral-coupling');
    expect([c.evidence['1'].class, c.evidence['2'].class, c.evidence['3'].class]).toEqual(['memory', 'memory', 'memory']);
  });

  it('roll performance: Class III Table IXf read in notes quoting the document, Classes I, II and IV recalled (3.3.4)', () => {
    // Table IXf as quoted in roll-rate-thesis-notes (3.3.4.2, p. 30), time to a 30 deg bank change, the strictest
    // speed range kept: Level 1 A 1.5, B 2.0, C 2.5 s; Level 2 A 2.0, B 3.3, C 4.0 s; Level 3 A 3.0, B 5.0, C 6.0 s
    const rows = mil.criteria.filter((c) => c.quantity === 'time_to_bank');
    expect(rows.length).toBeGreaterThan(0);
    for (const c of rows) {
      const classes = [c.evidence['1'].class, c.evidence['2'].class, c.evidence['3'].class];
      if (c.applies.classes?.includes('III')) {
        expect(c.applies.classes, c.id).toEqual(['III']);
        expect(classes, c.id).toEqual(['secondary', 'secondary', 'secondary']);
        for (const k of ['1', '2', '3'] as const) expect(c.evidence[k].cites.map((x) => x.source)).toEqual(['roll-rate-thesis-notes']);
      } else {
        expect(classes, c.id).toEqual(['memory', 'memory', 'memory']);
      }
    }
    const iii = (cat: string) => rows.find((c) => c.applies.classes?.includes('III') && c.applies.categories?.includes(cat as 'A'))!.levels;
    expect(iii('A')).toEqual({ '1': { max: 1.5 }, '2': { max: 2 }, '3': { max: 3 } });
    expect(iii('B')).toEqual({ '1': { max: 2 }, '2': { max: 3.3 }, '3': { max: 5 } });
    expect(iii('C')).toEqual({ '1': { max: 2.5 }, '2': { max: 4 }, '3': { max: 6 } });
  });

  it('the set notes list them', () => {
    const notes = mil.notes.join('\n');
    for (const words of [/short-period Level 3 minimum\s+damping \(0\.15\)/, /Class IV Category A Dutch-roll damping in CO and GA \(0\.4\)/, /\|phi\/beta\| rise/, /coupled\s+roll-spiral limits/, /roll performance of Classes I, II\s+and IV/]) {
      expect(notes).toMatch(words);
    }
  });
});

describe('a programme that changes a value says its evidence, or it is shown as programme-set', () => {
  const base = parsedFile(
    `format: modalgate-criteria/1
id: base
title: Base
sources:
  - { id: spec, kind: primary, title: The specification }
  - { id: reprint, kind: reproduction, title: A reprint }
criteria:
  - id: dr-damping
    title: Dutch-roll damping
    mode: dutch_roll
    quantity: damping_ratio
    applies: {}
    levels: { "1": { min: 0.08 }, "2": { min: 0.02 }, "3": { min: 0 } }
    params: { k: 1 }
    source: { document: Spec, paragraph: "3" }
    evidence:
      - levels: [1, 2]
        class: secondary
        cites: [{ source: reprint, at: Table 2 }]
      - levels: [3]
        class: memory
      - params: [k]
        class: memory
    note: ""
`,
    'base.yaml',
  );
  const child = (body: string) => parsedFile(`format: modalgate-criteria/1\nid: prog\ntitle: Programme\nextends: base.yaml\n${body}`, 'prog.yaml');

  it('an override without evidence: the changed level is programme-set, the others keep theirs, and the set notes say so', () => {
    const set = resolveCriteriaChain([base, child(`overrides:\n  - id: dr-damping\n    levels: { "1": { min: 0.12 } }\n    params: { k: 2 }\n`)]);
    const c = set.criteria[0]!;
    expect(c.evidence['1']).toMatchObject({ class: 'programme-set', cites: [], by: 'prog' });
    expect(c.evidence['2']).toMatchObject({ class: 'secondary', by: 'base' });
    expect(c.evidence['3'].class).toBe('memory');
    expect(c.paramEvidence).toEqual([expect.objectContaining({ class: 'programme-set', params: ['k'], by: 'prog' })]);
    expect(set.notes).toContain('Set prog changes Level 1 bounds, parameter k of criterion dr-damping without stating evidence: shown as programme-set.');
  });

  it('an override with evidence: its class and sources, which may be its own', () => {
    const set = resolveCriteriaChain([
      base,
      child(`sources:
  - { id: prog-spec, kind: primary, title: Programme specification }
overrides:
  - id: dr-damping
    levels: { "1": { min: 0.12 } }
    evidence:
      - class: published
        cites: [{ source: prog-spec, at: "4.3.1, p. 15" }]
`),
    ]);
    const c = set.criteria[0]!;
    expect(c.evidence['1']).toMatchObject({ class: 'published', cites: [{ source: 'prog-spec', at: '4.3.1, p. 15' }], by: 'prog' });
    expect(c.evidence['2'].class).toBe('secondary');
    expect(set.sources.map((s) => [s.id, s.set])).toEqual([['spec', 'base'], ['reprint', 'base'], ['prog-spec', 'prog']]);
    expect(set.notes.some((n) => n.includes('programme-set'))).toBe(false);
  });

  it('evidence alone restates the parent values, e.g. once read in the primary document', () => {
    const set = resolveCriteriaChain([
      base,
      child(`overrides:
  - id: dr-damping
    evidence:
      - levels: [3]
        class: published
        cites: [{ source: spec, at: p. 21 }]
`),
    ]);
    const c = set.criteria[0]!;
    expect(c.levels['3']).toEqual({ min: 0 });
    expect(c.evidence['3']).toMatchObject({ class: 'published', by: 'prog' });
    expect(c.evidence['1']).toMatchObject({ class: 'secondary', by: 'base' });
  });

  it('a source id listed twice in the chain is an error at its place', () => {
    expect(() => resolveCriteriaChain([base, child(`sources:\n  - { id: spec, kind: primary, title: Another }\n`)])).toThrow(
      "prog.yaml:6:11: sources[0].id: source id 'spec' is already listed by set 'base': cite it, or give this source an id of its own (found \"spec\") [duplicate_id]",
    );
  });

  it('the shipped programme template states the evidence of every value it changes', () => {
    const set = shipped[1]![1];
    expect(set.notes.some((n) => n.includes('programme-set'))).toBe(false);
    expect(criterion(set, 'short-period-damping-cat-b').evidence['1']).toMatchObject({ class: 'published', cites: [{ source: 'programme-hq-spec' }] });
    expect(criterion(set, 'short-period-damping-cat-b').evidence['2']).toMatchObject({ class: 'secondary', by: 'mil-f-8785c' });
  });

  it('the Part 25 fixture sets the heavily-damped number without evidence: programme-set', () => {
    const set = shipped[3]![1];
    expect(criterion(set, 'part25-short-period-heavily-damped').evidence['1'].class).toBe('programme-set');
  });
});

describe('sets checked together', () => {
  const set = (id: string, title: string) =>
    resolveCriteriaChain([
      parsedFile(
        `format: modalgate-criteria/1
id: ${id}
title: ${id}
sources: [{ id: spec, kind: primary, title: ${title} }]
criteria:
  - { id: c, title: t, mode: roll, quantity: time_constant, applies: {}, levels: { "1": { max: 1 } }, source: { document: d, paragraph: p }, evidence: [{ class: published, cites: [{ source: spec, at: p. 1 }] }], note: "" }
`,
        `${id}.yaml`,
      ),
    ]);

  it('may share a source list (the same set reached twice, or the same entry)', () => {
    expect(() => checkSourceIdsAgree([mil, shipped[1]![1]])).not.toThrow();
  });

  it('may not give one id to two different sources: findings cite by id', () => {
    expect(() => checkSourceIdsAgree([set('one', 'Spec A'), set('two', 'Spec B')])).toThrow(
      "two.yaml: sources: source id 'spec' of set 'two' names another source than in set 'one' (criteria one), checked in the same run: give one of them an id of its own [duplicate_id]",
    );
  });
});
