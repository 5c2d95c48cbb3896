/**
 * The shipped criteria sets' build-time cache (src/load/criteria-cache.ts): the same data and
 * the same places as parsing the YAML, used only for the very bytes it was made from, and the
 * same resolved sets from the compiled loader (which has the cache) as from the sources
 * (which have none).
 */
import { createHash } from 'node:crypto';
import { execFileSync } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { criteriaCacheEntry, parsedFromCache } from '../../src/load/criteria-cache.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import { criteriaFileSchema } from '../../src/load/criteria-schema.js';
import { parseStructuredText } from '../../src/load/structured-text.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const SHIPPED = readdirSync(join(ROOT, 'criteria')).filter((f) => f.endsWith('.yaml')).sort();
const sha = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

function paths(value: unknown, path: PropertyKey[] = []): PropertyKey[][] {
  const out = [path];
  if (Array.isArray(value)) value.forEach((v, i) => out.push(...paths(v, [...path, i])));
  else if (value !== null && typeof value === 'object') for (const [k, v] of Object.entries(value)) out.push(...paths(v, [...path, k]));
  return out;
}

describe('criteria cache', () => {
  it('has every shipped set', () => {
    expect(SHIPPED).toEqual(['civil-dynamic-stability.yaml', 'mil-f-8785c.yaml', 'programme-template.yaml']);
  });

  it.each(SHIPPED)('%s: the same data and places as the parser, through JSON', (name) => {
    const bytes = readFileSync(join(ROOT, 'criteria', name));
    const text = bytes.toString('utf8');
    const shown = `criteria/${name}`;
    const entry = criteriaCacheEntry(text, shown, sha(bytes));
    expect(entry).not.toBeNull();
    const parsed = parsedFromCache(JSON.parse(JSON.stringify(entry)), shown, sha(bytes))!;
    const source = parseStructuredText(text, shown);
    const checked = criteriaFileSchema.parse(source.value);
    expect(parsed.file).toBe(shown);
    expect(parsed.data).toEqual(checked);
    for (const p of paths(source.value)) expect(parsed.locate(p), JSON.stringify(p)).toEqual(source.locate(p));
    // a path that is not in the file is placed at its nearest parent, as the parser does
    for (const p of [['criteria', 0, 'no-such-field'], ['no-such-field'], ['criteria', 999, 'levels']]) {
      expect(parsed.locate(p), JSON.stringify(p)).toEqual(source.locate(p));
    }
  });

  it('is used only for the bytes it was made from, and only in its own format', () => {
    const bytes = readFileSync(join(ROOT, 'criteria', 'mil-f-8785c.yaml'));
    const entry = criteriaCacheEntry(bytes.toString('utf8'), 'x.yaml', sha(bytes))!;
    expect(parsedFromCache(entry, 'x.yaml', sha(Buffer.concat([bytes, Buffer.from('\n')])))).toBeNull();
    expect(parsedFromCache({ ...entry, format: 'something-else' }, 'x.yaml', sha(bytes))).toBeNull();
    expect(parsedFromCache(null, 'x.yaml', sha(bytes))).toBeNull();
  });

  it('makes no entry for a file the schema refuses', () => {
    expect(criteriaCacheEntry('format: nonsense\n', 'bad.yaml', 'ab')).toBeNull();
  });

  it('the compiled loader (with the cache of npm run build) resolves every shipped set as the sources do', async () => {
    const ids = SHIPPED.map((f) => f.replace(/\.yaml$/, '')).filter((id) => id !== 'civil-dynamic-stability');
    const script = `
      import { loadCriteriaSet } from ${JSON.stringify(join(ROOT, 'dist/load/criteria-file.js'))};
      import { existsSync } from 'node:fs';
      if (!existsSync(${JSON.stringify(join(ROOT, 'dist/criteria-cache/mil-f-8785c.json'))})) throw new Error('no cache: run npm run build');
      const out = [];
      for (const id of ${JSON.stringify(ids)}) out.push(await loadCriteriaSet(id));
      // the civil set alone stops with an error naming the number the programme must set
      out.push(await loadCriteriaSet('civil-dynamic-stability').then(() => 'loaded', (err) => err.message));
      process.stdout.write(JSON.stringify(out));`;
    const compiled = execFileSync(process.execPath, ['--input-type=module', '-e', script], { cwd: ROOT, encoding: 'utf8' });
    const fromSources: unknown[] = await Promise.all(ids.map((id) => loadCriteriaSet(id)));
    fromSources.push(await loadCriteriaSet('civil-dynamic-stability').then(() => 'loaded', (err: Error) => err.message));
    expect(fromSources.at(-1)).not.toBe('loaded');
    expect(JSON.parse(compiled)).toEqual(JSON.parse(JSON.stringify(fromSources)));
  });
});
