#!/usr/bin/env node
/**
 * The report benchmark: the whole process, cold start to exit, checking the shipped sample and
 * writing the HTML review, then the PDF review (which drives the system Chromium).
 *
 *   node bench/report.mjs [--runs 5] [--against DIR] [--strict]
 *
 * --against DIR times an earlier build too (DIR/bin/modalgate.js), in turns with this one.
 * The sample is samples/ketra-kt4.yaml; when it is absent the benchmark says so and stops.
 */
import { existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { against, megabytes, memoryMethod, seconds, timeInTurns } from './time-process.mjs';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin', 'modalgate.js');
const CLI_BUILD = join(ROOT, 'dist', 'cli.js');
const SAMPLE = join(ROOT, 'samples', 'ketra-kt4.yaml');
const TARGETS = { htmlSeconds: 0.6, pdfSeconds: 4.0 };

function parseArgs(argv) {
  const out = { runs: 5, strict: false, against: null };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === '--strict') out.strict = true;
    else if (argv[i] === '--count' || argv[i] === '--scale') i += 1; // the sweep's options, passed on by run.mjs; no meaning here
    else if (argv[i] === '--against') {
      out.against = resolve(argv[i + 1] ?? '');
      if (!existsSync(join(out.against, 'bin', 'modalgate.js'))) throw new Error(`report: --against ${out.against}: no bin/modalgate.js there`);
      i += 1;
    }
    else if (argv[i] === '--runs') {
      out.runs = Number(argv[i + 1]);
      i += 1;
    } else throw new Error(`report: unknown option ${argv[i]} (use --runs N --against DIR --strict)`);
  }
  if (!Number.isInteger(out.runs) || out.runs < 1) throw new Error('report: --runs must be a whole number >= 1');
  return out;
}

function main() {
  const args = parseArgs(process.argv.slice(2));
  if (!existsSync(CLI_BUILD)) {
    console.log(`report: modalgate is not built (${CLI_BUILD} is missing); run \`npm run build\` first`);
    return 1;
  }
  if (!existsSync(SAMPLE)) {
    console.log(`report: skipped, the sample ${SAMPLE} is not there yet`);
    return 0;
  }
  const dir = mkdtempSync(join(tmpdir(), 'modalgate-report-'));
  let missed = 0;
  try {
    console.log(`report: samples/ketra-kt4.yaml, median of ${args.runs} cold start(s), whole process; memory by ${memoryMethod()}`);
    const cases = [
      ['--html', join(dir, 'review.html'), TARGETS.htmlSeconds],
      ['--pdf', join(dir, 'review.pdf'), TARGETS.pdfSeconds],
    ];
    for (const [option, out, limit] of cases) {
      const job = (bin, file) => ({ command: process.execPath, args: [bin, 'check', SAMPLE, option, file], options: { kind: 'node', okCodes: [0, 1] } });
      const jobs = [job(BIN, out)];
      if (args.against) jobs.push(job(join(args.against, 'bin', 'modalgate.js'), `${out}.previous`));
      const [run, previous] = timeInTurns(jobs, args.runs, (k, err) => {
        throw err;
      });
      if (!existsSync(out)) throw new Error(`modalgate check ${option} exited without writing ${out}`);
      const size = `${(statSync(out).size / 1e3).toFixed(0)} kB`;
      console.log(`  check ${option.padEnd(7)} ${seconds(run.median).padEnd(8)} ${megabytes(run.peakMb).padEnd(16)} ${size.padEnd(8)} target <= ${limit} s: ${against(run.median, limit)}`);
      if (previous) console.log(`  previous build   ${seconds(previous.median).padEnd(8)} ${megabytes(previous.peakMb).padEnd(16)} (in turns; this build / previous: ${(run.median / previous.median).toFixed(2)})`);
      if (!(run.median <= limit)) missed += 1;
    }
    console.log(missed === 0 ? 'report: every target met' : `report: ${missed} target(s) missed`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  return args.strict && missed > 0 ? 1 : 0;
}

try {
  process.exitCode = main();
} catch (err) {
  console.error(`report: ${err.message}`);
  process.exitCode = 1;
}
