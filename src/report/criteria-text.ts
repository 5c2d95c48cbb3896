/** `modalgate criteria show`: a resolved criteria set as terminal tables. */
import { EVIDENCE_ORDER } from '../criteria/evidence.js';
import { expandRegions } from '../criteria/level-regions.js';
import type { Bound, EvidenceClass, ResolvedCriteriaSet, ResolvedCriterion } from '../types.js';
import { citationText, EVIDENCE_MEANING, evidenceGroups, levelClassesText, sourceEntryText } from './evidence-text.js';
import { formatSig } from './format-number.js';
import { textTable } from './text-table.js';
import { visibleData } from '../visible-text.js';

/** Strings from the criteria files are made visible first (visible-text.ts). */
export function formatCriteriaSetText(written: ResolvedCriteriaSet): string {
  const set = visibleData(written);
  const out: string[] = [];
  out.push(`${set.id}: ${set.title}`);
  out.push(`chain: ${set.chain.join(' > ')}`);
  out.push(`files: ${set.files.join(', ')}`);
  out.push(`default required level: Level ${set.defaultRequiredLevel}`);
  const abs = Object.entries(set.marginalBand.absolute)
    .map(([q, v]) => `${q} ${formatSig(v)}`)
    .join(', ');
  out.push(`marginal band: ${formatSig(set.marginalBand.relative * 100)} % of the boundary${abs ? `; absolute where the boundary is 0: ${abs}` : ''}`);
  const byCategory = new Map<string, string[]>();
  for (const [phase, cat] of Object.entries(set.phaseCategories)) byCategory.set(cat, [...(byCategory.get(cat) ?? []), phase]);
  out.push(`phases: ${[...byCategory.entries()].map(([c, p]) => `Category ${c}: ${p.join(' ')}`).join('; ')}`);
  out.push('');
  out.push(
    textTable(
      [
        { header: 'criterion' },
        { header: 'mode' },
        { header: 'quantity' },
        { header: 'applies to' },
        { header: 'Level 1' },
        { header: 'Level 2' },
        { header: 'Level 3' },
        { header: 'source' },
        { header: 'evidence (L1 / L2 / L3)' },
      ],
      set.criteria.map((c) => [
        c.id,
        c.mode,
        c.quantity,
        [
          c.applies.classes ? `Class ${c.applies.classes.join(',')}` : 'all classes',
          c.applies.categories ? `Cat ${c.applies.categories.join(',')}` : '',
          c.applies.phases ? `phases ${c.applies.phases.join(',')}` : '',
        ]
          .filter(Boolean)
          .join('; '),
        ...levelTexts(c),
        c.source,
        levelClassesText(c),
      ]),
    ),
  );
  const regions = set.criteria.filter((c) => c.region);
  if (regions.length > 0) {
    out.push('');
    out.push('regions ([x, y] vertices, SI units):');
    for (const c of regions) {
      const r = expandRegions(c.region!);
      out.push(`  ${c.id}: x ${c.quantity}, y ${c.region!.against}${c.region!.figure ? ` (${c.region!.figure})` : ''}`);
      for (const key of ['1', '2', '3'] as const) {
        const p = r[key];
        out.push(`    Level ${key}: ${p === 'any' ? 'any point' : p.map(([x, y]) => `[${formatSig(x)}, ${formatSig(y)}]`).join(' ')}`);
      }
    }
  }
  out.push('');
  out.push(`evidence of the ${set.criteria.length * 3} level boundaries: ${evidenceCounts(set)}`);
  for (const cls of EVIDENCE_ORDER) out.push(`  ${cls}: ${EVIDENCE_MEANING[cls]}`);
  out.push('');
  out.push('evidence by criterion:');
  for (const c of set.criteria) {
    out.push(`  ${c.id}`);
    for (const g of evidenceGroups(c)) {
      const by = g.evidence.by !== c.set ? ` (stated by ${g.evidence.by})` : '';
      out.push(`    ${g.covers}: ${g.evidence.class}${by}`);
      for (const cite of g.evidence.cites) out.push(`      - ${citationText(cite)}`);
      if (g.evidence.note !== '') out.push(...wrapped(g.evidence.note, '      '));
    }
  }
  out.push('');
  out.push('sources:');
  if (set.sources.length === 0) out.push('  (none listed)');
  for (const s of set.sources) {
    out.push(`  ${s.id} (${s.kind}, listed by ${s.set}): ${sourceEntryText(s)}`);
    if (s.note !== undefined) out.push(...wrapped(s.note, '      '));
  }
  if (set.dropped.length > 0) {
    out.push('');
    out.push('dropped:');
    for (const d of set.dropped) out.push(`  ${d.id} (by ${d.by}): ${d.reason}`);
  }
  return out.join('\n');
}

function levelTexts(c: ResolvedCriterion): string[] {
  if (!c.region) return [boundText(c.levels['1']), boundText(c.levels['2']), boundText(c.levels['3'])];
  const r = expandRegions(c.region);
  return (['1', '2', '3'] as const).map((k) => {
    const p = r[k];
    return p === 'any' ? 'any' : `region (${p.length} pts)`;
  });
}

function boundText(b: Bound | undefined): string {
  if (!b || (b.min === undefined && b.max === undefined)) return '-';
  if (b.min !== undefined && b.max !== undefined) return `${formatSig(b.min)}..${formatSig(b.max)}`;
  return b.min !== undefined ? `>= ${formatSig(b.min)}` : `<= ${formatSig(b.max)}`;
}

/** How many level boundaries of the set have each class ("12 secondary, 3 memory"). */
function evidenceCounts(set: ResolvedCriteriaSet): string {
  const counts = new Map<EvidenceClass, number>();
  for (const c of set.criteria) for (const k of ['1', '2', '3'] as const) counts.set(c.evidence[k].class, (counts.get(c.evidence[k].class) ?? 0) + 1);
  return EVIDENCE_ORDER.map((cls) => `${counts.get(cls) ?? 0} ${cls}`).join(', ');
}

/** A note on lines of its own, each under the indent. */
function wrapped(text: string, indent: string): string[] {
  return text.split('\n').map((l) => `${indent}${l}`.trimEnd()).filter((l) => l.trim() !== '');
}
