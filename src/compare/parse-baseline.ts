/**
 * Read a baseline results file (`modalgate-results/1`, contract 2). The schema is lenient: it
 * asks for what a comparison needs and the contract promises (inputs, aircraft, conditions
 * with their modes and findings), ignores unknown fields, and accepts a file from an older
 * writer that lacks the fields a comparison does not use. Those are filled with stand-ins
 * that say so (empty text, NaN numbers) and the condition's notes name every one, so nothing
 * is passed off as read from the file.
 */
import { z } from 'zod';
import { InputError, type InputIssue } from '../errors.js';
import { parseStructuredText } from '../load/structured-text.js';
import { issuesFromZod } from '../load/zod-issues.js';
import { countVerdicts } from '../results.js';
import { evidenceClasses, quantities, sourceKinds } from '../load/criteria-schema.js';
import type { ConditionResult, Finding, ResultMode, Results } from '../types.js';

const modeKind = z.enum(['short_period', 'phugoid', 'dutch_roll', 'roll', 'spiral', 'roll_spiral', 'kinematic', 'other']);
// the quantities the criteria files may name: a results file holds findings of any of them
const quantity = z.enum(quantities);
const verdict = z.enum(['pass', 'marginal', 'fail', 'not_evaluated']);
const level = z.literal([1, 2, 3]);
/** JSON has no infinity: the results writer turns infinite figures into null. */
const figure = z.number().nullable();
const bound = z.object({ min: z.number().optional(), max: z.number().optional() });

const modeSchema = z.object({
  kind: modeKind,
  eigenvalues: z.array(z.object({ re: z.number(), im: z.number() })),
  naturalFrequency: figure,
  dampingRatio: figure,
  dampedFrequency: figure.optional(),
  period: figure.optional(),
  timeConstant: figure.optional(),
  timeToHalf: figure.optional(),
  timeToDouble: figure.optional(),
  cyclesToHalf: figure.optional(),
  basis: z.string().optional(),
  ambiguous: z.boolean().optional(),
});

const findingSchema = z.object({
  criterion: z.string(),
  set: z.string().optional(),
  title: z.string().optional(),
  mode: modeKind,
  quantity,
  value: figure,
  unit: z.string().optional(),
  level: level.nullable(),
  verdict,
  margin: figure,
  bounds: z.object({ '1': bound.optional(), '2': bound.optional(), '3': bound.optional() }).optional(),
  source: z.string().optional(),
  evidence: z.object({ class: z.enum(evidenceClasses), sources: z.array(z.string()) }).optional(),
  /** results written before evidence classes: 'published' | 'memory' */
  confidence: z.enum(['published', 'memory']).optional(),
  reason: z.string().optional(),
  method: z.string().optional(),
});

const conditionSchema = z.object({
  id: z.string(),
  phase: z.string(),
  category: z.enum(['A', 'B', 'C']).nullable().optional(),
  requiredLevel: level,
  requiredLevelFrom: z.enum(['model', 'criteria default']).optional(),
  airspeed: z.number().optional(),
  altitude: z.number().nullable().optional(),
  form: z.enum(['stateSpace', 'derivatives', 'nondimensional', 'mixed']).optional(),
  subsystems: z
    .object({ longitudinal: z.array(z.string()), lateral: z.array(z.string()), kinematic: z.array(z.string()), other: z.array(z.string()) })
    .optional(),
  coupling: z.number().optional(),
  modes: z.array(modeSchema),
  findings: z.array(findingSchema),
  warnings: z.array(z.string()).optional(),
  notes: z.array(z.string()).optional(),
});

const resultsSchema = z.object({
  format: z.literal('modalgate-results/1'),
  tool: z.object({ name: z.literal('modalgate'), version: z.string() }),
  generatedAt: z.string().optional(),
  command: z.array(z.string()).optional(),
  inputs: z.array(z.object({ role: z.enum(['model', 'criteria', 'table', 'response', 'baseline']), path: z.string(), sha256: z.string() })),
  aircraft: z.object({ name: z.string(), class: z.enum(['I', 'II-L', 'II-C', 'III', 'IV']) }),
  criteriaSets: z
    .array(
      z.object({
        id: z.string(),
        title: z.string().optional(),
        chain: z.array(z.string()).optional(),
        sources: z
          .array(
            z.object({
              id: z.string(),
              kind: z.enum(sourceKinds),
              title: z.string(),
              reproduces: z.string().optional(),
              where: z.string().optional(),
              note: z.string().optional(),
              set: z.string(),
            }),
          )
          .optional(),
      }),
    )
    .optional(),
  conditions: z.array(conditionSchema),
});

type WrittenCondition = z.infer<typeof conditionSchema>;

/** Parse and check a baseline results file; every problem is reported at once with its place. */
export function parseBaselineResults(text: string, file: string): Results {
  const source = parseStructuredText(text, file);
  const parsed = resultsSchema.safeParse(source.value);
  if (!parsed.success) throw new InputError(issuesFromZod(parsed.error, source));
  const written = parsed.data;

  const issues: InputIssue[] = [];
  const firstIndex = new Map<string, number>();
  written.conditions.forEach((c, i) => {
    const first = firstIndex.get(c.id);
    if (first === undefined) {
      firstIndex.set(c.id, i);
      return;
    }
    const field = `conditions[${i}].id`;
    const pos = source.locate(['conditions', i, 'id']);
    issues.push({
      file,
      ...(pos ?? {}),
      field,
      message: `condition id already used by conditions[${first}]`,
      expected: 'a unique condition id',
      found: JSON.stringify(c.id),
      code: 'duplicate_id',
    });
  });
  if (issues.length > 0) throw new InputError(issues);

  const conditions = written.conditions.map(toConditionResult);
  const summary = countVerdicts(conditions.flatMap((c) => c.findings));
  return {
    format: written.format,
    tool: written.tool,
    generatedAt: written.generatedAt ?? '',
    command: written.command ?? [],
    inputs: written.inputs,
    aircraft: written.aircraft,
    criteriaSets: (written.criteriaSets ?? []).map((s) => ({
      id: s.id,
      title: s.title ?? '',
      chain: s.chain ?? [s.id],
      sources: (s.sources ?? []).map((x) => ({ ...x })),
    })),
    // the comparison reads no mode shapes, so none are taken from the baseline
    contents: { modeShapes: false },
    summary,
    conditions,
  };
}

function toConditionResult(c: WrittenCondition): ConditionResult {
  const missing: string[] = [];
  const take = <T>(value: T | undefined, name: string, standIn: T): T => {
    if (value !== undefined) return value;
    missing.push(name);
    return standIn;
  };
  const legacy = c.findings.some((f) => f.evidence === undefined);
  const findings: Finding[] = c.findings.map((f) => ({
    criterion: f.criterion,
    set: f.set ?? '',
    title: f.title ?? '',
    mode: f.mode,
    quantity: f.quantity,
    value: f.value,
    unit: f.unit ?? '',
    level: f.level,
    verdict: f.verdict,
    margin: f.margin,
    bounds: f.bounds ?? {},
    source: f.source ?? '',
    evidence: f.evidence ?? legacyEvidence(f.confidence),
    reason: f.reason ?? '',
    ...(f.method !== undefined ? { method: f.method } : {}),
  }));
  if (legacy) missing.push('findings[].evidence (taken from `confidence`: published as secondary, otherwise memory)');
  const modes: ResultMode[] = c.modes.map((m) => ({
    kind: m.kind,
    eigenvalues: m.eigenvalues,
    naturalFrequency: m.naturalFrequency,
    dampingRatio: m.dampingRatio,
    dampedFrequency: m.dampedFrequency ?? null,
    period: m.period ?? null,
    timeConstant: m.timeConstant ?? null,
    timeToHalf: m.timeToHalf ?? null,
    timeToDouble: m.timeToDouble ?? null,
    cyclesToHalf: m.cyclesToHalf ?? null,
    basis: m.basis ?? '',
    ambiguous: m.ambiguous ?? false,
  }));
  const result: ConditionResult = {
    id: c.id,
    phase: c.phase,
    category: c.category ?? null,
    requiredLevel: c.requiredLevel,
    requiredLevelFrom: take(c.requiredLevelFrom, 'requiredLevelFrom', 'criteria default'),
    airspeed: take(c.airspeed, 'airspeed', Number.NaN),
    altitude: c.altitude ?? null,
    form: take(c.form, 'form', 'stateSpace'),
    subsystems: take(c.subsystems, 'subsystems', { longitudinal: [], lateral: [], kinematic: [], other: [] }),
    coupling: take(c.coupling, 'coupling', Number.NaN),
    modes,
    findings,
    warnings: c.warnings ?? [],
    notes: c.notes ?? [],
    notApplicable: [],
    // a baseline is compared by its findings and modes; its responses are not read back
    responses: null,
  };
  if (missing.length > 0) result.notes = [...result.notes, `baseline file gave no ${missing.join(', ')}: stand-ins used, not for display`];
  return result;
}

/**
 * Results written before evidence classes carry `confidence`: its 'published' meant "read in a
 * reproduction of the table", which is `secondary`; unknown provenance is `memory`, the least
 * trusted class.
 */
function legacyEvidence(confidence: 'published' | 'memory' | undefined): Finding['evidence'] {
  return { class: confidence === 'published' ? 'secondary' : 'memory', sources: [] };
}
