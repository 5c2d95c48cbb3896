/**
 * Bad model files, one problem each (and one with three): the full message is pinned, with
 * file:line:col, field, what was expected and what was found, and the code.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { parseModel } from '../../src/load/model-file.js';

function messageOf(name: string): string {
  const text = readFileSync(new URL(`../fixtures/models/bad/${name}`, import.meta.url), 'utf8');
  try {
    parseModel(text, `bad/${name}`);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as InputError).message;
  }
  throw new Error(`${name} was accepted`);
}

const cases: [string, string][] = [
  ['nan-entry.yaml', 'bad/nan-entry.yaml:12:12: conditions[0].stateSpace.A[1][0]: wrong type (expected a finite number, found NaN) [invalid_type]'],
  ['nan-entry.json', 'bad/nan-entry.json:7:66: not valid JSON: NaN is not a JSON value (found NaN) [syntax]'],
  ['infinite-airspeed.yaml', 'bad/infinite-airspeed.yaml:7:15: conditions[0].airspeed: wrong type (expected a finite number, found Infinity) [invalid_type]'],
  ['duplicate-ids.json', "bad/duplicate-ids.json:8:13: conditions[1].id: condition id 'c1' is used twice (first at line 6) (expected a unique id, found \"c1\") [duplicate_id]"],
  ['unknown-units.yaml', 'bad/unknown-units.yaml:3:8: units: not one of the allowed values (expected "US" | "SI", found "metric") [invalid_value]'],
  ['unknown-class.json', 'bad/unknown-class.json:3:53: aircraft.class: not one of the allowed values (expected "I" | "II-L" | "II-C" | "III" | "IV", found "V") [invalid_value]'],
  ['missing-class.yaml', 'bad/missing-class.yaml:3:3: aircraft.class: missing (expected "I" | "II-L" | "II-C" | "III" | "IV", found nothing) [invalid_value]'],
  ['missing-units.json', 'bad/missing-units.json:1:1: units: missing (expected "US" | "SI", found nothing) [invalid_value]'],
  ['state-named-twice.yaml', "bad/state-named-twice.yaml:9:25: conditions[0].stateSpace.states[3]: state 'w' is named twice (first at position 2) (expected unique state names) [duplicate_name]"],
  ['a-shape.yaml', 'bad/a-shape.yaml:11:9: conditions[0].stateSpace.A: A has 3 rows, expected 4 (one per state) (expected 4 x 4, found 3 rows) [shape]'],
  ['b-shape.json', 'bad/b-shape.json:11:14: conditions[0].stateSpace.B: B has 3 rows, expected 4 (one per state) (expected 4 x 1, found 3 rows) [shape]'],
  ['missing-derivative.yaml', 'bad/missing-derivative.yaml:10:9: conditions[0].longitudinal.derivatives: missing derivative Mq (needed for the longitudinal form) (expected Xu, Xw, Zu, Zw, Mu, Mw, Mwdot, Mq) [missing_derivative]'],
  ['misspelt-derivative.yaml', "bad/misspelt-derivative.yaml:9:108: conditions[0].longitudinal.derivatives.Mqq: unknown field 'Mqq' (expected one of Xu, Xw, Zu, Zw, Mu, Mw, Mwdot, Mq, Xq, Zwdot, Zq, or a control derivative X/Z/M<input> with the input name starting with d) [unknown_field]"],
  ['two-forms.json', 'bad/two-forms.json:6:5: conditions[0]: 2 dynamics forms given (stateSpace, longitudinal); give exactly one (expected one of stateSpace, longitudinal and/or lateral, nondimensional, found stateSpace, longitudinal) [dynamics_form]'],
  ['unknown-field.yaml', "bad/unknown-field.yaml:8:5: conditions[0].airspeedUnit: unknown field(s) 'airspeedUnit' [unknown_field]"],
  ['missing-phase.json', 'bad/missing-phase.json:6:5: conditions[0].phase: missing (expected text, found nothing) [invalid_type]'],
  ['yaml-syntax.yaml', [
    'bad/yaml-syntax.yaml:8:66: not valid YAML/JSON: Flow sequence in block collection must be sufficiently indented and end with a ] [syntax]',
    'bad/yaml-syntax.yaml:8:67: not valid YAML/JSON: Flow map in block collection must be sufficiently indented and end with a } [syntax]',
  ].join('\n')],
  ['json-syntax.json', 'bad/json-syntax.json:6:49: not valid YAML/JSON: Unexpected , in flow map [syntax]'],
  ['primed-unstated.yaml', 'bad/primed-unstated.yaml:9:12: conditions[0].lateral.Ixz: Ixz is given and nonzero, so say whether the L and N derivatives already include it (expected primed: true (already coupled) or primed: false (couple them here), found no primed field) [primed_unstated]'],
  ['mixed-sideslip-forms.yaml', 'bad/mixed-sideslip-forms.yaml:9:20: conditions[0].lateral.derivatives: v-form and beta-form sideslip derivatives mixed (Yv, Lbeta, Nbeta) (expected Yv, Lv, Nv or Ybeta, Lbeta, Nbeta) [mixed_forms]'],
  ['nondimensional-no-altitude.yaml', 'bad/nondimensional-no-altitude.yaml:5:5: conditions[0]: altitude is needed for the nondimensional form (air density comes from the standard atmosphere) (expected altitude: <geometric altitude in m>, found nothing) [missing_altitude]'],
  ['theta0-conflict.yaml', 'bad/theta0-conflict.yaml:12:15: conditions[0].lateral.theta0: theta0 differs from the longitudinal theta0 (one trim per condition) (expected 0.05, found 0.04) [conflict]'],
  ['zwdot-one.yaml', 'bad/zwdot-one.yaml:9:69: conditions[0].longitudinal.derivatives.Zwdot: Zwdot must be less than 1 (the w equation is divided by 1 - Zwdot) (expected Zwdot < 1, found 1) [out_of_range]'],
  ['unprimed-without-inertia.yaml', 'bad/unprimed-without-inertia.yaml:9:7: conditions[0].lateral: primed: false with a nonzero Ixz needs Ix and Iz to couple the L and N derivatives (expected Ix and Iz, found no Iz) [missing_inertia]'],
  ['wrong-format.yaml', [
    'bad/wrong-format.yaml:1:9: format: not one of the allowed values (expected "modalgate-model/1", found "modalgate-model/2") [invalid_value]',
    'bad/wrong-format.yaml:4:13: conditions: too few items (expected at least 1 item, found a list of 0) [too_small]',
  ].join('\n')],
];

describe('bad model files', () => {
  it.each(cases)('%s', (name, expected) => {
    expect(messageOf(name)).toBe(expected);
  });

  it('reports all three problems of one file at once, in file order (requiredLevel 4, a missing phase, a short A row)', () => {
    expect(messageOf('three-problems.yaml').split('\n')).toEqual([
      'bad/three-problems.yaml:8:20: conditions[0].requiredLevel: requiredLevel must be 1, 2 or 3 (expected 1 | 2 | 3, found 4) [out_of_range]',
      'bad/three-problems.yaml:12:5: conditions[1].phase: missing (expected text, found nothing) [invalid_type]',
      'bad/three-problems.yaml:20:11: conditions[2].stateSpace.A[0]: A row 1 has 3 entries, expected 2 (one per state) (expected 2 x 2, found 3 entries) [shape]',
    ]);
  });

  it('reports a condition\'s semantic problems together (requiredLevel 0 and a short A)', () => {
    expect(messageOf('two-problems-one-condition.yaml').split('\n')).toEqual([
      'bad/two-problems-one-condition.yaml:8:20: conditions[0].requiredLevel: requiredLevel must be 1, 2 or 3 (expected 1 | 2 | 3, found 0) [out_of_range]',
      'bad/two-problems-one-condition.yaml:11:10: conditions[0].stateSpace.A: A has 2 rows, expected 3 (one per state) (expected 3 x 3, found 2 rows) [shape]',
    ]);
  });

  it('still checks the conditions when the header is wrong (missing class, unknown units, A shape)', () => {
    expect(messageOf('three-problems-header.yaml').split('\n')).toEqual([
      'bad/three-problems-header.yaml:2:11: aircraft.class: missing (expected "I" | "II-L" | "II-C" | "III" | "IV", found nothing) [invalid_value]',
      'bad/three-problems-header.yaml:3:8: units: not one of the allowed values (expected "US" | "SI", found "imperial") [invalid_value]',
      'bad/three-problems-header.yaml:10:10: conditions[0].stateSpace.A: A has 3 rows, expected 2 (one per state) (expected 2 x 2, found 3 rows) [shape]',
    ]);
  });

  it('keeps the issues as data for other writers (JSON, JUnit)', () => {
    try {
      parseModel(readFileSync(new URL('../fixtures/models/bad/a-shape.yaml', import.meta.url), 'utf8'), 'a.yaml');
    } catch (err) {
      expect((err as InputError).issues).toEqual([
        { file: 'a.yaml', line: 11, column: 9, field: 'conditions[0].stateSpace.A', message: 'A has 3 rows, expected 4 (one per state)', expected: '4 x 4', found: '3 rows', code: 'shape' },
      ]);
      return;
    }
    throw new Error('accepted');
  });
});
