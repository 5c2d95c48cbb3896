/** How evidence classes read in the terminal, the report and `criteria show`. */
import type { Citation, Evidence, EvidenceClass, ResolvedCriterion, SourceEntry } from '../types.js';

/** What a class means for the review, in one sentence. */
export const EVIDENCE_MEANING: Record<EvidenceClass, string> = {
  published: 'read in the primary document, at the page or paragraph cited',
  secondary: 'read in a named reproduction of the document (report, textbook reprint, notes quoting it), not in the document itself',
  conflicting: 'the sources disagree: each is listed with its value, and the evidence note says which value is kept',
  memory: 'recalled or inferred, not read in any retrievable text: verify it before the review relies on it',
  'programme-set': 'chosen by the programme, which states no document for it',
};

/** One group of levels (or parameters) of a criterion that share one evidence entry. */
export interface EvidenceGroup {
  /** "Level 1", "Levels 1, 2", "params phiBetaK1, phiBetaK2" */
  covers: string;
  /** the levels it covers (none for a group of parameters) */
  levels: ('1' | '2' | '3')[];
  evidence: Evidence;
}

/**
 * A criterion's evidence grouped the way it was written: levels with the same evidence are
 * shown once (a level left out of `levels` takes the evidence of the level whose bounds it
 * holds).
 */
export function evidenceGroups(c: ResolvedCriterion): EvidenceGroup[] {
  // Compared by content, not identity: a copy of the set (e.g. made visible for a terminal)
  // no longer shares the entry objects.
  const groups: { levels: ('1' | '2' | '3')[]; evidence: Evidence; key: string }[] = [];
  for (const level of ['1', '2', '3'] as const) {
    const e = c.evidence[level];
    const key = JSON.stringify(e);
    const group = groups.find((g) => g.key === key);
    if (group) group.levels.push(level);
    else groups.push({ levels: [level], evidence: e, key });
  }
  return [
    ...groups.map((g) => ({ covers: `${g.levels.length > 1 ? 'Levels' : 'Level'} ${g.levels.join(', ')}`, levels: g.levels, evidence: g.evidence })),
    ...c.paramEvidence.map((p) => ({ covers: `params ${p.params.join(', ')}`, levels: [], evidence: p })),
  ];
}

/** The classes of Levels 1 / 2 / 3, or the one class when they agree. */
export function levelClassesText(c: ResolvedCriterion): string {
  const classes = (['1', '2', '3'] as const).map((k) => c.evidence[k].class);
  return classes.every((x) => x === classes[0]) ? classes[0]! : classes.join(' / ');
}

/** A citation in one line: source id, where, value, quote. */
export function citationText(cite: Citation): string {
  const parts = [cite.source];
  if (cite.at !== undefined) parts.push(cite.at);
  if (cite.value !== undefined) parts.push(`gives ${cite.value}`);
  if (cite.quote !== undefined) parts.push(`"${cite.quote}"`);
  return parts.join(', ');
}

/** A source entry in one line. */
export function sourceEntryText(s: SourceEntry): string {
  const parts = [s.title];
  if (s.reproduces !== undefined) parts.push(`quotes ${s.reproduces}`);
  if (s.where !== undefined) parts.push(s.where);
  return parts.join('; ');
}
