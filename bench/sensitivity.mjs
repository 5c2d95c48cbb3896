#!/usr/bin/env node
/**
 * The sensitivity benchmark: what the design sensitivities (what would move a finding) add to
 * a whole `modalgate check` process, start to exit. The same check is run with
 * `--sensitivities none` and with the default (failing and marginal findings), taking turns,
 * on the shipped sample and on the 10,000-condition bench sweep (make-sweep.mjs, seed 20261,
 * US units with small cross terms, as sweep.mjs times it).
 *
 *   node bench/sensitivity.mjs [--count 10000] [--runs 5] [--strict]
 *
 * Targets (issue 16): the sample at most 0.15 s more with sensitivities than without; the
 * sweep, writing JSON only, at most 1 s more.
 */
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { writeSweep } from './make-sweep.mjs';
import { seconds, timeInTurns } from './time-process.mjs';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin', 'modalgate.js');
const CLI_BUILD = join(ROOT, 'dist', 'cli.js');
const SAMPLE = join(ROOT, 'samples', 'ketra-kt4.yaml');
const TARGETS = { sampleExtra: 0.15, sweepExtra: 1.0 };

function parseArgs(argv) {
  const out = { count: 10000, runs: 5, strict: false };
  for (let i = 0; i < argv.length; i++) {
    const key = argv[i];
    if (key === '--strict') out.strict = true;
    else if (key === '--count' || key === '--runs') {
      out[key.slice(2)] = Number(argv[i + 1]);
      i += 1;
    } else if (key === '--scale' || key === '--against') i += 1; // other benchmarks' options, passed on by run.mjs
    else throw new Error(`sensitivity: unknown option ${key} (use --count N --runs N --strict)`);
  }
  if (!Number.isInteger(out.count) || out.count < 1) throw new Error('sensitivity: --count must be a whole number >= 1');
  if (!Number.isInteger(out.runs) || out.runs < 1) throw new Error('sensitivity: --runs must be a whole number >= 1');
  return out;
}

/** The findings given sensitivities in a results file, and how many numbers they list. */
function counted(file) {
  const results = JSON.parse(readFileSync(file, 'utf8'));
  let findings = 0;
  let numbers = 0;
  for (const c of results.conditions) {
    for (const f of c.findings) {
      if (f.sensitivities === undefined) continue;
      findings += 1;
      numbers += f.sensitivities.length;
    }
  }
  return `${findings} findings with sensitivities, ${numbers} numbers verified or ruled out`;
}

function compare(label, model, dir, runs, limit) {
  const job = (choice) => ({
    command: process.execPath,
    args: [BIN, 'check', model, '--json', join(dir, `${choice}.json`), '--sensitivities', choice],
    options: { kind: 'node', okCodes: [0, 1] },
  });
  const [without, withThem] = timeInTurns([job('none'), job('issues')], runs, (k, err) => {
    throw err;
  });
  const extra = withThem.median - without.median;
  console.log(`  ${label}`);
  console.log(`    --sensitivities none     ${seconds(without.median)} (median; ${seconds(without.min)} to ${seconds(without.max)})`);
  console.log(`    failing and marginal     ${seconds(withThem.median)} (median; ${seconds(withThem.min)} to ${seconds(withThem.max)}); ${counted(join(dir, 'issues.json'))}`);
  const met = extra <= limit;
  console.log(`    sensitivities add        ${seconds(extra)}   target <= ${limit} s: ${met ? 'met' : 'MISSED'}`);
  return met;
}

function main() {
  const args = parseArgs(process.argv.slice(2));
  if (!existsSync(CLI_BUILD)) {
    console.log(`sensitivity: modalgate is not built (${CLI_BUILD} is missing); run \`npm run build\` first`);
    return 1;
  }
  const dir = mkdtempSync(join(tmpdir(), 'modalgate-sensitivity-'));
  let missed = 0;
  try {
    console.log(`sensitivity: whole process, with and without sensitivities in turns, median of ${args.runs} runs`);
    if (!compare('samples/ketra-kt4.yaml', SAMPLE, dir, args.runs, TARGETS.sampleExtra)) missed += 1;
    const sweep = join(dir, 'sweep.json');
    writeSweep(sweep, { count: args.count, seed: 20261, units: 'US', coupled: true });
    if (!compare(`bench sweep, ${args.count} conditions, JSON only`, sweep, dir, args.runs, TARGETS.sweepExtra)) missed += 1;
    console.log(missed === 0 ? 'sensitivity: every target met' : `sensitivity: ${missed} target(s) missed`);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
  return args.strict && missed > 0 ? 1 : 0;
}

try {
  process.exitCode = main();
} catch (err) {
  console.error(`sensitivity: ${err.message}`);
  process.exitCode = 1;
}
