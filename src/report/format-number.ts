/** Number formatting shared by the terminal table (the HTML report has its own view model). */

/** `digits` significant figures, plain notation for ordinary magnitudes, '-' for null. */
export function formatSig(value: number | null | undefined, digits = 3): string {
  if (value === null || value === undefined) return '-';
  if (!Number.isFinite(value)) return value > 0 ? 'inf' : value < 0 ? '-inf' : 'NaN';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e5 || abs < 1e-3) return value.toExponential(digits - 1);
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
  return value.toFixed(decimals);
}

/** `-2.51 ± 2.59i` for a pair, `-8.43` for a real root. */
export function formatEigenvalues(eigenvalues: { re: number; im: number }[], digits = 4): string {
  const out: string[] = [];
  for (const e of eigenvalues) {
    if (e.im === 0) out.push(formatSig(e.re, digits));
    else if (e.im > 0) out.push(`${formatSig(e.re, digits)} ± ${formatSig(e.im, digits)}i`);
  }
  return out.join(', ');
}
