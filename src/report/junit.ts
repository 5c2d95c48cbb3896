/**
 * JUnit XML for CI servers: one testsuite per flight condition, one testcase per finding.
 * A failing finding (and a marginal one under failOn 'marginal') is a <failure>; a finding
 * that could not be evaluated is <skipped> with its reason, so it is neither hidden as a pass
 * nor counted as a failure. Times are 0: the figures are computed, not timed tests.
 */
import { QUANTITY_TEXT } from './labels.js';
import { EVIDENCE_MEANING } from './evidence-text.js';
import type { Bound, ConditionResult, Finding, LevelBounds, Results } from '../types.js';
import { formatSig } from './format-number.js';

export interface JunitOptions {
  failOn: 'fail' | 'marginal';
}

/** Test, failure and skipped counts of a suite or of the whole file. */
export interface JunitTotals {
  tests: number;
  failures: number;
  skipped: number;
}

export interface JunitSuite extends JunitTotals {
  /** the suite's lines, without a final newline */
  xml: string;
}

/** The first line of the file. */
export const JUNIT_DECLARATION = '<?xml version="1.0" encoding="UTF-8"?>';
/** The last line of the file. */
export const JUNIT_CLOSE = '</testsuites>';

/**
 * The file: the declaration, the root element's start tag with the totals, one suite per
 * condition, the end tag, each on its own line. junit-file.ts writes the same lines as the
 * conditions are checked.
 */
export function renderJunit(results: Results, options: JunitOptions): string {
  const aircraft = results.aircraft.name;
  const suites = results.conditions.map((c) => renderJunitSuite(aircraft, c, options));
  const totals: JunitTotals = { tests: 0, failures: 0, skipped: 0 };
  for (const s of suites) addJunitTotals(totals, s);
  return [JUNIT_DECLARATION, junitRoot(aircraft, totals), ...suites.map((s) => s.xml), JUNIT_CLOSE, ''].join('\n');
}

/** The root element's start tag. */
export function junitRoot(aircraft: string, totals: JunitTotals): string {
  return `<testsuites ${attrs({ name: `modalgate ${aircraft}`, tests: totals.tests, failures: totals.failures, errors: 0, skipped: totals.skipped, time: 0 })}>`;
}

export function addJunitTotals(into: JunitTotals, suite: JunitTotals): void {
  into.tests += suite.tests;
  into.failures += suite.failures;
  into.skipped += suite.skipped;
}

/** One condition's suite. */
export function renderJunitSuite(aircraft: string, c: ConditionResult, options: JunitOptions): JunitSuite {
  const classname = `${aircraft}.${c.id}`;
  let failures = 0;
  let skipped = 0;
  const cases = c.findings.map((f) => {
    const outcome = outcomeOf(f, options);
    if (outcome === 'failure') failures += 1;
    if (outcome === 'skipped') skipped += 1;
    return renderCase(classname, c, f, outcome);
  });
  const head = `  <testsuite ${attrs({ name: classname, tests: c.findings.length, failures, errors: 0, skipped, time: 0 })}>`;
  const out = [...c.warnings.map((w) => `warning: ${w}`), ...c.notes.map((n) => `note: ${n}`)];
  const systemOut = out.length > 0 ? [`    <system-out>${text(out.join('\n'))}</system-out>`] : [];
  const xml = [head, ...cases, ...systemOut, '  </testsuite>'].join('\n');
  return { xml, tests: c.findings.length, failures, skipped };
}

type Outcome = 'pass' | 'failure' | 'skipped';

function outcomeOf(f: Finding, options: JunitOptions): Outcome {
  if (f.verdict === 'not_evaluated') return 'skipped';
  if (f.verdict === 'fail') return 'failure';
  if (f.verdict === 'marginal' && options.failOn === 'marginal') return 'failure';
  return 'pass';
}

function renderCase(classname: string, c: ConditionResult, f: Finding, outcome: Outcome): string {
  const open = `    <testcase ${attrs({ classname, name: `${f.criterion} ${QUANTITY_TEXT[f.quantity]}`, time: 0 })}`;
  const body: string[] = [];
  if (outcome === 'failure') {
    body.push(`      <failure ${attrs({ message: verdictMessage(c, f), type: f.verdict })}>${text(detail(f))}</failure>`);
  } else if (outcome === 'skipped') {
    body.push(`      <skipped ${attrs({ message: f.reason || 'not evaluated (no reason given)' })}/>`);
  } else if (f.verdict === 'marginal') {
    // Kept visible in the CI log although it does not fail the build under failOn 'fail'.
    body.push(`      <system-out>${text(`${verdictMessage(c, f)} (not a failure unless failing on marginal)`)}</system-out>`);
  }
  return body.length === 0 ? `${open}/>` : [`${open}>`, ...body, '    </testcase>'].join('\n');
}

/** `fail: value 0.31 [-], Level 1 bounds min 0.35 max 1.3, level reached 2 (required 1), margin -0.04` */
function verdictMessage(c: ConditionResult, f: Finding): string {
  const unit = f.unit ? ` [${f.unit}]` : '';
  const required = f.bounds[String(c.requiredLevel) as '1' | '2' | '3'];
  const reached = f.level === null ? 'none' : String(f.level);
  return (
    `${f.verdict}: value ${formatSig(f.value, 4)}${unit}, Level ${c.requiredLevel} bounds ${boundText(required)}, ` +
    `level reached ${reached} (required ${c.requiredLevel}), margin ${formatSig(f.margin, 3)}`
  );
}

function detail(f: Finding): string {
  const lines = [`${f.title || f.criterion} (${f.set || 'criteria set not named'})`];
  for (const level of ['1', '2', '3'] as const) {
    const b = (f.bounds as LevelBounds)[level];
    if (b) lines.push(`Level ${level}: ${boundText(b)}`);
  }
  if (f.method) lines.push(`method: ${f.method}`);
  if (f.reason) lines.push(f.reason);
  lines.push(`source: ${f.source}`);
  const cited = f.evidence.sources.length > 0 ? `; sources ${f.evidence.sources.join(', ')}` : '';
  lines.push(`evidence of the boundary: ${f.evidence.class} (${EVIDENCE_MEANING[f.evidence.class]})${cited}`);
  return lines.join('\n');
}

function boundText(b: Bound | undefined): string {
  if (!b || (b.min === undefined && b.max === undefined)) return 'none';
  const parts: string[] = [];
  if (b.min !== undefined) parts.push(`min ${formatSig(b.min, 4)}`);
  if (b.max !== undefined) parts.push(`max ${formatSig(b.max, 4)}`);
  return parts.join(' ');
}

function attrs(values: Record<string, string | number>): string {
  return Object.entries(values)
    .map(([k, v]) => `${k}="${escapeXml(String(v))}"`)
    .join(' ');
}

function text(s: string): string {
  return escapeXml(s, 'text');
}

/**
 * Escape the five XML specials, and replace the characters XML 1.0 forbids outright (C0
 * controls other than tab, newline and return; lone surrogates; U+FFFE/U+FFFF) with U+FFFD,
 * since no escape can carry them. Newlines and tabs in attributes are written as character
 * references so that attribute-value normalisation does not turn them into spaces.
 */
export function escapeXml(s: string, context: 'attribute' | 'text' = 'attribute'): string {
  const keepWhitespace = context === 'text';
  let out = '';
  for (let i = 0; i < s.length; i++) {
    const code = s.charCodeAt(i);
    const ch = s[i] as string;
    if (code >= 0xd800 && code <= 0xdbff) {
      const next = s.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) {
        out += ch + (s[i + 1] as string);
        i += 1;
      } else out += '\ufffd';
      continue;
    }
    if (code >= 0xdc00 && code <= 0xdfff) {
      out += '\ufffd';
      continue;
    }
    switch (ch) {
      case '&': out += '&amp;'; break;
      case '<': out += '&lt;'; break;
      case '>': out += '&gt;'; break;
      case '"': out += '&quot;'; break;
      case "'": out += '&apos;'; break;
      case '\n': out += keepWhitespace ? '\n' : '&#10;'; break;
      case '\r': out += '&#13;'; break;
      case '\t': out += keepWhitespace ? '\t' : '&#9;'; break;
      default:
        out += (code < 0x20 || code === 0xfffe || code === 0xffff) ? '\ufffd' : ch;
    }
  }
  return out;
}
