/**
 * A fast yes-or-don't-know test compiled from a zod schema: true only when zod would accept
 * the value unchanged; false sends the value to zod, which then says what is wrong. It reads
 * the schema's own definition, so it cannot accept what the schema refuses; a kind of schema
 * or check it does not know makes it answer false (zod decides). A 10,000-condition sweep
 * spends most of its validation time in zod's per-issue machinery without this.
 */
import type { z } from 'zod';

type Check = (value: unknown) => boolean;

interface Def {
  type: string;
  shape?: Record<string, z.ZodType>;
  catchall?: z.ZodType;
  innerType?: z.ZodType;
  keyType?: z.ZodType;
  valueType?: z.ZodType;
  element?: z.ZodType;
  entries?: Record<string, string | number>;
  values?: unknown[];
  checks?: { _zod: { def: { check: string; value?: number; inclusive?: boolean; minimum?: number } } }[];
}

const defOf = (schema: z.ZodType): Def => (schema as unknown as { _zod: { def: Def } })._zod.def;

const never: Check = () => false;

export function quickCheck(schema: z.ZodType): Check {
  const def = defOf(schema);
  switch (def.type) {
    case 'number':
      return numberCheck(def);
    case 'string': {
      const min = lengthMinimum(def);
      return min === undefined ? never : (v) => typeof v === 'string' && v.length >= min;
    }
    case 'boolean':
      return noChecks(def) ? (v) => typeof v === 'boolean' : never;
    case 'unknown':
      return noChecks(def) ? () => true : never;
    case 'enum': {
      const allowed = new Set(Object.values(def.entries!));
      return (v) => allowed.has(v as string);
    }
    case 'literal': {
      const allowed = new Set(def.values);
      return (v) => allowed.has(v);
    }
    case 'optional': {
      const inner = quickCheck(def.innerType!);
      return (v) => v === undefined || inner(v);
    }
    case 'array': {
      const min = lengthMinimum(def);
      if (min === undefined) return never;
      const item = quickCheck(def.element!);
      return (v) => Array.isArray(v) && v.length >= min && v.every(item);
    }
    case 'record': {
      const key = quickCheck(def.keyType!);
      const item = quickCheck(def.valueType!);
      if (!noChecks(def)) return never;
      return (v) => isPlainObject(v) && Object.entries(v).every(([k, x]) => key(k) && item(x));
    }
    case 'object':
      return objectCheck(def);
    default:
      return never;
  }
}

function objectCheck(def: Def): Check {
  if (!noChecks(def)) return never;
  const fields = Object.entries(def.shape!).map(([key, s]) => ({ key, check: quickCheck(s), optional: defOf(s).type === 'optional' }));
  const known = new Set(fields.map((f) => f.key));
  const catchallDef = def.catchall ? defOf(def.catchall) : undefined;
  // No catchall in zod 4 means unknown keys are stripped: the output would differ from the input.
  if (!catchallDef) return never;
  const rest: Check | 'refuse' = catchallDef.type === 'never' ? 'refuse' : quickCheck(def.catchall!);
  return (v) => {
    if (!isPlainObject(v)) return false;
    for (const f of fields) {
      const x = v[f.key];
      if (x === undefined ? !f.optional : !f.check(x)) return false;
    }
    for (const key in v) {
      if (known.has(key)) continue;
      if (rest === 'refuse' || !rest(v[key])) return false;
    }
    return true;
  };
}

function numberCheck(def: Def): Check {
  const bounds: Check[] = [];
  for (const c of def.checks ?? []) {
    const { check, value, inclusive } = c._zod.def;
    if (check === 'greater_than' && value !== undefined) bounds.push(inclusive ? (v) => (v as number) >= value : (v) => (v as number) > value);
    else if (check === 'less_than' && value !== undefined) bounds.push(inclusive ? (v) => (v as number) <= value : (v) => (v as number) < value);
    else return never;
  }
  return (v) => typeof v === 'number' && Number.isFinite(v) && bounds.every((b) => b(v));
}

/** The minimum length a string or array check asks for (0 without one); undefined for any other check. */
function lengthMinimum(def: Def): number | undefined {
  let min = 0;
  for (const c of def.checks ?? []) {
    if (c._zod.def.check !== 'min_length' || c._zod.def.minimum === undefined) return undefined;
    min = Math.max(min, c._zod.def.minimum);
  }
  return min;
}

function noChecks(def: Def): boolean {
  return (def.checks ?? []).length === 0;
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}
