/**
 * A problem found while building a model, placed by field path. The loader turns the path
 * into file:line:col; model building itself knows nothing of files.
 */
export interface ModelProblem {
  /** path of the field inside the model file, e.g. ['conditions', 2, 'stateSpace', 'A'] */
  path: (string | number)[];
  message: string;
  expected?: string;
  found?: string;
  /** stable short code, e.g. `shape`, `duplicate_name`, `missing_derivative` */
  code: string;
}

/** The outcome of a building step: a value, or the problems that stopped it. */
export type Built<T> = { ok: true; value: T; notes: string[] } | { ok: false; problems: ModelProblem[] };
