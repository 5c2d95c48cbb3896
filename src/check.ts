/**
 * The pipeline, top to bottom: load the model -> build the linear model per condition ->
 * analyse modes -> resolve criteria -> evaluate findings -> results. Writers (terminal, JSON,
 * JUnit, HTML, PDF) take the results from here; nothing in this file prints or writes.
 */
import { dedupeIssues, InputError, type InputIssue } from './errors.js';
import { checkSourceIdsAgree } from './criteria/evidence.js';
import { loadCriteriaSet } from './load/criteria-file.js';
import { loadModel } from './load/load-model.js';
import { assembleResults, resultsContents, resultsHead } from './results.js';
import { checkAllConditions } from './sweep/check-all.js';
import type { AircraftModel, ConditionResult, InputFile, ResolvedCriteriaSet, Results, ResultsHead, SensitivityChoice } from './types.js';

export interface CheckRequest {
  /** path of the model file */
  model: string;
  /** criteria set paths or shipped ids; empty = modes only */
  criteria: string[];
  /** folders besides the model's own whose files the model may name (e.g. a condition table) */
  trustedFolders?: string[];
  /** tool version, the command line and the run time, supplied by the caller (no clock here) */
  toolVersion: string;
  command: string[];
  generatedAt: string;
  /** called after each condition (for a progress bar); no effect on the results */
  onProgress?: (done: number, total: number) => void;
  /**
   * Whether the results carry each mode's shape: true = always, false = never, absent = up to
   * MODE_SHAPES_UP_TO conditions (results.ts). `results.contents` says which it was.
   */
  modeShapes?: boolean;
  /** worker threads for the conditions: 0 = none; absent = chosen by their number (no effect on the results) */
  workers?: number;
  /**
   * Called once the model and criteria are read and before any condition is checked, with
   * the results as they will be but for `summary` and `conditions`, and the number of
   * conditions (e.g. to start writing the results file).
   */
  onStart?: (head: ResultsHead, total: number) => void;
  /**
   * Called with each condition's result as soon as it is checked, in the order of the model
   * (e.g. to write it out at once); `total` is the number of conditions.
   */
  onCondition?: (result: ConditionResult, total: number) => void;
  /**
   * Which conditions' results the outcome keeps in `results.conditions`; absent = all. The
   * summary still counts every condition. With either of these the conditions are checked in
   * the main thread.
   */
  keep?: (result: ConditionResult, total: number) => boolean;
  /** which findings get design sensitivities (what would move them); absent = failing and marginal ones */
  sensitivities?: SensitivityChoice;
}

export interface CheckOutcome {
  model: AircraftModel;
  sets: ResolvedCriteriaSet[];
  /** `conditions` holds every condition, or only those the request's `keep` kept */
  results: Results;
  /** the number of conditions checked */
  conditionCount: number;
}

export async function runCheck(request: CheckRequest): Promise<CheckOutcome> {
  // criteria first: a condition's phase unknown to them is then reported at its field
  const loaded = refuseRepeatedSets(await Promise.all(request.criteria.map((ref) => loadCriteriaSet(ref, { trustedFolders: request.trustedFolders ?? [] }))), request.criteria);
  const sets = loaded.map((l) => l.set);
  checkSourceIdsAgree(sets);
  const knownPhases = { sets: sets.map((s) => ({ id: s.id, phases: Object.keys(s.phaseCategories) })) };
  const { model, files: modelFiles } = await loadModel(request.model, { trustedFolders: request.trustedFolders ?? [], knownPhases });

  const inputs: InputFile[] = [
    ...modelFiles,
    ...loaded.flatMap((l) => l.files.map((f) => ({ role: 'criteria' as const, path: f.path, sha256: f.sha256 }))),
  ];
  const total = model.conditions.length;
  const contents = resultsContents(total, request.modeShapes);
  request.onStart?.(resultsHead({ request, model, sets, inputs, contents }), total);

  // per condition: analyse the modes, evaluate every set, the design sensitivities of the
  // chosen findings, assemble (worker threads for a big sweep)
  const { onCondition, keep } = request;
  const { results: conditions, issues, summary } = await checkAllConditions(model, sets, contents, {
    ...(request.workers !== undefined ? { workers: request.workers } : {}),
    ...(request.sensitivities ? { sensitivities: request.sensitivities } : {}),
    ...(request.onProgress ? { onProgress: request.onProgress } : {}),
    ...(onCondition ? { onResult: (r: ConditionResult) => onCondition(r, total) } : {}),
    ...(keep ? { keep: (r: ConditionResult) => keep(r, total) } : {}),
  });
  if (issues.length > 0) throw new InputError(dedupeIssues(issues));

  const results = assembleResults({ request, model, sets, inputs, contents, conditions, summary });
  return { model, sets, results, conditionCount: total };
}

/**
 * The same set given twice would judge every condition twice and count each finding twice:
 * refused, naming both references, whether given by id, by path or by two paths to one file.
 */
function refuseRepeatedSets<T extends { set: ResolvedCriteriaSet }>(loaded: T[], refs: readonly string[]): T[] {
  const seen = new Map<string, number>();
  const issues: InputIssue[] = [];
  loaded.forEach((l, i) => {
    const key = l.set.id.toLowerCase();
    const first = seen.get(key);
    if (first === undefined) seen.set(key, i);
    else {
      issues.push({
        file: refs[i] ?? l.set.id,
        field: '--criteria',
        message: `criteria set '${l.set.id}' is given twice (as '${refs[first]}' and '${refs[i]}'): every finding would be counted twice; give it once`,
        code: 'repeated_set',
      });
    }
  });
  if (issues.length > 0) throw new InputError(issues);
  return loaded;
}
