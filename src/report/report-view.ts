/**
 * The review document as the templates see it: every number already formatted, every verdict
 * already a symbol and a word. Templates do no arithmetic and make no decisions.
 */
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
  eigenvalues: string;
  naturalFrequency: string;
  dampingRatio: string;
  period: string;
  timeConstant: string;
  timeToHalf: string;
  timeToDouble: string;
  basis: string;
  ambiguous: boolean;
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
  /** `Level 1`, or `none` when no level's bounds hold */
  levelReached: string;
  mark: VerdictMark;
  margin: string;
  source: string;
  memory: boolean;
  /** why this verdict (always filled for not evaluated) */
  reason: string;
  method: string | null;
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
  charts: ChartView[];
  /** false when the options ask for issues only and this condition has none, or for no detail */
  detailed: boolean;
  /** why the tables and charts are left out, when they are */
  omission: string | null;
}

export interface CriterionNoteView {
  id: string;
  title: string;
  source: string;
  memory: boolean;
  /** Markdown; rendered with raw HTML off */
  note: string;
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
  criteria: CriterionNoteView[];
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
  memoryFindings: number;
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
