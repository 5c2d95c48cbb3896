/**
 * Standing cautions printed in every review document. They say what the figures are and what
 * they are not, so that nobody mistakes a computed check for a compliance finding.
 */

export const STANDING_CAUTIONS: readonly string[] = [
  'The verdicts in this document are an engineering aid computed from the linear model supplied. ' +
    'They are not a statement of compliance: compliance is decided by the certifying or procuring ' +
    'authority under the programme\u2019s approved means of compliance.',
  'Piloted evaluation (simulator and flight) and flight test remain necessary; a computed level does ' +
    'not replace the pilot\u2019s rating of the task.',
  'A linear model holds only for small perturbations about the trim point it was derived at. It treats ' +
    'the airframe as rigid and leaves out nonlinear aerodynamics, large-amplitude motion, actuator limits ' +
    'and aeroelastic effects unless these were built into the model.',
  'The military boundaries apply to equivalent-system figures. Where a flight control system adds ' +
    'dynamics of its own, the modes should first be matched by a low-order equivalent system; the raw ' +
    'eigenvalues of an augmented model may not be the figures the boundaries were drawn for.',
  'Boundary values marked \u201cfrom memory\u201d were entered without the published document at hand. ' +
    'Check each against the issued document before relying on the verdict it supports.',
];
