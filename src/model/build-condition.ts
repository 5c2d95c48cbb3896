/**
 * One written flight condition -> one normalised FlightCondition (SI, named states). Pure: the
 * problems found are returned with their field paths, and every default or conversion applied
 * is written into the condition's notes.
 */
import { ATMOSPHERE_MAX_ALTITUDE, ATMOSPHERE_MIN_ALTITUDE } from '../atmosphere.js';
import type { WrittenCondition } from '../load/model-schema.js';
import type { DynamicsForm, FlightCondition, Level, LiftData, StateSpace, UnitSystem } from '../types.js';
import { UNIT_FACTORS, UNIT_WORDS } from '../units.js';
import { buildNondimensional } from './build-nondimensional.js';
import { buildControls } from './cockpit-controls.js';
import { stateSpaceToSI } from './convert-to-si.js';
import { buildLateralPart, buildLongitudinalPart, type Part } from './derivative-parts.js';
import { nonFiniteEntry } from './finite-entries.js';
import type { Built, ModelProblem } from './problem.js';
import { blockDiagonal, buildStateSpace } from './state-space.js';

type Path = (string | number)[];

export interface BuildSettings {
  units: UnitSystem;
  /** [written acceleration unit] g for the kinematic terms */
  gravity: number;
  /** how g was chosen, for the notes */
  gravityOrigin: string;
}

export type BuiltCondition = Omit<FlightCondition, 'place'>;

export function buildCondition(written: WrittenCondition, settings: BuildSettings, path: Path): Built<BuiltCondition> {
  const problems: ModelProblem[] = [];
  const notes: string[] = [];
  const { units } = settings;
  const length = UNIT_FACTORS[units].length;
  const words = UNIT_WORDS[units];

  const requiredLevel = readRequiredLevel(written.requiredLevel, [...path, 'requiredLevel'], problems);

  const forms = (['stateSpace', 'nondimensional'] as const).filter((f) => written[f] !== undefined) as string[];
  const derivativeParts = (['longitudinal', 'lateral'] as const).filter((f) => written[f] !== undefined);
  if (derivativeParts.length > 0) forms.push(derivativeParts.join(' + '));
  const responsesOnly = forms.length === 0 && written.frequencyResponses !== undefined;
  if (forms.length === 0 && !responsesOnly) {
    problems.push({ path, message: 'no dynamics given', expected: 'one of stateSpace, longitudinal and/or lateral, nondimensional, or frequencyResponses', found: 'none', code: 'dynamics_form' });
  } else if (forms.length > 1) {
    problems.push({ path, message: `${forms.length} dynamics forms given (${forms.join(', ')}); give exactly one`, expected: 'one of stateSpace, longitudinal and/or lateral, nondimensional', found: forms.join(', '), code: 'dynamics_form' });
  }

  let altitude: number | null = null;
  if (written.altitude !== undefined) {
    altitude = written.altitude * length;
    if (altitude < ATMOSPHERE_MIN_ALTITUDE || altitude > ATMOSPHERE_MAX_ALTITUDE) {
      problems.push({ path: [...path, 'altitude'], message: 'altitude outside the U.S. Standard Atmosphere 1976 range', expected: `${ATMOSPHERE_MIN_ALTITUDE / length} to ${ATMOSPHERE_MAX_ALTITUDE / length} ${words.length} geometric`, found: String(written.altitude), code: 'out_of_range' });
    }
  }
  if (written.nondimensional !== undefined && written.altitude === undefined) {
    problems.push({ path, message: 'altitude is needed for the nondimensional form (air density comes from the standard atmosphere)', expected: `altitude: <geometric altitude in ${words.length}>`, found: 'nothing', code: 'missing_altitude' });
  }

  const theta0 = readTheta0(written, path, problems);
  // Go on building after a problem where possible, so that the condition's other problems show too.
  const altitudeUsable = altitude !== null && altitude >= ATMOSPHERE_MIN_ALTITUDE && altitude <= ATMOSPHERE_MAX_ALTITUDE;
  if (responsesOnly) return responsesOnlyCondition(written, requiredLevel, altitude, problems, length);
  if (forms.length !== 1 || (written.nondimensional !== undefined && !altitudeUsable)) return { ok: false, problems };

  if (units === 'US') notes.push(`written in US units: airspeed ft/s and altitude ft converted to SI (1 ft = 0.3048 m)`);
  if (altitude !== null) notes.push('altitude is geometric');

  let system: StateSpace;
  let form: DynamicsForm;
  let liftData: LiftData | null = null;
  let theta0Used: number | null = theta0 ?? null;

  if (written.nondimensional !== undefined) {
    const built = buildNondimensional(written.nondimensional, written.airspeed * length, altitude!, theta0, settings, [...path, 'nondimensional']);
    if (!built.ok) return { ok: false, problems: [...problems, ...built.problems] };
    if (problems.length > 0) return { ok: false, problems };
    ({ system, liftData } = built.value);
    theta0Used = built.value.theta0;
    form = 'nondimensional';
    notes.push(...built.notes);
  } else {
    const parts: Part[] = [];
    const needsTrim = written.longitudinal?.derivatives !== undefined || written.lateral?.derivatives !== undefined;
    if (needsTrim) {
      if (theta0 === undefined) {
        theta0Used = 0;
        notes.push('theta0 not given: 0 rad used (trim pitch attitude)');
      }
      notes.push(`derivatives taken in stability axes with u0 = airspeed (${written.airspeed} ${words.velocity})`);
      notes.push(`g = ${settings.gravity} ${words.acceleration} (${settings.gravityOrigin}) used in the kinematic terms`);
    }
    const trim = { u0: written.airspeed, g: settings.gravity, theta0: theta0Used ?? 0 };
    if (written.stateSpace !== undefined) {
      const built = buildStateSpace(written.stateSpace, [...path, 'stateSpace']);
      if (built.ok) parts.push({ system: built.value, form: 'stateSpace', notes: built.notes });
      else problems.push(...built.problems);
    }
    if (written.longitudinal !== undefined) {
      const built = buildLongitudinalPart(written.longitudinal, trim, [...path, 'longitudinal']);
      if (built.ok) parts.push(built.value);
      else problems.push(...built.problems);
    }
    if (written.lateral !== undefined) {
      const built = buildLateralPart(written.lateral, trim, [...path, 'lateral']);
      if (built.ok) parts.push(built.value);
      else problems.push(...built.problems);
    }
    if (problems.length > 0) return { ok: false, problems };
    let combined = parts[0]!.system;
    for (const part of parts.slice(1)) {
      const clash = part.system.states.filter((s) => combined.states.includes(s));
      if (clash.length > 0) {
        return { ok: false, problems: [{ path, message: `state(s) ${clash.join(', ')} named in both the longitudinal and the lateral model`, expected: 'unique state names', code: 'duplicate_name' }] };
      }
      combined = blockDiagonal(combined, part.system);
    }
    if (parts.length > 1) notes.push('longitudinal and lateral-directional models combined block-diagonally, with zero coupling');
    for (const part of parts) notes.push(...part.notes);
    const kinds = new Set(parts.map((p) => p.form));
    form = kinds.size > 1 ? 'mixed' : parts[0]!.form;
    const si = stateSpaceToSI(combined, units);
    system = si.system;
    notes.push(...si.notes);
  }

  const broken = nonFiniteEntry(system, written, path);
  if (broken) return { ok: false, problems: [broken] };

  const { controls, problems: controlProblems } = buildControls(written.controls, system, [...path, 'controls']);
  if (controlProblems.length > 0) return { ok: false, problems: controlProblems };

  return {
    ok: true,
    value: {
      ...conditionHead(written, requiredLevel, altitude, length),
      theta0: theta0Used,
      form,
      system,
      liftData,
      controls,
      frequencyResponses: [],
      notes,
    },
    notes: [],
  };
}

/**
 * A condition given by frequency responses alone: no state-space model, so no roots (the
 * modal criteria are not evaluated on raw roots); the responses are read from their files by
 * the loader and attached to the condition there.
 */
function responsesOnlyCondition(
  written: WrittenCondition,
  requiredLevel: Level | null,
  altitude: number | null,
  problems: ModelProblem[],
  length: number,
): Built<BuiltCondition> {
  if (written.controls !== undefined) {
    problems.push({ path: ['controls'], message: 'controls name inputs of a state-space model; this condition gives frequency responses only', expected: 'no controls (the responses name their input)', found: 'controls', code: 'conflict' });
  }
  if (problems.length > 0) return { ok: false, problems };
  return {
    ok: true,
    value: {
      ...conditionHead(written, requiredLevel, altitude, length),
      theta0: null,
      form: 'frequencyResponses',
      system: { states: [], A: [], inputs: [], B: [], outputs: [], C: [], D: [] },
      liftData: null,
      controls: {},
      frequencyResponses: [],
      notes: ['given by frequency responses only: no state-space model, so no roots'],
    },
    notes: [],
  };
}

/** The fields every built condition takes from its written form (airspeed [m/s], altitude [m]). */
function conditionHead(written: WrittenCondition, requiredLevel: Level | null, altitude: number | null, length: number) {
  return {
    id: written.id,
    phase: written.phase,
    airspeed: written.airspeed * length,
    altitude,
    requiredLevel,
    nAlpha: written.nAlpha ?? null,
  };
}

function readRequiredLevel(value: number | undefined, path: Path, problems: ModelProblem[]): Level | null {
  if (value === undefined) return null;
  if (value === 1 || value === 2 || value === 3) return value;
  problems.push({ path, message: 'requiredLevel must be 1, 2 or 3', expected: '1 | 2 | 3', found: String(value), code: 'out_of_range' });
  return null;
}

/** One trim pitch attitude per condition; it may be written in the longitudinal or lateral part. */
function readTheta0(written: WrittenCondition, path: Path, problems: ModelProblem[]): number | undefined {
  const given = [
    { where: 'longitudinal', value: written.longitudinal?.theta0 },
    { where: 'lateral', value: written.lateral?.theta0 },
    { where: 'nondimensional', value: written.nondimensional?.theta0 },
  ].filter((g): g is { where: string; value: number } => g.value !== undefined);
  const first = given[0];
  if (!first) return undefined;
  for (const other of given.slice(1)) {
    if (other.value !== first.value) {
      problems.push({ path: [...path, other.where, 'theta0'], message: `theta0 differs from the ${first.where} theta0 (one trim per condition)`, expected: String(first.value), found: String(other.value), code: 'conflict' });
    }
  }
  return first.value;
}
