/**
 * Render every requested output in memory first, then write them all under temporary names
 * and put them in place as one set: a run that fails while rendering or writing leaves every
 * earlier report as it was.
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
import { commitFiles, discardPrepared, prepareFile, realTarget, targetKind, type Chunks, type PreparedFile } from './report/write-atomic.js';
import type { InputFile } from './types.js';

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
    const { responseCurves } = await import('./responses/response-curves.js');
    const byId = new Map(outcome.model.conditions.map((c) => [c.id, c]));
    const view = buildReportView(results, sets, {
      reportId,
      responseCurves: (c) => {
        const condition = byId.get(c.id);
        return condition && c.responses ? responseCurves(condition, c.responses, c.modes) : null;
      },
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

/** An output the command line was asked for: the option that names it and the path given. */
export interface OutputPath {
  option: string;
  path: string;
}

/**
 * Fail before any work when an output cannot be written where it is asked for (an empty path,
 * a missing folder, no permission, a folder, FIFO or socket of that name) or when two outputs
 * name the same file: a long sweep should not run first, and one report must not be written
 * when the next one then cannot be.
 */
export async function checkOutputPaths(outputs: readonly OutputPath[]): Promise<void> {
  const issues: InputIssue[] = [];
  const seen = new Map<string, OutputPath>();
  for (const output of outputs) {
    const { option, path } = output;
    if (path.trim() === '') {
      issues.push({ file: '<command line>', field: option, message: 'the output path is empty', expected: 'a file name', found: JSON.stringify(path), code: 'output_path' });
      continue;
    }
    const target = realTarget(path);
    const first = seen.get(target);
    if (first) {
      issues.push({ file: path, field: option, message: `the same file is also named by ${first.option}; each output needs a file of its own`, expected: 'a path no other output uses', found: first.path, code: 'output_twice' });
      continue;
    }
    seen.set(target, output);
    try {
      await access(dirname(target), constants.W_OK);
      const kind = targetKind(target);
      if (kind === 'other') {
        const isFolder = (await stat(target)).isDirectory();
        throw Object.assign(new Error('in the way'), { code: isFolder ? 'EISDIR' : 'MG_NOT_REGULAR' });
      }
    } catch (err) {
      const mapped = outputError(path, err);
      if (!(mapped instanceof InputError)) throw mapped;
      issues.push(...mapped.issues.map((i) => ({ ...i, field: option })));
    }
  }
  if (issues.length > 0) throw new InputError(issues);
}

/**
 * No output may overwrite an input of the run (model, condition table, criteria file, baseline),
 * compared by real path so that another spelling or a link to the same file is caught too.
 */
export function checkOutputsAreNotInputs(outputs: readonly OutputPath[], inputs: readonly InputFile[]): void {
  const byTarget = new Map(inputs.map((i) => [realTarget(i.path), i]));
  const issues: InputIssue[] = [];
  for (const { option, path } of outputs) {
    const input = byTarget.get(realTarget(path));
    if (!input) continue;
    const what = input.role === 'table' ? 'condition table' : `${input.role} file`;
    issues.push({ file: path, field: option, message: `this output would overwrite the ${what} ${input.path}; choose another path`, expected: 'a path that is not an input', found: input.path, code: 'output_is_input' });
  }
  if (issues.length > 0) throw new InputError(issues);
}

/**
 * Write every artifact as one set: each is written in full under a temporary name first, then
 * all are put in place together (write-atomic.ts), so a failure leaves every earlier output as
 * it was, or names exactly the ones that were replaced.
 */
/** Write the artifacts and put them in place, with `written` (files already prepared), as one set. */
export async function writeArtifacts(artifacts: Artifact[], written: readonly PreparedFile[] = []): Promise<void> {
  const prepared: PreparedFile[] = [...written];
  try {
    for (const a of artifacts) prepared.push(await prepareFile(a.path, a.data));
  } catch (err) {
    discardPrepared(prepared);
    throw err;
  }
  await commitFiles(prepared);
}
