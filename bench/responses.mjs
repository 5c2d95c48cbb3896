// Benchmark of the responses stage: analyseResponses on 10,000 perturbed 8-state conditions
// (the light-aeroplane blocks of bench/modes.mjs, each derivative perturbed by up to +/-15 %)
// with a pitch control (elevator) and a roll control (ailerons, full travel 0.3 rad): the
// transfer functions of q, theta, alpha, nz, p, phi and beta, the trade figures, the pitch
// bandwidth, and the full roll-control step (time to bank). Timed on its own, after the modes
// (which bench/modes.mjs times), so the figure is what the responses add per condition.
// Build first: npx tsc -p tsconfig.build.json. Target: at most 60 us per condition (the figure the
// issue asks for: what the responses add to a JSON run).
import { analyseModes } from '../dist/modes/analyse.js';
import { analyseResponses } from '../dist/responses/analyse-responses.js';
import { seeded } from './lib/seeded.mjs';

const CONDITIONS = 10_000;
const TARGET_US = 60;

const V = 55;
const G = 9.80665;
const LON = { Xu: -0.045, Xw: 0.036, Zu: -0.37, Zw: -2.0, Mu: 0, Mw: -0.16, Mwdot: -0.017, Mq: -2.1, Zde: -8.6, Mde: -11.9 };
const LAT = { Yv: -0.25, Lbeta: -16, Lp: -8.4, Lr: 2.2, Nbeta: 4.5, Np: -0.35, Nr: -0.76, Lda: 28.6, Nda: -0.22 };

function condition(random, index) {
  const f = () => 1 + 0.3 * (random() - 0.5);
  const d = Object.fromEntries(Object.entries(LON).map(([k, x]) => [k, x * f()]));
  const l = Object.fromEntries(Object.entries(LAT).map(([k, x]) => [k, x * f()]));
  const A = [
    [d.Xu, d.Xw, 0, -G, 0, 0, 0, 0],
    [d.Zu, d.Zw, V, 0, 0, 0, 0, 0],
    [d.Mu + d.Mwdot * d.Zu, d.Mw + d.Mwdot * d.Zw, d.Mq + d.Mwdot * V, 0, 0, 0, 0, 0],
    [0, 0, 1, 0, 0, 0, 0, 0],
    [0, 0, 0, 0, l.Yv, 0, -1, G / V],
    [0, 0, 0, 0, l.Lbeta, l.Lp, l.Lr, 0],
    [0, 0, 0, 0, l.Nbeta, l.Np, l.Nr, 0],
    [0, 0, 0, 0, 0, 1, 0, 0],
  ];
  const B = [[0, 0], [d.Zde, 0], [d.Mde + d.Mwdot * d.Zde, 0], [0, 0], [0, 0], [0, l.Lda], [0, l.Nda], [0, 0]];
  const states = ['u', 'w', 'q', 'theta', 'beta', 'p', 'r', 'phi'];
  const system = { states, A, inputs: ['de', 'da'], B, outputs: [], C: [], D: [[], []].slice(0, 0) };
  return {
    id: `c${index}`, phase: 'CR', airspeed: V, altitude: 1000, requiredLevel: null, nAlpha: null, theta0: 0, form: 'stateSpace',
    system, liftData: null, notes: [], place: { file: 'bench' },
    controls: { pitch: { input: 'de', unit: 'rad', max: null }, roll: { input: 'da', unit: 'rad', max: 0.3 } },
  };
}

const random = seeded(20261202);
const conditions = Array.from({ length: CONDITIONS }, (_, i) => condition(random, i));
const analyses = conditions.map((c) => analyseModes(c.system, { airspeed: V }));

function run() {
  let figures = 0;
  const cpuStart = process.cpuUsage();
  const start = process.hrtime.bigint();
  for (let i = 0; i < CONDITIONS; i += 1) {
    const r = analyseResponses(conditions[i], analyses[i], { bankAngles: [] });
    figures += r.transferFunctions.length + r.timeToBank.length;
  }
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const cpu = process.cpuUsage(cpuStart);
  return { seconds, cpuSeconds: (cpu.user + cpu.system) / 1e6, figures };
}

run(); // warm-up
const timings = Array.from({ length: 5 }, run);
const us = (seconds) => (seconds / CONDITIONS) * 1e6;
const wall = Math.min(...timings.map((t) => us(t.seconds)));
const cpu = Math.min(...timings.map((t) => us(t.cpuSeconds)));
console.log(
  `responses: ${CONDITIONS} conditions x 8 states, pitch and roll controls, ${timings[0].figures} transfer functions and bank times; ` +
    `${wall.toFixed(1)} us per condition wall, ${cpu.toFixed(1)} us CPU (best of ${timings.length}; ` +
    `wall runs ${timings.map((t) => us(t.seconds).toFixed(1)).join(', ')}); ` +
    `target <= ${TARGET_US} us: ${wall <= TARGET_US ? 'met' : 'NOT met'}`,
);
if (wall > TARGET_US) process.exitCode = 1;
