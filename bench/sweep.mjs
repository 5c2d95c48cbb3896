#!/usr/bin/env node
/**
 * The sweep benchmark: a 10,000-condition, 8-state model file checked by the whole modalgate
 * process (start to exit, as a user or a CI job runs it), once writing JSON and once writing
 * HTML, against a Python + numpy reference doing the same kind of work on the same file
 * (writing every field of the results contract), and, for information, the same reference
 * writing figures and verdicts only (--lean).
 *
 *   node bench/sweep.mjs [--count 10000] [--runs 5] [--keep] [--strict]
 *
 * --keep leaves the temporary directory (model and outputs) in place and says where;
 * --strict exits 1 when a target is missed (the default only reports it).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeSweep } from './make-sweep.mjs';
import { against, megabytes, memoryMethod, seconds, timeInTurns, timeRuns } from './time-process.mjs';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin', 'modalgate.js');
const CLI_BUILD = join(ROOT, 'dist', 'cli.js');
const REFERENCE = join(ROOT, 'bench', 'reference', 'modal_reference.py');

const TARGETS = { jsonSeconds: 1.5, jsonPeakMb: 400, htmlSeconds: 6, ratio: 1.0 };

function parseArgs(argv) {
  const out = { count: 10000, runs: 5, keep: false, strict: false };
  for (let i = 0; i < argv.length; i++) {
    const key = argv[i];
    if (key === '--keep') out.keep = true;
    else if (key === '--strict') out.strict = true;
    else if (key === '--count' || key === '--runs') {
      out[key.slice(2)] = Number(argv[i + 1]);
      i += 1;
    } else throw new Error(`sweep: unknown option ${key} (use --count N --runs N --keep --strict)`);
  }
  if (!Number.isInteger(out.count) || out.count < 1) throw new Error('sweep: --count must be a whole number >= 1');
  if (!Number.isInteger(out.runs) || out.runs < 1) throw new Error('sweep: --runs must be a whole number >= 1');
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
  try {
    const model = join(dir, 'sweep.json');
    const { bytes } = writeSweep(model, { count: args.count });
    console.log(`sweep: ${args.count} conditions, 8 states (u w q theta v p r phi), ${(bytes / 1e6).toFixed(1)} MB model file`);
    console.log(`       median of ${args.runs} run(s), wall clock of the whole process; memory by ${memoryMethod()}`);
    console.log('       modalgate --json and the two references take turns, run by run, so a slow spell falls on all three');
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

    // modalgate --json, the reference (every field of the results contract) and the lean
    // reference (figures and verdicts only), in turns.
    const jsonOut = join(dir, 'out.json');
    const jobs = [];
    if (built) jobs.push({ label: 'modalgate check --json', command: process.execPath, args: [BIN, 'check', model, '--json', jsonOut], options: { kind: 'node', okCodes: [0, 1] } });
    if (py) {
      jobs.push({ label: 'reference', command: py.python, args: [REFERENCE, model, join(dir, 'reference.json')], options: { kind: 'python' } });
      jobs.push({ label: 'lean reference', command: py.python, args: [REFERENCE, '--lean', model, join(dir, 'reference-lean.json')], options: { kind: 'python' } });
    }
    const timed = timeInTurns(jobs, args.runs, (k, err) => report(jobs[k].label, err));
    const of = (label) => timed[jobs.findIndex((j) => j.label === label)] ?? null;
    const jsonRun = of('modalgate check --json');
    const refRun = of('reference');
    const leanRun = of('lean reference');

    if (jsonRun) {
      if (!existsSync(jsonOut)) {
        report('modalgate check --json', new Error('exited without writing the JSON file'));
      } else {
        console.log(line('modalgate check --json', `${seconds(jsonRun.median)}, ${megabytes(jsonRun.peakMb)}`,
          `target <= ${TARGETS.jsonSeconds} s: ${against(jsonRun.median, TARGETS.jsonSeconds)}; <= ${TARGETS.jsonPeakMb} MB: ${against(jsonRun.peakMb, TARGETS.jsonPeakMb)}`));
        console.log(`  ${''.padEnd(34)} (JSON ${(statSync(jsonOut).size / 1e6).toFixed(1)} MB; runs ${seconds(jsonRun.min)} to ${seconds(jsonRun.max)})`);
        if (!(jsonRun.median <= TARGETS.jsonSeconds)) missed += 1;
        if (jsonRun.peakMb !== null && !(jsonRun.peakMb <= TARGETS.jsonPeakMb)) missed += 1;
      }
    }
    if (py) {
      if (refRun) {
        console.log(line('reference (Python + numpy)', `${seconds(refRun.median)}, ${megabytes(refRun.peakMb)}`, '(timing reference, no target)'));
        console.log(`  ${''.padEnd(34)} (JSON ${(statSync(join(dir, 'reference.json')).size / 1e6).toFixed(1)} MB: every field of the results contract; runs ${seconds(refRun.min)} to ${seconds(refRun.max)})`);
      }
      if (leanRun) {
        console.log(line('lean reference (--lean)', `${seconds(leanRun.median)}, ${megabytes(leanRun.peakMb)}`, '(for information, no target)'));
        console.log(`  ${''.padEnd(34)} (JSON ${(statSync(join(dir, 'reference-lean.json')).size / 1e6).toFixed(1)} MB: figures and verdicts only; runs ${seconds(leanRun.min)} to ${seconds(leanRun.max)})`);
      }
      console.log(`  ${''.padEnd(34)} ${py.python} (Python ${py.pythonVersion}), numpy ${py.numpy}, ${py.origin}: ${py.file}`);
      if (jsonRun && refRun) {
        const ratio = jsonRun.median / refRun.median;
        console.log(line('ratio modalgate --json / reference', ratio.toFixed(2), `target <= ${TARGETS.ratio.toFixed(1)}: ${against(ratio, TARGETS.ratio)}`));
        if (!(ratio <= TARGETS.ratio)) missed += 1;
      }
      if (jsonRun && leanRun) {
        console.log(line('ratio modalgate --json / lean', (jsonRun.median / leanRun.median).toFixed(2), '(for information: the lean reference writes far less)'));
      }
      if (jsonRun && refRun && existsSync(jsonOut)) console.log(`  ${''.padEnd(34)} ${sameSummary(jsonOut, join(dir, 'reference.json'))}`);
    }

    if (built) {
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
        if (!(htmlRun.median <= TARGETS.htmlSeconds)) missed += 1;
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

try {
  process.exitCode = main();
} catch (err) {
  console.error(`sweep: ${err.message}`);
  process.exitCode = 1;
}
