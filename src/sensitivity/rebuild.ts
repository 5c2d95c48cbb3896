/**
 * The condition built again from its written form with one number changed: the same pure
 * build the loader uses, so every conversion (units, inertia coupling, dynamic pressure,
 * v or beta form, Zwdot) is differentiated along with the number.
 */
import { buildCondition, type BuiltCondition } from '../model/build-condition.js';
import type { WrittenCondition } from '../load/model-schema.js';
import type { FlightCondition, WrittenSource } from '../types.js';
import { withNumber, type NumberPath } from './written-numbers.js';

/** The built condition with the number at `path` set to `value`; null when that no longer builds (e.g. a mass of 0). */
export function rebuiltWith(source: WrittenSource, path: NumberPath, value: number): BuiltCondition | null {
  const written = withNumber(source.condition, path, value) as WrittenCondition;
  const built = buildCondition(written, source, []);
  return built.ok ? built.value : null;
}

/** The same, as a flight condition that keeps the original's place (looked up only if an error needs it). */
export function rebuildWith(original: FlightCondition, source: WrittenSource, path: NumberPath, value: number): FlightCondition | null {
  const built = rebuiltWith(source, path, value);
  if (built === null) return null;
  return {
    ...built,
    get place() {
      return original.place;
    },
  };
}
