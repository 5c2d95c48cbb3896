/** `criteria show`: the evidence of every level and the source list, as text. */
import { describe, expect, it } from 'vitest';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import { formatCriteriaSetText } from '../../src/report/criteria-text.js';

const text = formatCriteriaSetText((await loadCriteriaSet('programme-template')).set);
const lines = text.split('\n');

describe('formatCriteriaSetText: evidence and sources', () => {
  it('gives each criterion its classes of Levels 1 / 2 / 3 in the table', () => {
    const row = lines.find((l) => l.startsWith('spiral-time-to-double-cat-c-light '));
    expect(row).toMatch(/conflicting \/ conflicting \/ memory$/);
    expect(lines.find((l) => l.startsWith('roll-time-constant-cat-b '))).toMatch(/ secondary$/);
  });

  it('counts the level boundaries by class and says what each class means', () => {
    // 51 criteria x 3 levels (33 of the classical modes, 13 of roll performance, 5 of augmented aircraft: equivalent
    // time delay per axis and two bandwidth regions); published: the template's own criterion (3 levels) and its two
    // Level 1 overrides
    expect(text).toMatch(/evidence of the 153 level boundaries: 5 published, \d+ secondary, 0 programme-set, 7 conflicting, \d+ memory/);
    expect(text).toContain('  conflicting: the sources disagree: each is listed with its value, and the evidence note says which value is kept');
  });

  it('lists the evidence of each criterion, levels with the same evidence once, with who stated it', () => {
    const at = lines.indexOf('  spiral-time-to-double-cat-c-light');
    expect(lines.slice(at, at + 6)).toEqual([
      '  spiral-time-to-double-cat-c-light',
      '    Level 1: conflicting',
      '      - textbook-tables-10, Table 10.3 (by Class, older arrangement), gives 20',
      '      - simulator-validation-notes, Table VIII (by Category), gives 12, "12 s for Categories A and C"',
      '      The stricter 20 s is kept. Read Table VIII of the 1980 document before relying on it.',
      '    Level 2: conflicting',
    ]);
    expect(lines).toContain('    Levels 1, 2, 3: secondary');
    // a criterion the template changed: its own Level 1, the parent's other levels
    const sp = lines.indexOf('  short-period-damping-cat-b');
    expect(lines.slice(sp, sp + 6)).toEqual([
      '  short-period-damping-cat-b',
      '    Level 1: published',
      '      - programme-hq-spec, 4.2.1, p. 12',
      '    Level 2: secondary (stated by mil-f-8785c)',
      '      - tu144-flight-data-report, Table 5(a), Category B, Class III, "2 / 0.20 / 2.00 / 0.20 / 0.60"',
      '    Level 3: memory (stated by mil-f-8785c)',
    ]);
  });

  it('ends with the source list of the whole chain', () => {
    const at = lines.indexOf('sources:');
    expect(at).toBeGreaterThan(0);
    expect(lines.slice(at + 1).map((l) => l.match(/^  (\S+) \((\w+), listed by ([\w-]+)\)/)?.slice(1)).filter(Boolean)).toEqual([
      ['mil-f-8785c-1980', 'primary', 'mil-f-8785c'],
      ['tu144-flight-data-report', 'reproduction', 'mil-f-8785c'],
      ['simulator-validation-notes', 'reproduction', 'mil-f-8785c'],
      ['textbook-tables-10', 'reproduction', 'mil-f-8785c'],
      ['lag-design-notes', 'reproduction', 'mil-f-8785c'],
      ['roll-rate-thesis-notes', 'reproduction', 'mil-f-8785c'],
      ['combat-flight-model-notes', 'reproduction', 'mil-f-8785c'],
      ['recalled-table-viii', 'recollection', 'mil-f-8785c'],
      ['programme-hq-spec', 'primary', 'programme-template'],
    ]);
  });
});
