/** Criteria files written inline in a test, parsed and validated as the loader does. */
import { criteriaFileSchema } from '../../src/load/criteria-schema.js';
import { parseStructuredText } from '../../src/load/structured-text.js';
import type { ParsedCriteriaFile } from '../../src/criteria/parsed-criteria-file.js';

export function parsedFile(text: string, file: string): ParsedCriteriaFile {
  const source = parseStructuredText(text, file);
  return { file, data: criteriaFileSchema.parse(source.value), locate: source.locate };
}
