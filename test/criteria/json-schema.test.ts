/** criteria/schema.json is the generated JSON Schema of the criteria format, kept in step. */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { criteriaJsonSchema } from '../../src/criteria/json-schema.js';

describe('criteriaJsonSchema', () => {
  it('equals criteria/schema.json (regenerate: npm run build && node scripts/write-criteria-schema.mjs)', () => {
    const shipped = JSON.parse(readFileSync(new URL('../../criteria/schema.json', import.meta.url), 'utf8'));
    expect(shipped).toEqual(criteriaJsonSchema());
  });

  it('is strict and requires the source of every criterion', () => {
    const schema = criteriaJsonSchema() as {
      additionalProperties: boolean;
      properties: { criteria: { items: { required: string[]; additionalProperties: boolean } } };
    };
    expect(schema.additionalProperties).toBe(false);
    expect(schema.properties.criteria.items.additionalProperties).toBe(false);
    expect(schema.properties.criteria.items.required).toEqual(
      expect.arrayContaining(['id', 'title', 'mode', 'quantity', 'applies', 'source', 'evidence', 'note']),
    );
    // `levels` or `region`, one of the two (checked by the loader)
    expect(schema.properties.criteria.items.required).not.toContain('levels');
  });
});
