import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { modelFileFullSchema } from '../../src/load/model-schema.js';

describe('model file schema', () => {
  it('exports as JSON Schema with the required top-level fields of the contract', () => {
    const schema = z.toJSONSchema(modelFileFullSchema) as { required?: string[]; additionalProperties?: unknown; properties?: Record<string, unknown> };
    // conditions may come from `conditions:`, from `conditionTable:` or both, so neither is required on its own
    expect(schema.required).toEqual(['format', 'aircraft', 'units']);
    expect(Object.keys(schema.properties ?? {})).toEqual(expect.arrayContaining(['conditions', 'conditionTable']));
    expect(schema.additionalProperties).toBe(false);
  });
});
