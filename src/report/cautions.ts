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
  'The \u201cwhat would move it\u201d tables change one number of the model at a time. They are a ' +
    'linearised design aid: in a real airframe the derivatives are coupled (a change of geometry, mass ' +
    'or inertia moves many of them at once), so a change found here points where to look; it is not a ' +
    'design change, and the whole model must be re-derived and checked again.',
  'Each boundary carries the class of its evidence. Only \u201cpublished\u201d boundaries were read in the primary ' +
    'document; \u201csecondary\u201d ones were read in a reproduction, \u201cconflicting\u201d ones have sources that ' +
    'disagree, \u201cmemory\u201d ones were recalled and \u201cprogramme-set\u201d ones were chosen by the programme. ' +
    'Check every boundary that is not published against the issued document before relying on the verdict it supports.',
];
