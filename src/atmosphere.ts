/**
 * U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562), from -5 km to 86 km geometric altitude:
 * the seven layers of linear temperature in geopotential altitude up to 84.852 km'.
 * Equation numbers cited are those of the 1976 document, from memory. Above 80 km the
 * temperature returned is the molecular-scale temperature, which the table shows up to 0.04 %
 * above the kinetic temperature (molecular weight no longer constant); pressure and density
 * are exact there.
 */
import { STANDARD_GRAVITY } from './units.js';

/** [m] effective Earth radius for the geometric -> geopotential conversion (1976 standard, eq. 18) */
export const EARTH_RADIUS = 6356766;
/** [J/(kmol K)] universal gas constant as the 1976 standard adopts it */
const GAS_CONSTANT = 8314.32;
/** [kg/kmol] mean molecular weight of sea-level air */
const MOLAR_MASS = 28.9644;
/** [J/(kg K)] specific gas constant of air, R* / M0 */
const AIR_GAS_CONSTANT = GAS_CONSTANT / MOLAR_MASS;
/** ratio of specific heats of air [-] */
const GAMMA = 1.4;

/** [m] lowest and highest geometric altitude covered */
export const ATMOSPHERE_MIN_ALTITUDE = -5000;
export const ATMOSPHERE_MAX_ALTITUDE = 86000;

/** Layer bases: geopotential altitude [m'], temperature lapse [K/m'] (1976 standard, table 4). */
const LAYERS: readonly { base: number; lapse: number }[] = [
  { base: 0, lapse: -0.0065 },
  { base: 11000, lapse: 0 },
  { base: 20000, lapse: 0.001 },
  { base: 32000, lapse: 0.0028 },
  { base: 47000, lapse: 0 },
  { base: 51000, lapse: -0.0028 },
  { base: 71000, lapse: -0.002 },
];

/** [K] and [Pa] at sea level (1976 standard) */
const SEA_LEVEL_TEMPERATURE = 288.15;
const SEA_LEVEL_PRESSURE = 101325;

export interface AtmosphereState {
  /** [m'] geopotential altitude */
  geopotentialAltitude: number;
  /** [K] */
  temperature: number;
  /** [Pa] */
  pressure: number;
  /** [kg/m^3] */
  density: number;
  /** [m/s] */
  speedOfSound: number;
}

/** Layer base temperature [K] and pressure [Pa], accumulated once from sea level. */
const LAYER_BASES: readonly { base: number; lapse: number; temperature: number; pressure: number }[] = (() => {
  const out: { base: number; lapse: number; temperature: number; pressure: number }[] = [];
  let temperature = SEA_LEVEL_TEMPERATURE;
  let pressure = SEA_LEVEL_PRESSURE;
  LAYERS.forEach((layer, i) => {
    out.push({ ...layer, temperature, pressure });
    const top = LAYERS[i + 1]?.base;
    if (top !== undefined) {
      pressure = layerPressure(pressure, temperature, layer.lapse, top - layer.base);
      temperature += layer.lapse * (top - layer.base);
    }
  });
  return out;
})();

/**
 * Hydrostatic pressure across a layer (1976 standard, eqs. 33a and 33b):
 * P = Pb [Tb / (Tb + L dH)]^(g0 M0 / (R* L)) for L != 0, P = Pb exp(-g0 M0 dH / (R* Tb)) for L = 0.
 */
function layerPressure(basePressure: number, baseTemperature: number, lapse: number, dH: number): number {
  const k = STANDARD_GRAVITY / AIR_GAS_CONSTANT;
  if (lapse === 0) return basePressure * Math.exp((-k * dH) / baseTemperature);
  return basePressure * Math.pow(baseTemperature / (baseTemperature + lapse * dH), k / lapse);
}

/** Geopotential altitude [m'] from geometric altitude z [m]: H = r0 z / (r0 + z) (1976 standard, eq. 18). */
export function geopotentialAltitude(geometricAltitude: number): number {
  return (EARTH_RADIUS * geometricAltitude) / (EARTH_RADIUS + geometricAltitude);
}

/**
 * Temperature, pressure, density (rho = P / (R T), eq. 42) and speed of sound
 * (a = sqrt(gamma R T), eq. 50) at a geometric altitude [m], U.S. Standard Atmosphere 1976.
 * Throws a RangeError outside -5 km .. 86 km geometric.
 */
export function standardAtmosphere(geometricAltitude: number): AtmosphereState {
  if (!Number.isFinite(geometricAltitude) || geometricAltitude < ATMOSPHERE_MIN_ALTITUDE || geometricAltitude > ATMOSPHERE_MAX_ALTITUDE) {
    throw new RangeError(
      `altitude ${geometricAltitude} m is outside the U.S. Standard Atmosphere 1976 range used here (${ATMOSPHERE_MIN_ALTITUDE} m to ${ATMOSPHERE_MAX_ALTITUDE} m geometric)`,
    );
  }
  const H = geopotentialAltitude(geometricAltitude);
  let layer = LAYER_BASES[0]!;
  for (const candidate of LAYER_BASES) if (H >= candidate.base) layer = candidate;
  const dH = H - layer.base;
  const temperature = layer.temperature + layer.lapse * dH;
  const pressure = layerPressure(layer.pressure, layer.temperature, layer.lapse, dH);
  return {
    geopotentialAltitude: H,
    temperature,
    pressure,
    density: pressure / (AIR_GAS_CONSTANT * temperature),
    speedOfSound: Math.sqrt(GAMMA * AIR_GAS_CONSTANT * temperature),
  };
}

/** Dynamic pressure [Pa] = 1/2 rho V^2, rho [kg/m^3], V [m/s] true airspeed. */
export function dynamicPressure(density: number, airspeed: number): number {
  return 0.5 * density * airspeed * airspeed;
}
