/**
 * The cockpit controls of a condition, checked against the model they drive: each names an
 * input of the state-space model (a column of B, or of D), never a state or an output, and
 * the column must move something. The unit is the one the input was written in; B and D
 * stay per that unit (inputs are not converted to SI), so `max` is read in it too.
 */
import type { WrittenCockpitControls } from '../load/model-schema.js';
import type { CockpitControls, ControlAxis, StateSpace } from '../types.js';
import type { ModelProblem } from './problem.js';

type Path = (string | number)[];

const AXES: readonly ControlAxis[] = ['pitch', 'roll', 'yaw'];

export function buildControls(written: WrittenCockpitControls | undefined, system: StateSpace, path: Path): { controls: CockpitControls; problems: ModelProblem[] } {
  const controls: CockpitControls = {};
  const problems: ModelProblem[] = [];
  if (written === undefined) return { controls, problems };
  const inputs = system.inputs.length > 0 ? system.inputs.join(', ') : 'none (the model has no inputs)';
  const usedBy = new Map<string, ControlAxis>();
  for (const axis of AXES) {
    const control = written[axis];
    if (control === undefined) continue;
    const at = [...path, axis, 'input'];
    const column = system.inputs.indexOf(control.input);
    if (column < 0) {
      const what = system.states.includes(control.input)
        ? `'${control.input}' is a state of the model, not an input: a control must name a column of B`
        : system.outputs.includes(control.input)
          ? `'${control.input}' is an output of the model, not an input: a control must name a column of B`
          : `unknown input '${control.input}'`;
      problems.push({ path: at, message: what, expected: `one of the model's inputs: ${inputs}`, found: control.input, code: 'unknown_input' });
      continue;
    }
    const moves = system.B.some((row) => row[column] !== 0) || system.D.some((row) => row[column] !== 0);
    if (!moves) {
      problems.push({ path: at, message: `input '${control.input}' has an all-zero column in B (and D): the ${axis} control would move nothing`, expected: 'a nonzero B column for the input', found: 'zeros', code: 'empty_input' });
      continue;
    }
    const other = usedBy.get(control.input);
    if (other !== undefined) {
      problems.push({ path: at, message: `input '${control.input}' is already the ${other} control`, expected: 'one input per control', found: control.input, code: 'duplicate_name' });
      continue;
    }
    usedBy.set(control.input, axis);
    controls[axis] = { input: control.input, unit: control.unit, max: control.max ?? null };
  }
  return { controls, problems };
}
