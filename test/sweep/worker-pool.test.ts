/**
 * The worker path of a large sweep gives exactly the results of the serial path, in the same
 * order, and the same results file. The model is generated here: the Ossel OS-3 Grebe, an
 * invented light twin of our own (Class II-L), 3,000 flight conditions of an 8-state
 * stability-axis model with plausible, seeded derivatives (not any real aircraft's).
 *
 * Node cannot start a worker from TypeScript, so the worker runs the compiled dist/ build:
 * the first test checks that the build is not older than the sources it runs.
 */
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import { parseModel } from '../../src/load/model-file.js';
import { renderResultsJson } from '../../src/report/json.js';
import { addVerdictCounts, assembleResults, countVerdicts } from '../../src/results.js';
import { checkConditions } from '../../src/sweep/check-conditions.js';
import { isJsonSafe } from '../../src/sweep/json-safe.js';
import { checkConditionsInWorkers, readBatch, splitShares } from '../../src/sweep/worker-pool.js';
import { workersFor } from '../../src/sweep/check-all.js';
import type { AircraftModel, ConditionResult, ResolvedCriteriaSet, ResultsContents } from '../../src/types.js';
import { seeded } from '../../bench/lib/seeded.mjs';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
/** results with and without the mode shapes */
const SHAPES: ResultsContents = { modeShapes: true };
const NO_SHAPES: ResultsContents = { modeShapes: false };

/** The results file a run of these conditions writes (fixed run data, no inputs). */
function resultsFile(model: AircraftModel, sets: ResolvedCriteriaSet[], conditions: ConditionResult[], contents: ResultsContents = SHAPES): string {
  return renderResultsJson(
    assembleResults({
      request: { toolVersion: 'test', command: ['modalgate'], generatedAt: '2026-01-01T00:00:00.000Z' },
      model,
      sets,
      inputs: [],
      contents,
      conditions,
    }),
  );
}

/** [m/s^2] standard gravity (ISO 80000-3, exact by definition) */
const G = 9.80665;

/**
 * One condition of the invented Grebe: the usual decoupled stability-axis layout (states
 * u w q theta / v p r phi), with derivatives drawn around plausible light-twin values. Some
 * draws give an unstable spiral, a split short period or a small cross-coupling, so that the
 * sweep holds warnings, failures and real roots.
 */
function grebeCondition(index: number, rand: () => number): object {
  const phases = ['CR', 'CL', 'PA', 'CO'] as const;
  const phase = phases[Math.floor(rand() * phases.length)]!;
  const u0 = phase === 'PA' ? 45 + 15 * rand() : 65 + 45 * rand();
  const within = (lo: number, hi: number) => lo + (hi - lo) * rand();
  const Xu = within(-0.06, -0.02);
  const Xw = within(0.02, 0.08);
  const Zu = within(-0.4, -0.2);
  const Zw = within(-2.2, -0.9);
  // now and then statically unstable (Mw > 0): a split short period
  const Mw = rand() < 0.05 ? within(0.001, 0.02) : within(-0.09, -0.01);
  const Mq = within(-3, -1);
  const Yv = within(-0.3, -0.08);
  const Lv = within(-0.06, -0.01);
  const Lp = within(-9, -2);
  const Lr = within(0.5, 2);
  const Nv = within(0.005, 0.03);
  const Np = within(-0.15, -0.02);
  const Nr = within(-0.8, -0.2);
  const cross = rand() < 0.1 ? within(-0.02, 0.02) : 0;
  const A = [
    [Xu, Xw, 0, -G, 0, 0, 0, 0],
    [Zu, Zw, u0, 0, 0, 0, 0, 0],
    [0, Mw, Mq, 0, cross, 0, 0, 0],
    [0, 0, 1, 0, 0, 0, 0, 0],
    [0, 0, 0, 0, Yv, 0, -u0, G],
    [0, cross, 0, 0, Lv, Lp, Lr, 0],
    [0, 0, 0, 0, Nv, Np, Nr, 0],
    [0, 0, 0, 0, 0, 1, 0, 0],
  ];
  return {
    id: `${phase}-${String(index + 1).padStart(4, '0')}`,
    phase,
    airspeed: u0,
    altitude: Math.round(within(0, 6000)),
    stateSpace: { states: ['u', 'w', 'q', 'theta', 'v', 'p', 'r', 'phi'], A },
  };
}

function grebeModel(count: number): AircraftModel {
  const rand = seeded(3003);
  const conditions = Array.from({ length: count }, (_, i) => grebeCondition(i, rand));
  const text = JSON.stringify({
    format: 'modalgate-model/1',
    aircraft: { name: 'Ossel OS-3 Grebe (invented, test sweep)', class: 'II-L' },
    units: 'SI',
    conditions,
  });
  return parseModel(text, 'grebe-sweep.json');
}

/** Every compiled module the worker runs is at least as new as its source. */
function staleBuilds(): string[] {
  const stale: string[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(join(ROOT, 'src', dir), { withFileTypes: true })) {
      const rel = join(dir, entry.name);
      if (entry.isDirectory()) walk(rel);
      else if (entry.name.endsWith('.ts')) {
        const built = join(ROOT, 'dist', rel.replace(/\.ts$/, '.js'));
        let builtAt = 0;
        try {
          builtAt = statSync(built).mtimeMs;
        } catch {
          builtAt = 0;
        }
        if (builtAt < statSync(join(ROOT, 'src', rel)).mtimeMs) stale.push(rel);
      }
    }
  };
  walk('.');
  return stale;
}

describe('worker path of a large sweep', () => {
  let model: AircraftModel;
  let sets: ResolvedCriteriaSet[];

  beforeAll(async () => {
    model = grebeModel(3000);
    sets = [(await loadCriteriaSet('mil-f-8785c')).set];
  });

  it('runs a compiled build that is up to date (npm run build)', () => {
    expect(staleBuilds()).toEqual([]);
  });

  it.each([[SHAPES], [NO_SHAPES]])('gives deep-equal results, in the same order, and the same results file (%o)', async (contents) => {
    const serial = checkConditions(model.conditions, model.aircraft.class, sets, contents);
    const seen: number[] = [];
    const parallel = await checkConditionsInWorkers(model.conditions, model.aircraft.class, sets, contents, {
      workers: 2,
      batch: 128,
      onProgress: (done) => seen.push(done),
    });
    expect(parallel.results.map((r) => r.id)).toEqual(model.conditions.map((c) => c.id));
    expect(parallel.issues).toEqual(serial.issues);
    expect(parallel.results).toStrictEqual(serial.results);
    expect(parallel.summary).toEqual(serial.summary);
    expect(parallel.summary).toEqual(countVerdicts(serial.results.flatMap((r) => r.findings)));
    // progress rises to the total
    expect(seen.at(-1)).toBe(3000);
    expect([...seen].sort((a, b) => a - b)).toEqual(seen);

    // the sweep has something to lose: failures, split or unclear modes, warnings
    const findings = serial.results.flatMap((r) => r.findings);
    expect(findings.some((f) => f.verdict === 'fail')).toBe(true);
    expect(serial.results.some((r) => r.warnings.length > 0)).toBe(true);

    expect(resultsFile(model, sets, parallel.results, contents)).toBe(resultsFile(model, sets, serial.results, contents));
    expect(serial.results.every((r) => r.modes.every((m) => (m.shape !== undefined) === contents.modeShapes))).toBe(true);
  });

  it('reports an input problem of a worker share as the serial path does', async () => {
    const withUnknownPhase = { ...model, conditions: model.conditions.slice(0, 40).map((c, i) => (i === 33 ? { ...c, phase: 'ZZ' } : c)) };
    const serial = checkConditions(withUnknownPhase.conditions, model.aircraft.class, sets, SHAPES);
    const parallel = await checkConditionsInWorkers(withUnknownPhase.conditions, model.aircraft.class, sets, SHAPES, { workers: 2, batch: 7 });
    expect(serial.issues.map((i) => i.code)).toEqual(['unknown_phase']);
    expect(parallel.issues).toEqual(serial.issues);
    expect(parallel.results).toStrictEqual(serial.results);
  });
});

describe('reading a batch back from a worker', () => {
  it('takes a result that JSON would change from its structured clone, and keeps the lines for the file', async () => {
    const model = grebeModel(250);
    const sets = [(await loadCriteriaSet('mil-f-8785c')).set];
    const { results } = checkConditions(model.conditions, model.aircraft.class, sets, SHAPES);
    // a -0 (e.g. a phase) is lost in JSON text: such a result travels as a clone
    const odd = structuredClone(results[1]!);
    odd.modes[0]!.shape![0]!.phase = -0;
    const sent = [results[0]!, odd, ...results.slice(2)];
    const text = `[${sent.map((r) => JSON.stringify(r)).join(',\n')}]`;
    const back = readBatch({ text, exact: [[1, structuredClone(odd)]] });
    expect(back).toStrictEqual(sent);
    expect(Object.is(back[1]!.modes[0]!.shape![0]!.phase, -0)).toBe(true);
    expect(resultsFile(model, sets, back)).toBe(resultsFile(model, sets, sent));
  });
});

describe('sharing out a sweep', () => {
  it('adds up the verdict counts of the shares', () => {
    expect(addVerdictCounts([])).toEqual({ pass: 0, marginal: 0, fail: 0, not_evaluated: 0 });
    expect(
      addVerdictCounts([
        { pass: 3, marginal: 1, fail: 0, not_evaluated: 2 },
        { pass: 4, marginal: 0, fail: 5, not_evaluated: 1 },
      ]),
    ).toEqual({ pass: 7, marginal: 1, fail: 5, not_evaluated: 3 });
  });

  it('splits into contiguous shares that cover every condition once', () => {
    expect(splitShares(10, 3)).toEqual([
      [0, 3],
      [3, 6],
      [6, 10],
    ]);
    expect(splitShares(2, 3)).toEqual([
      [0, 0],
      [0, 1],
      [1, 2],
    ]);
  });

  it('uses workers only for large sweeps on machines with spare cores', () => {
    expect(workersFor(10000, 2)).toBe(0);
    expect(workersFor(1999, 8)).toBe(0);
    expect(workersFor(10000, 4)).toBe(2);
  });
});

describe('JSON-safe values', () => {
  it.each([
    [{ a: 1, b: 'x', c: [true, null] }, true],
    [{ a: -0 }, false],
    [{ a: Infinity }, false],
    [{ a: Number.NaN }, false],
    [{ a: undefined }, false],
    [[1, , 2], false],
    [{ a: new Date(0) }, false],
  ])('%o -> %s', (value, safe) => {
    expect(isJsonSafe(value)).toBe(safe);
  });
});
