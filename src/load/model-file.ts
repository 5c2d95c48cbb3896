/**
 * Load a model file (`format: modalgate-model/1`, YAML or JSON) into the normalised, SI
 * AircraftModel. Pure: text in, model out. Every problem in the file, schema and semantic, is
 * collected and thrown at once as one InputError, sorted by place.
 */
import { formatPath, InputError, type InputIssue } from '../errors.js';
import { buildCondition, type BuildSettings } from '../model/build-condition.js';
import type { ModelProblem } from '../model/problem.js';
import type { AircraftModel, FlightCondition } from '../types.js';
import { defaultGravity, STANDARD_GRAVITY } from '../units.js';
import { conditionSchema, modelFileSchema } from './model-schema.js';
import { parseStructuredText, type StructuredText } from './structured-text.js';
import { issuesFromZod } from './zod-issues.js';

export function parseModel(text: string, file: string): AircraftModel {
  const source = parseStructuredText(text, file);
  const issues: InputIssue[] = [];

  const top = modelFileSchema.safeParse(source.value);
  if (!top.success) issues.push(...issuesFromZod(top.error, source));

  const root = isRecord(source.value) ? source.value : {};
  const rawConditions = Array.isArray(root['conditions']) ? (root['conditions'] as unknown[]) : [];
  const units = top.success ? top.data.units : undefined;
  const settings: BuildSettings | undefined = units && {
    units,
    gravity: top.success && top.data.gravity !== undefined ? top.data.gravity : defaultGravity(units),
    gravityOrigin: top.success && top.data.gravity !== undefined ? 'given in the file' : `default for ${units} input`,
  };

  issues.push(...duplicateIds(rawConditions, source));

  const conditions: FlightCondition[] = [];
  rawConditions.forEach((raw, i) => {
    const path = ['conditions', i];
    const parsed = conditionSchema.safeParse(raw);
    if (!parsed.success) {
      issues.push(...issuesFromZod(prefixed(parsed.error, path), source));
      return;
    }
    // Without a valid header the condition is still checked (shapes, forms) so that every
    // problem shows at once; its numbers are read as SI only for that and then dropped.
    const built = buildCondition(parsed.data, settings ?? CHECK_ONLY, path);
    if (!built.ok) {
      issues.push(...built.problems.map((p) => issueFromProblem(p, source)));
      return;
    }
    if (!settings) return;
    const pos = source.locate(path);
    conditions.push({ ...built.value, place: { file, ...(pos ?? {}) } });
  });

  const unique = dedupe(issues);
  if (unique.length > 0 || !top.success) throw new InputError(sortByPlace(unique));
  return {
    file,
    aircraft: { name: top.data.aircraft.name, class: top.data.aircraft.class },
    units: top.data.units,
    conditions,
  };
}

const CHECK_ONLY: BuildSettings = { units: 'SI', gravity: STANDARD_GRAVITY, gravityOrigin: 'check only' };

function duplicateIds(conditions: unknown[], source: StructuredText): InputIssue[] {
  const seen = new Map<string, number>();
  const out: InputIssue[] = [];
  conditions.forEach((c, i) => {
    const id = isRecord(c) ? c['id'] : undefined;
    if (typeof id !== 'string') return;
    const first = seen.get(id);
    if (first === undefined) {
      seen.set(id, i);
      return;
    }
    const firstPos = source.locate(['conditions', first, 'id']);
    out.push(
      issueFromProblem(
        {
          path: ['conditions', i, 'id'],
          message: `condition id '${id}' is used twice (first at ${firstPos ? `line ${firstPos.line}` : `conditions[${first}]`})`,
          expected: 'a unique id',
          found: JSON.stringify(id),
          code: 'duplicate_id',
        },
        source,
      ),
    );
  });
  return out;
}

function issueFromProblem(problem: ModelProblem, source: StructuredText): InputIssue {
  const pos = source.locate(problem.path);
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

function dedupe(issues: InputIssue[]): InputIssue[] {
  const seen = new Set<string>();
  return issues.filter((i) => {
    const key = `${i.line}:${i.column}:${i.field}:${i.message}:${i.code}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

function sortByPlace(issues: InputIssue[]): InputIssue[] {
  return [...issues].sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
}

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}
