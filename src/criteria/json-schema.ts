/**
 * JSON Schema of the criteria file format, generated from the zod schema (the one source of
 * truth), for editors. criteria/schema.json holds a copy; a test keeps the two equal, and
 * `npm run build && node scripts/write-criteria-schema.mjs` rewrites it.
 */
import { z } from 'zod';
import { CRITERIA_FORMAT, criteriaFileSchema } from '../load/criteria-schema.js';

export function criteriaJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(criteriaFileSchema, { target: 'draft-2020-12' }),
    title: `modalgate criteria file (${CRITERIA_FORMAT})`,
  };
}
