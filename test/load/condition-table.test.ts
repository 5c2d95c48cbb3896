/**
 * Conditions from a CSV table (`conditionTable:`): a table gives the same model as the same
 * conditions written in the model file; every bad table gives its problem at table:ROW:COL,
 * with the message pinned. The CSV rules are those of RFC 4180, section 2. The Navion
 * (Teper, NASA CR-96008, 1969) appears only as a check case.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { parseModel, type TableText } from '../../src/load/model-file.js';
import type { AircraftModel, FlightCondition } from '../../src/types.js';
import { eigenvalues, nearest } from '../model/eigenvalues.js';

const dir = 'test/fixtures/models/tables';
const read = (name: string) => readFileSync(`${dir}/${name}`, 'utf8');

function fromTable(modelName: string, tableName: string): AircraftModel {
  return parseModel(read(modelName), `${dir}/${modelName}`, { [tableName]: { path: `${dir}/${tableName}`, text: read(tableName) } });
}

/** The built condition without its place and its written form (which names each number where it was written). */
function withoutPlace(c: FlightCondition): Omit<FlightCondition, 'place' | 'written'> {
  const { place: _, written: _written, ...rest } = c;
  return rest;
}

function messageOf(text: string, tables: Record<string, TableText>, file = 'model.yaml'): string {
  try {
    parseModel(text, file, tables);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as InputError).message;
  }
  throw new Error('accepted');
}

describe('a good table equals the same conditions written in the model file', () => {
  it('derivatives, US units, with common fields, an ignored column, quotes, CRLF and a BOM', () => {
    const table = fromTable('tarnwing-sweep-derivatives.yaml', 'tarnwing-sweep-derivatives.csv');
    const written = parseModel(read('tarnwing-sweep-derivatives-written.yaml'), 'written.yaml');
    expect(table.aircraft).toEqual(written.aircraft);
    expect(table.units).toBe('US');
    expect(table.conditions.map(withoutPlace)).toEqual(written.conditions.map(withoutPlace));
    // one row per condition, placed at its line of the table
    expect(table.conditions.map((c) => c.place)).toEqual([2, 3, 4].map((line) => ({ file: `${dir}/tarnwing-sweep-derivatives.csv`, line })));
  });

  it('state-space matrices by entry, named by state and input; the other entries are 0 and the notes say so', () => {
    const table = fromTable('tarnwing-sweep-state-space.yaml', 'tarnwing-sweep-state-space.csv');
    const written = parseModel(read('tarnwing-sweep-state-space-written.yaml'), 'written.yaml');
    expect(table.conditions).toHaveLength(3);
    table.conditions.forEach((c, i) => {
      const w = written.conditions[i]!;
      expect({ ...withoutPlace(c), notes: [] }).toEqual({ ...withoutPlace(w), notes: [] });
      expect(c.notes).toEqual([
        ...w.notes,
        'stateSpace.A: 6 of 16 entries are not table columns and were taken as 0',
        'stateSpace.B: 2 of 4 entries are not table columns and were taken as 0',
      ]);
    });
  });

  it('takes the entries that are not columns from a matrix given in common, and the table overrides it', () => {
    const text = `format: modalgate-model/1
aircraft: { name: Test Case, class: I }
units: SI
conditionTable:
  file: t.csv
  common:
    phase: CR
    stateSpace: { states: [u, w], A: [[-0.02, 0.07], [-0.3, -1.9]] }
  columns:
    id: id
    airspeed: V
    stateSpace.A[w][w]: Zw
`;
    const model = parseModel(text, 'm.yaml', { 't.csv': { path: 't.csv', text: 'id,V,Zw\nslow,40,-1.1\nfast,70,-2.6\n' } });
    expect(model.conditions.map((c) => c.system.A)).toEqual([
      [[-0.02, 0.07], [-0.3, -1.1]],
      [[-0.02, 0.07], [-0.3, -2.6]],
    ]);
    expect(model.conditions[0]!.notes.some((n) => n.includes('taken as 0'))).toBe(false);
  });

  it('keeps conditions written in the file and appends the rows of the table', () => {
    const text = `format: modalgate-model/1
aircraft: { name: Test Case, class: I }
units: SI
conditions:
  - { id: hand, phase: CR, airspeed: 50, stateSpace: { states: [u], A: [[-0.1]] } }
conditionTable:
  file: t.csv
  common: { stateSpace: { states: [u] } }
  columns:
    id: id
    phase: phase
    airspeed: V
    stateSpace.A[u][u]: Xu
`;
    const model = parseModel(text, 'm.yaml', { 't.csv': { path: 't.csv', text: 'id,phase,V,Xu\nrow,PA,40,-0.2\n' } });
    expect(model.conditions.map((c) => [c.id, c.place.file, c.system.A[0]![0]])).toEqual([['hand', 'm.yaml', -0.1], ['row', 't.csv', -0.2]]);
  });

  it('builds the Navion lateral model from a table row, keeping its roots (Teper, NASA CR-96008, 1969; values as in test/load/model-file.test.ts, from memory)', () => {
    const text = `format: modalgate-model/1
aircraft: { name: Test Case, class: I }
units: US
conditionTable:
  file: navion.csv
  common: { phase: CR, lateral: { Ixz: 0, derivatives: { Yp: 0, Yr: 0 } } }
  columns:
    id: id
    airspeed: u0
    lateral.derivatives.Ybeta: Ybeta
    lateral.derivatives.Lbeta: Lbeta
    lateral.derivatives.Lp: Lp
    lateral.derivatives.Lr: Lr
    lateral.derivatives.Nbeta: Nbeta
    lateral.derivatives.Np: Np
    lateral.derivatives.Nr: Nr
`;
    const csv = 'id,u0,Ybeta,Lbeta,Lp,Lr,Nbeta,Np,Nr\r\nnavion-sl,176,-44.76,-15.982,-8.402,2.193,4.495,-0.3498,-0.7605\r\n';
    const [c] = parseModel(text, 'm.yaml', { 'navion.csv': { path: 'navion.csv', text: csv } }).conditions;
    const roots = eigenvalues(c!.system.A);
    // Dutch roll -0.487 +/- 2.335i, roll -8.435 [1/s]
    const dutch = nearest(roots, { re: -0.487, im: 2.335 });
    expect(dutch.re).toBeCloseTo(-0.487, 3);
    expect(dutch.im).toBeCloseTo(2.335, 3);
    expect(Math.abs(nearest(roots, { re: -8.435, im: 0 }).re + 8.435)).toBeLessThan(6e-4);
  });
});

describe('bad tables: every problem at table:ROW:COL, all at once', () => {
  const model = read('bad/sweep.yaml');
  const messageOfTable = (name: string) => messageOf(model, { 'table.csv': { path: `bad/${name}`, text: read(`bad/${name}`) } }, 'bad/sweep.yaml');

  const cases: [string, string][] = [
    ['bad-number.csv', 'bad/bad-number.csv:3:7: stateSpace.A[u][w]: not a number (expected a decimal number, e.g. -0.045 or 1.2e-3, found "12abc") [not_a_number]'],
    ['nan-airspeed.csv', 'bad/nan-airspeed.csv:3:3: airspeed: not a number (expected a decimal number, e.g. -0.045 or 1.2e-3, found "NaN") [not_a_number]'],
    ['empty-airspeed.csv', 'bad/empty-airspeed.csv:3:3: airspeed: missing (expected a finite number, found nothing) [invalid_type]'],
    ['empty-entry.csv', 'bad/empty-entry.csv:3:9: stateSpace.A[w][w]: missing (expected a finite number, found nothing) [invalid_type]'],
    ['negative-airspeed.csv', 'bad/negative-airspeed.csv:3:3: airspeed: too small (expected a number > 0, found -45) [too_small]'],
    ['level-four.csv', 'bad/level-four.csv:3:5: requiredLevel: requiredLevel must be 1, 2 or 3 (expected 1 | 2 | 3, found 4) [out_of_range]'],
    ['id-in-model-file.csv', "bad/id-in-model-file.csv:2:1: id: condition id 'cruise-2400m' is used twice (first at bad/sweep.yaml line 6) (expected a unique id, found \"cruise-2400m\") [duplicate_id]"],
    ['id-twice-in-table.csv', "bad/id-twice-in-table.csv:4:1: id: condition id 'cruise-3000m' is used twice (first at line 2) (expected a unique id, found \"cruise-3000m\") [duplicate_id]"],
    ['missing-column.csv', "bad/sweep.yaml:18:5: conditionTable.columns.altitude: column 'h' is not in the header of bad/missing-column.csv (expected a column headed \"h\", found 9 other column(s)) [missing_column]"],
    // a required column missing is said once, not again as a missing airspeed on every row
    ['missing-airspeed-column.csv', "bad/sweep.yaml:17:5: conditionTable.columns.airspeed: column 'V' is not in the header of bad/missing-airspeed-column.csv (expected a column headed \"V\", found 9 other column(s)) [missing_column]"],
    ['no-ignored-column.csv', "bad/sweep.yaml:24:12: conditionTable.ignore[0]: ignored column 'remarks' is not in the header of bad/no-ignored-column.csv (expected a header of the table, found \"remarks\") [missing_column]"],
    ['unknown-column.csv', "bad/unknown-column.csv:1:5: column 'mach' is not mapped to a condition field (expected a field in conditionTable.columns, or the header in conditionTable.ignore, found \"mach\") [unknown_column]"],
    ['ragged-rows.csv', [
      'bad/ragged-rows.csv:2:11: row has 11 cells, the header 10 (expected 10 cells, found 11 cells) [ragged_row]',
      'bad/ragged-rows.csv:4:8: row has 8 cells, the header 10 (expected 10 cells, found 8 cells) [ragged_row]',
    ].join('\n')],
    ['unclosed-quote.csv', 'bad/unclosed-quote.csv:3:10: quoted cell not closed before the end of the file (expected a closing ", found end of file) [csv_syntax]'],
    ['three-problems.csv', [
      'bad/three-problems.csv:2:3: airspeed: not a number (expected a decimal number, e.g. -0.045 or 1.2e-3, found "70abc") [not_a_number]',
      'bad/three-problems.csv:2:8: stateSpace.A[w][u]: missing (expected a finite number, found nothing) [invalid_type]',
      'bad/three-problems.csv:3:5: requiredLevel: requiredLevel must be 1, 2 or 3 (expected 1 | 2 | 3, found 0) [out_of_range]',
    ].join('\n')],
  ];
  it.each(cases)('%s', (name, expected) => {
    expect(messageOfTable(name)).toBe(expected);
  });
});

describe('bad mappings: placed in the model file', () => {
  const header = `format: modalgate-model/1
aircraft: { name: Test Case, class: I }
units: SI
conditionTable:
  file: t.csv
`;
  // two rows, so that a problem of common shows once, not once per row
  const csv = { 't.csv': { path: 't.csv', text: 'id,phase,V,a\nc1,CR,50,-0.1\nc2,CR,60,-0.2\n' } };
  const cases: [string, string, string][] = [
    [
      'a field that no condition has',
      '  common: { stateSpace: { states: [u] } }\n  columns:\n    id: id\n    phase: phase\n    airspeeed: V\n    stateSpace.A[u][u]: a\n',
      [
        "m.yaml:8:5: conditionTable.columns: no column and no common value for 'airspeed' (expected columns: { airspeed: <header> } or common: { airspeed: .. }, found neither) [missing_field]",
        "m.yaml:10:5: conditionTable.columns.airspeeed: no condition field 'airspeeed' (expected a field of a written condition, e.g. airspeed, longitudinal.derivatives.Xu, stateSpace.A[u][w], found \"airspeeed\") [column_field]",
      ].join('\n'),
    ],
    [
      'a matrix entry named by a state that common does not list',
      '  common: { stateSpace: { states: [u] } }\n  columns:\n    id: id\n    phase: phase\n    airspeed: V\n    stateSpace.A[u][w]: a\n',
      "m.yaml:11:5: conditionTable.columns.stateSpace.A[u][w]: 'w' is not one of the states in common.stateSpace.states (expected u, found \"w\") [column_field]",
    ],
    [
      'matrix entries without the names in common',
      '  columns:\n    id: id\n    phase: phase\n    airspeed: V\n    stateSpace.A[u][u]: a\n',
      'm.yaml:10:5: conditionTable.columns.stateSpace.A[u][u]: A entries are named by states, but common.stateSpace.states is not given (expected common.stateSpace.states: [..] in conditionTable.common, found nothing) [column_field]',
    ],
    [
      'a list in one cell',
      '  common: { stateSpace: { states: [u], A: [[-0.1]] } }\n  columns:\n    id: id\n    phase: phase\n    airspeed: V\n    stateSpace.inputs: a\n',
      "m.yaml:11:5: conditionTable.columns.stateSpace.inputs: 'stateSpace.inputs' holds a list or a mapping, which one table cell cannot (expected a single number, text or true/false; put lists (e.g. the states) in common, found \"stateSpace.inputs\") [column_field]",
    ],
    [
      'a field both in common and in a column',
      '  common: { phase: CR, stateSpace: { states: [u] } }\n  columns:\n    id: id\n    phase: phase\n    airspeed: V\n    stateSpace.A[u][u]: a\n',
      "m.yaml:9:5: conditionTable.columns.phase: 'phase' is given both in common and as column 'phase' (expected one of them, found both) [conflict]",
    ],
    [
      'a problem of a common field, once for all rows',
      '  common: { stateSpace: { states: [u, u] } }\n  columns:\n    id: id\n    phase: phase\n    airspeed: V\n    stateSpace.A[u][u]: a\n',
      "m.yaml:6:39: conditionTable.common.stateSpace.states[1]: state 'u' is named twice (first at position 1) (expected unique state names) [duplicate_name]",
    ],
    [
      'an unknown field in common',
      '  common: { stateSpace: { states: [u] }, mach: 0.2 }\n  columns:\n    id: id\n    phase: phase\n    airspeed: V\n    stateSpace.A[u][u]: a\n',
      "m.yaml:6:42: conditionTable.common.mach: unknown field(s) 'mach' [unknown_field]",
    ],
  ];
  it.each(cases)('%s', (_, mapping, expected) => {
    expect(messageOf(header + mapping, csv, 'm.yaml')).toBe(expected);
  });

  it('refuses a table with a header and no rows', () => {
    const mapping = '  common: { stateSpace: { states: [u] } }\n  columns:\n    id: id\n    phase: phase\n    airspeed: V\n    stateSpace.A[u][u]: a\n';
    expect(messageOf(header + mapping, { 't.csv': { path: 't.csv', text: 'id,phase,V,a\r\n' } }, 'm.yaml')).toBe(
      't.csv:1: the table has a header but no rows (expected one line per condition after the header, found nothing) [empty_table]',
    );
  });

  it('says when the table text was not passed in', () => {
    expect(messageOf(`${header}  columns:\n    id: id\n`, {}, 'm.yaml')).toBe(
      "m.yaml:5:9: conditionTable.file: table 't.csv' was not read (expected its text, passed to parseModel (loadModel reads it), found nothing) [table_missing]",
    );
  });

  it('needs conditions from somewhere', () => {
    expect(messageOf('format: modalgate-model/1\naircraft: { name: T, class: I }\nunits: SI\n', {}, 'm.yaml')).toBe(
      'm.yaml:1:1: conditions: no conditions (expected conditions: [..] and/or conditionTable: {..}, found neither) [missing]',
    );
  });
});
