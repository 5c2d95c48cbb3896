/**
 * Where the pitch attitude's phase branch is pinned: nearest -90 deg between the phugoid and
 * the short period, at sqrt(omega_ph omega_sp), or at omega_sp / 4 without a phugoid; there a
 * rate-response aircraft looks like K/s (common practice). Undefined without a short period.
 */
import type { Mode } from '../types.js';
import type { PhaseAnchor } from './frequency-response.js';

export function pitchPhaseAnchor(modes: readonly Pick<Mode, 'kind' | 'naturalFrequency'>[]): { anchor: PhaseAnchor; how: string } | null {
  const wsp = modes.find((m) => m.kind === 'short_period')?.naturalFrequency ?? null;
  const wph = modes.find((m) => m.kind === 'phugoid')?.naturalFrequency ?? null;
  if (wsp !== null && wph !== null && wph < wsp) {
    const omega = Math.sqrt(wph * wsp);
    return { anchor: { omega, phase: -90 }, how: `phase branch nearest -90 deg at sqrt(omega_ph omega_sp) = ${omega.toPrecision(3)} rad/s` };
  }
  if (wsp !== null) {
    return { anchor: { omega: wsp / 4, phase: -90 }, how: `phase branch nearest -90 deg at omega_sp / 4 = ${(wsp / 4).toPrecision(3)} rad/s` };
  }
  return null;
}
