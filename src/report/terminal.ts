/**
 * The terminal rendering of results: per condition a modes table and a findings table.
 * Verdicts are words with a symbol; colour is added only when asked (a TTY without NO_COLOR)
 * and never carries meaning alone.
 */
import type { ConditionResult, EquivalentSystem, Finding, Results, Verdict } from '../types.js';
import { hasIssue } from './condition-status.js';
import { isRealMode, modeStability } from '../modes/stability.js';
import { defaultsBehind } from './finding-defaults.js';
import { formatEigenvalues, formatSig } from './format-number.js';
import { MODE_TEXT, QUANTITY_TEXT } from './labels.js';
import { levelReachedWords, modeLevel, modeLevelWords } from './mode-levels.js';
import { textTable } from './text-table.js';
import { visibleData } from '../visible-text.js';
import { decidingNumbers, moveRows, moveTarget } from './what-would-move.js';

export interface TerminalOptions {
  color: boolean;
  /** which conditions get their tables: all, only those with a finding that is not a pass (or no finding at all), or none */
  detail: 'all' | 'issues' | 'none';
  /** include the findings tables (false for the `modes` command) */
  findings: boolean;
  /** conditions checked, when `results.conditions` holds only those kept (see runCheck's `keep`) */
  conditionCount?: number;
}

const MAX_LISTED_CONDITIONS = 100;

const VERDICT_TEXT: Record<Verdict, string> = {
  pass: '+ pass',
  marginal: '~ marginal',
  fail: 'x FAIL',
  not_evaluated: '? not evaluated',
};

const VERDICT_COLOR: Record<Verdict, string> = {
  pass: '\u001b[32m',
  marginal: '\u001b[33m',
  fail: '\u001b[31;1m',
  not_evaluated: '\u001b[36m',
};

export function verdictText(verdict: Verdict): string {
  return VERDICT_TEXT[verdict];
}

/**
 * Every string from the user's files (names, ids, notes, warnings, sources) is made visible
 * before it is laid out (visible-text.ts): the only escape sequences in the text are the
 * colours added here.
 */
export function formatResultsText(written: Results, options: TerminalOptions): string {
  const results = { ...written, ...visibleData({ tool: written.tool, aircraft: written.aircraft, criteriaSets: written.criteriaSets }) };
  const paint = (code: string, text: string) => (options.color ? `${code}${text}\u001b[0m` : text);
  const out: string[] = [];
  out.push(paint('\u001b[1m', `modalgate ${results.tool.version}: ${results.aircraft.name} (Class ${results.aircraft.class})`));
  if (results.criteriaSets.length > 0) {
    out.push(`criteria: ${results.criteriaSets.map((s) => `${s.id} (${s.chain.join(' > ')})`).join('; ')}`);
  }
  const total = options.conditionCount ?? results.conditions.length;
  const shown = results.conditions.filter((c) => showCondition(c, options.detail));
  // With detail 'issues' (the default for sweeps) a condition gets its heading and the
  // findings that are not a pass; the full tables are in the report and the JSON.
  const compact = options.detail === 'issues';
  const listed = compact ? shown.slice(0, MAX_LISTED_CONDITIONS) : shown;
  for (const raw of listed) {
    const c = visibleData(raw);
    out.push('');
    out.push(paint('\u001b[1m', conditionHeading(c)));
    if (compact) {
      const issues = { ...c, findings: c.findings.filter((f) => f.verdict !== 'pass') };
      out.push(indent(findingsTable(issues, (v, t) => paint(VERDICT_COLOR[v], t))));
      out.push(...defaultLines(c));
      out.push(...moveBlocks(issues.findings));
      continue;
    }
    for (const n of c.notes) out.push(`  note: ${n}`);
    if (c.modes.length > 0) out.push(indent(modesTable(c, options.findings)));
    if (c.equivalentSystems && c.equivalentSystems.length > 0) out.push(indent(equivalentTable(c.equivalentSystems)));
    if (options.findings) {
      if (c.findings.length === 0) out.push('  (no criterion applies to this condition)');
      else out.push(indent(findingsTable(c, (v, t) => paint(VERDICT_COLOR[v], t))));
      out.push(...defaultLines(c));
      out.push(...moveBlocks(c.findings));
      for (const n of c.notApplicable) out.push(`  not applicable: ${n.criterion} (${n.source}): ${n.reason}`);
    }
    for (const w of c.warnings) out.push(paint('\u001b[33m', `  warning: ${w}`));
  }
  if (listed.length < shown.length) {
    out.push('');
    out.push(`... and ${shown.length - listed.length} more condition(s) with a finding that is not a pass: see the report or the results JSON`);
  }
  if (shown.length < total) {
    out.push('');
    out.push(
      `${total - shown.length} of ${total} conditions not listed (detail: ${options.detail}${options.detail === 'issues' ? ': only conditions with a fail, marginal or not-evaluated finding' : ''}).`,
    );
  }
  // every failing or marginal condition is kept even where a sweep keeps only some (see runCheck's keep)
  if (options.findings && total > 1 && options.detail !== 'none') out.push(...decidingLines(results.conditions));
  if (options.findings) {
    const s = results.summary;
    out.push('');
    out.push(
      `summary: ${s.pass} pass, ${s.marginal} marginal, ${s.fail} fail, ${s.not_evaluated} not evaluated ` +
        `over ${total} condition(s)`,
    );
  }
  return out.join('\n');
}

/** Under the findings: per finding with sensitivities, what would move it (one number at a time). */
function moveBlocks(findings: readonly Finding[]): string[] {
  const out: string[] = [];
  for (const f of findings) {
    if (f.sensitivities === undefined) continue;
    out.push(`  what would move ${f.criterion} (${MODE_TEXT[f.mode]} ${QUANTITY_TEXT[f.quantity]} ${valueText(f)}): ${moveTarget(f)}`);
    if (f.sensitivities.length === 0) {
      out.push(`    ${f.sensitivityNote ?? 'no number of the model moves this value'}`);
      continue;
    }
    const rows = moveRows(f).map((r) => [
      r.parameter,
      formatSig(r.now, 4),
      formatSig(r.needed, 4),
      r.change === null ? '-' : `${formatSig(r.change, 3)} (x${formatSig(r.ratio, 3)})`,
      formatSig(r.estimate, 3),
      r.reached,
    ]);
    out.push(
      indent(
        indent(
          textTable(
            [
              { header: 'number (as written)' },
              { header: 'now', align: 'right' },
              { header: 'needed', align: 'right' },
              { header: 'change', align: 'right' },
              { header: 'linear est.', align: 'right' },
              { header: 'reached when verified' },
            ],
            rows,
          ),
        ),
      ),
    );
  }
  return out;
}

/** Over a sweep: the numbers that lead the failing and marginal findings most often. */
function decidingLines(conditions: readonly ConditionResult[]): string[] {
  const deciding = visibleData(decidingNumbers(conditions));
  if (deciding.length === 0) return [];
  return [
    '',
    'numbers that most often decide failing and marginal findings:',
    indent(
      textTable(
        [
          { header: 'number' },
          { header: 'leads fail', align: 'right' },
          { header: 'leads marginal', align: 'right' },
          { header: 'in top five', align: 'right' },
          { header: 'fixes alone', align: 'right' },
        ],
        deciding.map((d) => [d.number, String(d.leadsFail), String(d.leadsMarginal), String(d.inTopFive), String(d.reachesAlone)]),
      ),
    ),
  ];
}

function showCondition(c: ConditionResult, detail: TerminalOptions['detail']): boolean {
  if (detail === 'all') return true;
  if (detail === 'none') return false;
  return hasIssue(c);
}

function conditionHeading(c: ConditionResult): string {
  const parts = [`condition ${c.id}`, `phase ${c.phase}`];
  if (c.category) parts.push(`Category ${c.category}`);
  parts.push(`V ${formatSig(c.airspeed, 4)} m/s`);
  if (c.altitude !== null) parts.push(`h ${formatSig(c.altitude, 4)} m`);
  if (c.requiredLevel !== null) parts.push(`required Level ${c.requiredLevel} (${c.requiredLevelFrom})`);
  return parts.join(', ');
}

/** The mode's one level (worst of its criteria) and the criterion deciding it, for the modes table. */
function modeLevelText(c: ConditionResult, m: ConditionResult['modes'][number], withLevels: boolean): string {
  if (!withLevels) return '';
  const l = modeLevel(c, m.kind);
  if (l.verdict === null) return '-';
  const level = modeLevelWords(l);
  return l.decidedBy ? `${level} (${l.decidedBy})` : level;
}

function modesTable(c: ConditionResult, withLevels: boolean): string {
  // A real root is read by its time constant or time to half/double and its stability, never
  // by a damping ratio of +-1 and a "natural frequency"; a divergent one has no time constant.
  const rows = c.modes.map((m) => {
    const real = isRealMode(m);
    const stability = modeStability(m);
    const row = [
      MODE_TEXT[m.kind] + (m.ambiguous ? ' (?)' : ''),
      stability,
      formatEigenvalues(m.eigenvalues),
      real ? '-' : formatSig(m.naturalFrequency),
      real ? '-' : formatSig(m.dampingRatio),
      formatSig(m.period),
      real && stability === 'convergent' ? formatSig(m.timeConstant) : '-',
      formatSig(m.timeToHalf),
      formatSig(m.timeToDouble),
    ];
    if (withLevels) row.push(modeLevelText(c, m, withLevels));
    return row;
  });
  return textTable(
    [
      { header: 'mode' },
      { header: 'stability' },
      { header: 'eigenvalues [1/s]' },
      { header: 'wn [rad/s]', align: 'right' },
      { header: 'zeta', align: 'right' },
      { header: 'period [s]', align: 'right' },
      { header: 'tau [s]', align: 'right' },
      { header: 't1/2 [s]', align: 'right' },
      { header: 't2 [s]', align: 'right' },
      ...(withLevels ? [{ header: 'mode level (decided by)' }] : []),
    ],
    rows,
  );
}

/** The equivalent systems of a condition: form, figures, delay, mismatch beside its guidance, validity. */
function equivalentTable(systems: EquivalentSystem[]): string {
  return textTable(
    [
      { header: 'equivalent system' },
      { header: 'fit' },
      { header: 'figures' },
      { header: 'tau [s]', align: 'right' },
      { header: 'mismatch M (guidance)', align: 'right' },
      { header: 'valid' },
    ],
    systems.map((s) => [
      `${s.axis}: ${s.output}/${s.input}`,
      `${s.method}, ${s.points} pts ${formatSig(s.frequencyRange[0])}-${formatSig(s.frequencyRange[1])} rad/s`,
      equivalentFigures(s),
      formatSig(s.timeDelay),
      `${formatSig(s.mismatch)} (${s.mismatchGuidance})`,
      s.valid ? 'yes' : 'NOT VALID',
    ]),
  );
}

function equivalentFigures(s: EquivalentSystem): string {
  const p = s.parameters;
  if (s.axis === 'roll') return `T_R ${formatSig(p['rollTimeConstant'])} s`;
  const base = `zeta ${formatSig(p['dampingRatio'])}, wn ${formatSig(p['naturalFrequency'])} rad/s`;
  if (s.axis !== 'pitch') return base;
  const db = s.dropback ? `; DB/q_ss ${formatSig(s.dropback.dropbackRatio)} s, q_pk/q_ss ${formatSig(s.dropback.peakRatio)}` : '';
  return `${base}, 1/Ttheta2 ${formatSig(p['inverseTtheta2'])} 1/s${db}`;
}

function findingsTable(c: ConditionResult, paintVerdict: (v: Verdict, text: string) => string): string {
  const rows = c.findings.map((f) => [
    f.basis !== undefined ? `${f.criterion} (equivalent)` : f.criterion,
    `${MODE_TEXT[f.mode]} ${QUANTITY_TEXT[f.quantity]}`,
    f.against ? `${valueText(f)}, ${formatSig(f.against.value)} ${f.against.unit}` : valueText(f),
    f.against ? `Level ${c.requiredLevel ?? 1} region` : boundsText(f.bounds[String(c.requiredLevel ?? 1) as '1' | '2' | '3']),
    levelReachedWords(f) ?? '-',
    VERDICT_TEXT[f.verdict],
    formatSig(f.margin),
    f.evidence.class,
  ]);
  return textTable(
    [
      { header: 'criterion' },
      { header: 'quantity' },
      { header: 'value', align: 'right' },
      { header: 'required bounds' },
      { header: 'reached' },
      { header: 'verdict' },
      { header: 'margin', align: 'right' },
      { header: 'evidence' },
    ],
    rows,
    (i, j, padded) => {
      const f = c.findings[i];
      return j === 5 && f ? paintVerdict(f.verdict, padded) : padded;
    },
  );
}

/** Under the findings table: the defaults each failing or marginal finding leans on. */
function defaultLines(c: ConditionResult): string[] {
  const out: string[] = [];
  for (const f of c.findings) {
    if (f.verdict !== 'fail' && f.verdict !== 'marginal') continue;
    const behind = defaultsBehind(c, f);
    if (behind.length > 0) out.push(`  defaults behind ${f.criterion}: ${behind.join('; ')}`);
  }
  return out;
}

function valueText(f: Finding): string {
  // A pass with no value is an unbounded figure (a convergent mode never doubles).
  if (f.value === null) return f.level !== null ? 'unbounded' : '-';
  const unit = f.unit && f.unit !== '-' ? ` ${f.unit}` : '';
  return `${formatSig(f.value)}${unit}`;
}

function boundsText(b: { min?: number; max?: number } | undefined): string {
  if (!b || (b.min === undefined && b.max === undefined)) return 'no bound';
  if (b.min !== undefined && b.max !== undefined) return `${formatSig(b.min)} to ${formatSig(b.max)}`;
  if (b.min !== undefined) return `>= ${formatSig(b.min)}`;
  return `<= ${formatSig(b.max)}`;
}

function indent(text: string): string {
  return text
    .split('\n')
    .map((l) => `  ${l}`)
    .join('\n');
}
