/**
 * Load a criteria set: a path, or the id of a set shipped in the package's criteria/ folder.
 * Follows the `extends` chain, validates every file (all problems at once, with file, line
 * and column), then hands the chain, root first, to the pure resolver.
 */
import { didYouMean } from '../did-you-mean.js';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { InputError, type InputIssue } from '../errors.js';
import type { ParsedCriteriaFile } from '../criteria/parsed-criteria-file.js';
import { resolveCriteriaChain } from '../criteria/resolve.js';
import type { Place, ResolvedCriteriaSet } from '../types.js';
import { isInside } from './contained.js';
import { parsedFromCache } from './criteria-cache.js';
import { criteriaFileSchema } from './criteria-schema.js';
import { readRegularFile, sha256Hex, UnreadableFile, withoutByteOrderMark } from './read-file.js';
import { parseStructuredText } from './structured-text.js';
import { issuesFromZod } from './zod-issues.js';

/** src/load/../../criteria and dist/load/../../criteria are both the package's criteria/ folder. */
export const SHIPPED_CRITERIA_DIR = fileURLToPath(new URL('../../criteria/', import.meta.url));

export interface LoadedCriteriaSet {
  set: ResolvedCriteriaSet;
  /** every file of the chain, root first */
  files: { path: string; sha256: string }[];
}

export interface CriteriaLoadOptions {
  /** folders besides a criteria file's own (and the shipped sets) that its `extends` may name */
  trustedFolders?: readonly string[];
}

export async function loadCriteriaSet(ref: string, options: CriteriaLoadOptions = {}): Promise<LoadedCriteriaSet> {
  const chain: { parsed: ParsedCriteriaFile; sha256: string }[] = [];
  const issues: InputIssue[] = [];
  const seen = new Map<string, string>();
  let next: Located | undefined = locateRef(ref, undefined);
  let extendsAt: Place | undefined;

  while (next) {
    const { shown, absolute } = next;
    if (seen.has(absolute)) {
      const loop = [...seen.values(), shown].join(' -> ');
      issues.push({ ...(extendsAt ?? { file: shown }), field: 'extends', message: `extends chain has a cycle: ${loop}`, code: 'extends_cycle' });
      break;
    }
    seen.set(absolute, shown);
    const bytes = await readBytes(absolute, shown, extendsAt);
    const sha256 = sha256Hex(bytes);
    const cached = shippedFromCache(absolute, shown, sha256);
    if (cached) {
      chain.unshift({ parsed: cached, sha256 });
      const parent = cached.data.extends;
      if (typeof parent !== 'string') break;
      extendsAt = { file: shown, ...(cached.locate(['extends']) ?? {}) };
      next = locateRef(parent, next);
      if (!next) issues.push(unknownExtends(parent, extendsAt));
      continue;
    }
    const text = withoutByteOrderMark(bytes.toString('utf8'));
    const source = parseStructuredText(text, shown);
    const checked = criteriaFileSchema.safeParse(source.value);
    // A file with schema problems is still followed up its chain, so that one run reports all.
    let parent: unknown;
    if (checked.success) {
      chain.unshift({ parsed: { file: shown, data: checked.data, locate: source.locate }, sha256 });
      parent = checked.data.extends;
    } else {
      issues.push(...issuesFromZod(checked.error, source).map(formerFieldHint));
      parent = (source.value as { extends?: unknown } | null)?.extends;
    }
    if (typeof parent !== 'string') break;
    extendsAt = { file: shown, ...(source.locate(['extends']) ?? {}) };
    const from: Located = next;
    next = locateRef(parent, from);
    if (next && !isShipped(next) && ![path.dirname(from.absolute), ...(options.trustedFolders ?? [])].some((folder) => isInside(next!.absolute, folder))) {
      // a criteria file cannot pull in files from elsewhere on the machine
      issues.push({
        ...extendsAt,
        field: 'extends',
        message: `the criteria file ${next.shown} lies outside the folder of ${from.shown}; extends may name a shipped set or a file in that folder (--trust-folder <folder> allows another)`,
        expected: 'a shipped set id or a path inside the extending file\'s folder',
        found: JSON.stringify(parent),
        code: 'outside_folder',
      });
      break;
    }
    if (!next) issues.push(unknownExtends(parent, extendsAt));
  }
  if (issues.length > 0) throw new InputError(issues);

  const set = resolveCriteriaChain(chain.map((c) => c.parsed));
  return { set, files: chain.map((c) => ({ path: c.parsed.file, sha256: c.sha256 })) };
}

/** A file written for the older format names `confidence`: say what took its place. */
function formerFieldHint(issue: InputIssue): InputIssue {
  if (issue.code !== 'unknown_field' || !/(^|\.)confidence$/.test(issue.field)) return issue;
  return {
    ...issue,
    message: "unknown field 'confidence': it was replaced by `evidence`",
    expected: 'evidence: a list of entries with levels, class (published | secondary | conflicting | memory | programme-set), cites and note; see DEVELOPERS.md',
  };
}

function unknownExtends(parent: string, extendsAt: Place): InputIssue {
  return {
    ...extendsAt,
    field: 'extends',
    message: `no criteria file or shipped set '${parent}'`,
    expected: `a path relative to this file, or one of ${shippedIds().join(', ')}${didYouMean(parent, allShippedIds())}`,
    found: JSON.stringify(parent),
    code: 'unknown_extends',
  };
}

/**
 * dist/criteria-cache/ beside the compiled loader (see criteria-cache.ts); from the sources
 * (tests) there is none, and every file is parsed.
 */
const CRITERIA_CACHE_DIR = fileURLToPath(new URL('../criteria-cache/', import.meta.url));

/** A shipped criteria file's cached parsed form, when one was built from these bytes. */
function shippedFromCache(absolute: string, shown: string, sha256: string): ParsedCriteriaFile | null {
  if (path.dirname(absolute) !== path.resolve(SHIPPED_CRITERIA_DIR)) return null;
  const name = path.basename(absolute).replace(/\.ya?ml$/i, '.json');
  let entry: unknown;
  try {
    entry = JSON.parse(readFileSync(path.join(CRITERIA_CACHE_DIR, name), 'utf8'));
  } catch {
    return null;
  }
  return parsedFromCache(entry, shown, sha256);
}

interface Located {
  /** as shown in messages and in the results' inputs */
  shown: string;
  absolute: string;
}

/**
 * A ref with a slash or a .yaml/.yml/.json ending is a path (relative to the extending file,
 * or to the working directory for the first); a bare name is the id of a shipped set.
 */
function locateRef(ref: string, from: Located | undefined): Located | undefined {
  const looksLikePath = /[\\/]/.test(ref) || /\.(ya?ml|json)$/i.test(ref);
  if (!looksLikePath) {
    // set ids are matched without regard to case: MIL-F-8785C names the shipped mil-f-8785c
    const id = allShippedIds().find((k) => k.toLowerCase() === ref.toLowerCase()) ?? ref;
    const shipped = path.join(SHIPPED_CRITERIA_DIR, `${id}.yaml`);
    if (existsSync(shipped)) return { shown: shownPath(shipped), absolute: shipped };
    if (from) return undefined;
  }
  if (!from) return { shown: ref, absolute: path.resolve(ref) };
  return { shown: path.join(path.dirname(from.shown), ref), absolute: path.resolve(path.dirname(from.absolute), ref) };
}

function isShipped(located: Located): boolean {
  return isInside(located.absolute, SHIPPED_CRITERIA_DIR);
}

/** A shipped file is shown relative to the working directory when it lies below it. */
function shownPath(absolute: string): string {
  const relative = path.relative(process.cwd(), absolute);
  return relative !== '' && !relative.startsWith('..') && !path.isAbsolute(relative) ? relative : absolute;
}

/** Every criteria file in the shipped folder, templates included. */
function allShippedIds(): string[] {
  try {
    return readdirSync(SHIPPED_CRITERIA_DIR)
      .filter((f) => f.endsWith('.yaml'))
      .map((f) => f.slice(0, -'.yaml'.length))
      .sort();
  } catch {
    return [];
  }
}

/** A shipped file named `*-template` is an example for a programme to copy, not a set to check against. */
const isTemplate = (id: string) => id.endsWith('-template');

/** The shipped sets, templates left out (they are named apart, see `shippedListText`). */
export function shippedIds(): string[] {
  return allShippedIds().filter((id) => !isTemplate(id));
}

/** `mil-f-8785c, civil-dynamic-stability; template to copy: criteria/programme-template.yaml` */
export function shippedListText(): string {
  const templates = allShippedIds().filter(isTemplate);
  return `${shippedIds().join(', ')}${templates.length > 0 ? `; template to copy: ${templates.map((t) => `criteria/${t}.yaml`).join(', ')}` : ''}`;
}

async function readBytes(absolute: string, shown: string, referencedAt: Place | undefined): Promise<Buffer> {
  try {
    return await readRegularFile(absolute);
  } catch (err) {
    if (!(err instanceof UnreadableFile)) throw err;
    const reason = err.reason === 'file not found' ? 'no such file' : `the file ${err.reason}`;
    const bare = !/[\\/]/.test(shown) && !/\.(ya?ml|json)$/i.test(shown);
    const shipped = referencedAt === undefined ? `${bare ? didYouMean(shown, allShippedIds()) : ''} (shipped sets: ${shippedListText()})` : '';
    throw new InputError([
      { ...(referencedAt ?? { file: shown }), field: referencedAt ? 'extends' : '', message: `${reason}: ${shown}${shipped}`, code: 'unreadable' },
    ]);
  }
}
