/**
 * The longitudinal and lateral parts of a condition written as `longitudinal:` / `lateral:`,
 * each either a state-space model or dimensional derivatives (written units, not yet SI).
 * The lateral part settles the inertia coupling: with a nonzero Ixz the file must say whether
 * its L and N derivatives are primed, and they are primed here at most once.
 */
import type { WrittenLateral, WrittenLongitudinal } from '../load/model-schema.js';
import type { StateSpace } from '../types.js';
import { missingDerivatives, splitControlDerivatives } from './control-derivatives.js';
import { LATERAL_KNOWN, lateralFromDerivatives, readLateralDerivatives } from './lateral-derivatives.js';
import { LONGITUDINAL_KNOWN, LONGITUDINAL_REQUIRED, longitudinalFromDerivatives, type LongitudinalDerivatives } from './longitudinal-derivatives.js';
import type { Built, ModelProblem } from './problem.js';
import { buildStateSpace } from './state-space.js';

type Path = (string | number)[];

/** [length/s], [length/s^2], [rad] in the written units */
export interface Trim {
  u0: number;
  g: number;
  theta0: number;
}

export interface Part {
  system: StateSpace;
  form: 'stateSpace' | 'derivatives';
  notes: string[];
}

export function buildLongitudinalPart(written: WrittenLongitudinal, trim: Trim, path: Path): Built<Part> {
  const oneOf = exactlyOne(written.stateSpace, written.derivatives, 'longitudinal', path);
  if (oneOf) return { ok: false, problems: [oneOf] };
  if (written.stateSpace !== undefined) {
    const built = buildStateSpace(written.stateSpace, [...path, 'stateSpace']);
    return built.ok ? { ok: true, value: { system: built.value, form: 'stateSpace', notes: [] }, notes: [] } : built;
  }
  const d = written.derivatives!;
  const dPath = [...path, 'derivatives'];
  const { controls, problems } = splitControlDerivatives(d, LONGITUDINAL_KNOWN, ['X', 'Z', 'M'], dPath);
  problems.push(...missingDerivatives(d, LONGITUDINAL_REQUIRED, 'longitudinal form', dPath));
  // (1 - Zwdot) divides the w' equation; Zwdot is small and negative in practice
  if (d.Zwdot !== undefined && d.Zwdot >= 1) {
    problems.push({ path: [...dPath, 'Zwdot'], message: 'Zwdot must be less than 1 (the w equation is divided by 1 - Zwdot)', expected: 'Zwdot < 1', found: String(d.Zwdot), code: 'out_of_range' });
  }
  if (problems.length > 0) return { ok: false, problems };
  const { system, notes } = longitudinalFromDerivatives(d as LongitudinalDerivatives, controls, trim);
  return { ok: true, value: { system, form: 'derivatives', notes }, notes: [] };
}

export function buildLateralPart(written: WrittenLateral, trim: Trim, path: Path): Built<Part> {
  const oneOf = exactlyOne(written.stateSpace, written.derivatives, 'lateral', path);
  if (oneOf) return { ok: false, problems: [oneOf] };
  if (written.stateSpace !== undefined) {
    const stray = (['primed', 'Ixz', 'Ix', 'Iz'] as const).filter((k) => written[k] !== undefined);
    if (stray.length > 0) {
      return { ok: false, problems: stray.map((k) => ({ path: [...path, k], message: `${k} applies to lateral derivatives only, not to a lateral stateSpace`, code: 'not_applicable' })) };
    }
    const built = buildStateSpace(written.stateSpace, [...path, 'stateSpace']);
    return built.ok ? { ok: true, value: { system: built.value, form: 'stateSpace', notes: [] }, notes: [] } : built;
  }
  const d = written.derivatives!;
  const dPath = [...path, 'derivatives'];
  const { controls, problems } = splitControlDerivatives(d, LATERAL_KNOWN, ['Y', 'L', 'N'], dPath);
  const read = readLateralDerivatives(d, dPath);
  if (!read.ok) problems.push(...read.problems);

  const notes: string[] = [];
  let coupling: { Ix: number; Iz: number; Ixz: number } | null = null;
  const { Ixz, Ix, Iz, primed } = written;
  if (Ixz !== undefined && Ixz !== 0) {
    if (primed === undefined) {
      problems.push({ path: [...path, 'Ixz'], message: 'Ixz is given and nonzero, so say whether the L and N derivatives already include it', expected: 'primed: true (already coupled) or primed: false (couple them here)', found: 'no primed field', code: 'primed_unstated' });
    } else if (primed) {
      notes.push('L and N derivatives taken as primed (as stated); Ixz not applied again');
    } else if (Ix === undefined || Iz === undefined) {
      problems.push({ path, message: 'primed: false with a nonzero Ixz needs Ix and Iz to couple the L and N derivatives', expected: 'Ix and Iz', found: [Ix === undefined ? 'no Ix' : '', Iz === undefined ? 'no Iz' : ''].filter(Boolean).join(', '), code: 'missing_inertia' });
    } else if (Ixz * Ixz >= Ix * Iz) {
      problems.push({ path: [...path, 'Ixz'], message: 'Ixz^2 must be less than Ix Iz (a real body has a positive-definite inertia tensor)', expected: `|Ixz| < ${Math.sqrt(Ix * Iz).toPrecision(4)}`, found: String(Ixz), code: 'out_of_range' });
    } else {
      coupling = { Ix, Iz, Ixz };
      notes.push(`L and N derivatives primed here with Ixz/Ix = ${(Ixz / Ix).toPrecision(4)}, Ixz/Iz = ${(Ixz / Iz).toPrecision(4)} (Etkin & Reid, 3rd ed., ch. 4)`);
    }
  } else if (Ixz === 0) {
    notes.push('Ixz = 0: no inertia coupling applied to the L and N derivatives');
  } else if (primed) {
    notes.push('L and N derivatives taken as primed (as stated)');
  } else {
    notes.push('Ixz not given: no inertia coupling applied to the L and N derivatives');
  }
  if (problems.length > 0 || !read.ok) return { ok: false, problems };
  notes.push(`lateral-directional states [${read.value.form}, p, r, phi]; phi' = p + tan(theta0) r`);
  const built = lateralFromDerivatives(read.value, controls, trim, coupling);
  return { ok: true, value: { system: built.system, form: 'derivatives', notes: [...notes, ...built.notes] }, notes: [] };
}

function exactlyOne(stateSpace: unknown, derivatives: unknown, part: string, path: Path): ModelProblem | undefined {
  if (stateSpace !== undefined && derivatives !== undefined) {
    return { path, message: `${part}: both stateSpace and derivatives given; give one`, expected: 'stateSpace or derivatives', found: 'both', code: 'dynamics_form' };
  }
  if (stateSpace === undefined && derivatives === undefined) {
    return { path, message: `${part}: neither stateSpace nor derivatives given`, expected: 'stateSpace or derivatives', found: 'neither', code: 'dynamics_form' };
  }
  return undefined;
}
