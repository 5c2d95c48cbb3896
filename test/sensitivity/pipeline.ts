/**
 * The whole pipeline from model text to findings, for checking sensitivities from outside:
 * a model object (and its table's text) is written out as text with one number changed,
 * parsed, analysed and evaluated, exactly as `modalgate check` does.
 */
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import { parseModel, type TableText } from '../../src/load/model-file.js';
import { checkOneCondition } from '../../src/sweep/check-conditions.js';
import type { ConditionResult, Finding, ResolvedCriteriaSet, SensitivityChoice } from '../../src/types.js';

export const TABLE = 'rows.csv';

export interface ModelText {
  model: Record<string, unknown>;
  /** CSV text of the condition table, when the model names one */
  table?: string;
}

let milSet: ResolvedCriteriaSet | undefined;
export async function shippedSet(): Promise<ResolvedCriteriaSet> {
  milSet ??= (await loadCriteriaSet('mil-f-8785c')).set;
  return milSet;
}

export function checkText(input: ModelText, set: ResolvedCriteriaSet, choice: SensitivityChoice): ConditionResult[] {
  const tables: Record<string, TableText> = input.table !== undefined ? { [TABLE]: { path: TABLE, text: input.table } } : {};
  const model = parseModel(JSON.stringify(input.model), 'model.json', tables);
  return model.conditions.map((c) => checkOneCondition(c, model.aircraft.class, [set], { modeShapes: true }, [], choice));
}

/** The model with the number named `parameter` (as the results name it) set to `value`. */
export function changed(input: ModelText, parameter: string, value: number): ModelText {
  const cell = /^(.+):(\d+):([^:]+)$/.exec(parameter);
  if (cell) {
    const [, file, line, header] = cell;
    if (file !== TABLE || input.table === undefined) throw new Error(`no table ${file}`);
    const lines = input.table.split('\n');
    const heads = lines[0]!.split(',');
    const col = heads.indexOf(header!);
    const cells = lines[Number(line) - 1]!.split(',');
    cells[col] = String(value);
    lines[Number(line) - 1] = cells.join(',');
    return { ...input, table: lines.join('\n') };
  }
  const model = structuredClone(input.model);
  const keys = [...parameter.matchAll(/([A-Za-z_][A-Za-z0-9_]*)|\[(\d+)\]/g)].map((m) => (m[2] !== undefined ? Number(m[2]) : m[1]!));
  let node = model as Record<string | number, unknown>;
  for (const key of keys.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  const last = keys[keys.length - 1]!;
  if (typeof node[last] !== 'number') throw new Error(`${parameter} is not a number of the model`);
  node[last] = value;
  return { ...input, model };
}

/** The same finding (criterion, set, mode kind, and which of them) in another run. */
export function sameFinding(findings: readonly Finding[], all: readonly Finding[], finding: Finding): Finding | undefined {
  const same = (f: Finding) => f.criterion === finding.criterion && f.set === finding.set && f.mode === finding.mode;
  const ordinal = all.slice(0, all.indexOf(finding)).filter(same).length;
  return findings.filter(same)[ordinal];
}
