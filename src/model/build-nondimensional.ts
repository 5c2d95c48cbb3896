/**
 * A condition written in the nondimensional form: its data brought to SI, air density from the
 * U.S. Standard Atmosphere 1976 at the geometric altitude, coefficients turned into dimensional
 * derivatives, then the same longitudinal and lateral equations as the derivative form.
 */
import { standardAtmosphere } from '../atmosphere.js';
import type { WrittenNondimensional } from '../load/model-schema.js';
import type { LiftData, StateSpace } from '../types.js';
import { UNIT_FACTORS, UNIT_WORDS } from '../units.js';
import type { BuildSettings } from './build-condition.js';
import { lateralFromDerivatives } from './lateral-derivatives.js';
import { longitudinalFromDerivatives } from './longitudinal-derivatives.js';
import { dimensionalFromCoefficients } from './nondimensional.js';
import type { Built } from './problem.js';
import { blockDiagonal } from './state-space.js';

type Path = (string | number)[];

export function buildNondimensional(
  written: WrittenNondimensional,
  airspeed: number,
  altitude: number,
  theta0: number | undefined,
  settings: BuildSettings,
  path: Path,
): Built<{ system: StateSpace; liftData: LiftData | null; theta0: number }> {
  const { length, mass } = UNIT_FACTORS[settings.units];
  const inertiaFactor = mass * length * length;
  const gravity = settings.gravity * length;
  const notes: string[] = [];
  if (settings.units === 'US') notes.push('nondimensional data converted to SI: mass slug -> kg, inertia slug ft^2 -> kg m^2, S ft^2 -> m^2, cbar and b ft -> m');
  const atmosphere = standardAtmosphere(altitude);
  const theta0Used = theta0 ?? 0;
  if (theta0 === undefined) notes.push('theta0 not given: 0 rad used (trim pitch attitude)');
  const { Ix, Iy, Iz, Ixz } = written.inertia;
  const built = dimensionalFromCoefficients(
    {
      mass: written.mass * mass,
      inertia: { Ix: Ix * inertiaFactor, Iy: Iy * inertiaFactor, Iz: Iz * inertiaFactor, Ixz: Ixz * inertiaFactor },
      geometry: { S: written.geometry.S * length * length, cbar: written.geometry.cbar * length, b: written.geometry.b * length },
      coefficients: written.coefficients,
      controls: written.controls ?? {},
      airspeed,
      density: atmosphere.density,
      gravity,
      theta0: theta0Used,
    },
    path,
  );
  if (!built.ok) return built;
  const set = built.value;
  notes.push(`density ${atmosphere.density.toPrecision(5)} kg/m^3 from the U.S. Standard Atmosphere 1976 at the geometric altitude; Q = 1/2 rho V^2 = ${set.dynamicPressure.toPrecision(5)} Pa`);
  notes.push(`g = ${settings.gravity} ${UNIT_WORDS[settings.units].acceleration} (${settings.gravityOrigin}) used in the weight and the kinematic terms`);
  notes.push('coefficients taken in stability axes, per rad, with u0 = airspeed; dimensional derivatives by the standard relations (Nelson, 2nd ed., ch. 4 and 5)');
  notes.push(...set.notes);
  const trim = { u0: airspeed, g: gravity, theta0: theta0Used };
  let system: StateSpace | undefined;
  if (set.longitudinal) {
    const longitudinal = longitudinalFromDerivatives(set.longitudinal.derivatives, set.longitudinal.controls, trim);
    system = longitudinal.system;
    notes.push(...longitudinal.notes);
  }
  if (set.lateral) {
    let coupling: { Ix: number; Iz: number; Ixz: number } | null = null;
    if (Ixz * Ixz >= Ix * Iz) {
      return { ok: false, problems: [{ path: [...path, 'inertia', 'Ixz'], message: 'Ixz^2 must be less than Ix Iz (a real body has a positive-definite inertia tensor)', expected: `|Ixz| < ${Math.sqrt(Ix * Iz).toPrecision(4)}`, found: String(Ixz), code: 'out_of_range' }] };
    }
    if (Ixz !== 0) {
      coupling = { Ix, Iz, Ixz };
      notes.push('L and N derivatives primed with the given Ixz (Etkin & Reid, 3rd ed., ch. 4)');
    } else {
      notes.push('Ixz = 0: no inertia coupling applied to the L and N derivatives');
    }
    const lateral = lateralFromDerivatives(set.lateral.derivatives, set.lateral.controls, trim, coupling);
    notes.push("lateral-directional states [beta, p, r, phi]; phi' = p + tan(theta0) r");
    system = system ? blockDiagonal(system, lateral.system) : lateral.system;
    if (set.longitudinal) notes.push('longitudinal and lateral-directional models combined block-diagonally, with zero coupling');
  }
  return { ok: true, value: { system: system!, liftData: set.liftData, theta0: theta0Used }, notes };
}
