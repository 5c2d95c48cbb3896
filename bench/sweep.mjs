#!/usr/bin/env node
/**
 * The sweep benchmark: a 10,000-condition, 8-state model file (US units, small cross terms
 * between the axes) checked by the whole modalgate process (start to exit, as a user or a CI
 * job runs it), writing JSON, then JSON and JUnit, then HTML, against a Python + numpy
 * reference doing the same kind of work on the same file (writing every field of the results
 * contract) and the same reference writing figures and verdicts only (--lean); then the same
 * check at 50,000 conditions, for time per condition and peak memory.
 *
 *   node bench/sweep.mjs [--count 10000] [--scale 50000] [--runs 5] [--against DIR] [--keep] [--strict]
 *
 * --against DIR times an earlier build too (DIR/bin/modalgate.js over DIR/dist, e.g. a copy of
 * the last commit's `bin`, `dist`, `criteria`, `templates` and `package.json`), run for run in
 * turns with this one, and prints the ratio of the medians; --scale 0 leaves out the large
 * sweep; --keep leaves the temporary directory (model and outputs) in place and says where;
 * --strict exits 1 when a target is missed (the default only reports it).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeSweep } from './make-sweep.mjs';
import { against, megabytes, memoryMethod, seconds, timeInTurns, timeRuns } from './time-process.mjs';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin', 'modalgate.js');
const CLI_BUILD = join(ROOT, 'dist', 'cli.js');
const REFERENCE = join(ROOT, 'bench', 'reference', 'modal_reference.py');

const TARGETS = { jsonSeconds: 1.2, jsonPeakMb: 400, junitSeconds: 1.5, htmlSeconds: 6, leanRatio: 0.9, scalePeakMb: 400, linearity: 1.1 };

function parseArgs(argv) {
  const out = { count: 10000, scale: 50000, runs: 5, keep: false, strict: false, against: null };
  for (let i = 0; i < argv.length; i++) {
    const key = argv[i];
    if (key === '--keep') out.keep = true;
    else if (key === '--strict') out.strict = true;
    else if (key === '--against') {
      out.against = resolve(argv[i + 1] ?? '');
      i += 1;
    } else if (key === '--count' || key === '--runs' || key === '--scale') {
      out[key.slice(2)] = Number(argv[i + 1]);
      i += 1;
    } else throw new Error(`sweep: unknown option ${key} (use --count N --scale N --runs N --against DIR --keep --strict)`);
  }
  if (!Number.isInteger(out.count) || out.count < 1) throw new Error('sweep: --count must be a whole number >= 1');
  if (!Number.isInteger(out.scale) || out.scale < 0) throw new Error('sweep: --scale must be a whole number >= 0');
  if (!Number.isInteger(out.runs) || out.runs < 1) throw new Error('sweep: --runs must be a whole number >= 1');
  if (out.against !== null && !existsSync(join(out.against, 'bin', 'modalgate.js'))) {
    throw new Error(`sweep: --against ${out.against}: no bin/modalgate.js there`);
  }
  return out;
}

/** Debian's python3-numpy lives beside /usr/bin/python3; a pip numpy may shadow it elsewhere. */
function choosePython() {
  for (const candidate of ['/usr/bin/python3', 'python3']) {
    const probe = spawnSync(candidate, ['-c', 'import numpy, sys; print(numpy.__version__); print(numpy.__file__); print(sys.version.split()[0])'], { encoding: 'utf8' });
    if (probe.status === 0) {
      const [version, file, pythonVersion] = probe.stdout.trim().split('\n');
      const origin = file.startsWith('/usr/lib/python3/dist-packages/')
        ? 'Debian python3-numpy'
        : file.includes('site-packages')
          ? 'pip (site-packages)'
          : 'other installation';
      return { python: candidate, pythonVersion, numpy: version, file, origin };
    }
  }
  return null;
}

/** Whether the reference reached the verdicts modalgate did: a check that it did the same work. */
function sameSummary(modalgateFile, referenceFile) {
  const counts = (file) => {
    const { summary } = JSON.parse(readFileSync(file, 'utf8'));
    return ['pass', 'marginal', 'fail', 'not_evaluated'].map((k) => `${summary[k]} ${k.replace('_', ' ')}`).join(', ');
  };
  const ours = counts(modalgateFile);
  const theirs = counts(referenceFile);
  return ours === theirs
    ? `(same verdict counts as modalgate: ${ours})`
    : `(verdict counts DIFFER: modalgate ${ours}; reference ${theirs}: the reference is not doing the same checks)`;
}

function line(label, value, target) {
  return `  ${label.padEnd(34)} ${value.padEnd(26)} ${target}`;
}

/** A run that broke, in a few lines; the other measurements go on. */
let broken = false;
function report(label, err) {
  broken = true;
  const lines = String(err.message).split('\n').filter((l) => l.trim() !== '');
  console.log(`  ${label}: FAILED`);
  for (const l of lines.slice(0, 6)) console.log(`      ${l}`);
}

/** Run one measurement; if it breaks, say so and go on. */
function measure(label, fn) {
  try {
    return fn();
  } catch (err) {
    report(label, err);
    return null;
  }
}

function main() {
  const args = parseArgs(process.argv.slice(2));
  const dir = mkdtempSync(join(tmpdir(), 'modalgate-sweep-'));
  let missed = 0;
  const miss = (ok) => {
    if (!ok) missed += 1;
  };
  try {
    const model = join(dir, 'sweep.json');
    const { bytes } = writeSweep(model, { count: args.count, units: 'US', coupled: true });
    console.log(`sweep: ${args.count} conditions, 8 states (u w q theta v p r phi), US units, small cross terms between the axes, ${(bytes / 1e6).toFixed(1)} MB model file`);
    console.log(`       median of ${args.runs} run(s), wall clock of the whole process; memory by ${memoryMethod()}`);
    console.log('       runs of one table take turns, run by run, so a slow spell falls on all of them');
    if (args.against) console.log(`       "previous" is the build in ${args.against}`);
    console.log('');

    const built = existsSync(CLI_BUILD);
    if (!built) {
      broken = true;
      console.log(`  modalgate is not built: ${CLI_BUILD} is missing.`);
      console.log('  Run `npm run build` first (or `npm run bench`, which builds), then run this again.');
      console.log('  The references are still timed below.');
    }
    const py = choosePython();
    if (py === null) {
      broken = true;
      console.log('  references skipped: neither /usr/bin/python3 nor python3 can import numpy (Debian: apt-get install python3-numpy)');
    }
    const modalgate = (bin, label, extra) => ({ label, command: process.execPath, args: [bin, 'check', model, ...extra], options: { kind: 'node', okCodes: [0, 1] } });
    const previousBin = args.against ? join(args.against, 'bin', 'modalgate.js') : null;

    // modalgate --json (and the previous build), the reference (every field of the results
    // contract) and the lean reference (figures and verdicts only), in turns.
    const jsonOut = join(dir, 'out.json');
    const jobs = [];
    if (built) jobs.push(modalgate(BIN, 'modalgate check --json', ['--json', jsonOut]));
    if (built && previousBin) jobs.push(modalgate(previousBin, 'previous --json', ['--json', join(dir, 'previous.json')]));
    if (py) {
      jobs.push({ label: 'reference', command: py.python, args: [REFERENCE, model, join(dir, 'reference.json')], options: { kind: 'python' } });
      jobs.push({ label: 'lean reference', command: py.python, args: [REFERENCE, '--lean', model, join(dir, 'reference-lean.json')], options: { kind: 'python' } });
    }
    const timed = timeInTurns(jobs, args.runs, (k, err) => report(jobs[k].label, err));
    const of = (label) => timed[jobs.findIndex((j) => j.label === label)] ?? null;
    const jsonRun = of('modalgate check --json');
    const previousRun = of('previous --json');
    const refRun = of('reference');
    const leanRun = of('lean reference');

    if (jsonRun) {
      if (!existsSync(jsonOut)) {
        report('modalgate check --json', new Error('exited without writing the JSON file'));
      } else {
        console.log(line('modalgate check --json', `${seconds(jsonRun.median)}, ${megabytes(jsonRun.peakMb)}`,
          `target <= ${TARGETS.jsonSeconds} s: ${against(jsonRun.median, TARGETS.jsonSeconds)}; <= ${TARGETS.jsonPeakMb} MB: ${against(jsonRun.peakMb, TARGETS.jsonPeakMb)}`));
        console.log(`  ${''.padEnd(34)} (JSON ${(statSync(jsonOut).size / 1e6).toFixed(1)} MB; runs ${seconds(jsonRun.min)} to ${seconds(jsonRun.max)})`);
        miss(jsonRun.median <= TARGETS.jsonSeconds);
        if (jsonRun.peakMb !== null) miss(jsonRun.peakMb <= TARGETS.jsonPeakMb);
      }
    }
    if (previousRun) printPrevious('previous build --json', previousRun, jsonRun, join(dir, 'previous.json'));
    if (py) {
      if (refRun) {
        console.log(line('reference (Python + numpy)', `${seconds(refRun.median)}, ${megabytes(refRun.peakMb)}`, '(timing reference, no target)'));
        console.log(`  ${''.padEnd(34)} (JSON ${(statSync(join(dir, 'reference.json')).size / 1e6).toFixed(1)} MB: every field of the results contract; runs ${seconds(refRun.min)} to ${seconds(refRun.max)})`);
      }
      if (leanRun) {
        console.log(line('lean reference (--lean)', `${seconds(leanRun.median)}, ${megabytes(leanRun.peakMb)}`, '(gauge of the machine, see README)'));
        console.log(`  ${''.padEnd(34)} (JSON ${(statSync(join(dir, 'reference-lean.json')).size / 1e6).toFixed(1)} MB: figures and verdicts only; runs ${seconds(leanRun.min)} to ${seconds(leanRun.max)})`);
      }
      console.log(`  ${''.padEnd(34)} ${py.python} (Python ${py.pythonVersion}), numpy ${py.numpy}, ${py.origin}: ${py.file}`);
      if (jsonRun && refRun) console.log(line('ratio modalgate --json / reference', (jsonRun.median / refRun.median).toFixed(2), '(for information)'));
      if (jsonRun && leanRun) {
        const ratio = jsonRun.median / leanRun.median;
        console.log(line('ratio modalgate --json / lean', ratio.toFixed(2), `target <= ${TARGETS.leanRatio}: ${against(ratio, TARGETS.leanRatio)}`));
        miss(ratio <= TARGETS.leanRatio);
      }
      if (jsonRun && refRun && existsSync(jsonOut)) console.log(`  ${''.padEnd(34)} ${sameSummary(jsonOut, join(dir, 'reference.json'))}`);
    }

    if (built) {
      // --json with --junit, in turns with the previous build when there is one
      const junitJobs = [modalgate(BIN, 'modalgate check --json --junit', ['--json', join(dir, 'j.json'), '--junit', join(dir, 'j.xml')])];
      if (previousBin) junitJobs.push(modalgate(previousBin, 'previous --json --junit', ['--json', join(dir, 'pj.json'), '--junit', join(dir, 'pj.xml')]));
      const [junitRun, previousJunit] = timeInTurns(junitJobs, args.runs, (k, err) => report(junitJobs[k].label, err));
      if (junitRun) {
        console.log(line('modalgate check --json --junit', `${seconds(junitRun.median)}, ${megabytes(junitRun.peakMb)}`,
          `target <= ${TARGETS.junitSeconds} s: ${against(junitRun.median, TARGETS.junitSeconds)}`));
        console.log(`  ${''.padEnd(34)} (JUnit ${(statSync(join(dir, 'j.xml')).size / 1e6).toFixed(1)} MB; runs ${seconds(junitRun.min)} to ${seconds(junitRun.max)})`);
        miss(junitRun.median <= TARGETS.junitSeconds);
      }
      if (previousJunit) printPrevious('previous build --json --junit', previousJunit, junitRun, null);

      const htmlOut = join(dir, 'out.html');
      const htmlRun = measure('modalgate check --html', () => {
        const run = timeRuns(process.execPath, [BIN, 'check', model, '--html', htmlOut], { kind: 'node', okCodes: [0, 1], runs: args.runs });
        if (!existsSync(htmlOut)) throw new Error('exited without writing the HTML file');
        return run;
      });
      if (htmlRun) {
        console.log(line('modalgate check --html', `${seconds(htmlRun.median)}, ${megabytes(htmlRun.peakMb)}`,
          `target <= ${TARGETS.htmlSeconds} s: ${against(htmlRun.median, TARGETS.htmlSeconds)}`));
        console.log(`  ${''.padEnd(34)} (HTML ${(statSync(htmlOut).size / 1e6).toFixed(1)} MB)`);
        miss(htmlRun.median <= TARGETS.htmlSeconds);
      }

      if (args.scale > 0 && jsonRun) {
        // the same kind of file, larger: time per condition and peak memory
        const large = join(dir, 'large.json');
        writeSweep(large, { count: args.scale, units: 'US', coupled: true });
        const runs = Math.min(args.runs, 3);
        const scaleRun = measure(`modalgate check --json, ${args.scale} conditions`, () =>
          timeRuns(process.execPath, [BIN, 'check', large, '--json', join(dir, 'large-out.json')], { kind: 'node', okCodes: [0, 1], runs }));
        if (scaleRun) {
          const per = (run, count) => (run.median / count) * 1000;
          const growth = per(scaleRun, args.scale) / per(jsonRun, args.count);
          console.log(line(`modalgate --json, ${args.scale} conditions`, `${seconds(scaleRun.median)}, ${megabytes(scaleRun.peakMb)}`,
            `<= ${TARGETS.scalePeakMb} MB: ${against(scaleRun.peakMb, TARGETS.scalePeakMb)}`));
          console.log(line('  time per 1,000 conditions', `${(per(scaleRun, args.scale) * 1000).toFixed(0)} ms against ${(per(jsonRun, args.count) * 1000).toFixed(0)} ms`,
            `x${growth.toFixed(2)}, target <= ${TARGETS.linearity} (linear): ${against(growth, TARGETS.linearity)}`));
          console.log(`  ${''.padEnd(34)} (median of ${runs} run(s), not in turns; the figure at ${args.count} is from the table above)`);
          if (scaleRun.peakMb !== null) miss(scaleRun.peakMb <= TARGETS.scalePeakMb);
          miss(growth <= TARGETS.linearity);
        }
      }
    }
    console.log('');
    if (broken) console.log('sweep: incomplete (see above)');
    else console.log(missed === 0 ? 'sweep: every target met' : `sweep: ${missed} target(s) missed`);
  } finally {
    if (args.keep) console.log(`kept ${dir}`);
    else rmSync(dir, { recursive: true, force: true });
  }
  if (broken) return 1;
  return args.strict && missed > 0 ? 1 : 0;
}

/** The earlier build's run beside this one's, taken in turns with it. */
function printPrevious(label, previous, current, outFile) {
  const size = outFile && existsSync(outFile) ? `JSON ${(statSync(outFile).size / 1e6).toFixed(1)} MB; ` : '';
  console.log(line(label, `${seconds(previous.median)}, ${megabytes(previous.peakMb)}`, current ? `this build / previous: ${(current.median / previous.median).toFixed(2)}` : ''));
  console.log(`  ${''.padEnd(34)} (${size}runs ${seconds(previous.min)} to ${seconds(previous.max)})`);
}

try {
  process.exitCode = main();
} catch (err) {
  console.error(`sweep: ${err.message}`);
  process.exitCode = 1;
}
