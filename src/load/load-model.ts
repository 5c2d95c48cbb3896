/**
 * Read a model file and the condition table it names (I/O), then parse them with the pure
 * parseModel. Every file read is returned with its SHA-256, for the results' inputs.
 *
 * A model file cannot pull other files into a report: the table it names must lie, by real
 * path (links followed), inside the model's own folder or one of the folders the caller
 * trusts (the command line's --trust-folder); a problem reading it is reported at the model's
 * `conditionTable.file`, never with the content of what was reached.
 */
import { dirname, isAbsolute, join } from 'node:path';
import { isInside, realOrSelf } from './contained.js';
import { InputError, type InputIssue } from '../errors.js';
import type { AircraftModel } from '../types.js';
import { parseModel, type KnownPhases, type TableText } from './model-file.js';
import { readInputFile } from './read-file.js';
import { parseStructuredText } from './structured-text.js';

export interface LoadedModel {
  model: AircraftModel;
  files: { role: 'model' | 'table' | 'response'; path: string; sha256: string }[];
}

export interface LoadOptions {
  /** folders besides the model's own whose files the model may name */
  trustedFolders?: readonly string[];
  /** the phases of the run's criteria sets: an unknown phase is reported at its field */
  knownPhases?: KnownPhases;
}

export async function loadModel(path: string, options: LoadOptions = {}): Promise<LoadedModel> {
  const modelFile = await readInputFile(path);
  const files: LoadedModel['files'] = [{ role: 'model', path: modelFile.path, sha256: modelFile.sha256 }];
  const tables: Record<string, TableText> = {};
  const ref = tableReference(modelFile.text, modelFile.path);
  if (ref !== undefined) {
    // Relative to the model file, shown the way the model file's own path was given.
    const tablePath = isAbsolute(ref.file) ? ref.file : join(dirname(modelFile.path), ref.file);
    const namedAt = { file: modelFile.path, ...ref.place, field: 'conditionTable.file' };
    checkContained(tablePath, modelFile.path, options.trustedFolders ?? [], namedAt, 'condition table');
    const table = await readInputFile(tablePath, { namedAt, what: 'condition table' });
    tables[ref.file] = { path: table.path, text: table.text };
    files.push({ role: 'table', path: table.path, sha256: table.sha256 });
  }
  // frequency-response files, under the same rules as the table
  const responses: Record<string, TableText> = {};
  for (const r of responseReferences(modelFile.text, modelFile.path)) {
    if (responses[r.file] !== undefined) continue;
    const responsePath = isAbsolute(r.file) ? r.file : join(dirname(modelFile.path), r.file);
    const namedAt = { file: modelFile.path, ...r.place, field: r.field };
    checkContained(responsePath, modelFile.path, options.trustedFolders ?? [], namedAt, 'frequency-response file');
    const read = await readInputFile(responsePath, { namedAt, what: 'frequency-response file' });
    responses[r.file] = { path: read.path, text: read.text };
    files.push({ role: 'response', path: read.path, sha256: read.sha256 });
  }
  return { model: parseModel(modelFile.text, modelFile.path, tables, options.knownPhases, responses), files };
}

/** The frequency-response files the written conditions name, with their places. */
function responseReferences(text: string, file: string): { file: string; field: string; place: { line?: number; column?: number } }[] {
  if (!text.includes('frequencyResponses')) return [];
  try {
    const source = parseStructuredText(text, file);
    const conditions = (source.value as { conditions?: unknown } | null)?.conditions;
    if (!Array.isArray(conditions)) return [];
    const out: { file: string; field: string; place: { line?: number; column?: number } }[] = [];
    conditions.forEach((c, i) => {
      const list = (c as { frequencyResponses?: unknown } | null)?.frequencyResponses;
      if (!Array.isArray(list)) return;
      list.forEach((r, j) => {
        const ref = (r as { file?: unknown } | null)?.file;
        if (typeof ref !== 'string' || ref === '') return;
        const path = ['conditions', i, 'frequencyResponses', j, 'file'];
        out.push({ file: ref, field: `conditions[${i}].frequencyResponses[${j}].file`, place: source.locate(path) ?? {} });
      });
    });
    return out;
  } catch (err) {
    if (err instanceof InputError) return [];
    throw err;
  }
}


function checkContained(tablePath: string, modelPath: string, trusted: readonly string[], namedAt: Omit<InputIssue, 'message' | 'code'>, what: string): void {
  const modelFolder = dirname(modelPath);
  if ([modelFolder, ...trusted].some((folder) => isInside(tablePath, folder))) return;
  throw new InputError([
    {
      ...namedAt,
      message: `the ${what} ${tablePath} lies outside the model's folder ${realOrSelf(modelFolder)}; a model may name only files inside its folder (--trust-folder <folder> allows another)`,
      expected: 'a path inside the model\'s folder',
      found: JSON.stringify(tablePath),
      code: 'outside_folder',
    },
  ]);
}

/**
 * The table file the model names, if any, with its place. The model is parsed here only when
 * it mentions a table at all (a large JSON sweep is not parsed twice); a broken file is left
 * to parseModel, which reports it properly.
 */
function tableReference(text: string, file: string): { file: string; place: { line?: number; column?: number } } | undefined {
  if (!text.includes('conditionTable')) return undefined;
  try {
    const source = parseStructuredText(text, file);
    const value = source.value as { conditionTable?: { file?: unknown } } | null;
    const ref = value?.conditionTable?.file;
    if (typeof ref !== 'string' || ref === '') return undefined;
    return { file: ref, place: source.locate(['conditionTable', 'file']) ?? {} };
  } catch (err) {
    if (err instanceof InputError) return undefined;
    throw err;
  }
}
