/**
 * `controls` of a condition: the pilot's pitch / roll / yaw controls naming inputs of the model.
 * Bad controls are input errors with the place, all at once; the messages are pinned.
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { parseModel } from '../../src/load/model-file.js';

const head = `format: modalgate-model/1
aircraft: { name: Test Case, class: I }
units: SI
conditions:
  - id: c1
    phase: CR
    airspeed: 60
`;

const model = (controls: string, extra = '') => `${head}    altitude: 1000
    stateSpace:
      states: [w, q, theta]
      A: [[-2, 60, 0], [-0.1, -2.5, 0], [0, 1, 0]]
      inputs: [Fes, spare]
      B: [[-0.05, 0], [0.4, 0], [0, 0]]
${extra}    controls:
${controls}`;

function problems(text: string): string[] {
  try {
    parseModel(text, 'm.yaml');
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as InputError).message.split('\n');
  }
  throw new Error('accepted');
}

describe('cockpit controls', () => {
  it('are read with their unit and full travel; max may be left out', () => {
    const c = parseModel(model('      pitch: { input: Fes, unit: N, max: 180 }\n'), 'm.yaml').conditions[0]!;
    expect(c.controls).toEqual({ pitch: { input: 'Fes', unit: 'N', max: 180 } });
    const d = parseModel(model('      pitch: { input: Fes, unit: N }\n'), 'm.yaml').conditions[0]!;
    expect(d.controls).toEqual({ pitch: { input: 'Fes', unit: 'N', max: null } });
  });

  it('a condition without controls has none', () => {
    const text = model('').replace('    controls:\n', '');
    expect(parseModel(text, 'm.yaml').conditions[0]!.controls).toEqual({});
  });

  it('derivative forms give the inputs de, da, dr that controls may name', () => {
    const text = `${head}    longitudinal:
      theta0: 0
      derivatives: { Xu: -0.04, Xw: 0.04, Zu: -0.3, Zw: -2, Mu: 0, Mw: -0.15, Mwdot: -0.017, Mq: -2.1, Zde: -8.6, Mde: -11.9 }
    lateral:
      primed: true
      derivatives: { Yv: -0.25, Yp: 0, Yr: 0, Lv: -0.3, Lp: -8.4, Lr: 2.2, Nv: 0.08, Np: -0.35, Nr: -0.76, Lda: 29, Nda: -0.2, Ldr: 2.5, Ndr: -4.6 }
    controls:
      pitch: { input: de, unit: rad }
      roll: { input: da, unit: rad, max: 0.3 }
      yaw: { input: dr, unit: rad, max: 0.4 }
`;
    const c = parseModel(text, 'm.yaml').conditions[0]!;
    expect(c.controls.roll).toEqual({ input: 'da', unit: 'rad', max: 0.3 });
    expect(c.system.inputs).toEqual(['de', 'da', 'dr']);
  });

  it('an unknown input, a state, an input with no B column and a second use of one input are all reported at once', () => {
    const lines = problems(model('      pitch: { input: elevator, unit: N }\n      roll: { input: q, unit: rad, max: 0.3 }\n      yaw: { input: spare, unit: N }\n'));
    expect(lines).toEqual([
      "m.yaml:15:23: conditions[0].controls.pitch.input: unknown input 'elevator' (expected one of the model's inputs: Fes, spare, found elevator) [unknown_input]",
      "m.yaml:16:22: conditions[0].controls.roll.input: 'q' is a state of the model, not an input: a control must name a column of B (expected one of the model's inputs: Fes, spare, found q) [unknown_input]",
      "m.yaml:17:21: conditions[0].controls.yaw.input: input 'spare' has an all-zero column in B (and D): the yaw control would move nothing (expected a nonzero B column for the input, found zeros) [empty_input]",
    ]);
    expect(problems(model('      pitch: { input: Fes, unit: N }\n      roll: { input: Fes, unit: N }\n'))).toEqual([
      "m.yaml:16:22: conditions[0].controls.roll.input: input 'Fes' is already the pitch control (expected one input per control, found Fes) [duplicate_name]",
    ]);
  });

  it('a model with no inputs at all says so', () => {
    const text = model('      pitch: { input: de, unit: rad }\n').replace('      inputs: [Fes, spare]\n      B: [[-0.05, 0], [0.4, 0], [0, 0]]\n', '');
    expect(problems(text)).toEqual([
      "m.yaml:13:23: conditions[0].controls.pitch.input: unknown input 'de' (expected one of the model's inputs: none (the model has no inputs), found de) [unknown_input]",
    ]);
  });

  it('max <= 0, a missing unit and an unknown axis are schema errors', () => {
    const lines = problems(model('      pitch: { input: Fes, unit: N, max: 0 }\n      roll: { input: Fes }\n      collective: { input: Fes, unit: N }\n'));
    expect(lines.join('\n')).toMatch(/controls\.pitch\.max: .*expected .*> ?0/);
    expect(lines.join('\n')).toMatch(/controls\.roll\.unit: missing/);
    expect(lines.join('\n')).toMatch(/controls\.collective: unknown field/);
  });
});
