/**
 * Nondimensional coefficients -> dimensional derivatives (Nelson, 2nd ed., ch. 4 and 5 summary
 * tables). Check case: the Navion, Nelson 2nd ed. appendix B coefficients (from memory), sea level,
 * u0 = 176 ft/s, W = 2750 lb, m = 85.4 slug, S = 184 ft^2, cbar = 5.7 ft, b = 33.4 ft,
 * Ix = 1048, Iy = 3000, Iz = 3530 slug ft^2 (Nelson ch. 4/5 worked examples). The results are
 * compared with the dimensional derivatives of Teper, NASA CR-96008 (1969), in US units.
 */
import { describe, expect, it } from 'vitest';
import { dimensionalFromCoefficients, type NondimensionalInput } from '../../src/model/nondimensional.js';

const ft = 0.3048;
const slug = 14.59390294;
const navion: NondimensionalInput = {
  mass: 85.4 * slug,
  inertia: { Ix: 1048 * slug * ft * ft, Iy: 3000 * slug * ft * ft, Iz: 3530 * slug * ft * ft, Ixz: 0 },
  geometry: { S: 184 * ft * ft, cbar: 5.7 * ft, b: 33.4 * ft },
  // Nelson, 2nd ed., appendix B, Navion (from memory)
  coefficients: {
    CL0: 0.41, CD0: 0.05, CLalpha: 4.44, CDalpha: 0.33, Cmalpha: -0.683, Cmalphadot: -4.36, Cmq: -9.96, CLq: 3.8,
    CYbeta: -0.564, Clbeta: -0.074, Clp: -0.41, Clr: 0.107, Cnbeta: 0.071, Cnp: -0.0575, Cnr: -0.125,
  },
  controls: {},
  airspeed: 176 * ft,
  density: 1.225, // sea level, U.S. Standard Atmosphere 1976
  gravity: 9.80665,
  theta0: 0,
};

function build(input: NondimensionalInput) {
  const r = dimensionalFromCoefficients(input, ['n']);
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.value;
}

const close = (actual: number, expected: number, tolerance: number) => expect(Math.abs(actual / expected - 1)).toBeLessThan(tolerance);

describe('dimensionalFromCoefficients', () => {
  const set = build(navion);
  const lon = set.longitudinal!.derivatives;
  const lat = set.lateral!.derivatives;

  it('dynamic pressure 36.8 lbf/ft^2 at sea level and 176 ft/s (Nelson, 2nd ed., ch. 4 example)', () => {
    close(set.dynamicPressure / (4.4482216152605 / (ft * ft)), 36.8, 0.002);
  });

  it('longitudinal derivatives agree with CR-96008 within 1 % (Mwdot 1.5 %)', () => {
    close(lon.Xu, -0.0451, 0.01);
    close(lon.Xw, 0.03607, 0.01);
    close(lon.Zu, -0.3697, 0.01);
    close(lon.Zw, -2.0244, 0.01);
    close(lon.Mw * ft, -0.04997, 0.01); // 1/(m s) -> 1/(ft s)
    close(lon.Mwdot * ft, -0.005165, 0.015); // 1/m -> 1/ft
    close(lon.Mq, -2.0767, 0.01);
    expect(lon.Mu).toBe(0);
  });

  it('lateral-directional derivatives agree with CR-96008 within 1.5 %', () => {
    expect(lat.form).toBe('beta');
    close(lat.Ys / ft, -44.76, 0.01); // m/s^2 -> ft/s^2
    close(lat.Ls, -15.982, 0.01);
    close(lat.Lp, -8.402, 0.01);
    close(lat.Lr, 2.193, 0.01);
    close(lat.Ns, 4.495, 0.015);
    close(lat.Np, -0.3498, 0.01);
    close(lat.Nr, -0.7605, 0.01);
  });

  it('keeps the lift data for n/alpha = q S CL_alpha / W: 10.9 g/rad for the Navion (q S CLa / W with Nelson ch. 4 numbers)', () => {
    const { dynamicPressure, wingArea, weight, liftCurveSlope } = set.liftData!;
    close((dynamicPressure * wingArea * liftCurveSlope) / weight, (36.8 * 184 * 4.44) / 2750, 0.003);
    close(weight, 2750 * 4.4482216152605, 0.001);
  });

  it('computes the trim lift coefficient W cos(theta0) / (q S) when none is given, and says so', () => {
    const { CL0: _, ...rest } = navion.coefficients;
    const r = build({ ...navion, coefficients: rest });
    // 2750 lb / (36.8 lbf/ft^2 x 184 ft^2) = 0.406 (Nelson ch. 4 numbers)
    expect(r.notes.find((n) => n.startsWith('trim lift coefficient not given'))).toMatch(/CL0 = W cos\(theta0\) \/ \(Q S\) = 0\.40[56]/);
  });

  it('names the missing coefficients of a set that was started', () => {
    const { Cmq: _, ...rest } = navion.coefficients;
    const r = dimensionalFromCoefficients({ ...navion, coefficients: rest }, ['n']);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.map((p) => p.message)).toEqual(['missing coefficient Cmq (needed for the longitudinal set)']);
  });

  it('turns control coefficients into control derivatives: Zde = -CLde q S / m, Mde = Cmde q S cbar / Iy', () => {
    const r = build({ ...navion, controls: { de: { CL: 0.355, Cm: -0.923 } } });
    // Navion elevator, Nelson 2nd ed. appendix B: CLde 0.355, Cmde -0.923 (from memory); ch. 4: Zde -28.15 ft/s^2, Mde -11.87 1/s^2 (from memory)
    const de = r.longitudinal!.controls.get('de')!;
    close(de['Z']! / ft, -28.15, 0.01);
    close(de['M']!, -11.87, 0.01);
  });
});
