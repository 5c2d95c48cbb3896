/**
 * U.S. Standard Atmosphere 1976, checked against NOAA-S/T 76-1562 (NOAA, NASA, USAF, 1976),
 * Table I (SI units, by geometric altitude Z, with geopotential altitude H alongside).
 * Table values below are from memory unless marked otherwise; they are printed there to five
 * or six significant figures, and the tolerances are half a unit of the last digit copied.
 */
import { describe, expect, it } from 'vitest';
import { dynamicPressure, geopotentialAltitude, standardAtmosphere } from '../src/atmosphere.js';

const rel = (actual: number, expected: number, tolerance: number) => expect(Math.abs(actual / expected - 1)).toBeLessThan(tolerance);

describe('standardAtmosphere, by geometric altitude', () => {
  // [Z geometric m, H geopotential m', T K, P Pa, rho kg/m^3]
  const table: [number, number, number, number, number][] = [
    // sea level: defining values of the 1976 standard (T0, P0; rho0 = 1.2250 tabulated)
    [0, 0, 288.15, 101325, 1.225],
    // NOAA-S/T 76-1562, Table I, Z = 5000 m geometric (from memory)
    [5000, 4996.1, 255.676, 54048, 0.73643],
    // Z = 11000 m geometric, just below the tropopause in H (from memory)
    [11000, 10981, 216.774, 22700, 0.36480],
    // Z = 20000 m geometric (from memory)
    [20000, 19937, 216.65, 5529.3, 0.088910],
    // Z = 32000 m geometric (from memory)
    [32000, 31840, 228.49, 889.06, 0.013555],
  ];
  it.each(table)('Z = %d m (geometric)', (Z, H, T, P, rho) => {
    const a = standardAtmosphere(Z);
    expect(a.geopotentialAltitude).toBeCloseTo(H, -1);
    expect(a.temperature).toBeCloseTo(T, 2);
    rel(a.pressure, P, 1e-4);
    rel(a.density, rho, 1e-4);
  });

  it('speed of sound at sea level is 340.294 m/s (NOAA-S/T 76-1562, Table I; from memory)', () => {
    expect(standardAtmosphere(0).speedOfSound).toBeCloseTo(340.294, 3);
  });

  it('at 5000 m geopotential (Z = 5003.9 m geometric): T 255.650 K, P 54020 Pa, rho 0.73612 kg/m^3 (NOAA-S/T 76-1562, Table I by H; from memory)', () => {
    // The density differs from the 5000 m geometric row in the fourth digit: the test says which one it means.
    const Z = (6356766 * 5000) / (6356766 - 5000);
    const a = standardAtmosphere(Z);
    expect(a.geopotentialAltitude).toBeCloseTo(5000, 6);
    expect(a.temperature).toBeCloseTo(255.65, 3);
    rel(a.pressure, 54020, 1e-4);
    rel(a.density, 0.73612, 1e-4);
    expect(Math.abs(a.density - standardAtmosphere(5000).density)).toBeGreaterThan(2e-4);
  });

  it('86 km geometric is 84852 m geopotential, the top of the seven layers (1976 standard)', () => {
    expect(geopotentialAltitude(86000)).toBeCloseTo(84852, 0);
    // NOAA-S/T 76-1562, Table I, Z = 86 km: P = 0.37338 Pa, rho = 6.958e-6 kg/m^3 (from memory)
    rel(standardAtmosphere(86000).pressure, 0.37338, 2e-4);
    rel(standardAtmosphere(86000).density, 6.958e-6, 1e-3);
  });

  it('refuses altitudes outside -5 km .. 86 km geometric', () => {
    expect(() => standardAtmosphere(86001)).toThrow(RangeError);
    expect(() => standardAtmosphere(-5001)).toThrow(RangeError);
    expect(() => standardAtmosphere(Number.NaN)).toThrow(RangeError);
  });

  it('is continuous across every layer boundary (hydrostatic integration, 1976 standard eqs. 33a/b, numbers from memory)', () => {
    for (const H of [11000, 20000, 32000, 47000, 51000, 71000]) {
      const Z = (6356766 * H) / (6356766 - H);
      const below = standardAtmosphere(Z - 1e-3);
      const above = standardAtmosphere(Z + 1e-3);
      rel(above.pressure, below.pressure, 1e-6);
      rel(above.temperature, below.temperature, 1e-6);
    }
  });
});

describe('dynamicPressure', () => {
  it('q = 1/2 rho V^2: 1.225 kg/m^3 at 100 m/s is 6125 Pa (definition)', () => {
    expect(dynamicPressure(1.225, 100)).toBeCloseTo(6125, 9);
  });
});
