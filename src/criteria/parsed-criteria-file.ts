/** One criteria file after parsing and schema validation, ready for the resolver. */
import type { CriteriaFileInput } from '../load/criteria-schema.js';

export interface ParsedCriteriaFile {
  /** the file as shown in messages */
  file: string;
  data: CriteriaFileInput;
  /** 1-based line and column of the value at a field path, when known */
  locate(path: readonly PropertyKey[]): { line: number; column: number } | undefined;
}
