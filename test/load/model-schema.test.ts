import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { modelFileFullSchema } from '../../src/load/model-schema.js';

describe('model file schema', () => {
  it('exports as JSON Schema with the required top-level fields of the contract', () => {
    const schema = z.toJSONSchema(modelFileFullSchema) as { required?: string[]; additionalProperties?: unknown };
    expect(schema.required).toEqual(['format', 'aircraft', 'units', 'conditions']);
    expect(schema.additionalProperties).toBe(false);
  });
});
