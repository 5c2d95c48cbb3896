/**
 * Modal analysis of one linear model: subsystem split and coupling, eigen-analysis block by
 * block, mode identification and modal figures. Pure: no file, clock or randomness.
 */
import type { ModalAnalysis, StateSpace } from '../types.js';
import { InternalError } from '../errors.js';
import { identifyModes } from './identify.js';
import { collectRoots } from './roots.js';
import { measureCoupling, splitSubsystems } from './subsystems.js';

export interface AnalyseOptions {
  /** [m/s] true airspeed of the condition */
  airspeed: number;
}

export function analyseModes(system: StateSpace, options: AnalyseOptions): ModalAnalysis {
  checkSystem(system, options);
  const subsystems = splitSubsystems(system.states);
  const roots = collectRoots(system.A, system.states);
  const coupling = measureCoupling(system.A, system.states, roots.values);
  const identification = identifyModes(roots.roots, { airspeed: options.airspeed });

  const warnings: string[] = [];
  if (!coupling.decoupled) {
    warnings.push(
      `longitudinal and lateral-directional states are coupled: zeroing the cross terms moves a root by ` +
        `${(coupling.coupling * 100).toPrecision(2)} % (tolerance ${coupling.tolerance * 100} %); ` +
        `modes are taken from the full model`,
    );
  }
  warnings.push(...roots.warnings, ...identification.warnings);
  return {
    subsystems,
    coupling: coupling.coupling,
    decoupled: coupling.decoupled,
    modes: identification.modes,
    warnings,
  };
}

/** The model builder guarantees these; a failure here is a bug upstream. */
function checkSystem(system: StateSpace, options: AnalyseOptions): void {
  const n = system.states.length;
  if (n === 0) throw new InternalError('modal analysis of a model with no states');
  if (hasDuplicate(system.states)) {
    throw new InternalError(`duplicate state names: ${system.states.join(', ')}`);
  }
  if (system.A.length !== n) throw new InternalError(`A must be ${n} x ${n} for states ${system.states.join(', ')}`);
  for (let i = 0; i < n; i += 1) {
    const row = system.A[i]!;
    if (row.length !== n) throw new InternalError(`A must be ${n} x ${n} for states ${system.states.join(', ')}`);
    for (let j = 0; j < n; j += 1) {
      const x = row[j]!;
      if (x - x !== 0) {
        // NaN and +/-Infinity are the only numbers for which x - x is not 0
        throw new InternalError(`A[${system.states[i]}][${system.states[j]}] is not finite (${x})`);
      }
    }
  }
  if (!(Number.isFinite(options.airspeed) && options.airspeed > 0)) {
    throw new InternalError(`airspeed must be a positive number of m/s, got ${options.airspeed}`);
  }
}

function hasDuplicate(names: readonly string[]): boolean {
  for (let i = 1; i < names.length; i += 1) {
    for (let j = 0; j < i; j += 1) if (names[i] === names[j]) return true;
  }
  return false;
}
