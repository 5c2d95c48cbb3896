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
  files: { role: 'model' | 'table'; path: string; sha256: string }[];
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
    checkContained(tablePath, modelFile.path, options.trustedFolders ?? [], namedAt);
    const table = await readInputFile(tablePath, { namedAt, what: 'condition table' });
    tables[ref.file] = { path: table.path, text: table.text };
    files.push({ role: 'table', path: table.path, sha256: table.sha256 });
  }
  return { model: parseModel(modelFile.text, modelFile.path, tables, options.knownPhases), files };
}

function checkContained(tablePath: string, modelPath: string, trusted: readonly string[], namedAt: Omit<InputIssue, 'message' | 'code'>): void {
  const modelFolder = dirname(modelPath);
  if ([modelFolder, ...trusted].some((folder) => isInside(tablePath, folder))) return;
  throw new InputError([
    {
      ...namedAt,
      message: `the condition table ${tablePath} lies outside the model's folder ${realOrSelf(modelFolder)}; a model may name only files inside its folder (--trust-folder <folder> allows another)`,
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
