#!/usr/bin/env node
/**
 * The report benchmark: the whole process, cold start to exit, checking the shipped sample and
 * writing the HTML review, then the PDF review (which drives the system Chromium).
 *
 *   node bench/report.mjs [--runs 5] [--strict]
 *
 * The sample is samples/ketra-kt4.yaml; when it is absent the benchmark says so and stops.
 */
import { existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { against, megabytes, memoryMethod, seconds, timeRuns } from './time-process.mjs';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin', 'modalgate.js');
const CLI_BUILD = join(ROOT, 'dist', 'cli.js');
const SAMPLE = join(ROOT, 'samples', 'ketra-kt4.yaml');
const TARGETS = { htmlSeconds: 1.0, pdfSeconds: 4.0 };

function parseArgs(argv) {
  const out = { runs: 5, strict: false };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === '--strict') out.strict = true;
    else if (argv[i] === '--count') i += 1; // the sweep's option, passed on by run.mjs; no meaning here
    else if (argv[i] === '--runs') {
      out.runs = Number(argv[i + 1]);
      i += 1;
    } else throw new Error(`report: unknown option ${argv[i]} (use --runs N --strict)`);
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
      const run = timeRuns(process.execPath, [BIN, 'check', SAMPLE, option, out], { kind: 'node', okCodes: [0, 1], runs: args.runs });
      if (!existsSync(out)) throw new Error(`modalgate check ${option} exited without writing ${out}`);
      const size = `${(statSync(out).size / 1e3).toFixed(0)} kB`;
      console.log(`  check ${option.padEnd(7)} ${seconds(run.median).padEnd(8)} ${megabytes(run.peakMb).padEnd(16)} ${size.padEnd(8)} target <= ${limit} s: ${against(run.median, limit)}`);
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
