/**
 * What kind of value a field of a written schema takes, found by walking the zod schema
 * itself (so that the table reader and the written form cannot drift apart). Only the
 * kinds a single table cell can hold are named; lists and mappings are `other`.
 */
import type { z } from 'zod';

export type FieldKind = 'number' | 'text' | 'boolean' | 'matrix' | 'other';

interface Def {
  type: string;
  shape?: Record<string, z.ZodType>;
  catchall?: z.ZodType;
  innerType?: z.ZodType;
  valueType?: z.ZodType;
  element?: z.ZodType;
}

const defOf = (schema: z.ZodType): Def => (schema as unknown as { _zod: { def: Def } })._zod.def;

/** The schema at `keys` below `root`, optionals unwrapped; undefined for a field the schema does not allow. */
export function schemaAt(root: z.ZodType, keys: readonly string[]): z.ZodType | undefined {
  let schema: z.ZodType | undefined = unwrap(root);
  for (const key of keys) {
    const def: Def = defOf(schema);
    if (def.type === 'object') {
      const own = Object.hasOwn(def.shape!, key) ? def.shape![key] : undefined;
      const rest = def.catchall && defOf(def.catchall).type !== 'never' ? def.catchall : undefined;
      schema = own ?? rest;
    } else if (def.type === 'record') {
      schema = def.valueType;
    } else {
      return undefined;
    }
    if (schema === undefined) return undefined;
    schema = unwrap(schema);
  }
  return schema;
}

export function kindOf(schema: z.ZodType): FieldKind {
  const def = defOf(schema);
  switch (def.type) {
    case 'number':
      return 'number';
    case 'string':
    case 'enum':
      return 'text';
    case 'boolean':
      return 'boolean';
    case 'array': {
      const inner = defOf(unwrap(def.element!));
      return inner.type === 'array' && defOf(unwrap(inner.element!)).type === 'number' ? 'matrix' : 'other';
    }
    default:
      return 'other';
  }
}

function unwrap(schema: z.ZodType): z.ZodType {
  let s = schema;
  while (defOf(s).type === 'optional') s = defOf(s).innerType!;
  return s;
}
