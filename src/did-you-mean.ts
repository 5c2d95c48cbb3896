/**
 * "Did you mean": the closest of a few known names to a mistyped one, by edit distance
 * (Levenshtein, case ignored), when it is close enough to be a slip rather than another name.
 */

function distance(a: string, b: string): number {
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let diagonal = row[0]!;
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const above = row[j]!;
      row[j] = Math.min(row[j]! + 1, row[j - 1]! + 1, diagonal + (a[i - 1] === b[j - 1] ? 0 : 1));
      diagonal = above;
    }
  }
  return row[b.length]!;
}

/** The known name nearest to `name`, if within a third of its length (at least 2 edits); else null. */
export function closestName(name: string, known: readonly string[]): string | null {
  const lower = name.toLowerCase();
  let best: { name: string; d: number } | null = null;
  for (const k of known) {
    const d = distance(lower, k.toLowerCase());
    if (best === null || d < best.d) best = { name: k, d };
  }
  if (best === null) return null;
  return best.d <= Math.max(2, Math.floor(name.length / 3)) ? best.name : null;
}

/** ` (did you mean 'x'?)`, or '' when nothing is close. */
export function didYouMean(name: string, known: readonly string[]): string {
  const near = closestName(name, known);
  return near === null || near === name ? '' : ` (did you mean '${near}'?)`;
}
