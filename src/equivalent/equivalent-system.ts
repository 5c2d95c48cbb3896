/** A fit in the shape of the results contract (`conditions[].equivalentSystems[]`). */
import type { EquivalentSystem } from '../types.js';
import { FORMS, type LoesFit } from './fit-loes.js';
import { dropbackFigures } from './dropback.js';
import { MISMATCH_FORM } from './mismatch.js';

export function toEquivalentSystem(fit: LoesFit, input: string, from: EquivalentSystem['from']): EquivalentSystem {
  return {
    axis: fit.axis,
    input,
    output: fit.channels[0]!.output,
    form: fit.channels.length > 1 ? `${fit.form}; ${FORMS.pitchNz}` : fit.form,
    method: fit.method,
    parameters: fit.parameters,
    timeDelay: fit.timeDelay,
    mismatch: fit.mismatch,
    mismatchForm: MISMATCH_FORM,
    mismatchGuidance: fit.mismatchGuidance,
    frequencyRange: fit.frequencyRange,
    points: fit.points,
    valid: fit.valid,
    remarks: fit.remarks,
    from,
    ...(fit.axis === 'pitch'
      ? { dropback: dropbackFigures(fit.parameters['inverseTtheta2']!, fit.parameters['dampingRatio']!, fit.parameters['naturalFrequency']!) }
      : {}),
    channels: fit.channels.map((c) => ({
      output: c.output,
      gain: c.gain,
      timeDelay: c.timeDelay,
      mismatch: c.mismatch,
      hos: c.samples,
      loes: { gain: c.fitted.gain, phase: c.fitted.phase },
      ...(c.fixed ? { fixed: c.fixed.description } : {}),
    })),
  };
}
