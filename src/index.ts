/** The public library API. */
export { runCheck, type CheckRequest, type CheckOutcome } from './check.js';
export { renderOutputs, writeArtifacts, reportIdOf, type OutputRequest, type Artifact } from './outputs.js';
export { parseModel } from './load/model-file.js';
export { readInputFile } from './load/read-file.js';
export { loadModel } from './load/load-model.js';
export { parseCsv } from './load/csv.js';
export { loadCriteriaSet } from './load/criteria-file.js';
export { analyseModes } from './modes/analyse.js';
export { evaluateCondition } from './criteria/evaluate.js';
export { standardAtmosphere } from './atmosphere.js';
export { compareResults, parseBaselineResults } from './compare/compare-results.js';
export { InputError, InternalError, formatIssue, type InputIssue } from './errors.js';
export type * from './types.js';
