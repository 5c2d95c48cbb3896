/**
 * Loading criteria sets: shipped ids, extends chains, and bad files with their messages pinned
 * (file:line:col, field, message, code), every problem of a file reported at once.
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';

const bad = 'test/fixtures/criteria/bad';

async function messageOf(ref: string): Promise<string> {
  try {
    await loadCriteriaSet(ref);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }
  throw new Error(`${ref} loaded without error`);
}

describe('loadCriteriaSet: shipped sets', () => {
  it('finds a shipped set by id and hashes each file of the chain, root first', async () => {
    const { set, files } = await loadCriteriaSet('programme-template');
    expect(set.chain).toEqual(['mil-f-8785c', 'programme-template']);
    expect(files.map((f) => f.path)).toEqual(['criteria/mil-f-8785c.yaml', 'criteria/programme-template.yaml']);
    for (const f of files) expect(f.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(set.files).toEqual(files.map((f) => f.path));
  });

  it('follows an extends given as a path relative to the extending file', async () => {
    const { set, files } = await loadCriteriaSet('test/fixtures/criteria/part23-programme.yaml');
    expect(files.map((f) => f.path)).toEqual(['criteria/civil-dynamic-stability.yaml', 'test/fixtures/criteria/part23-programme.yaml']);
    expect(set.criteria.map((c) => c.id)).toEqual(['part23-dutch-roll-below-18000-ft', 'part23-dutch-roll-at-or-above-18000-ft']);
    expect(set.dropped.map((d) => [d.id, d.reason, d.by])).toEqual([
      ['part25-short-period-heavily-damped', 'Part 23 aircraft', 'part23-programme'],
      ['part25-dutch-roll-positively-damped', 'Part 23 aircraft', 'part23-programme'],
    ]);
  });

  it('accepts the civil set once the programme sets the heavily-damped threshold', async () => {
    const { set } = await loadCriteriaSet('test/fixtures/criteria/part25-programme.yaml');
    const sp = set.criteria.find((c) => c.id === 'part25-short-period-heavily-damped');
    expect(sp?.levels['1']).toEqual({ min: 0.5 });
    expect(sp?.source).toBe('Test programme specification 7.1');
    expect(sp?.set).toBe('part25-programme');
  });
});

describe('loadCriteriaSet: bad files (messages pinned)', () => {
  const cases: [name: string, ref: string, message: string][] = [
    [
      'extends cycle',
      `${bad}/cycle-a.yaml`,
      `${bad}/cycle-b.yaml:4:10: extends: extends chain has a cycle: ${bad}/cycle-a.yaml -> ${bad}/cycle-b.yaml -> ${bad}/cycle-a.yaml [extends_cycle]`,
    ],
    [
      'unknown override and drop ids (both reported)',
      `${bad}/unknown-override.yaml`,
      `${bad}/unknown-override.yaml:6:9: overrides[0].id: no criterion 'short-period-damping-cat-d' in the sets this file extends (did you mean 'short-period-damping-cat-b'?) (found "short-period-damping-cat-d") [unknown_id]\n` +
        `${bad}/unknown-override.yaml:10:9: drop[0].id: no criterion 'spiral-stability' in the sets this file extends (found "spiral-stability") [unknown_id]`,
    ],
    [
      'min above max',
      `${bad}/min-above-max.yaml`,
      `${bad}/min-above-max.yaml:11:12: criteria[0].levels.1: criterion 'sp-damping': Level 1 min 1.3 is above its max 0.35 [conflicting_bounds]`,
    ],
    [
      'Level 1 looser than Level 2 for a lower bound',
      `${bad}/level-order.yaml`,
      `${bad}/level-order.yaml:11:12: criteria[0].levels.1: criterion 'dr-damping': Level 1 minimum 0.02 is looser than the Level 2 minimum 0.08 [conflicting_bounds]`,
    ],
    [
      'missing source',
      `${bad}/missing-source.yaml`,
      `${bad}/missing-source.yaml:5:5: criteria[0].source: missing (expected a mapping, found nothing) [invalid_type]`,
    ],
    [
      'unknown quantity',
      `${bad}/unknown-quantity.yaml`,
      `${bad}/unknown-quantity.yaml:8:15: criteria[0].quantity: not one of the allowed values (expected "damping_ratio" | "natural_frequency" | "cap" | "damping_frequency_product" | "time_to_double" | "time_constant" | "time_to_bank" | "equivalent_time_delay" | "pitch_bandwidth" | "pitch_phase_delay", found "period") [invalid_value]`,
    ],
    [
      'region criterion that also gives bounds',
      `${bad}/region-and-levels.yaml`,
      `${bad}/region-and-levels.yaml:12:7: criteria[0].levels: a criterion gives \`levels\` (bounds) or \`region\` (polygons per level): exactly one of the two (found a mapping) [custom]`,
    ],
    [
      'Level 1 region reaching outside Level 2',
      `${bad}/region-not-nested.yaml`,
      `${bad}/region-not-nested.yaml:14:14: criteria[0].region.levels.1: criterion 'bw': the Level 1 vertex [2, 0.25] lies outside the Level 2 region [conflicting_bounds]`,
    ],
    [
      'heavily-damped threshold left unset (14 CFR 25.181 gives no number)',
      `${bad}/heavily-damped-unset.yaml`,
      `criteria/civil-dynamic-stability.yaml:131:19: criteria[3].levels.1.min: criterion 'part25-short-period-heavily-damped': the Level 1 min is a value the programme must set (set 'heavily-damped-unset' in ${bad}/heavily-damped-unset.yaml leaves it unset); extend the set and give it under overrides, or drop the criterion with a reason [unset_value]`,
    ],
    [
      'evidence that does not hold: wrong source kind, unknown source, values missing, a level uncovered or covered twice',
      `${bad}/evidence.yaml`,
      [
        `${bad}/evidence.yaml:38:17: criteria[1].evidence[1].levels: criterion 'sp-damping': Level 1 is covered by two evidence entries [duplicate_evidence]`,
        `${bad}/evidence.yaml:21:16: criteria[0].evidence[0].class: criterion 'dr-damping', Level 1 (published): a published boundary cites the primary document (a source of kind primary) with the page or paragraph in \`at\` [evidence]`,
        `${bad}/evidence.yaml:25:68: criteria[0].evidence[1].cites[1].source: criterion 'dr-damping', Level 2 (conflicting): cites source 'nowhere', which no source list of the chain holds (known: spec, notes, recalled) [evidence]`,
        `${bad}/evidence.yaml:25:68: criteria[0].evidence[1].cites[1].source: criterion 'dr-damping', Level 2 (conflicting): source 'nowhere' of a conflicting boundary gives no \`value\` [evidence]`,
        `${bad}/evidence.yaml:20:7: criteria[0].evidence: criterion 'dr-damping': no evidence entry covers Level 3 [missing_evidence]`,
        `${bad}/evidence.yaml:36:16: criteria[1].evidence[0].class: criterion 'sp-damping', Level 1 (secondary): a secondary boundary cites the named text it was read in (a source of kind reproduction or primary) [evidence]`,
        `${bad}/evidence.yaml:38:17: criteria[1].evidence[1].levels: criterion 'sp-damping': evidence for Level 3, which \`levels\` does not list [evidence]`,
      ].join('\n'),
    ],
    [
      'a file written with the former confidence field is told what replaced it',
      `${bad}/former-confidence.yaml`,
      `${bad}/former-confidence.yaml:9:5: overrides[0].confidence: unknown field 'confidence': it was replaced by \`evidence\` (expected evidence: a list of entries with levels, class (published | secondary | conflicting | memory | programme-set), cites and note; see DEVELOPERS.md) [unknown_field]`,
    ],
    [
      'no such file',
      `${bad}/nowhere.yaml`,
      `${bad}/nowhere.yaml: no such file: ${bad}/nowhere.yaml (shipped sets: civil-dynamic-stability, mil-f-8785c; template to copy: criteria/programme-template.yaml) [unreadable]`,
    ],
  ];
  it.each(cases)('%s', async (_name, ref, message) => {
    expect(await messageOf(ref)).toBe(message);
  });

  it('the shipped civil set on its own asks for the programme threshold', async () => {
    expect(await messageOf('civil-dynamic-stability')).toContain("criterion 'part25-short-period-heavily-damped': the Level 1 min is a value the programme must set;");
  });
});
