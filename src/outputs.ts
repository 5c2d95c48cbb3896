/**
 * Render every requested output in memory first, then write them all under temporary names
 * and rename: a run that fails while rendering leaves every earlier report as it was.
 */
import { createHash } from 'node:crypto';
import type { CheckOutcome } from './check.js';
import type { Comparison } from './compare/compare-results.js';
import { constants } from 'node:fs';
import { access, stat } from 'node:fs/promises';
import { dirname } from 'node:path';
import { InputError, InternalError, type InputIssue } from './errors.js';
import { outputError } from './report/output-error.js';
import { resultsJsonChunks } from './report/json.js';
import { renderJunit } from './report/junit.js';
import { writeFileAtomic, type Chunks } from './report/write-atomic.js';

export interface OutputRequest {
  html?: string;
  pdf?: string;
  json?: string;
  junit?: string;
  paper: 'A4' | 'Letter';
  browser?: string;
  failOn: 'fail' | 'marginal';
  comparison?: Comparison;
  detail: 'all' | 'issues' | 'none';
}

export interface Artifact {
  kind: 'html' | 'pdf' | 'json' | 'junit';
  path: string;
  data: string | Buffer | Chunks;
}

/** Stable id of a report: the same inputs and run time give the same id. */
export function reportIdOf(outcome: CheckOutcome): string {
  const hash = createHash('sha256');
  for (const input of outcome.results.inputs) hash.update(`${input.role}:${input.sha256}\n`);
  hash.update(outcome.results.generatedAt);
  return `MG-${hash.digest('hex').slice(0, 10).toUpperCase()}`;
}

export async function renderOutputs(outcome: CheckOutcome, request: OutputRequest): Promise<Artifact[]> {
  const artifacts: Artifact[] = [];
  const { results, sets } = outcome;
  const wantsAny = Boolean(request.json || request.junit || request.html || request.pdf || request.comparison);
  if (wantsAny && results.conditions.length !== outcome.conditionCount) {
    throw new InternalError('an output that needs every condition was asked of a check that kept only some');
  }
  if (request.json) artifacts.push({ kind: 'json', path: request.json, data: resultsJsonChunks(results) });
  if (request.junit) artifacts.push({ kind: 'junit', path: request.junit, data: renderJunit(results, { failOn: request.failOn }) });
  if (request.html || request.pdf) {
    // The document's machinery (templates, Markdown, charts, browser) loads only when asked for.
    const [{ buildReportView }, { renderHtml }] = await Promise.all([import('./report/view-model.js'), import('./report/html.js')]);
    const reportId = reportIdOf(outcome);
    const view = buildReportView(results, sets, {
      reportId,
      ...(request.comparison ? { comparison: request.comparison } : {}),
      detail: request.detail,
    });
    const html = renderHtml(view);
    if (request.html) artifacts.push({ kind: 'html', path: request.html, data: html });
    if (request.pdf) {
      const [{ findBrowser }, { renderPdf }] = await Promise.all([import('./report/browser.js'), import('./report/pdf.js')]);
      const browser = findBrowser(request.browser);
      const pdf = await renderPdf(html, {
        browser,
        paper: request.paper,
        reportId,
        title: `${results.aircraft.name}: handling-qualities review`,
      });
      artifacts.push({ kind: 'pdf', path: request.pdf, data: pdf });
    }
  }
  return artifacts;
}

/**
 * Fail before any work when an output cannot be written where it is asked for (a missing
 * folder, no permission, a folder of that name): a long sweep should not run first, and one
 * report must not be written when the next one then cannot be.
 */
export async function checkOutputPaths(paths: readonly string[]): Promise<void> {
  const issues: InputIssue[] = [];
  for (const path of paths) {
    try {
      await access(dirname(path), constants.W_OK);
      const existing = await stat(path).catch(() => undefined);
      if (existing?.isDirectory()) throw Object.assign(new Error('is a directory'), { code: 'EISDIR' });
    } catch (err) {
      const mapped = outputError(path, err);
      if (!(mapped instanceof InputError)) throw mapped;
      issues.push(...mapped.issues);
    }
  }
  if (issues.length > 0) throw new InputError(issues);
}

export async function writeArtifacts(artifacts: Artifact[]): Promise<void> {
  for (const a of artifacts) await writeFileAtomic(a.path, a.data);
}
