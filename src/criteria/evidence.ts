/**
 * Evidence of boundaries: what each class asks of its citations, how a finding's evidence is
 * taken from its criterion, and how classes rank when two boundaries combine. Pure.
 */
import { InputError, type InputIssue } from '../errors.js';
import type {
  Citation, Evidence, EvidenceClass, FindingEvidence, Level, ResolvedCriteriaSet, ResolvedCriterion, SourceEntry,
} from '../types.js';
import { levelKey } from './level-bounds.js';

/** From the strongest to the weakest: a combined boundary is as weak as its weakest part. */
export const EVIDENCE_ORDER: readonly EvidenceClass[] = ['published', 'secondary', 'programme-set', 'conflicting', 'memory'];

export function weaker(a: EvidenceClass, b: EvidenceClass): EvidenceClass {
  return EVIDENCE_ORDER.indexOf(a) >= EVIDENCE_ORDER.indexOf(b) ? a : b;
}

/**
 * What a class asks of its citations, as problems found (empty when it holds):
 * published cites the primary document at a page or paragraph; secondary cites at least one
 * text (not a recollection); conflicting lists at least two sources, each with its value.
 * Every cited id must be in the source list.
 */
export function citationProblems(
  evidenceClass: EvidenceClass,
  cites: readonly Citation[],
  sources: ReadonlyMap<string, SourceEntry>,
): { message: string; cite?: number }[] {
  const out: { message: string; cite?: number }[] = [];
  cites.forEach((c, i) => {
    if (!sources.has(c.source)) {
      const known = [...sources.keys()];
      out.push({
        message: `cites source '${c.source}', which no source list of the chain holds (${known.length > 0 ? `known: ${known.join(', ')}` : 'no `sources` given'})`,
        cite: i,
      });
    }
  });
  const kindOf = (c: Citation) => sources.get(c.source)?.kind;
  switch (evidenceClass) {
    case 'published':
      if (!cites.some((c) => kindOf(c) === 'primary' && c.at !== undefined)) {
        out.push({ message: 'a published boundary cites the primary document (a source of kind primary) with the page or paragraph in `at`' });
      }
      break;
    case 'secondary':
      if (!cites.some((c) => kindOf(c) === 'primary' || kindOf(c) === 'reproduction')) {
        out.push({ message: 'a secondary boundary cites the named text it was read in (a source of kind reproduction or primary)' });
      }
      break;
    case 'conflicting':
      if (cites.length < 2) out.push({ message: 'a conflicting boundary lists every source that disagrees (at least two), each with its value' });
      cites.forEach((c, i) => {
        if (c.value === undefined) out.push({ message: `source '${c.source}' of a conflicting boundary gives no \`value\``, cite: i });
      });
      break;
    case 'memory':
    case 'programme-set':
      break;
  }
  return out;
}

/**
 * The evidence of the boundary a finding is judged against: the required level's, weakened
 * by the evidence of the parameters when they moved the bounds (e.g. the |phi/beta| rule).
 * One shared object per criterion, level and case: a sweep makes a finding per criterion and
 * condition, and they all point at these.
 */
const cache = new WeakMap<ResolvedCriterion, Map<string, FindingEvidence>>();

export function findingEvidence(c: ResolvedCriterion, requiredLevel: Level, adjusted: boolean): FindingEvidence {
  let byCase = cache.get(c);
  if (byCase === undefined) {
    byCase = new Map();
    cache.set(c, byCase);
  }
  const key = `${requiredLevel}${adjusted ? '+' : ''}`;
  let out = byCase.get(key);
  if (out === undefined) {
    const parts: Evidence[] = [c.evidence[levelKey(requiredLevel)], ...(adjusted ? c.paramEvidence : [])];
    let evidenceClass = parts[0]!.class;
    for (const p of parts) evidenceClass = weaker(evidenceClass, p.class);
    const sources = [...new Set(parts.flatMap((p) => p.cites.map((x) => x.source)))];
    out = Object.freeze({ class: evidenceClass, sources: Object.freeze(sources) as string[] });
    byCase.set(key, out);
  }
  return out;
}

/**
 * Findings name their sources by id: sets checked together must not give one id to two
 * different sources. (A set reached through two chains lists the same entry twice: that holds.)
 */
export function checkSourceIdsAgree(sets: readonly ResolvedCriteriaSet[]): void {
  const seen = new Map<string, { entry: SourceEntry; set: ResolvedCriteriaSet }>();
  const issues: InputIssue[] = [];
  for (const set of sets) {
    for (const entry of set.sources) {
      const earlier = seen.get(entry.id);
      if (!earlier) seen.set(entry.id, { entry, set });
      else if (JSON.stringify(earlier.entry) !== JSON.stringify(entry)) {
        issues.push({
          file: set.files[set.files.length - 1] ?? set.id,
          field: 'sources',
          message: `source id '${entry.id}' of set '${entry.set}' names another source than in set '${earlier.entry.set}' (criteria ${earlier.set.id}), checked in the same run: give one of them an id of its own`,
          code: 'duplicate_id',
        });
      }
    }
  }
  if (issues.length > 0) throw new InputError(issues);
}
