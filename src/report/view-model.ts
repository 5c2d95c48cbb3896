/**
 * Results -> ReportView: the one place that decides what the review document says and how
 * each number is printed. Pure: no files, no clock (the date is the run's own generatedAt).
 */
import type { Comparison } from '../compare/compare-results.js';
import { countVerdicts } from '../results.js';
import { EVIDENCE_ORDER, weaker } from '../criteria/evidence.js';
import { expandLevels } from '../criteria/level-bounds.js';
import type {
  ConditionResult, DynamicsForm, EquivalentSystem, EvidenceClass, Finding, Quantity, ResolvedCriteriaSet, ResolvedCriterion, ResultMode, Results, SourceEntry, VerdictCounts,
} from '../types.js';
import { EVIDENCE_MEANING, evidenceGroups, levelClassesText } from './evidence-text.js';
import { STANDING_CAUTIONS } from './cautions.js';
import { comparisonView } from './comparison/comparison-view.js';
import { conditionVerdict } from './condition-status.js';
import { type DetailMode, selectDetail } from './detail-selection.js';
import { envelopeView } from './envelope/envelope-view.js';
import { bandwidthChart, bandwidthFinding } from './charts/bandwidth-chart.js';
import { bodeOverlayChart } from './charts/bode-overlay-chart.js';
import { dutchRollChart } from './charts/dutch-roll-chart.js';
import { sPlaneChart } from './charts/s-plane-chart.js';
import type { ControlCurves } from '../responses/response-curves.js';
import { responsesView } from './responses-view.js';
import { shortPeriodChart } from './charts/short-period-chart.js';
import { safeId } from './charts/svg-kit.js';
import { categoryLabel, classLabel, MODE_LABEL, QUANTITY_LABEL, QUANTITY_UNIT } from './labels.js';
import type {
  ChartView, ConditionView, EquivalentSystemRow, CriteriaSetView, EvidenceSummaryView, FindingRow, ModeRow, MovesView, OverviewView, ReportView, SourceView, VerdictTally,
} from './report-view.js';
import { VERDICT_ORDER, verdictMark, worstVerdict } from './verdict-marks.js';
import { boundText, dateText, eigenvalueText, levelBoundsText, lengthText, mathText, NONE, sig, signedSig, unitText, withUnit } from './view-format.js';
import { isRealMode, modeStability, type Stability } from '../modes/stability.js';
import { defaultsBehind } from './finding-defaults.js';
import { isSingleRequirement, levelReachedWords, modeLevel, modeLevelWords } from './mode-levels.js';
import { moveRows, moveTarget } from './what-would-move.js';

export interface ReportViewOptions {
  reportId: string;
  /** which conditions get full sections; the summary always lists every condition */
  detail?: DetailMode;
  /** comparison with a baseline run, shown as "Changes since the baseline" */
  comparison?: Comparison;
  /** the response curves of a condition (step and frequency responses), computed from the model; absent = none drawn */
  responseCurves?: (condition: ConditionResult) => ControlCurves[] | null;
}

/**
 * Per-condition charts are the bulk of a section (some 60 kB of SVG); past this many sections
 * a sweep gets its tables only, and the envelope trend charts show every condition instead.
 */
export const SECTION_CHART_CAP = 40;

/** Up to this many conditions "Conditions at a glance" lists each; above, the envelope summary stands for it. */
export const OVERVIEW_CAP = 60;

const FORM_LABEL: Record<DynamicsForm, string> = {
  stateSpace: 'state-space matrices',
  derivatives: 'dimensional stability derivatives',
  nondimensional: 'nondimensional coefficients',
  mixed: 'mixed forms',
  frequencyResponses: 'frequency responses only',
};

const REQUIRED_FROM: Record<'model' | 'criteria default' | 'none', string> = {
  model: 'set in the model file',
  'criteria default': 'criteria set default',
  none: 'no criteria evaluated',
};

function tallyOf(counts: VerdictCounts): VerdictTally[] {
  return VERDICT_ORDER.map((v) => ({ mark: verdictMark(v), count: counts[v] }));
}

const STABILITY_WORD: Record<Stability, string> = { convergent: 'convergent', neutral: 'neutral', divergent: 'divergent' };

function modeRow(mode: ResultMode, c: ConditionResult): ModeRow {
  // A real root has no damping ratio or natural frequency to show; a divergent one no time
  // constant either (it would be negative): its time to double says how fast it grows.
  const real = isRealMode(mode);
  const stability = modeStability(mode);
  const level = modeLevel(c, mode.kind);
  return {
    kind: MODE_LABEL[mode.kind],
    stability: STABILITY_WORD[stability],
    divergent: stability === 'divergent',
    eigenvalues: eigenvalueText(mode.eigenvalues),
    naturalFrequency: real ? NONE : sig(mode.naturalFrequency),
    dampingRatio: real ? NONE : sig(mode.dampingRatio),
    period: sig(mode.period),
    timeConstant: real && stability === 'convergent' ? sig(mode.timeConstant) : NONE,
    timeToHalf: sig(mode.timeToHalf),
    timeToDouble: sig(mode.timeToDouble),
    basis: mode.basis,
    ambiguous: mode.ambiguous,
    level: modeLevelWords(level),
    levelMark: level.verdict === null ? null : verdictMark(level.verdict),
    decidedBy: level.decidedBy,
  };
}

/** The level columns of a region criterion: each level's polygon named, not its vertices (they are in the chart). */
function regionBoundsText(region: NonNullable<Finding['region']>): FindingRow['bounds'] {
  const text = (r: [number, number][] | 'any') => (r === 'any' ? 'any' : `region (${r.length} pts)`);
  return { l1: text(region['1']), l2: text(region['2']), l3: text(region['3']) };
}

function findingRow(f: Finding, c: ConditionResult, showSet: boolean): FindingRow {
  const unit = f.unit.trim() !== '' ? f.unit : QUANTITY_UNIT[f.quantity];
  const bounds = f.region ? regionBoundsText(f.region) : levelBoundsText(f.bounds);
  return {
    criterion: f.criterion,
    // one set in use: its id is in the title block, not on every row
    set: showSet ? f.set : '',
    title: f.title,
    mode: MODE_LABEL[f.mode],
    quantity: QUANTITY_LABEL[f.quantity],
    unit: unitText(unit),
    value: f.against ? `${sig(f.value)}, ${sig(f.against.value)} ${f.against.unit}` : sig(f.value),
    bounds,
    singleBound: isSingleRequirement(f) ? bounds.l1 : null,
    levelReached: levelReachedWords(f) ?? NONE,
    defaults: f.verdict === 'fail' || f.verdict === 'marginal' ? defaultsBehind(c, f) : [],
    mark: verdictMark(f.verdict),
    margin: signedSig(f.margin),
    source: f.source,
    evidence: f.evidence.class,
    evidenceSources: f.evidence.sources.map((id) => ({ id, anchor: sourceAnchor(id) })),
    // a pass says no more than its level column; any other verdict says why
    reason: f.verdict === 'pass' ? '' : mathText(f.reason),
    method: f.method === undefined ? null : mathText(f.method),
    moves: movesView(f),
    basis: f.basis ?? null,
  };
}

function movesView(f: Finding): MovesView | null {
  if (f.sensitivities === undefined) return null;
  const all = moveRows(f);
  const prefixes = all.map((r) => namePrefix(r.parameter));
  const prefix = prefixes.length > 0 && prefixes.every((p) => p === prefixes[0]) ? prefixes[0]! : '';
  const rows = all.map((r) => ({
    parameter: r.parameter.slice(prefix.length),
    fullName: r.parameter,
    now: sig(r.now, 4),
    needed: r.needed === null ? NONE : sig(r.needed, 4),
    change: r.change === null ? NONE : `${signedSig(r.change)} (\u00d7${sig(r.ratio)})`,
    estimate: r.estimate === null ? NONE : signedSig(r.estimate),
    reached: r.reached,
    verified: r.needed !== null,
  }));
  return { target: moveTarget(f), prefix, rows, note: rows.length === 0 ? (f.sensitivityNote ?? 'no number of the model moves this value') : null };
}

/** The condition's part of a number's name: `conditions[3].` of a model file, `t.csv:14:` of a table row. */
function namePrefix(parameter: string): string {
  return /^conditions\[\d+\]\./.exec(parameter)?.[0] ?? /^.+:\d+:(?=[^:]+$)/.exec(parameter)?.[0] ?? '';
}

function charts(c: ConditionResult): ChartView[] {
  const id = safeId(c.id);
  const out: ChartView[] = [];
  if (c.modes.length > 0) {
    out.push(
      { id: `${id}-s-plane`, title: 's-plane map', ...sPlaneChart(c) },
      { id: `${id}-short-period`, title: 'Short period: \u03c9sp against n/\u03b1', ...shortPeriodChart(c) },
      { id: `${id}-dutch-roll`, title: 'Dutch roll: \u03b6d against \u03c9nd', ...dutchRollChart(c) },
    );
  }
  for (const s of c.equivalentSystems ?? []) {
    for (const ch of s.channels) {
      out.push({ id: `${id}-loes-${s.axis}-${safeId(ch.output)}`, title: `Equivalent system, ${s.axis}: ${ch.output}/${s.input}`, ...bodeOverlayChart(s, ch) });
    }
  }
  if (bandwidthFinding(c)) out.push({ id: `${id}-bandwidth`, title: 'Pitch bandwidth and phase delay', ...bandwidthChart([c], c.id) });
  return out;
}

function equivalentRow(s: EquivalentSystem): EquivalentSystemRow {
  const p = s.parameters;
  const figures =
    s.axis === 'roll'
      ? `T_R ${sig(p['rollTimeConstant'])} s`
      : `\u03b6 ${sig(p['dampingRatio'])}, \u03c9n ${sig(p['naturalFrequency'])} rad/s${s.axis === 'pitch' ? `, 1/T\u03b82 ${sig(p['inverseTtheta2'])} 1/s` : ''}`;
  const gains = s.channels.map((ch) => `K(${ch.output}) ${sig(ch.gain)}`).join(', ');
  const method =
    s.method === 'q-and-nz' ? 'q and nz fitted together (common \u03b6, \u03c9n)'
      : s.method === 'q-with-fixed-ttheta2' ? '1/T\u03b82 held at the airframe value'
        : s.method === 'q-only' ? 'q alone (1/T\u03b82 may be unrealistic)'
          : `${s.output} alone`;
  return {
    axis: s.axis,
    response: s.channels.map((ch) => `${ch.output}/${s.input}`).join(', '),
    form: s.form,
    method,
    points: s.points,
    range: `${sig(s.frequencyRange[0])} to ${sig(s.frequencyRange[1])} rad/s`,
    from: s.from,
    figures: `${figures}; ${gains}${s.dropback ? `; Gibson dropback DB/q_ss ${sig(s.dropback.dropbackRatio)} s, q_pk/q_ss ${sig(s.dropback.peakRatio)} (steady-state definition; no boundary judged)` : ''}`,
    timeDelay: sig(s.timeDelay),
    mismatch: s.channels.length > 1 ? s.channels.map((ch) => `${ch.output} ${sig(ch.mismatch)}`).join(', ') : sig(s.mismatch),
    guidance: `guidance ${s.mismatchGuidance}`,
    valid: s.valid,
    remarks: s.remarks,
  };
}

/** Cautions the reader needs for this condition, beyond the warnings the analysis raised. */
function derivedWarnings(c: ConditionResult): string[] {
  const out: string[] = [];
  const weak = c.findings.filter((f) => f.evidence.class === 'memory' || f.evidence.class === 'conflicting');
  if (weak.length > 0) {
    out.push(
      `${weak.length} of ${c.findings.length} findings rest on boundary values recalled from memory or given differently by their sources ` +
        `(${[...new Set(weak.map((f) => f.criterion))].join(', ')}): verify them against the published document.`,
    );
  }
  const ambiguous = c.modes.filter((m) => m.ambiguous);
  if (ambiguous.length > 0) {
    out.push(`Identification not clear-cut for: ${ambiguous.map((m) => MODE_LABEL[m.kind]).join(', ')} (see the basis column).`);
  }
  if (c.category === null) out.push(`Flight phase ${c.phase} has no category in the criteria set: category-dependent criteria could not be applied.`);
  return out;
}

/** The coupling figure with what it means: the largest relative shift of a root when the cross terms are removed. */
function couplingText(coupling: number): string {
  if (coupling === 0) return '0: uncoupled (no root moves when the longitudinal/lateral cross terms are removed)';
  return `${sig(coupling, 2)}: the largest relative shift of a root when the longitudinal/lateral cross terms are removed`;
}

function subsystemsText(c: ConditionResult): string {
  const s = c.subsystems;
  const parts: string[] = [];
  if (s.longitudinal.length > 0) parts.push(`longitudinal ${s.longitudinal.join(', ')}`);
  if (s.lateral.length > 0) parts.push(`lateral-directional ${s.lateral.join(', ')}`);
  if (s.kinematic.length > 0) parts.push(`kinematic ${s.kinematic.join(', ')}`);
  if (s.other.length > 0) parts.push(`other ${s.other.join(', ')}`);
  return parts.join('; ');
}

function conditionView(c: ConditionResult, anchor: string, withCharts: boolean, chartsOmitted: string, showSet: boolean, curves: ReportViewOptions['responseCurves']): ConditionView {
  return {
    id: c.id,
    anchor,
    phase: c.phase,
    category: categoryLabel(c.category),
    airspeed: withUnit(c.airspeed, 'm/s', 4),
    altitude: lengthText(c.altitude),
    requiredLevel: c.requiredLevel === null ? 'not set' : `Level ${c.requiredLevel}`,
    requiredLevelFrom: REQUIRED_FROM[c.requiredLevelFrom ?? 'none'],
    form: FORM_LABEL[c.form],
    subsystems: subsystemsText(c),
    coupling: couplingText(c.coupling),
    mark: verdictMark(conditionVerdict(c)),
    tally: tallyOf(countVerdicts(c.findings)),
    modes: c.modes.map((m) => modeRow(m, c)),
    findings: c.findings.map((f) => findingRow(f, c, showSet)),
    notApplicable: c.notApplicable.map((n) => ({ criterion: n.criterion, title: n.title, source: n.source, reason: n.reason })),
    warnings: [...c.warnings, ...derivedWarnings(c)],
    notes: c.notes,
    charts: withCharts ? charts(c) : [],
    equivalentSystems: (c.equivalentSystems ?? []).map(equivalentRow),
    chartsOmitted: withCharts ? null : chartsOmitted,
    responses: responsesView(c, withCharts && curves ? curves(c) : null),
  };
}

function overviewView(results: Results, anchorOf: (index: number) => string | null): OverviewView {
  const n = results.conditions.length;
  if (n > OVERVIEW_CAP) {
    return {
      rows: [],
      note: `${n} conditions: too many to list one by one here; the envelope summary gives them by phase and lists those with issues. The results file holds every one.`,
    };
  }
  return {
    rows: results.conditions.map((c, i) => ({
      id: c.id,
      anchor: anchorOf(i),
      phase: c.phase,
      category: categoryLabel(c.category),
      airspeed: withUnit(c.airspeed, 'm/s', 4),
      altitude: lengthText(c.altitude),
      requiredLevel: c.requiredLevel === null ? 'not set' : `Level ${c.requiredLevel}`,
      tally: tallyOf(countVerdicts(c.findings)),
      mark: verdictMark(conditionVerdict(c)),
    })),
    note: null,
  };
}

/**
 * `used`: ids of the criteria that select at least one condition of this review (a finding or a
 * declared not-applicable); the others are named in one line, not given a row each: their notes
 * and evidence are about aircraft or phases this review does not cover (`criteria show` lists them).
 */
function marginalBandText(set: ResolvedCriteriaSet): string {
  const band = set.marginalBand;
  const absolute = Object.entries(band.absolute).map(([q, v]) => `${QUANTITY_LABEL[q as Quantity] ?? q} ${sig(v)}`);
  return `${sig(band.relative * 100, 2)} % of the boundary${absolute.length > 0 ? `; where the boundary is 0: ${absolute.join(', ')}` : ''}`;
}

function setView(set: ResolvedCriteriaSet, used?: ReadonlySet<string>): CriteriaSetView {
  return {
    id: set.id,
    title: set.title,
    chain: set.chain.join(' \u2192 '),
    files: set.files,
    defaultRequiredLevel: `Level ${set.defaultRequiredLevel}`,
    marginalBand: marginalBandText(set),
    phaseCategories: Object.entries(set.phaseCategories).map(([p, c]) => `${p} ${c}`).join(', ') || 'none listed',
    notes: set.notes,
    unselected: used ? set.criteria.filter((c) => !used.has(c.id)).map((c) => c.id) : [],
    criteria: set.criteria.filter((c) => !used || used.has(c.id)).map((c) => ({
      id: c.id,
      title: c.title,
      source: c.source,
      evidenceText: levelClassesText(c),
      evidence: weaker(weaker(c.evidence['1'].class, c.evidence['2'].class), c.evidence['3'].class),
      groups: evidenceGroups(c).map((g) => ({
        covers: g.covers,
        bounds: groupBounds(c, g.levels),
        evidence: g.evidence.class,
        statedBy: g.evidence.by !== c.set ? g.evidence.by : null,
        cites: g.evidence.cites.map((x) => ({
          source: x.source,
          anchor: sourceAnchor(x.source),
          at: x.at ?? null,
          value: x.value === undefined ? null : String(x.value),
          quote: x.quote ?? null,
        })),
        note: g.evidence.note,
      })),
      note: c.note,
    })),
    dropped: set.dropped,
  };
}

/** The bounds of the levels of one evidence group: "≥ 0.35", or "≤ 1.4 / ≤ 3" for two levels. */
function groupBounds(c: ResolvedCriterion, levels: readonly ('1' | '2' | '3')[]): string {
  if (levels.length === 0) return '';
  const expanded = expandLevels(c.levels);
  const texts = levels.map((k) => boundText(expanded[k]));
  const unit = unitText(QUANTITY_UNIT[c.quantity]);
  const shown = texts.every((t) => t === texts[0]) ? texts[0]! : texts.join(' / ');
  return unit !== '' && unit !== '-' ? `${shown} ${unit}` : shown;
}

/** HTML id of a source in the list at the end of the document. */
function sourceAnchor(id: string): string {
  return `source-${safeId(id)}`;
}

const EVIDENCE_WORDS: Record<EvidenceClass, string> = {
  published: 'published',
  secondary: 'secondary',
  conflicting: 'conflicting',
  memory: 'memory',
  'programme-set': 'programme-set',
};

function evidenceSummary(findings: readonly Finding[]): EvidenceSummaryView {
  const counts = new Map<EvidenceClass, number>();
  for (const f of findings) counts.set(f.evidence.class, (counts.get(f.evidence.class) ?? 0) + 1);
  const notPublished = findings.length - (counts.get('published') ?? 0);
  const byClass = EVIDENCE_ORDER.filter((cls) => (counts.get(cls) ?? 0) > 0).map((cls) => ({
    evidence: cls,
    count: counts.get(cls) ?? 0,
    meaning: EVIDENCE_MEANING[cls],
  }));
  let statement: string;
  if (findings.length === 0) statement = 'No finding was made, so no boundary was relied on.';
  else if (notPublished === 0) statement = 'Every finding is judged against a boundary read in the primary document, at the page cited.';
  else {
    const parts = EVIDENCE_ORDER.filter((cls) => cls !== 'published' && (counts.get(cls) ?? 0) > 0).map(
      (cls) => `${counts.get(cls)} ${EVIDENCE_WORDS[cls]}`,
    );
    statement =
      `${notPublished} of ${findings.length} findings are judged against a boundary that was not read in the primary document ` +
      `(${parts.join(', ')}). Their verdicts stand only as far as those values do: before the review relies on one, ` +
      `check its boundary in the published document. A memory or conflicting boundary may move a verdict either way; ` +
      `the criteria section gives the evidence of every level and the sources are listed at the end.`;
  }
  return { notPublished, byClass, statement };
}

function sourcesView(sets: readonly ResolvedCriteriaSet[], findings: readonly Finding[]): SourceView[] {
  const cited = new Map<string, number>();
  for (const f of findings) for (const id of f.evidence.sources) cited.set(id, (cited.get(id) ?? 0) + 1);
  const byId = new Map<string, { entry: SourceEntry; sets: string[] }>();
  for (const set of sets) {
    for (const s of set.sources) {
      const known = byId.get(s.id);
      if (known) {
        if (!known.sets.includes(set.id)) known.sets.push(set.id);
      } else byId.set(s.id, { entry: s, sets: [set.id] });
    }
  }
  return [...byId.values()].map(({ entry, sets: listedBy }) => ({
    id: entry.id,
    anchor: sourceAnchor(entry.id),
    kind: entry.kind,
    title: entry.title,
    reproduces: entry.reproduces ?? null,
    where: entry.where ?? null,
    note: entry.note ?? null,
    sets: listedBy.join(', '),
    findings: cited.get(entry.id) ?? 0,
  }));
}

function requiredLevelsText(conditions: readonly ConditionResult[]): string {
  const byLevel = new Map<string, string[]>();
  for (const c of conditions) {
    const key = c.requiredLevel === null ? 'not set' : `Level ${c.requiredLevel}`;
    const ids = byLevel.get(key);
    if (ids) ids.push(c.id);
    else byLevel.set(key, [c.id]);
  }
  if (byLevel.size === 1) return `${[...byLevel.keys()][0] ?? 'not set'} in every condition`;
  // A sweep would print thousands of ids: name a few, count the rest.
  const listed = (ids: string[]) => (ids.length <= 8 ? ids.join(', ') : `${ids.slice(0, 6).join(', ')} and ${ids.length - 6} more`);
  return [...byLevel.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([l, ids]) => `${l} (${listed(ids)})`).join('; ');
}

/** Shell-style quoting so that the printed command can be pasted back. */
function commandText(args: readonly string[]): string {
  if (args.length === 0) return 'not run from the command line';
  return args.map((a) => (/^[\w@%+=:,./-]+$/.test(a) ? a : `'${a.replace(/'/g, `'\\''`)}'`)).join(' ');
}

/** What "marginal" means here, with each set's band: the term is modalgate's own, not the standards'. */
function marginalText(sets: ResolvedCriteriaSet[]): string {
  const bands = sets.map((s) => `${marginalBandText(s)} (${s.id})`);
  return (
    'Marginal is this tool\'s own word, not a level of the standards: the required level is reached, but the value lies ' +
    `within the marginal band of that level's boundary: ${bands.length > 0 ? bands.join('; ') : 'no criteria set'}. ` +
    'The band is set in the criteria file (marginalBand).'
  );
}

export function buildReportView(results: Results, sets: ResolvedCriteriaSet[], options: ReportViewOptions): ReportView {
  const allFindings = results.conditions.flatMap((c) => c.findings);
  const usedCriteria = new Set([...allFindings.map((f) => f.criterion), ...results.conditions.flatMap((c) => c.notApplicable.map((n) => n.criterion))]);
  const counts = countVerdicts(allFindings);
  const selection = selectDetail(results.conditions, options.detail ?? 'all');
  const anchors: (string | null)[] = results.conditions.map(() => null);
  for (const i of selection.detailed) anchors[i] = `condition-${i + 1}-${safeId(results.conditions[i]!.id)}`;
  const anchorOf = (index: number) => anchors[index] ?? null;
  const anchorById = new Map<string, string | null>();
  results.conditions.forEach((c, i) => {
    if (!anchorById.has(c.id)) anchorById.set(c.id, anchors[i] ?? null);
  });
  const sections = selection.detailed.length;
  const chartsOmitted =
    `Charts are drawn in the first ${SECTION_CHART_CAP} of the ${sections} condition sections only, to keep a sweep's document small; ` +
    `this condition's figures are marked in the trend charts of the envelope summary.`;
  const detailText = `${selection.text}${sections > SECTION_CHART_CAP ? `; charts in the first ${SECTION_CHART_CAP} sections` : ''}.`;
  return {
    reportId: options.reportId,
    title: `${results.aircraft.name}: handling-qualities review`,
    aircraft: { name: results.aircraft.name, classLabel: classLabel(results.aircraft.class) },
    date: dateText(results.generatedAt),
    generatedAt: results.generatedAt,
    tool: { name: results.tool.name, version: results.tool.version },
    modelFiles: results.inputs.filter((i) => i.role === 'model' || i.role === 'table').map((i) => i.path),
    criteriaSets: sets.map((s) => setView(s, usedCriteria)),
    requiredLevels: requiredLevelsText(results.conditions),
    overall: verdictMark(worstVerdict(allFindings.map((f) => f.verdict))),
    tally: tallyOf(counts),
    totalFindings: allFindings.length,
    marginalNote: marginalText(sets),
    evidence: evidenceSummary(allFindings),
    sources: sourcesView(sets, allFindings),
    detail: detailText.charAt(0).toUpperCase() + detailText.slice(1),
    envelope: results.conditions.length > 1 ? envelopeView(results.conditions, sets, anchorOf) : null,
    comparison: options.comparison ? comparisonView(options.comparison, (id) => anchorById.get(id) ?? null) : null,
    overview: overviewView(results, anchorOf),
    conditions: selection.detailed.map((i, k) => conditionView(results.conditions[i]!, anchors[i]!, k < SECTION_CHART_CAP, chartsOmitted, sets.length > 1, options.responseCurves)),
    cautions: [...STANDING_CAUTIONS],
    traceability: {
      inputs: results.inputs.map((i) => ({ role: i.role, path: i.path, sha256: i.sha256 })),
      command: commandText(results.command),
      toolVersion: `${results.tool.name} ${results.tool.version}`,
      criteriaSetIds: results.criteriaSets.map((s) => `${s.id} (${s.chain.join(' \u2192 ')})`),
      reportId: options.reportId,
    },
  };
}
