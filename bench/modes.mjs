// Benchmark of the modal analysis: analyseModes on 10,000 perturbed 8-state conditions
// (longitudinal u, w, q, theta and lateral beta, p, r, phi blocks with rounded, Navion-like
// light-aeroplane derivatives, each perturbed by up to +/-15 %), timed end to end from a
// StateSpace to the identified modes with their figures and basis text.
// Build first: npx tsc -p tsconfig.build.json. Target: at most 25 us per condition.
import { analyseModes } from '../dist/modes/analyse.js';
import { seeded } from './lib/seeded.mjs';

const CONDITIONS = 10_000;
const TARGET_US = 25;

// Nominal dimensional derivatives (SI, stability axes) at V = 55 m/s; only their magnitudes matter here.
const V = 55;
const G = 9.80665;
const LON = { Xu: -0.045, Xw: 0.036, Zu: -0.37, Zw: -2.0, Mu: 0, Mw: -0.16, Mwdot: -0.017, Mq: -2.1 };
const LAT = { Yv: -0.25, Lbeta: -16, Lp: -8.4, Lr: 2.2, Nbeta: 4.5, Np: -0.35, Nr: -0.76 };

function condition(random) {
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
  const states = ['u', 'w', 'q', 'theta', 'beta', 'p', 'r', 'phi'];
  return { states, A, inputs: [], B: A.map(() => []), outputs: [], C: [], D: [] };
}

const random = seeded(20260101);
const systems = Array.from({ length: CONDITIONS }, () => condition(random));

function run() {
  let modes = 0;
  const cpuStart = process.cpuUsage();
  const start = process.hrtime.bigint();
  for (const system of systems) modes += analyseModes(system, { airspeed: V }).modes.length;
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const cpu = process.cpuUsage(cpuStart);
  return { seconds, cpuSeconds: (cpu.user + cpu.system) / 1e6, modes };
}

run(); // warm-up: let the JIT compile the hot paths
const timings = Array.from({ length: 5 }, run);
const us = (seconds) => (seconds / CONDITIONS) * 1e6;
const wall = Math.min(...timings.map((t) => us(t.seconds)));
const cpu = Math.min(...timings.map((t) => us(t.cpuSeconds)));
// Wall time is what a user sees; process CPU time is also printed because on a shared machine
// other processes stretch the wall time while the CPU time stays what the analysis costs.
console.log(
  `modes: ${CONDITIONS} conditions x 8 states, ${timings[0].modes} modes; ` +
    `${wall.toFixed(1)} us per condition wall, ${cpu.toFixed(1)} us CPU (best of ${timings.length}; ` +
    `wall runs ${timings.map((t) => us(t.seconds).toFixed(1)).join(', ')}); ` +
    `target <= ${TARGET_US} us: ${wall <= TARGET_US ? 'met' : 'NOT met'}`,
);
if (wall > TARGET_US) process.exitCode = 1;
