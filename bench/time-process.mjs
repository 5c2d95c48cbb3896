/**
 * Time a whole process, start to exit (wall clock), and its peak memory (maximum resident set
 * size). Peak memory comes from GNU time (`/usr/bin/time -v`) when it is installed; otherwise
 * the child reports its own resource usage at exit (Node: process.resourceUsage(); Python:
 * resource.getrusage), which sees the same kernel figure.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { performance } from 'node:perf_hooks';

const GNU_TIME = '/usr/bin/time';
const MARK = 'bench-peak-rss-kb';

/** MODALGATE_BENCH_NO_GNU_TIME=1 forces the fallback, to check it on a machine that has GNU time. */
function gnuTimeUsable() {
  return existsSync(GNU_TIME) && !process.env.MODALGATE_BENCH_NO_GNU_TIME;
}

let nodeHook;
function nodeHookFile() {
  if (nodeHook) return nodeHook;
  nodeHook = join(tmpdir(), `modalgate-bench-rss-${process.pid}.mjs`);
  writeFileSync(nodeHook, `process.on('exit', () => process.stderr.write('\\n${MARK} ' + process.resourceUsage().maxRSS + '\\n'));\n`);
  return nodeHook;
}

/** How the peak memory is measured on this machine, for the printout. */
export function memoryMethod() {
  return gnuTimeUsable() ? 'GNU time -v (maximum resident set size)' : 'the child\'s own resource usage at exit';
}

/**
 * Run `command args` once. `kind` ('node' | 'python') tells how to ask a child for its peak
 * memory when GNU time is absent. `okCodes` are the exit codes that mean the run worked
 * (modalgate exits 1 when a finding fails, which is a normal outcome for a sweep).
 */
export function runOnce(command, args, { kind, okCodes = [0], cwd } = {}) {
  let cmd = command;
  let argv = args;
  const useGnuTime = gnuTimeUsable();
  if (useGnuTime) {
    cmd = GNU_TIME;
    argv = ['-v', command, ...args];
  } else if (kind === 'node') {
    argv = ['--import', pathToFileURL(nodeHookFile()).href, ...args];
  } else if (kind === 'python') {
    const [script, ...rest] = args;
    const code = [
      'import resource, runpy, sys',
      `sys.argv = ${JSON.stringify([script, ...rest])}`,
      'try:',
      `    runpy.run_path(${JSON.stringify(script)}, run_name="__main__")`,
      'finally:',
      `    print("\\n${MARK}", resource.getrusage(resource.RUSAGE_SELF).ru_maxrss, file=sys.stderr)`,
    ].join('\n');
    argv = ['-c', code];
  }
  const t0 = performance.now();
  const child = spawnSync(cmd, argv, { cwd, encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
  const seconds = (performance.now() - t0) / 1000;
  if (child.error) throw new Error(`could not start ${command}: ${child.error.message}`);
  const stderr = child.stderr ?? '';
  let peakKb = null;
  for (const line of stderr.split('\n')) {
    const t = line.trim();
    if (t.startsWith('Maximum resident set size (kbytes):')) peakKb = Number(t.split(':')[1]);
    else if (t.startsWith(MARK)) peakKb = Number(t.slice(MARK.length));
  }
  // Python's SystemExit from runpy still reaches the finally; its exit code is the script's.
  const status = child.status;
  if (!okCodes.includes(status)) {
    const shown = stderr.split('\n').filter((l) => !l.includes(MARK) && !/^\s*(Command being timed|User time|System time|Percent of CPU|Elapsed|Average|Maximum|Major|Minor|Voluntary|Involuntary|Swaps|File system|Socket|Signals|Page size|Exit status)/.test(l)).join('\n');
    throw new Error(`${command} ${args.join(' ')} exited with ${status}\n${shown.trim()}\n${(child.stdout ?? '').slice(0, 2000)}`);
  }
  return { seconds, peakMb: peakKb === null ? null : peakKb / 1024, status, stdout: child.stdout ?? '' };
}

/** Run `runs` times; the median wall clock and the largest peak memory. */
export function timeRuns(command, args, options = {}) {
  const runs = options.runs ?? 5;
  const results = [];
  for (let i = 0; i < runs; i++) results.push(runOnce(command, args, options));
  return summarise(results);
}

/**
 * Time several commands `runs` times each, taking turns (A B C A B C ...), so that a slow spell
 * of the machine falls on all of them alike and their ratio stays fair. Each job is
 * { command, args, options }; returns one summary per job, in order, or null for a job whose
 * run broke (`onError(job index, error)` is told, and the job is not run again).
 */
export function timeInTurns(jobs, runs, onError = () => undefined) {
  const results = jobs.map(() => []);
  const broken = jobs.map(() => false);
  for (let i = 0; i < runs; i++) {
    jobs.forEach((job, k) => {
      if (broken[k]) return;
      try {
        results[k].push(runOnce(job.command, job.args, job.options));
      } catch (err) {
        broken[k] = true;
        onError(k, err);
      }
    });
  }
  return results.map((r, k) => (broken[k] ? null : summarise(r)));
}

function summarise(results) {
  const runs = results.length;
  const times = results.map((r) => r.seconds).sort((a, b) => a - b);
  const mid = Math.floor(times.length / 2);
  const median = times.length % 2 === 1 ? times[mid] : (times[mid - 1] + times[mid]) / 2;
  const peaks = results.map((r) => r.peakMb).filter((p) => p !== null);
  return { median, min: times[0], max: times[times.length - 1], peakMb: peaks.length > 0 ? Math.max(...peaks) : null, runs, last: results[results.length - 1] };
}

/** `1.23 s` / `310 MB` / a verdict against a target, in words. */
export function seconds(x) {
  return `${x.toFixed(x < 10 ? 2 : 1)} s`;
}

export function megabytes(x) {
  return x === null ? 'peak not measured' : `peak ${Math.round(x)} MB`;
}

export function against(value, limit) {
  if (value === null || value === undefined) return 'not measured';
  return value <= limit ? 'met' : 'MISSED';
}
