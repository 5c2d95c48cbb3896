/**
 * Primed lateral-directional derivatives: the rolling and yawing moment derivatives with the
 * product of inertia folded in, so that p' and r' each have one moment on the right-hand side
 * (Etkin & Reid, Dynamics of Flight, 3rd ed., ch. 4, lateral equations with primed derivatives):
 *   L' = (L + (Ixz/Ix) N) / (1 - Ixz^2/(Ix Iz)),  N' = (N + (Ixz/Iz) L) / (1 - Ixz^2/(Ix Iz))
 * where L and N are the moment derivatives divided by Ix and Iz. Applied to each pair (L_x, N_x)
 * with the same x; the inertias [mass length^2] enter only as ratios, so any consistent unit works.
 */
export interface Inertias {
  /** [mass length^2] */
  Ix: number;
  /** [mass length^2] */
  Iz: number;
  /** [mass length^2] */
  Ixz: number;
}

export function primeMomentPair(L: number, N: number, inertia: Inertias): { L: number; N: number } {
  const { Ix, Iz, Ixz } = inertia;
  const denominator = 1 - (Ixz * Ixz) / (Ix * Iz);
  return { L: (L + (Ixz / Ix) * N) / denominator, N: (N + (Ixz / Iz) * L) / denominator };
}
