/**
 * The command line: turns arguments into one library call and the result into output and an
 * exit code. The only module that prints or sets the exit code.
 * Exit codes: 0 nothing failed; 1 a finding failed (or was marginal under --fail-on marginal);
 * 2 bad input or usage; 3 internal error.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { Command, CommanderError, Option } from 'commander';
import { runCheck, type CheckOutcome } from './check.js';
import { MODE_SHAPES_UP_TO } from './results.js';
import { hasIssue } from './report/condition-status.js';
import { INDENT_UP_TO_CONDITIONS } from './report/json.js';
import { ResultsJsonFile } from './report/results-json-file.js';
import { JunitFile } from './report/junit-file.js';
import type { ConditionResult, ResultsHead, SensitivityChoice } from './types.js';
import { InputError } from './errors.js';
import { loadCriteriaSet } from './load/criteria-file.js';
import { BASELINE_LIMIT_BYTES, readInputFile } from './load/read-file.js';
import { checkOutputPaths, checkOutputsAreNotInputs, renderOutputs, writeArtifacts, type OutputPath, type OutputRequest } from './outputs.js';
import { OutputSetError, realTarget, removeLiveTemporaries, targetKind, type PreparedFile } from './report/write-atomic.js';
import { formatResultsText } from './report/terminal.js';
import { progressReporter } from './progress.js';
import { visible, visibleLines } from './visible-text.js';

export const DEFAULT_CRITERIA = 'mil-f-8785c';

export const EXIT = { ok: 0, findingFailed: 1, badInput: 2, internal: 3 } as const;

interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
  color: boolean;
  now: () => Date;
}

function defaultIo(): Io {
  return {
    out: (t) => process.stdout.write(`${t}\n`),
    err: (t) => process.stderr.write(`${t}\n`),
    color: Boolean(process.stdout.isTTY) && !('NO_COLOR' in process.env) && process.env.TERM !== 'dumb',
    now: () => new Date(),
  };
}

export function toolVersion(): string {
  const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8')) as { version: string };
  return pkg.version;
}

export async function main(argv: string[], io: Io = defaultIo()): Promise<number> {
  let exitCode: number = EXIT.ok;
  const program = new Command('modalgate')
    .description('Check an aircraft linear model\'s dynamic modes against handling-qualities criteria.')
    .version(toolVersion())
    .exitOverride()
    .configureOutput({ writeOut: (s) => io.out(visibleLines(s.trimEnd())), writeErr: (s) => io.err(visibleLines(s.trimEnd())) })
    .showHelpAfterError('(modalgate --help for the commands)');

  program
    .command('check')
    .description('identify the modes, evaluate the criteria and write the review document')
    .argument('<model>', 'model file (modalgate-model/1, YAML or JSON)')
    .option('--criteria <set>', `criteria file or shipped set id, any case (repeatable; default: ${DEFAULT_CRITERIA})`, collect)
    .option('--html <file>', 'write the HTML review document')
    .option('--pdf <file>', 'write the PDF review document (needs Chromium)')
    .option('--json <file>', 'write results JSON (modalgate-results/1)')
    .option('--junit <file>', 'write JUnit XML, one test case per condition and criterion')
    .option('--mode-shapes', `write each mode's shape in the results JSON of a sweep too (left out above ${MODE_SHAPES_UP_TO} conditions)`)
    .option('--baseline <results.json>', 'compare with the results of an earlier run')
    .addOption(new Option('--fail-on <verdict>', 'lowest verdict that makes the exit code 1').choices(['fail', 'marginal']).default('fail'))
    .addOption(new Option('--paper <size>', 'PDF paper size').choices(['A4', 'Letter']).default('A4'))
    .option('--browser <path>', 'Chromium or Chrome executable for the PDF')
    .option('--trust-folder <folder>', 'a folder besides the model\'s own whose files the model may name (repeatable)', collect)
    .addOption(new Option('--detail <which>', 'per-condition detail: all, issues (conditions with a fail, marginal or not-evaluated finding) or none').choices(['all', 'issues', 'none']))
    .addOption(
      new Option('--sensitivities <which>', 'design sensitivities (what would move a finding): issues (failing and marginal findings), all or none')
        .choices(['issues', 'all', 'none'])
        .default('issues'),
    )
    .action(async (modelPath: string, opts: CheckCommandOptions) => {
      exitCode = await checkCommand(modelPath, opts, argv, io);
    });

  program
    .command('modes')
    .description('identify the modes and print their figures (no criteria)')
    .argument('<model>', 'model file (modalgate-model/1, YAML or JSON)')
    .option('--json <file>', 'write results JSON (modes only, no findings)')
    .option('--trust-folder <folder>', 'a folder besides the model\'s own whose files the model may name (repeatable)', collect)
    .option('--mode-shapes', `write each mode's shape in the results JSON of a sweep too (left out above ${MODE_SHAPES_UP_TO} conditions)`)
    .action(async (modelPath: string, opts: { json?: string; trustFolder?: string[]; modeShapes?: boolean }) => {
      const outputs: OutputPath[] = opts.json !== undefined ? [{ option: '--json', path: opts.json }] : [];
      await checkOutputPaths(outputs);
      const outcome = await runCheck({
        model: modelPath,
        criteria: [],
        trustedFolders: opts.trustFolder ?? [],
        ...runContext(argv, io),
        ...(opts.modeShapes ? { modeShapes: true } : {}),
        onStart: (head) => checkOutputsAreNotInputs(outputs, head.inputs),
      });
      for (const w of outcome.model.warnings ?? []) io.err(`warning: ${visible(w)}`);
      if (opts.json !== undefined) tellModeShapes(outcome, io);
      io.out(formatResultsText(outcome.results, { color: io.color, detail: 'all', findings: false }));
      await writeAndTell(outcome, { ...(opts.json !== undefined ? { json: opts.json } : {}), paper: 'A4', failOn: 'fail', detail: 'all' }, io);
    });

  const criteria = program.command('criteria').description('inspect criteria files');
  criteria
    .command('show')
    .argument('<file>', 'criteria file or shipped set id')
    .description('print the resolved criteria set (after extends and overrides) as a table')
    .option('--trust-folder <folder>', 'a folder besides the file\'s own that its extends may name (repeatable)', collect, [])
    .action(async (file: string, opts: { trustFolder: string[] }) => {
      const [{ set }, { formatCriteriaSetText }] = await Promise.all([loadCriteriaSet(file, { trustedFolders: opts.trustFolder }), import('./report/criteria-text.js')]);
      io.out(formatCriteriaSetText(set));
    });
  criteria
    .command('check')
    .argument('<file>', 'criteria file or shipped set id')
    .description('validate a criteria file and its extends chain')
    .option('--trust-folder <folder>', 'a folder besides the file\'s own that its extends may name (repeatable)', collect, [])
    .action(async (file: string, opts: { trustFolder: string[] }) => {
      const { set, files } = await loadCriteriaSet(file, { trustedFolders: opts.trustFolder });
      io.out(visible(`${file}: valid; set ${set.id} (${set.chain.join(' > ')}), ${set.criteria.length} criteria, ${set.dropped.length} dropped, ${files.length} file(s)`));
    });

  // A usage error prints the error and the command's one usage line, not the whole help.
  for (const command of [...program.commands, ...criteria.commands]) {
    const name = command.parent && command.parent !== program ? `${command.parent.name()} ${command.name()}` : command.name();
    command.showHelpAfterError(`usage: modalgate ${name} ${command.usage()} (--help for every option)`);
  }

  try {
    await program.parseAsync(argv, { from: 'user' });
    return exitCode;
  } catch (err) {
    return reportError(err, io);
  }
}

/** Above this many conditions the report lists only conditions with issues, unless asked. */
const LARGE_RUN = 50;

/** Above this many conditions the terminal lists only conditions with issues, unless asked (a screenful of tables). */
const SMALL_SWEEP = 8;

interface CheckCommandOptions {
  /** absent when not given: the default set is used and said */
  criteria?: string[];
  html?: string;
  pdf?: string;
  json?: string;
  junit?: string;
  modeShapes?: boolean;
  baseline?: string;
  failOn: 'fail' | 'marginal';
  paper: 'A4' | 'Letter';
  browser?: string;
  detail?: 'all' | 'issues' | 'none';
  trustFolder?: string[];
  sensitivities: SensitivityChoice;
}

async function checkCommand(modelPath: string, opts: CheckCommandOptions, argv: string[], io: Io): Promise<number> {
  const given = opts.criteria ?? [];
  const criteria = given.length > 0 ? given : [DEFAULT_CRITERIA];
  if (given.length === 0) io.out(`no --criteria given: using the shipped set ${DEFAULT_CRITERIA}`);
  // Read the baseline and check the outputs (the default report too) before any work, so that
  // a bad baseline or an output that cannot be written is reported at once; once the model
  // and criteria are read, no output may be one of them.
  const baseline = opts.baseline !== undefined ? await readInputFile(opts.baseline, { limitBytes: BASELINE_LIMIT_BYTES }) : undefined;
  // the comparison's machinery (and the baseline schema) loads only with a baseline
  const compare = baseline ? await Promise.all([import('./compare/compare-results.js'), import('./compare/format-comparison.js')]) : undefined;
  const baselineResults = baseline && compare ? compare[0].parseBaselineResults(baseline.text, baseline.path) : undefined;
  const outputs = outputPaths(modelPath, opts);
  await checkOutputPaths(outputs);
  // a PDF's browser is looked for now, not after a long sweep (one that exists but will not
  // start is found only when it is started)
  if (opts.pdf !== undefined) (await import('./report/browser.js')).findBrowser(opts.browser);
  const baselineInput = baseline ? [{ role: 'baseline' as const, path: baseline.path, sha256: baseline.sha256 }] : [];
  // The results JSON of a large sweep and the JUnit file are written as the conditions are
  // checked (to regular files; a device is written through at the end), and only the
  // conditions the terminal lists are kept whole. The report and a comparison need every
  // result, so with either of them the results are kept and every output written at the end.
  const detailFor = (total: number) => opts.detail ?? (total > LARGE_RUN ? 'issues' : 'all');
  const terminalDetailFor = (total: number) => opts.detail ?? (total > SMALL_SWEEP ? 'issues' : 'all');
  const streamable = opts.html === undefined && opts.pdf === undefined && !baseline;
  const streamsTo = (path: string | undefined): path is string => streamable && path !== undefined && targetKind(realTarget(path)) !== 'device';
  const streams: Streams = {};
  const progress = progressReporter();
  try {
    const outcome = await runCheck({
      model: modelPath,
      criteria,
      trustedFolders: opts.trustFolder ?? [],
      ...runContext(argv, io),
      ...(opts.modeShapes ? { modeShapes: true } : {}),
      sensitivities: opts.sensitivities,
      onProgress: progress.onProgress,
      onStart: (head: ResultsHead, total: number) => {
        checkOutputsAreNotInputs(outputs, [...head.inputs, ...baselineInput]);
        checkReportSize(outputs, total);
        if (streamsTo(opts.json) && total > INDENT_UP_TO_CONDITIONS) streams.json = ResultsJsonFile.open(opts.json, head);
        if (streamsTo(opts.junit)) streams.junit = JunitFile.open(opts.junit, head.aircraft.name, { failOn: opts.failOn });
      },
      ...(streamable
        ? {
            onCondition: (r: ConditionResult) => {
              streams.json?.add(r);
              streams.junit?.add(r);
            },
            // an output written at the end needs every condition
            keep: (r: ConditionResult, total: number) =>
              (opts.json !== undefined && streams.json === undefined) ||
              (opts.junit !== undefined && streams.junit === undefined) ||
              keepFor(terminalDetailFor(total), r),
          }
        : {}),
    }).finally(progress.stop);
    const total = outcome.conditionCount;
    return await reportCheck(outcome, { modelPath, opts, baseline, baselineResults, compare, detail: detailFor(total), terminalDetail: terminalDetailFor(total), streams }, io);
  } catch (err) {
    // files begun during the check are dropped; the last good ones stay in place
    streams.json?.abort();
    streams.junit?.abort();
    throw err;
  }
}

/** The outputs being written as the conditions are checked, if any. */
interface Streams {
  json?: ResultsJsonFile;
  junit?: JunitFile;
}

type BaselineResults = ReturnType<typeof import('./compare/compare-results.js').parseBaselineResults>;

interface ReportContext {
  modelPath: string;
  opts: CheckCommandOptions;
  baseline: Awaited<ReturnType<typeof readInputFile>> | undefined;
  /** the baseline, parsed before the check */
  baselineResults: BaselineResults | undefined;
  /** the comparison's modules, loaded only with a baseline */
  compare: [typeof import('./compare/compare-results.js'), typeof import('./compare/format-comparison.js')] | undefined;
  detail: 'all' | 'issues' | 'none';
  /** the terminal's own: a sweep beyond a few conditions lists those with issues */
  terminalDetail: 'all' | 'issues' | 'none';
  /** the outputs written as the conditions were checked */
  streams: Streams;
}

async function reportCheck(outcome: CheckOutcome, context: ReportContext, io: Io): Promise<number> {
  const { modelPath, opts, baseline, baselineResults, detail, terminalDetail, streams } = context;
  if (baseline) outcome.results.inputs.push({ role: 'baseline', path: baseline.path, sha256: baseline.sha256 });
  const compare = context.compare;
  const comparison = baselineResults && compare ? compare[0].compareResults(outcome.results, baselineResults) : undefined;

  for (const w of outcome.model.warnings ?? []) io.err(`warning: ${visible(w)}`);
  const total = outcome.conditionCount;
  if (!opts.detail && total > SMALL_SWEEP) {
    const where = total > LARGE_RUN ? 'here and in the report' : 'here (the report has every one)';
    io.out(`${total} conditions: per-condition detail limited to conditions with issues ${where}; --detail all lists every one`);
  }
  if (opts.json) tellModeShapes(outcome, io);

  const html = outputPaths(modelPath, opts).find((o) => o.option === '--html')?.path;
  io.out(formatResultsText(outcome.results, { color: io.color, detail: terminalDetail, findings: true, conditionCount: total }));
  if (comparison && compare) io.out(`\n${compare[1].formatComparisonText(comparison, { color: io.color })}`);

  const request: OutputRequest = {
    ...(html ? { html } : {}),
    ...(opts.pdf !== undefined ? { pdf: opts.pdf } : {}),
    ...(opts.json !== undefined && !streams.json ? { json: opts.json } : {}),
    ...(opts.junit !== undefined && !streams.junit ? { junit: opts.junit } : {}),
    ...(opts.browser ? { browser: opts.browser } : {}),
    ...(comparison ? { comparison } : {}),
    paper: opts.paper,
    failOn: opts.failOn,
    detail,
  };
  await writeAndTell(outcome, request, io, streams);

  const s = outcome.results.summary;
  if (s.fail > 0 || (opts.failOn === 'marginal' && s.marginal > 0)) return EXIT.findingFailed;
  return EXIT.ok;
}

/** Render the outputs and put them in place, with those written during the check, as one set. */
async function writeAndTell(outcome: CheckOutcome, request: OutputRequest, io: Io, streams: Streams = {}): Promise<void> {
  const written = await whileCleaningUpOnSignals(io, async () => {
    const rendered = await renderOutputs(outcome, request);
    const streamed: { kind: string; file: PreparedFile }[] = [];
    if (streams.json) streamed.push({ kind: 'json', file: streams.json.prepare(outcome.results.summary) });
    if (streams.junit) streamed.push({ kind: 'junit', file: streams.junit.prepare() });
    await writeArtifacts(rendered, streamed.map((s) => s.file));
    return [...rendered, ...streamed.map((s) => ({ kind: s.kind, path: s.file.path }))];
  });
  for (const a of written) io.out(`wrote ${a.kind.toUpperCase()} ${visible(a.path)}`);
}

/**
 * While outputs are rendered and written (the asynchronous part of a run, when a signal is
 * handled at once), SIGINT or SIGTERM removes this run's temporary files before it stops; a
 * set of outputs being put in place is completed first. A run stopped while it checks the
 * conditions (synchronous work, during which no signal handler runs) leaves the temporary files
 * of the outputs it writes as it goes, named so that the next run writing them removes them
 * (write-atomic.ts).
 */
async function whileCleaningUpOnSignals<T>(io: Io, work: () => Promise<T>): Promise<T> {
  const onSignal = (signal: NodeJS.Signals) => {
    const code = 128 + (signal === 'SIGINT' ? 2 : 15);
    const stop = (after: string) => () => {
      io.err(`modalgate: stopped by ${signal}; ${after}`);
      process.exit(code);
    };
    if (removeLiveTemporaries(stop('the outputs being put in place were completed first'))) stop('no output was changed')();
  };
  process.on('SIGINT', onSignal);
  process.on('SIGTERM', onSignal);
  try {
    return await work();
  } finally {
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
  }
}

/**
 * Most conditions a review document is made for. The document is built in memory as one text;
 * at 100,000 conditions it passes the largest string the JavaScript engine can hold, and fails
 * after the whole sweep was checked. 10,000 take a few seconds (bench/sweep.mjs).
 */
export const REPORT_CONDITION_LIMIT = 20_000;

/** Stop before the work when a review document is asked of a sweep too large for one. */
function checkReportSize(outputs: readonly OutputPath[], total: number): void {
  const report = outputs.find((o) => o.option === '--html' || o.option === '--pdf');
  if (!report || total <= REPORT_CONDITION_LIMIT) return;
  throw new InputError([
    {
      file: '<command line>',
      field: report.option,
      message: `a review document of ${total} conditions is more than modalgate writes (at most ${REPORT_CONDITION_LIMIT}); check the sweep in parts, or write only --json and --junit for the whole of it`,
      expected: `at most ${REPORT_CONDITION_LIMIT} conditions with --html or --pdf`,
      found: `${total} conditions`,
      code: 'output_too_large',
    },
  ]);
}

/** The outputs a check writes, by option; with none named, the HTML report beside the model. */
function outputPaths(modelPath: string, opts: CheckCommandOptions): OutputPath[] {
  const named: OutputPath[] = [];
  for (const option of ['html', 'pdf', 'json', 'junit'] as const) {
    const path = opts[option];
    if (path !== undefined) named.push({ option: `--${option}`, path });
  }
  return named.length > 0 ? named : [{ option: '--html', path: defaultHtmlPath(modelPath) }];
}

/** A default the user did not ask for is said: mode shapes left out of a sweep's results. */
function tellModeShapes(outcome: CheckOutcome, io: Io): void {
  if (outcome.results.contents.modeShapes) return;
  io.out(`${outcome.conditionCount} conditions: mode shapes left out of the results JSON (more than ${MODE_SHAPES_UP_TO} conditions; --mode-shapes to write them)`);
}

function runContext(argv: string[], io: Io) {
  return { toolVersion: toolVersion(), command: ['modalgate', ...argv], generatedAt: io.now().toISOString() };
}

/** Whether the terminal lists a condition under `detail`, so that its whole result must be kept. */
function keepFor(detail: 'all' | 'issues' | 'none', result: ConditionResult): boolean {
  return detail === 'all' || (detail === 'issues' && hasIssue(result));
}

function defaultHtmlPath(modelPath: string): string {
  const parsed = path.parse(modelPath);
  return path.join(parsed.dir, `${parsed.name}.review.html`);
}

function collect(value: string, previous: string[] | undefined): string[] {
  return [...(previous ?? []), value];
}

/** Problems of the command line's outputs or of the machine (not of the model or criteria files). */
const SETUP_CODES = /^(output_|no_browser$|browser_)/;

function reportError(err: unknown, io: Io): number {
  if (err instanceof CommanderError) {
    if (err.code === 'commander.helpDisplayed' || err.code === 'commander.version' || err.code === 'commander.help') return EXIT.ok;
    return EXIT.badInput;
  }
  if (err instanceof OutputSetError) {
    io.err(err.message);
    io.err(`modalgate: ${err.issues.length} problem(s) writing the outputs; these were written and could not be put back: ${err.written.map(visible).join(', ')}`);
    return EXIT.badInput;
  }
  if (err instanceof InputError) {
    io.err(err.message);
    const where = err.issues.every((i) => SETUP_CODES.test(i.code)) ? 'with the outputs or the browser' : 'in the input';
    io.err(`modalgate: ${err.issues.length} problem(s) ${where}; nothing was written`);
    return EXIT.badInput;
  }
  const e = err as Error;
  io.err(`modalgate: internal error: ${visibleLines(e?.stack ?? String(err))}`);
  io.err('this is a bug in modalgate; nothing was written');
  return EXIT.internal;
}
