/** `modalgate criteria show`: a resolved criteria set as terminal tables. */
import type { Bound, ResolvedCriteriaSet } from '../types.js';
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
        { header: 'values' },
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
        boundText(c.levels['1']),
        boundText(c.levels['2']),
        boundText(c.levels['3']),
        c.source,
        c.confidence === 'memory' ? 'from memory: verify' : 'published',
      ]),
    ),
  );
  if (set.dropped.length > 0) {
    out.push('');
    out.push('dropped:');
    for (const d of set.dropped) out.push(`  ${d.id} (by ${d.by}): ${d.reason}`);
  }
  return out.join('\n');
}

function boundText(b: Bound | undefined): string {
  if (!b || (b.min === undefined && b.max === undefined)) return '-';
  if (b.min !== undefined && b.max !== undefined) return `${formatSig(b.min)}..${formatSig(b.max)}`;
  return b.min !== undefined ? `>= ${formatSig(b.min)}` : `<= ${formatSig(b.max)}`;
}
