/**
 * The review document as the templates see it: every number already formatted, every verdict
 * already a symbol and a word. Templates do no arithmetic and make no decisions.
 */
import type { EvidenceClass, Verdict } from '../types.js';
import type { ResponsesView } from './responses-view.js';
import type { VerdictMark } from './verdict-marks.js';

export interface VerdictTally {
  mark: VerdictMark;
  count: number;
}

export interface ChartView {
  id: string;
  title: string;
  /** inline SVG produced by src/report/charts; null when the data are missing */
  svg: string | null;
  /** what the chart shows, or why it could not be drawn */
  caption: string;
}

export interface ModeRow {
  kind: string;
  /** convergent, neutral or divergent: read before any figure */
  stability: string;
  divergent: boolean;
  eigenvalues: string;
  naturalFrequency: string;
  dampingRatio: string;
  period: string;
  timeConstant: string;
  timeToHalf: string;
  timeToDouble: string;
  basis: string;
  ambiguous: boolean;
  /** the mode's one level: the worst over its criteria (`Level 2`, `no level`, `bounds met`, ...) */
  level: string;
  /** the worst verdict of the mode's findings; null when no criterion applies to the mode */
  levelMark: VerdictMark | null;
  /** the criterion that decides `level` */
  decidedBy: string | null;
}

export interface FindingRow {
  criterion: string;
  set: string;
  title: string;
  mode: string;
  quantity: string;
  /** print form of the quantity's unit ('' when dimensionless) */
  unit: string;
  /** value, bounds and margin are in `unit` */
  value: string;
  bounds: { l1: string; l2: string; l3: string };
  /** the one bound of a single-requirement criterion (the same at every level), shown across the level columns */
  singleBound: string | null;
  /** `Level 1`, `no level` when no level's bounds hold; `met` / `not met` for a single requirement */
  levelReached: string;
  /** defaults the finding leans on (failing and marginal findings only) */
  defaults: string[];
  mark: VerdictMark;
  margin: string;
  source: string;
  /** evidence class of the boundary judged against, and the ids of its sources */
  evidence: EvidenceClass;
  evidenceSources: { id: string; anchor: string }[];
  /** why this verdict: filled for every verdict but a pass (whose level column says it) */
  reason: string;
  method: string | null;
  /** where the figure came from when not the raw roots (e.g. the equivalent system) */
  basis: string | null;
  /** what would move it: one number at a time (findings given sensitivities only) */
  moves: MovesView | null;
}

export interface MovesView {
  /** what the changes aim at */
  target: string;
  /** the part of every number's name the rows share (`conditions[3].`, `t.csv:14:`), shown once; '' when none */
  prefix: string;
  /** `parameter` is the name without the prefix; `fullName` the whole of it */
  rows: { parameter: string; fullName: string; now: string; needed: string; change: string; estimate: string; reached: string; verified: boolean }[];
  /** why there are no rows (e.g. a nearly defective mode) */
  note: string | null;
}

export interface DecidingNumberRow {
  number: string;
  leadsFail: number;
  leadsMarginal: number;
  inTopFive: number;
  reachesAlone: number;
}

export interface ConditionView {
  id: string;
  /** HTML id, unique in the document */
  anchor: string;
  phase: string;
  category: string;
  airspeed: string;
  altitude: string;
  requiredLevel: string;
  requiredLevelFrom: string;
  form: string;
  subsystems: string;
  coupling: string;
  mark: VerdictMark;
  tally: VerdictTally[];
  modes: ModeRow[];
  findings: FindingRow[];
  warnings: string[];
  notes: string[];
  /** applicable criteria that made no finding here; never counted as a pass */
  notApplicable: NotApplicableRow[];
  charts: ChartView[];
  /** low-order equivalent systems fitted for the condition (empty when none) */
  equivalentSystems: EquivalentSystemRow[];
  /** why the charts are left out of this section, when they are (large sweeps) */
  chartsOmitted: string | null;
  /** responses to the cockpit controls; null when the condition names none */
  responses: ResponsesView | null;
}

export interface EquivalentSystemRow {
  axis: string;
  response: string;
  form: string;
  method: string;
  points: number;
  range: string;
  from: string;
  figures: string;
  timeDelay: string;
  mismatch: string;
  guidance: string;
  valid: boolean;
  remarks: string[];
}

export interface NotApplicableRow {
  criterion: string;
  title: string;
  source: string;
  reason: string;
}

/** One row of "Conditions at a glance". */
export interface OverviewRow {
  id: string;
  /** section anchor, null when the condition has no section */
  anchor: string | null;
  phase: string;
  category: string;
  airspeed: string;
  altitude: string;
  requiredLevel: string;
  tally: VerdictTally[];
  mark: VerdictMark;
}

export interface OverviewView {
  rows: OverviewRow[];
  /** said instead of (or after) the rows when the list is cut short */
  note: string | null;
}

// ------------------------------------------------------------------ envelope summary

/** One cell of the verdict matrix: a verdict, a declared not-applicable, or a criterion not applied. */
export interface MatrixCell {
  /** symbol and letter (greyscale-safe), '·' for not applicable, '' when not applied */
  text: string;
  cls: string;
  state: Verdict | 'not_applicable' | 'not_applied';
  /** hover text: criterion, value and verdict, or the reason it does not apply */
  title: string;
  criterion: string;
}

export interface MatrixRow {
  id: string;
  anchor: string | null;
  phase: string;
  airspeed: string;
  altitude: string;
  cells: MatrixCell[];
  mark: VerdictMark;
}

export interface MatrixChunk {
  /** mode headings over the numbered columns */
  groups: { label: string; span: number }[];
  columns: { number: number; id: string; title: string }[];
  rows: MatrixRow[];
}

export interface EnvelopeMatrixView {
  /** which conditions the rows are and in which order */
  scope: string;
  /** wide sets are split into several tables of at most a page's width of columns */
  chunks: MatrixChunk[];
  /** "and N more" when the rows were capped */
  more: string | null;
}

export interface WorstCaseRow {
  number: number;
  criterion: string;
  set: string;
  title: string;
  source: string;
  /** the weakest evidence class of the boundaries its findings were judged against */
  evidence: EvidenceClass;
  quantity: string;
  unit: string;
  /** conditions with a finding of this criterion */
  evaluated: number;
  counts: { fail: number; marginal: number; notEvaluated: number; pass: number; notApplicable: number };
  worst: { condition: string; anchor: string | null; value: string; margin: string; mark: VerdictMark } | null;
}

export interface CoverageRow {
  phase: string;
  category: string;
  conditions: number;
  airspeed: string;
  altitude: string;
  /** conditions by their worst verdict, worst first */
  tally: VerdictTally[];
}

export interface EnvelopeView {
  conditionCount: number;
  coverage: CoverageRow[];
  matrix: EnvelopeMatrixView;
  worstCases: WorstCaseRow[];
  trends: ChartView[];
  /** how the trend charts were drawn (axes, boundaries, merged points) */
  trendNote: string;
  /** the numbers that most often lead failing and marginal findings (empty without sensitivities) */
  deciding: DecidingNumberRow[];
}

// ------------------------------------------------------------------ baseline comparison

export interface TransitionRow {
  /** 'worse' | 'better' | 'same' */
  kind: string;
  /** ▼ worse, ▲ better, = same: a shape, then the word */
  symbol: string;
  word: string;
  condition: string;
  anchor: string | null;
  criterion: string;
  quantity: string;
  unit: string;
  from: VerdictMark;
  to: VerdictMark;
  level: string;
  value: string;
  delta: string;
  margin: string;
}

export interface PresenceRow {
  condition: string;
  criterion: string;
  quantity: string;
  mark: VerdictMark;
}

export interface ComparisonView {
  baseline: { date: string; toolVersion: string; aircraft: string };
  aircraftChanged: boolean;
  model: string;
  criteria: string;
  inputs: { role: string; name: string; status: string; baselineSha: string; currentSha: string }[];
  summary: string[];
  conditionsAdded: { id: string; summary: string }[];
  conditionsRemoved: { id: string; summary: string }[];
  conditionsMore: string | null;
  /** verdict changes, regressions first */
  transitions: TransitionRow[];
  transitionsMore: string | null;
  /** unchanged verdicts whose figure moved, largest relative change first */
  moved: TransitionRow[];
  movedMore: string | null;
  findingsAdded: PresenceRow[];
  findingsRemoved: PresenceRow[];
  presenceMore: string | null;
  criteriaChanges: string[];
  modeChanges: { condition: string; mode: string; figure: string; change: string; relative: string }[];
  nothingChanged: boolean;
}

export interface EvidenceGroupView {
  /** "Level 1", "Levels 2, 3", "params ..." */
  covers: string;
  /** the bounds of the levels it covers, in the quantity's unit ('' for parameters) */
  bounds: string;
  evidence: EvidenceClass;
  /** the set that stated it, when not the criterion's own set */
  statedBy: string | null;
  cites: { source: string; anchor: string; at: string | null; value: string | null; quote: string | null }[];
  /** Markdown; rendered with raw HTML off */
  note: string;
}

export interface CriterionNoteView {
  id: string;
  title: string;
  source: string;
  /** the classes of Levels 1 / 2 / 3, or one class when they agree */
  evidenceText: string;
  /** the weakest class of its levels (for the mark) */
  evidence: EvidenceClass;
  groups: EvidenceGroupView[];
  /** Markdown; rendered with raw HTML off */
  note: string;
}

/** One entry of the list of sources at the end of the document. */
export interface SourceView {
  id: string;
  /** HTML id, unique in the document */
  anchor: string;
  kind: string;
  title: string;
  reproduces: string | null;
  where: string | null;
  /** Markdown */
  note: string | null;
  /** the criteria sets that list it */
  sets: string;
  /** findings whose boundary cites it */
  findings: number;
}

/** How many findings rest on boundaries of each class, and what it means for the review. */
export interface EvidenceSummaryView {
  notPublished: number;
  byClass: { evidence: EvidenceClass; count: number; meaning: string }[];
  /** one or two sentences for the first page */
  statement: string;
}

export interface CriteriaSetView {
  id: string;
  title: string;
  chain: string;
  files: string[];
  defaultRequiredLevel: string;
  marginalBand: string;
  phaseCategories: string;
  /** Markdown, root of the chain first */
  notes: string[];
  /** the criteria that select at least one condition of this review */
  criteria: CriterionNoteView[];
  /** ids of the set's other criteria (no condition of this review selects them) */
  unselected: string[];
  dropped: { id: string; reason: string; by: string }[];
}

export interface ReportView {
  reportId: string;
  title: string;
  aircraft: { name: string; classLabel: string };
  date: string;
  generatedAt: string;
  tool: { name: string; version: string };
  modelFiles: string[];
  criteriaSets: CriteriaSetView[];
  requiredLevels: string;
  overall: VerdictMark;
  tally: VerdictTally[];
  totalFindings: number;
  /** what "marginal" means, with the band of each criteria set (first page) */
  marginalNote: string;
  evidence: EvidenceSummaryView;
  /** every source of the criteria sets used, cited or not */
  sources: SourceView[];
  /** what `--detail` left in and out, in words */
  detail: string;
  /** shown when there is more than one condition */
  envelope: EnvelopeView | null;
  /** shown when a baseline was given */
  comparison: ComparisonView | null;
  overview: OverviewView;
  /** the per-condition sections (see `detail`) */
  conditions: ConditionView[];
  cautions: string[];
  traceability: {
    inputs: { role: string; path: string; sha256: string }[];
    command: string;
    toolVersion: string;
    criteriaSetIds: string[];
    reportId: string;
  };
}
