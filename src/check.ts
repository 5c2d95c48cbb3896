/**
 * The pipeline, top to bottom: load the model -> build the linear model per condition ->
 * analyse modes -> resolve criteria -> evaluate findings -> results. Writers (terminal, JSON,
 * JUnit, HTML, PDF) take the results from here; nothing in this file prints or writes.
 */
import { dedupeIssues, InputError } from './errors.js';
import { loadCriteriaSet } from './load/criteria-file.js';
import { loadModel } from './load/load-model.js';
import { assembleResults } from './results.js';
import { checkAllConditions } from './sweep/check-all.js';
import type { AircraftModel, InputFile, ResolvedCriteriaSet, Results } from './types.js';

export interface CheckRequest {
  /** path of the model file */
  model: string;
  /** criteria set paths or shipped ids; empty = modes only */
  criteria: string[];
  /** tool version, the command line and the run time, supplied by the caller (no clock here) */
  toolVersion: string;
  command: string[];
  generatedAt: string;
  /** called after each condition (for a progress bar); no effect on the results */
  onProgress?: (done: number, total: number) => void;
  /** worker threads for the conditions: 0 = none; absent = chosen by their number (no effect on the results) */
  workers?: number;
}

export interface CheckOutcome {
  model: AircraftModel;
  sets: ResolvedCriteriaSet[];
  results: Results;
}

export async function runCheck(request: CheckRequest): Promise<CheckOutcome> {
  const { model, files: modelFiles } = await loadModel(request.model);
  const loaded = await Promise.all(request.criteria.map((ref) => loadCriteriaSet(ref)));
  const sets = loaded.map((l) => l.set);

  // per condition: analyse the modes, evaluate every set, assemble (worker threads for a big sweep)
  const { results: conditions, issues } = await checkAllConditions(model, sets, {
    ...(request.workers !== undefined ? { workers: request.workers } : {}),
    ...(request.onProgress ? { onProgress: request.onProgress } : {}),
  });
  if (issues.length > 0) throw new InputError(dedupeIssues(issues));

  const inputs: InputFile[] = [
    ...modelFiles,
    ...loaded.flatMap((l) => l.files.map((f) => ({ role: 'criteria' as const, path: f.path, sha256: f.sha256 }))),
  ];
  const results = assembleResults({ request, model, sets, inputs, conditions });
  return { model, sets, results };
}
