/**
 * The shipped criteria sets, parsed and checked at build time: `npm run build` writes
 * dist/criteria-cache/<id>.json for each criteria/<id>.yaml (scripts/build.mjs), holding the
 * SHA-256 of the file it was made from, the data as the schema accepted it and the line and
 * column of every value. Loading a shipped set then reads the YAML file's bytes (for its hash,
 * which the results record anyway), and when the hash matches takes the cached form instead
 * of parsing and checking the YAML again: the same data and the same places, so the same
 * resolved set and the same messages. A file changed after the build simply does not match
 * and is parsed as any other.
 */
import { isDeepStrictEqual } from 'node:util';
import type { ParsedCriteriaFile } from '../criteria/parsed-criteria-file.js';
import { criteriaFileSchema } from './criteria-schema.js';
import { parseStructuredText } from './structured-text.js';

export interface CriteriaCacheEntry {
  format: 'modalgate-criteria-cache/1';
  /** SHA-256 (hex) of the criteria file's bytes */
  sha256: string;
  /** the file's content as the schema accepted it */
  data: ParsedCriteriaFile['data'];
  /** [path as JSON, line, column] of every value of the file */
  places: [string, number, number][];
}

/**
 * The cache entry of a criteria file, or null when there is nothing to cache: the file does
 * not pass the schema, or its data would not come back from JSON the same (e.g. an infinity).
 */
export function criteriaCacheEntry(text: string, shown: string, sha256: string): CriteriaCacheEntry | null {
  const source = parseStructuredText(text, shown);
  const checked = criteriaFileSchema.safeParse(source.value);
  if (!checked.success || !isDeepStrictEqual(JSON.parse(JSON.stringify(checked.data)), checked.data)) return null;
  const places: [string, number, number][] = [];
  const walk = (value: unknown, path: PropertyKey[]) => {
    const at = source.locate(path);
    if (at) places.push([JSON.stringify(path), at.line, at.column]);
    if (Array.isArray(value)) value.forEach((item, i) => walk(item, [...path, i]));
    else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) walk(v, [...path, k]);
  };
  walk(source.value, []);
  return { format: 'modalgate-criteria-cache/1', sha256, data: checked.data, places };
}

/**
 * The parsed file from a cache entry, when it was made from these very bytes (`sha256`);
 * otherwise null. `locate` answers as the parser's does: the place of the value at a path,
 * or of its nearest existing parent.
 */
export function parsedFromCache(entry: unknown, shown: string, sha256: string): ParsedCriteriaFile | null {
  const e = entry as Partial<CriteriaCacheEntry> | null;
  if (e === null || typeof e !== 'object' || e.format !== 'modalgate-criteria-cache/1' || e.sha256 !== sha256 || !Array.isArray(e.places)) return null;
  const places = new Map(e.places.map(([path, line, column]) => [path, { line, column }]));
  return {
    file: shown,
    data: e.data as ParsedCriteriaFile['data'],
    locate: (path) => {
      for (let n = path.length; n >= 0; n -= 1) {
        const found = places.get(JSON.stringify(path.slice(0, n)));
        if (found) return { ...found };
      }
      return undefined;
    },
  };
}
