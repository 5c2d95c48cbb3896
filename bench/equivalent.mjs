#!/usr/bin/env node
/**
 * The equivalent-system benchmark:
 * 1. one pitch fit (q alone, and q with nz), in process: the median of many fits after a warm-up,
 *    on the reference's check-vector high-order system (short term x actuator x filter) over
 *    41 points, 0.1-10 rad/s. Target: at most 20 ms median.
 * 2. a 1,000-condition sweep given by frequency responses (q, nz and p per condition, each its
 *    own CSV file, perturbed from an invented fly-by-wire aircraft), with pitch and roll fits
 *    and the HTML review: the whole process, cold start to exit. Target: at most 30 s.
 *
 *   node bench/equivalent.mjs [--runs 3] [--count 1000]
 * Build first (npm run bench does). The machine may be shared: the figures say so.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { fitPitch } from '../dist/equivalent/fit-loes.js';
import { logSpaced, samplesFromComplex } from '../dist/equivalent/response-samples.js';
import { seeded } from './lib/seeded.mjs';
import { against, megabytes, seconds, timeRuns } from './time-process.mjs';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const TARGETS = { fitMs: 20, sweepSeconds: 30 };

function parseArgs(argv) {
  const out = { runs: 3, count: 1000 };
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === '--runs') out.runs = Number(argv[++i]);
    else if (argv[i] === '--count') out.count = Number(argv[++i]);
    else if (argv[i] === '--scale' || argv[i] === '--against') i += 1; // other benchmarks' options, passed on by run.mjs
    else if (argv[i] === '--strict') continue;
    else throw new Error(`equivalent: unknown option ${argv[i]} (use --runs N --count N)`);
  }
  return out;
}
const options = parseArgs(process.argv.slice(2));

// complex arithmetic on [re, im]
const mul = (a, b) => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const div = (a, b) => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
/** K (s + a) / (s^2 + 2 z w s + w^2) x w_a^2 / (s^2 + 2 0.7 w_a s + w_a^2) x 1/(s/f + 1) x e^(-tau s), at s = j x */
function hos({ K, a, z, w, wa, f, tau, zero = true }, x) {
  let h = [K, 0];
  if (zero) h = mul(h, [a, x]);
  h = div(h, [w * w - x * x, 2 * z * w * x]);
  h = mul(h, div([wa * wa, 0], [wa * wa - x * x, 1.4 * wa * x]));
  h = div(h, [1, x / f]);
  return mul(h, [Math.cos(x * tau), -Math.sin(x * tau)]);
}
const toComplex = ([re, im]) => ({ re, im });

// 1. one pitch fit
{
  const grid = logSpaced(0.1, 10);
  const ref = { K: 1, a: 1.25, z: 0.7, w: 3, wa: 20, f: 15, tau: 0 };
  const q = { output: 'q', samples: samplesFromComplex(grid, grid.map((x) => toComplex(hos(ref, x)))) };
  const nz = { output: 'nz', samples: samplesFromComplex(grid, grid.map((x) => toComplex(hos({ ...ref, K: 12, zero: false }, x)))) };
  const time = (input, n) => {
    for (let i = 0; i < 20; i++) fitPitch(input); // warm-up
    const t = [];
    for (let i = 0; i < n; i++) {
      const t0 = performance.now();
      fitPitch(input);
      t.push(performance.now() - t0);
    }
    t.sort((x, y) => x - y);
    return { median: t[Math.floor(n / 2)], min: t[0], max: t[n - 1] };
  };
  const alone = time({ q, method: 'q-only' }, 200);
  const both = time({ q, nz }, 100);
  console.log(
    `equivalent: one pitch fit, 41 points: q alone median ${alone.median.toFixed(2)} ms (min ${alone.min.toFixed(2)}, max ${alone.max.toFixed(1)}); ` +
      `q and nz median ${both.median.toFixed(2)} ms (min ${both.min.toFixed(2)}); target <= ${TARGETS.fitMs} ms: ${against(Math.max(alone.median, both.median), TARGETS.fitMs)}`,
  );
}

// 2. the sweep, whole process
{
  const dir = mkdtempSync(join(tmpdir(), 'modalgate-bench-eq-'));
  try {
    const random = seeded(20261202);
    const freq = Array.from({ length: 91 }, (_, i) => 0.05 * Math.pow(400, i / 90));
    const csv = (values) => `w,gain_db,phase_deg\n${freq.map((x, i) => `${x.toPrecision(6)},${values[i].g.toFixed(5)},${values[i].p.toFixed(4)}`).join('\n')}\n`;
    const points = (h) => {
      const s = samplesFromComplex(freq, freq.map((x) => toComplex(h(x))));
      return s.gain.map((g, i) => ({ g, p: s.phase[i] }));
    };
    const lines = ['format: modalgate-model/1', 'aircraft: { name: Bench fly-by-wire aircraft (invented), class: IV }', 'units: SI', 'conditions:'];
    const spec = (output, file) => `      - { input: ${output === 'p' ? 'Fas' : 'Fes'}, output: ${output}, file: ${file}, columns: { frequency: w, gain: gain_db, phase: phase_deg }, units: { frequency: rad/s, gain: dB, phase: deg } }`;
    for (let k = 0; k < options.count; k++) {
      const f = () => 1 + 0.3 * (random() - 0.5);
      const p = { K: 0.05 * f(), a: 1.1 * f(), z: 0.65 * f(), w: 3.5 * f(), wa: 25 * f(), f: 14 * f(), tau: 0.03 * f() };
      writeFileSync(join(dir, `q${k}.csv`), csv(points((x) => hos(p, x))));
      writeFileSync(join(dir, `nz${k}.csv`), csv(points((x) => hos({ ...p, K: p.K * 9, zero: false }, x))));
      const r = { K: 0.5 * f(), b: 3 * f(), wa: 30 * f(), tau: 0.03 * f() };
      writeFileSync(join(dir, `p${k}.csv`), csv(points((x) => mul(mul(div([r.K, 0], [r.b, x]), div([1, 0], [1, x / r.wa])), [Math.cos(x * r.tau), -Math.sin(x * r.tau)]))));
      lines.push(`  - id: c${k}`, `    phase: ${k % 2 === 0 ? 'CO' : 'PA'}`, '    airspeed: 120', '    altitude: 1000', '    frequencyResponses:');
      lines.push(spec('q', `q${k}.csv`), spec('nz', `nz${k}.csv`), spec('p', `p${k}.csv`));
    }
    const model = join(dir, 'sweep.yaml');
    writeFileSync(model, `${lines.join('\n')}\n`);
    const html = join(dir, 'sweep.html');
    const result = timeRuns(process.execPath, [join(ROOT, 'bin', 'modalgate.js'), 'check', model, '--html', html], { kind: 'node', okCodes: [0, 1], runs: options.runs });
    console.log(
      `equivalent: ${options.count}-condition sweep from frequency responses (pitch q+nz and roll fits per condition) with the HTML review: ` +
        `median ${seconds(result.median)} (min ${seconds(result.min)}, max ${seconds(result.max)}, ${result.runs} runs), ${megabytes(result.peakMb)}; ` +
        `target <= ${TARGETS.sweepSeconds} s: ${against(result.median, TARGETS.sweepSeconds)}. The machine may be shared with other work.`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
