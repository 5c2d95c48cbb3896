/**
 * Resolve a chain of criteria files (root first, each extending the one before) into one
 * ResolvedCriteriaSet: inherit, override by criterion id, drop with a reason, add. Pure: the
 * files are read and validated in src/load/criteria-file.ts.
 */
import { didYouMean } from '../did-you-mean.js';
import { InputError, describeFound, formatPath, type InputIssue } from '../errors.js';
import {
  PROGRAMME_VALUE, type BoundInput, type CriterionInput, type EvidenceEntryInput, type OverrideInput,
} from '../load/criteria-schema.js';
import type {
  Bound, Category, Evidence, Level, LevelBounds, LevelRegions, Quantity, ResolvedCriteriaSet, ResolvedCriterion, SourceEntry,
} from '../types.js';
import { citationProblems } from './evidence.js';
import { expandLevels, LEVELS, levelKey, type LevelKey } from './level-bounds.js';
import { expandRegions, inRegion } from './level-regions.js';
import { DEFAULT_ABSOLUTE_BAND, DEFAULT_RELATIVE_BAND } from './marginal-band.js';
import type { ParsedCriteriaFile } from './parsed-criteria-file.js';

interface Origin {
  file: ParsedCriteriaFile;
  path: PropertyKey[];
}

/** Evidence while the chain is walked, with where it was written. */
interface WorkingEvidence {
  evidence: Evidence;
  origin: Origin;
}

/** A criterion while the chain is walked: bounds may still hold the programme placeholder. */
interface Working {
  criterion: Omit<ResolvedCriterion, 'levels' | 'evidence' | 'paramEvidence'>;
  levels: Partial<Record<LevelKey, BoundInput>>;
  /** where each listed level was last written */
  levelOrigin: Partial<Record<LevelKey, Origin>>;
  /** evidence of each listed level */
  evidence: Partial<Record<LevelKey, WorkingEvidence>>;
  paramEvidence: (WorkingEvidence & { params: string[] })[];
  /** where the criterion was defined */
  origin: Origin;
  /** where the region was last written, for a region criterion */
  regionOrigin?: Origin;
}

export function resolveCriteriaChain(files: ParsedCriteriaFile[]): ResolvedCriteriaSet {
  const leaf = files[files.length - 1];
  if (!leaf) throw new InputError([{ file: '', field: '', message: 'no criteria file given', code: 'empty_chain' }]);
  const issues: InputIssue[] = [];
  const issueAt = (origin: Origin, message: string, code: string, found?: unknown): InputIssue => ({
    file: origin.file.file,
    ...(origin.file.locate(origin.path) ?? {}),
    field: formatPath(origin.path),
    message,
    code,
    ...(found !== undefined ? { found: describeFound(found) } : {}),
  });

  const working = new Map<string, Working>();
  const dropped: ResolvedCriteriaSet['dropped'] = [];
  const phaseCategories: Record<string, Category> = {};
  const notes: string[] = [];
  let requiredLevel: Level | undefined;
  let relativeBand: number | undefined;
  const absoluteBand: Partial<Record<Quantity, number>> = {};
  const sources = new Map<string, SourceEntry>();

  for (const file of files) {
    const data = file.data;
    (data.sources ?? []).forEach((entry, j) => {
      const earlier = sources.get(entry.id);
      if (earlier) {
        issues.push(issueAt({ file, path: ['sources', j, 'id'] }, `source id '${entry.id}' is already listed by set '${earlier.set}': cite it, or give this source an id of its own`, 'duplicate_id', entry.id));
        return;
      }
      sources.set(entry.id, {
        id: entry.id,
        kind: entry.kind,
        title: entry.title.trim(),
        ...(entry.reproduces !== undefined ? { reproduces: entry.reproduces.trim() } : {}),
        ...(entry.where !== undefined ? { where: entry.where.trim() } : {}),
        ...(entry.note !== undefined && entry.note.trim() !== '' ? { note: entry.note.trim() } : {}),
        set: data.id,
      });
    });
    Object.assign(phaseCategories, data.phaseCategories ?? {});
    if (data.requiredLevel !== undefined) requiredLevel = data.requiredLevel;
    if (data.marginalBand?.relative !== undefined) relativeBand = data.marginalBand.relative;
    for (const [q, band] of Object.entries(data.marginalBand?.absolute ?? {})) {
      if (band !== undefined) absoluteBand[q as Quantity] = band;
    }
    if (data.notes !== undefined && data.notes.trim() !== '') notes.push(data.notes.trim());

    const droppedHere = new Set((data.drop ?? []).map((d) => d.id));
    (data.overrides ?? []).forEach((override, j) => {
      const at: Origin = { file, path: ['overrides', j, 'id'] };
      const target = working.get(override.id);
      if (!target) {
        issues.push(issueAt(at, `no criterion '${override.id}' in the sets this file extends${didYouMean(override.id, [...working.keys()])}`, 'unknown_id', override.id));
      } else if (droppedHere.has(override.id)) {
        issues.push(issueAt(at, `criterion '${override.id}' is both overridden and dropped in this file`, 'override_and_drop'));
      } else {
        applyOverride(target, override, { file, path: ['overrides', j] }, data.id, issues, issueAt, notes);
      }
    });
    (data.drop ?? []).forEach((drop, j) => {
      if (!working.has(drop.id)) {
        issues.push(issueAt({ file, path: ['drop', j, 'id'] }, `no criterion '${drop.id}' in the sets this file extends${didYouMean(drop.id, [...working.keys()])}`, 'unknown_id', drop.id));
        return;
      }
      working.delete(drop.id);
      dropped.push({ id: drop.id, reason: drop.reason.trim(), by: data.id });
    });
    const addedHere = new Set<string>();
    (data.criteria ?? []).forEach((criterion, k) => {
      const at: Origin = { file, path: ['criteria', k, 'id'] };
      const existing = working.get(criterion.id);
      if (addedHere.has(criterion.id)) {
        issues.push(issueAt(at, `criterion id '${criterion.id}' is used twice in this file`, 'duplicate_id', criterion.id));
      } else if (existing) {
        issues.push(issueAt(at, `criterion '${criterion.id}' is already defined by set '${existing.criterion.set}': change it under overrides`, 'duplicate_id', criterion.id));
      } else {
        working.set(criterion.id, fromInput(criterion, { file, path: ['criteria', k] }, data.id, issues, issueAt));
      }
      addedHere.add(criterion.id);
    });
  }

  const criteria: ResolvedCriterion[] = [];
  for (const w of working.values()) {
    const levels = checkLevels(w, issues, issueAt, leaf);
    const evidence = checkEvidence(w, sources, issues, issueAt);
    const regionOk = checkRegion(w, issues, issueAt);
    if (levels && evidence && regionOk) criteria.push({ ...w.criterion, levels, ...evidence });
  }
  if (issues.length > 0) throw new InputError(issues);

  if (requiredLevel === undefined) {
    notes.push('No file of this criteria chain sets `requiredLevel`: Level 1 is required where the model gives no level.');
  }
  if (relativeBand === undefined) {
    notes.push(`No file of this criteria chain sets \`marginalBand.relative\`: the default of ${DEFAULT_RELATIVE_BAND * 100} % of the governing boundary is used.`);
  }
  const defaultedAbsolute = (Object.keys(DEFAULT_ABSOLUTE_BAND) as Quantity[]).filter((q) => absoluteBand[q] === undefined);
  const usedQuantities = new Set(criteria.map((c) => c.quantity));
  const defaultedUsed = defaultedAbsolute.filter((q) => usedQuantities.has(q));
  if (defaultedUsed.length > 0) {
    notes.push(
      `Absolute marginal band (used where a boundary is 0) not set for ${defaultedUsed.join(', ')}: defaults ${defaultedUsed
        .map((q) => `${q} ${DEFAULT_ABSOLUTE_BAND[q]}`)
        .join(', ')} (SI units).`,
    );
  }

  return {
    id: leaf.data.id,
    title: leaf.data.title,
    files: files.map((f) => f.file),
    chain: files.map((f) => f.data.id),
    phaseCategories,
    defaultRequiredLevel: requiredLevel ?? 1,
    marginalBand: {
      relative: relativeBand ?? DEFAULT_RELATIVE_BAND,
      absolute: { ...DEFAULT_ABSOLUTE_BAND, ...absoluteBand },
    },
    criteria,
    sources: [...sources.values()],
    dropped,
    notes,
  };
}

function sourceText(source: { document: string; paragraph: string }): string {
  return `${source.document} ${source.paragraph}`;
}

function fromInput(input: CriterionInput, origin: Origin, setId: string, issues: InputIssue[], issueAt: IssueAt): Working {
  const levelOrigin: Working['levelOrigin'] = {};
  for (const key of Object.keys(input.levels ?? {}) as LevelKey[]) {
    levelOrigin[key] = { file: origin.file, path: [...origin.path, 'levels', key] };
  }
  const listed = Object.keys(input.levels ?? input.region?.levels ?? {}) as LevelKey[];
  const written = writtenEvidence(input.evidence, listed, { file: origin.file, path: [...origin.path, 'evidence'] }, setId, input.id, issues, issueAt);
  return {
    criterion: {
      id: input.id,
      set: setId,
      title: input.title,
      mode: input.mode,
      quantity: input.quantity,
      applies: structuredClone(input.applies),
      params: { ...(input.params ?? {}) },
      source: sourceText(input.source),
      note: input.note.trim(),
      ...(input.region ? { region: structuredClone(input.region) as LevelRegions } : {}),
    },
    levels: structuredClone(input.levels ?? {}),
    levelOrigin,
    evidence: written.levels,
    paramEvidence: written.params,
    origin,
    ...(input.region ? { regionOrigin: { file: origin.file, path: [...origin.path, 'region'] } } : {}),
  };
}

/**
 * The evidence entries of one criterion or override, by level and by parameter group. An
 * entry that names neither levels nor params covers `defaultLevels` (every level listed there).
 */
function writtenEvidence(
  entries: readonly EvidenceEntryInput[] | undefined,
  defaultLevels: readonly LevelKey[],
  at: Origin,
  setId: string,
  criterionId: string,
  issues: InputIssue[],
  issueAt: IssueAt,
): { levels: Working['evidence']; params: Working['paramEvidence'] } {
  const levels: Working['evidence'] = {};
  const params: Working['paramEvidence'] = [];
  (entries ?? []).forEach((entry, e) => {
    const origin: Origin = { file: at.file, path: [...at.path, e] };
    const evidence: Evidence = {
      class: entry.class,
      cites: (entry.cites ?? []).map((c) => ({ ...c })),
      note: (entry.note ?? '').trim(),
      by: setId,
    };
    if (entry.params !== undefined) params.push({ evidence, origin, params: [...entry.params] });
    const covered = entry.levels !== undefined ? entry.levels.map((l) => levelKey(l)) : entry.params === undefined ? defaultLevels : [];
    for (const key of covered) {
      if (levels[key]) {
        issues.push(issueAt({ file: at.file, path: [...origin.path, 'levels'] }, `criterion '${criterionId}': Level ${key} is covered by two evidence entries`, 'duplicate_evidence'));
      } else levels[key] = { evidence, origin };
    }
  });
  return { levels, params };
}

/** Change what the override names; record on the criterion that it was changed, and by whom. */
function applyOverride(
  target: Working,
  override: OverrideInput,
  origin: Origin,
  setId: string,
  issues: InputIssue[],
  issueAt: IssueAt,
  notes: string[],
): void {
  const c = target.criterion;
  const changed: string[] = [];
  const givenLevels = (Object.entries(override.levels ?? {}) as [LevelKey, BoundInput | undefined][])
    .filter(([, b]) => b !== undefined)
    .map(([k]) => k);
  const listedAfter = [...new Set([...(Object.keys(target.levels) as LevelKey[]), ...givenLevels])].sort();
  const written = writtenEvidence(
    override.evidence,
    givenLevels.length > 0 ? givenLevels : listedAfter,
    { file: origin.file, path: [...origin.path, 'evidence'] },
    setId,
    override.id,
    issues,
    issueAt,
  );
  if (override.title !== undefined) {
    c.title = override.title;
    changed.push('title');
  }
  if (override.applies !== undefined) {
    c.applies = { ...c.applies, ...structuredClone(override.applies) };
    changed.push('applies');
  }
  if (override.levels !== undefined) {
    for (const [key, bound] of Object.entries(override.levels) as [LevelKey, BoundInput | undefined][]) {
      if (bound === undefined) continue;
      target.levels[key] = { ...bound };
      target.levelOrigin[key] = { file: origin.file, path: [...origin.path, 'levels', key] };
      changed.push(`Level ${key} bounds`);
    }
  }
  if (override.region !== undefined) {
    c.region = structuredClone(override.region) as LevelRegions;
    target.regionOrigin = { file: origin.file, path: [...origin.path, 'region'] };
    changed.push('region');
  }
  if (override.params !== undefined) {
    c.params = { ...c.params, ...override.params };
    changed.push('params');
  }
  // Evidence: what the override states replaces the parent's for the levels it covers; a
  // level whose bounds it changes without stating evidence is shown as programme-set.
  const unstated: LevelKey[] = [];
  for (const key of Object.keys(written.levels) as LevelKey[]) {
    if (!listedAfter.includes(key)) {
      issues.push(issueAt({ file: origin.file, path: [...origin.path, 'evidence'] }, `criterion '${override.id}': evidence for Level ${key}, which neither the override nor its parent lists under \`levels\``, 'evidence'));
    }
  }
  for (const key of listedAfter) {
    const stated = written.levels[key];
    if (stated) target.evidence[key] = stated;
    else if (givenLevels.includes(key)) {
      unstated.push(key);
      target.evidence[key] = {
        evidence: { class: 'programme-set', cites: [], note: `Level ${key} bounds set by ${setId}, which states no evidence for them.`, by: setId },
        origin: { file: origin.file, path: [...origin.path, 'levels', key] },
      };
    }
  }
  const changedParams = Object.keys(override.params ?? {});
  const restated = new Set(written.params.flatMap((p) => p.params));
  const unstatedParams = changedParams.filter((p) => !restated.has(p) && target.paramEvidence.some((g) => g.params.includes(p)));
  for (const name of [...restated, ...unstatedParams]) {
    for (const g of target.paramEvidence) g.params = g.params.filter((p) => p !== name);
  }
  target.paramEvidence = target.paramEvidence.filter((g) => g.params.length > 0);
  target.paramEvidence.push(...written.params);
  if (unstatedParams.length > 0) {
    target.paramEvidence.push({
      evidence: { class: 'programme-set', cites: [], note: `Set by ${setId}, which states no evidence for them.`, by: setId },
      origin: { file: origin.file, path: [...origin.path, 'params'] },
      params: unstatedParams,
    });
  }
  if (override.evidence !== undefined) changed.push('evidence');
  if (unstated.length > 0 || unstatedParams.length > 0) {
    const what = [...unstated.map((k) => `Level ${k} bounds`), ...unstatedParams.map((p) => `parameter ${p}`)].join(', ');
    notes.push(`Set ${setId} changes ${what} of criterion ${override.id} without stating evidence: shown as programme-set.`);
  }
  if (override.source !== undefined) {
    c.source = sourceText(override.source);
    changed.push('source');
  } else if (override.levels !== undefined || override.region !== undefined) {
    c.source = `${c.source} (bounds changed by set ${setId})`;
  }
  if (override.note !== undefined) {
    c.note = override.note.trim();
    changed.push('note');
  }
  c.set = setId;
  c.note = `${c.note}\n\n_Changed by set ${setId}: ${changed.join(', ')}._`.trim();
}

type IssueAt = (origin: Origin, message: string, code: string, found?: unknown) => InputIssue;

/**
 * Every listed level has its evidence, every class has the citations it asks for, and every
 * cited id is in the chain's source list. The evidence is then filled in for every level the
 * way bounds are: a level left out takes the evidence of the level whose bounds it holds.
 */
function checkEvidence(
  w: Working,
  sources: ReadonlyMap<string, SourceEntry>,
  issues: InputIssue[],
  issueAt: IssueAt,
): Pick<ResolvedCriterion, 'evidence' | 'paramEvidence'> | undefined {
  const before = issues.length;
  const id = w.criterion.id;
  const check = (entry: WorkingEvidence, what: string) => {
    for (const p of citationProblems(entry.evidence.class, entry.evidence.cites, sources)) {
      const path = p.cite !== undefined ? [...entry.origin.path, 'cites', p.cite, 'source'] : [...entry.origin.path, 'class'];
      issues.push(issueAt({ file: entry.origin.file, path }, `criterion '${id}', ${what} (${entry.evidence.class}): ${p.message}`, 'evidence'));
    }
  };
  const listed = Object.keys(w.criterion.region?.levels ?? w.levels) as LevelKey[];
  for (const key of listed) {
    const entry = w.evidence[key];
    if (!entry) {
      issues.push(issueAt({ file: w.origin.file, path: [...w.origin.path, 'evidence'] }, `criterion '${id}': no evidence entry covers Level ${key}`, 'missing_evidence'));
    } else check(entry, `Level ${key}`);
  }
  for (const key of Object.keys(w.evidence) as LevelKey[]) {
    const entry = w.evidence[key]!;
    if (!listed.includes(key)) {
      issues.push(issueAt({ file: entry.origin.file, path: [...entry.origin.path, 'levels'] }, `criterion '${id}': evidence for Level ${key}, which \`levels\` does not list`, 'evidence'));
    }
  }
  for (const g of w.paramEvidence) {
    const unknown = g.params.filter((p) => !(p in w.criterion.params));
    if (unknown.length > 0) {
      issues.push(issueAt({ file: g.origin.file, path: [...g.origin.path, 'params'] }, `criterion '${id}': evidence for parameter(s) ${unknown.join(', ')}, which \`params\` does not hold`, 'evidence'));
    }
    check(g, `parameters ${g.params.join(', ')}`);
  }
  if (issues.length > before) return undefined;
  const evidence = {} as Record<LevelKey, Evidence>;
  let previous: Evidence | undefined;
  for (const level of LEVELS) {
    const key = levelKey(level);
    previous = w.evidence[key]?.evidence ?? previous;
    if (previous) evidence[key] = previous;
  }
  return { evidence, paramEvidence: w.paramEvidence.map((g) => ({ ...g.evidence, params: g.params })) };
}

/**
 * Every bound a number, min <= max within a level, and each level at least as strict as the
 * next worse one (a Level 1 minimum below the Level 2 minimum is a copying error, not a choice).
 */
function checkLevels(w: Working, issues: InputIssue[], issueAt: IssueAt, leaf: ParsedCriteriaFile): LevelBounds | undefined {
  const before = issues.length;
  const numeric: LevelBounds = {};
  for (const key of ['1', '2', '3'] as const) {
    const bound = w.levels[key];
    const origin = w.levelOrigin[key];
    if (!bound || !origin) continue;
    const out: Bound = {};
    for (const side of ['min', 'max'] as const) {
      const v = bound[side];
      if (v === PROGRAMME_VALUE) {
        const by = origin.file === leaf ? '' : ` (set '${leaf.data.id}' in ${leaf.file} leaves it unset)`;
        issues.push(
          issueAt(
            { file: origin.file, path: [...origin.path, side] },
            `criterion '${w.criterion.id}': the Level ${key} ${side} is a value the programme must set${by}; ` +
              `extend the set and give it under overrides, or drop the criterion with a reason`,
            'unset_value',
          ),
        );
      } else if (v !== undefined) out[side] = v;
    }
    if (out.min !== undefined && out.max !== undefined && out.min > out.max) {
      issues.push(issueAt(origin, `criterion '${w.criterion.id}': Level ${key} min ${out.min} is above its max ${out.max}`, 'conflicting_bounds'));
    }
    numeric[key] = out;
  }
  if (issues.length > before) return undefined;

  const expanded = expandLevels(numeric);
  for (const level of LEVELS.slice(0, 2)) {
    const better = expanded[levelKey(level)];
    const worse = expanded[levelKey((level + 1) as Level)];
    const origin = w.levelOrigin[levelKey(level)] ?? w.levelOrigin['1'];
    if (!origin) continue;
    const betterMin = better.min ?? -Infinity;
    const worseMin = worse.min ?? -Infinity;
    const betterMax = better.max ?? Infinity;
    const worseMax = worse.max ?? Infinity;
    if (betterMin < worseMin) {
      issues.push(
        issueAt(origin, `criterion '${w.criterion.id}': Level ${level} minimum ${fmt(betterMin)} is looser than the Level ${level + 1} minimum ${fmt(worseMin)}`, 'conflicting_bounds'),
      );
    }
    if (betterMax > worseMax) {
      issues.push(
        issueAt(origin, `criterion '${w.criterion.id}': Level ${level} maximum ${fmt(betterMax)} is looser than the Level ${level + 1} maximum ${fmt(worseMax)}`, 'conflicting_bounds'),
      );
    }
  }
  return issues.length > before ? undefined : numeric;
}

/**
 * A region criterion: a region on one side and bounds on the other do not mix, and each
 * level's polygon lies inside the next worse level's region (a Level 1 region reaching outside
 * Level 2 is a copying error). Checked on the vertices.
 */
function checkRegion(w: Working, issues: InputIssue[], issueAt: IssueAt): boolean {
  const region = w.criterion.region;
  if (!region || !w.regionOrigin) return true;
  const before = issues.length;
  const origin = w.regionOrigin;
  if (Object.keys(w.levels).some((k) => Object.keys(w.levels[k as LevelKey] ?? {}).length > 0)) {
    issues.push(issueAt(origin, `criterion '${w.criterion.id}': a region criterion takes its levels from \`region\`, not from bounds`, 'conflicting_bounds'));
  }
  if (region.against === w.criterion.quantity) {
    issues.push(issueAt({ file: origin.file, path: [...origin.path, 'against'] }, `criterion '${w.criterion.id}': the region needs two different quantities`, 'conflicting_bounds', region.against));
  }
  const expanded = expandRegions(region);
  for (const level of LEVELS.slice(0, 2)) {
    const better = expanded[levelKey(level)];
    const worse = expanded[levelKey((level + 1) as Level)];
    if (better === 'any') {
      if (worse !== 'any') {
        issues.push(issueAt({ file: origin.file, path: [...origin.path, 'levels', levelKey(level)] }, `criterion '${w.criterion.id}': Level ${level} is "any" but Level ${level + 1} is a polygon`, 'conflicting_bounds'));
      }
      continue;
    }
    const outside = better.find(([x, y]) => !inRegion(worse, x, y));
    if (outside) {
      issues.push(
        issueAt(
          { file: origin.file, path: [...origin.path, 'levels', levelKey(level)] },
          `criterion '${w.criterion.id}': the Level ${level} vertex [${outside[0]}, ${outside[1]}] lies outside the Level ${level + 1} region`,
          'conflicting_bounds',
        ),
      );
    }
  }
  return issues.length === before;
}

function fmt(v: number): string {
  return Number.isFinite(v) ? String(v) : 'none';
}
