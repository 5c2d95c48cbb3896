/**
 * Load a model file (`format: modalgate-model/1`, YAML or JSON) into the normalised, SI
 * AircraftModel. Pure: text in, model out; a condition table (`conditionTable:`) comes in as
 * text too, keyed by its `file` as written in the model file. Every problem, schema and
 * semantic, in the model file and in its table, is collected and thrown at once as one
 * InputError, sorted by file (model file first) and place.
 */
import type { z } from 'zod';
import { dedupeIssues, formatPath, InputError, type InputIssue } from '../errors.js';
import { buildCondition, type BuildSettings } from '../model/build-condition.js';
import type { ModelProblem } from '../model/problem.js';
import type { AircraftModel, FlightCondition, MeasuredResponse, Place, WrittenNaming } from '../types.js';
import { defaultGravity, STANDARD_GRAVITY } from '../units.js';
import { readConditionTable, type RowPlace } from './condition-table.js';
import { readFrequencyResponse } from './frequency-response-file.js';
import { conditionSchema, conditionTableSchema, modelFileSchema, type WrittenCondition, type WrittenConditionTable } from './model-schema.js';
import { quickCheck } from './quick-check.js';
import { parseStructuredText, type StructuredText } from './structured-text.js';
import { issuesFromZod } from './zod-issues.js';

/** The text of a table named by the model file, and the path to show for it. */
export interface TableText {
  path: string;
  text: string;
}

/** One condition to check and build, wherever it was written. */
interface Entry {
  raw: unknown;
  /** path prefix of its problems (from the model file root for a written condition, empty for a row) */
  path: (string | number)[];
  place: Place;
  /**
   * The place again, found only when asked, by a function that holds neither the parsed text
   * nor this entry: a built condition keeps it for the whole run, and keeping the parsed tree
   * of a large sweep alive beside the built conditions made every garbage collection longer.
   */
  placeLater: () => Place;
  /** fields already reported as unreadable: no second issue for them */
  unreadable: (string | number)[][];
  /** how the condition's numbers are named in the files */
  naming: WrittenNaming;
  notes: string[];
  issuesOf(error: z.ZodError): InputIssue[];
  issueOf(problem: ModelProblem): InputIssue;
}

const acceptsCondition = quickCheck(conditionSchema);

/**
 * The flight phases the criteria sets of the run know (phase code -> the ids of the sets that
 * give it a category); with it, a condition's unknown phase is reported at its `phase` field
 * (or table cell) with every other problem of the file.
 */
export type KnownPhases = { sets: { id: string; phases: string[] }[] };

export function parseModel(
  text: string,
  file: string,
  tables: Record<string, TableText> = {},
  known?: KnownPhases,
  responseFiles: Record<string, TableText> = {},
): AircraftModel {
  const source = parseStructuredText(text, file);
  const issues: InputIssue[] = [];

  const top = modelFileSchema.safeParse(source.value);
  if (!top.success) issues.push(...issuesFromZod(top.error, source));

  const root = isRecord(source.value) ? source.value : {};
  const units = top.success ? top.data.units : undefined;
  const settings: BuildSettings | undefined = units && {
    units,
    gravity: top.success && top.data.gravity !== undefined ? top.data.gravity : defaultGravity(units),
    gravityOrigin: top.success && top.data.gravity !== undefined ? 'given in the file' : `default for ${units} input`,
  };
  if (isRecord(source.value) && root['conditions'] === undefined && root['conditionTable'] === undefined) {
    issues.push({ file, line: 1, column: 1, field: 'conditions', message: 'no conditions', expected: 'conditions: [..] and/or conditionTable: {..}', found: 'neither', code: 'missing' });
  }

  const entries: Entry[] = writtenEntries(root, source);
  // A table is read even under a broken header, so that its problems show too.
  const table = top.success ? top.data.conditionTable : conditionTableSchema.safeParse(root['conditionTable']).data;
  if (table) {
    const read = tableEntries(table, tables, source);
    // push(...x) would run out of stack for a table of a hundred thousand rows
    for (const issue of read.issues) issues.push(issue);
    for (const entry of read.entries) entries.push(entry);
  }
  for (const issue of duplicateIds(entries)) issues.push(issue);

  const conditions: FlightCondition[] = [];
  for (const entry of entries) {
    // Most conditions of a large sweep are fine: a quick check lets them skip zod's full parse.
    let written: WrittenCondition;
    if (acceptsCondition(entry.raw)) {
      written = entry.raw as WrittenCondition;
    } else {
      const parsed = conditionSchema.safeParse(entry.raw);
      if (!parsed.success) {
        issues.push(...entry.issuesOf(withoutUnreadable(parsed.error, entry.unreadable)));
        continue;
      }
      written = parsed.data;
    }
    if (entry.unreadable.length > 0) continue;
    // Without a valid header the condition is still checked (shapes, forms) so that every
    // problem shows at once; its numbers are read as SI only for that and then dropped.
    const unknownIn = known?.sets.filter((set) => !set.phases.includes(written.phase)) ?? [];
    if (unknownIn.length > 0) {
      const phases = [...new Set(known!.sets.flatMap((set) => set.phases))];
      issues.push(
        entry.issueOf({
          path: [...entry.path, 'phase'],
          message: `flight phase '${written.phase}' has no category in criteria set${unknownIn.length > 1 ? 's' : ''} ${unknownIn.map((set) => `'${set.id}'`).join(', ')}`,
          expected: phases.join(' | ') || 'a phase listed under phaseCategories of the criteria set',
          found: JSON.stringify(written.phase),
          code: 'unknown_phase',
        }),
      );
    }
    const built = buildCondition(written, settings ?? CHECK_ONLY, entry.path);
    if (!built.ok) {
      issues.push(...built.problems.map((p) => entry.issueOf(p)));
      continue;
    }
    const measured = readResponses(written, responseFiles, entry);
    if (measured.issues.length > 0) {
      for (const issue of measured.issues) issues.push(issue);
      continue;
    }
    if (!settings) continue;
    const writtenSource = { condition: written as Record<string, unknown>, ...settings, naming: entry.naming };
    conditions.push(
      withLazyPlace(
        { ...built.value, frequencyResponses: measured.responses, notes: [...built.value.notes, ...entry.notes], written: writtenSource },
        entry.placeLater,
      ),
    );
  }

  const unique = dedupeIssues(issues);
  if (unique.length > 0 || !top.success) throw new InputError(sortByPlace(unique, file));
  return {
    file,
    aircraft: { name: top.data.aircraft.name, class: top.data.aircraft.class },
    units: top.data.units,
    conditions,
    ...(source.warnings ? { warnings: source.warnings } : {}),
  };
}

/** The condition's frequency-response files, read (every bad row of every file reported). */
function readResponses(written: WrittenCondition, files: Record<string, TableText>, entry: Entry): { responses: MeasuredResponse[]; issues: InputIssue[] } {
  const responses: MeasuredResponse[] = [];
  const issues: InputIssue[] = [];
  const seen = new Set<string>();
  (written.frequencyResponses ?? []).forEach((spec, j) => {
    const pair = `${spec.input} -> ${spec.output}`;
    if (seen.has(pair)) {
      issues.push(entry.issueOf({ path: [...entry.path, 'frequencyResponses', j, 'output'], message: `a second ${pair} response`, expected: 'one file per input and output', found: spec.output, code: 'duplicate_name' }));
      return;
    }
    seen.add(pair);
    const text = files[spec.file];
    if (!text) {
      issues.push(entry.issueOf({ path: [...entry.path, 'frequencyResponses', j, 'file'], message: `frequency-response file ${spec.file} was not read`, expected: 'the file beside the model', found: spec.file, code: 'unreadable' }));
      return;
    }
    const read = readFrequencyResponse(spec, text);
    if (read.response) responses.push(read.response);
    for (const issue of read.issues) issues.push(issue);
  });
  return { responses, issues };
}

const CHECK_ONLY: BuildSettings = { units: 'SI', gravity: STANDARD_GRAVITY, gravityOrigin: 'check only' };

function writtenEntries(root: Record<string, unknown>, source: StructuredText): Entry[] {
  const raw = Array.isArray(root['conditions']) ? (root['conditions'] as unknown[]) : [];
  const { file, locate } = source;
  return raw.map((condition, i) => {
    const path = ['conditions', i];
    const placeLater = (): Place => ({ file, ...(locate(path) ?? {}) });
    return {
      raw: condition,
      path,
      get place() {
        return placeLater();
      },
      placeLater,
      unreadable: [],
      naming: { in: 'model', prefix: path },
      notes: [],
      issuesOf: (error) => issuesFromZod(prefixed(error, path), source),
      issueOf: (problem) => issueFromProblem(problem, source),
    };
  });
}

function tableEntries(table: WrittenConditionTable, tables: Record<string, TableText>, source: StructuredText): { entries: Entry[]; issues: InputIssue[] } {
  const text = tables[table.file];
  if (!text) {
    const problem = { path: ['conditionTable', 'file'], message: `table '${table.file}' was not read`, expected: 'its text, passed to parseModel (loadModel reads it)', found: 'nothing', code: 'table_missing' };
    return { entries: [], issues: [issueFromProblem(problem, source)] };
  }
  const read = readConditionTable(table, text);
  // A wrong column mapping is pointed at by its key (the field path), not by its header.
  const atKey = (p: ModelProblem) => p.path.length === 3 && p.path[1] === 'columns';
  const issues = [...read.issues, ...read.problems.map((p) => issueFromProblem(p, source, atKey(p)))];
  const toIssue = (place: RowPlace, rest: Omit<InputIssue, 'file' | 'line' | 'column' | 'field'>, atKey = false): InputIssue => {
    if (place.in === 'table') return { file: text.path, line: place.line, ...(place.column !== undefined ? { column: place.column } : {}), field: place.field, ...rest };
    const pos = (atKey ? source.locateKey?.(place.path) : undefined) ?? source.locate(place.path);
    return { file: source.file, ...(pos ?? {}), field: place.field, ...rest };
  };
  const entries = read.rows.map((row): Entry => {
    const place: Place = { file: text.path, line: row.line };
    return {
      raw: row.value,
      path: [],
      place,
      placeLater: () => place,
      unreadable: row.unreadable,
      naming: { in: 'table', file: text.path, line: row.line, columns: read.columns },
      notes: row.notes,
      issuesOf: (error) =>
        error.issues.map((zodIssue) => {
          // An unknown field is placed by its own key, which only common can hold.
          const unknownKey = zodIssue.code === 'unrecognized_keys' ? (zodIssue as { keys: string[] }).keys[0] : undefined;
          const path = [...(zodIssue.path as (string | number)[]), ...(unknownKey !== undefined ? [unknownKey] : [])];
          const one = { issues: [zodIssue] } as unknown as z.ZodError;
          // issuesFromZod words the issue; the place and field are the row's.
          const [worded] = issuesFromZod(one, { value: row.value, file: text.path, locate: () => undefined });
          const { file: _f, line: _l, column: _c, field: _field, ...rest } = worded!;
          return toIssue(row.placeOf(path), rest, unknownKey !== undefined);
        }),
      issueOf: (problem) => {
        const { path, ...rest } = problem;
        return toIssue(row.placeOf(path), rest);
      },
    };
  });
  return { entries, issues };
}

function duplicateIds(entries: Entry[]): InputIssue[] {
  const seen = new Map<string, Entry>();
  const out: InputIssue[] = [];
  for (const entry of entries) {
    const id = isRecord(entry.raw) ? entry.raw['id'] : undefined;
    if (typeof id !== 'string') continue;
    const first = seen.get(id);
    if (first === undefined) {
      seen.set(id, entry);
      continue;
    }
    const firstPlace = first.issueOf({ path: [...first.path, 'id'], message: '', code: '' });
    const where = firstPlace.line === undefined ? formatPath([...first.path]) : `${firstPlace.file === entry.place.file ? '' : `${firstPlace.file} `}line ${firstPlace.line}`;
    out.push(
      entry.issueOf({
        path: [...entry.path, 'id'],
        message: `condition id '${id}' is used twice (first at ${where})`,
        expected: 'a unique id',
        found: JSON.stringify(id),
        code: 'duplicate_id',
      }),
    );
  }
  return out;
}

function issueFromProblem(problem: ModelProblem, source: StructuredText, atKey = false): InputIssue {
  const pos = (atKey ? source.locateKey?.(problem.path) : undefined) ?? source.locate(problem.path);
  return {
    file: source.file,
    ...(pos ?? {}),
    field: formatPath(problem.path),
    message: problem.message,
    ...(problem.expected !== undefined ? { expected: problem.expected } : {}),
    ...(problem.found !== undefined ? { found: problem.found } : {}),
    code: problem.code,
  };
}

/** A ZodError of one condition, with its paths made relative to the file. */
function prefixed<E extends { issues: { path: PropertyKey[] }[] }>(error: E, prefix: (string | number)[]): E {
  for (const issue of error.issues) issue.path = [...prefix, ...issue.path];
  return error;
}

/** A cell that could not be read is reported once, not again as a missing field. */
function withoutUnreadable(error: z.ZodError, unreadable: (string | number)[][]): z.ZodError {
  if (unreadable.length === 0) return error;
  const keep = error.issues.filter((issue) => !unreadable.some((u) => u.every((k, i) => issue.path[i] === k)));
  return { issues: keep } as unknown as z.ZodError;
}

/** The model file first, then each table; within a file, by line and column. */
function sortByPlace(issues: InputIssue[], modelFile: string): InputIssue[] {
  const order = (f: string) => (f === modelFile ? 0 : 1);
  return [...issues].sort((a, b) => order(a.file) - order(b.file) || a.file.localeCompare(b.file) || (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
}

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

/**
 * A condition's line and column are looked up only when something asks for them (an error
 * after loading, e.g. an unknown phase): locating costs a pass over the text, and a sweep of
 * ten thousand good conditions never needs it.
 */
function withLazyPlace(condition: Omit<FlightCondition, 'place'>, locate: () => Place): FlightCondition {
  let place: Place | undefined;
  return Object.defineProperty(condition, 'place', {
    enumerable: true,
    configurable: true,
    get: () => (place ??= locate()),
  }) as FlightCondition;
}
