/**
 * Read a model file and the condition table it names (I/O), then parse them with the pure
 * parseModel. Every file read is returned with its SHA-256, for the results' inputs.
 */
import { dirname, isAbsolute, join } from 'node:path';
import { InputError } from '../errors.js';
import type { AircraftModel } from '../types.js';
import { parseModel, type TableText } from './model-file.js';
import { readInputFile } from './read-file.js';
import { parseStructuredText } from './structured-text.js';

export interface LoadedModel {
  model: AircraftModel;
  files: { role: 'model' | 'table'; path: string; sha256: string }[];
}

export async function loadModel(path: string): Promise<LoadedModel> {
  const modelFile = await readInputFile(path);
  const files: LoadedModel['files'] = [{ role: 'model', path: modelFile.path, sha256: modelFile.sha256 }];
  const tables: Record<string, TableText> = {};
  const ref = tableReference(modelFile.text, modelFile.path);
  if (ref !== undefined) {
    // Relative to the model file, shown the way the model file's own path was given.
    const tablePath = isAbsolute(ref) ? ref : join(dirname(modelFile.path), ref);
    const table = await readInputFile(tablePath);
    tables[ref] = { path: table.path, text: table.text };
    files.push({ role: 'table', path: table.path, sha256: table.sha256 });
  }
  return { model: parseModel(modelFile.text, modelFile.path, tables), files };
}

/**
 * The table file the model names, if any. The model is parsed here only when it mentions a
 * table at all (a large JSON sweep is not parsed twice); a broken file is left to parseModel,
 * which reports it properly.
 */
function tableReference(text: string, file: string): string | undefined {
  if (!text.includes('conditionTable')) return undefined;
  try {
    const value = parseStructuredText(text, file).value as { conditionTable?: { file?: unknown } } | null;
    const ref = value?.conditionTable?.file;
    return typeof ref === 'string' && ref !== '' ? ref : undefined;
  } catch (err) {
    if (err instanceof InputError) return undefined;
    throw err;
  }
}
