/**
 * The defaults behind a finding: of the notes a condition's model building recorded, those
 * that supplied a value the user did not give (a derivative or coefficient taken as 0, a
 * computed trim lift coefficient, standard gravity) and that feed the finding's mode. A
 * failing or marginal finding shows them beside it, so a reviewer sees what the verdict
 * leans on without reading every note.
 */
import type { ConditionResult, Finding, ModeKind } from '../types.js';

type Axis = 'longitudinal' | 'lateral';

const AXIS_OF_MODE: Partial<Record<ModeKind, Axis>> = {
  short_period: 'longitudinal',
  phugoid: 'longitudinal',
  dutch_roll: 'lateral',
  roll: 'lateral',
  spiral: 'lateral',
  roll_spiral: 'lateral',
};

/** Notes that supply a value: "... not given: taken as 0", "Xq taken as 0", "... (default ...)". */
const SUPPLIED = /taken as 0|not given|\(default\b|\bassumed\b/;

/** Derivative and coefficient names by axis (Cl is rolling moment, CL lift). */
function axesNamed(note: string): Set<Axis> {
  const out = new Set<Axis>();
  for (const token of note.split(/[^A-Za-z0-9]+/)) {
    if (/^[XZM][a-z]/.test(token) || /^C[DLm]/.test(token)) out.add('longitudinal');
    else if (/^[YLN][a-z]/.test(token) || /^C[Yln]/.test(token) || token === 'Ixz') out.add('lateral');
  }
  return out;
}

/** Gravity sets the phugoid's frequency (omega_p ~ sqrt(2) g / V, Lanchester): shown there only. */
const GRAVITY = /^g = /;

export function defaultsBehind(c: Pick<ConditionResult, 'notes'>, f: Pick<Finding, 'mode'>): string[] {
  const axis = AXIS_OF_MODE[f.mode];
  if (axis === undefined) return [];
  return c.notes.filter((note) => {
    if (!SUPPLIED.test(note)) return false;
    if (GRAVITY.test(note)) return f.mode === 'phugoid';
    return axesNamed(note).has(axis);
  });
}
