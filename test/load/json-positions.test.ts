/**
 * The JSON position scanner against the `yaml` parser's own positions for the same text (YAML
 * 1.2 reads JSON text; YAML 1.2.2 spec, section 1.3): for random JSON values, written compact
 * and indented, every path to a value gives the same line and column.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonLocator } from '../../src/load/json-positions.js';
import { parseStructuredText } from '../../src/load/structured-text.js';

function paths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  const out = [prefix];
  if (Array.isArray(value)) value.forEach((v, i) => out.push(...paths(v, [...prefix, i])));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) out.push(...paths(v, [...prefix, k]));
  return out;
}

describe('jsonLocator', () => {
  it('gives the line and column that the yaml parser gives, for every value', () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 4 }), fc.constantFrom(0, 2, '\t'), (value, indent) => {
        const text = JSON.stringify(value, null, indent);
        const fast = jsonLocator(text);
        const slow = parseStructuredText(text, 'oracle.yaml');
        for (const path of paths(JSON.parse(text))) expect(fast.locate(path), JSON.stringify(path)).toEqual(slow.locate(path));
      }),
      { numRuns: 150 },
    );
  });

  it('says undefined for a path that does not resolve (the caller falls back to the parent)', () => {
    const fast = jsonLocator('{"conditions": [{"id": "a"}], "units": "SI"}');
    expect(fast.locate(['conditions', 1])).toBeUndefined();
    expect(fast.locate(['units', 'x'])).toBeUndefined();
    expect(fast.locate(['conditions', 0, 'id'])).toEqual({ line: 1, column: 24 });
  });

  it('skips strings holding brackets, quotes and backslashes', () => {
    const text = '{\r\n  "a": "x}]\\"\\\\",\r\n  "b": [1, {"c": "{["}]\r\n}';
    expect(jsonLocator(text).locate(['b', 1, 'c'])).toEqual({ line: 3, column: 18 });
  });
});
