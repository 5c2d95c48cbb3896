/**
 * Control derivatives are written as the force or moment letter followed by the input name,
 * which starts with `d` (delta), e.g. Xde, Mde, Lda, Ndr (common practice). Any other field in
 * a derivatives mapping is unknown, so that a misspelt stability derivative is an error and
 * not a new input.
 */
import type { ModelProblem } from './problem.js';

/** input name -> letter (X, Z, M or Y, L, N) -> value, in the order the inputs first appear */
export type ControlDerivatives = Map<string, Record<string, number>>;

export function splitControlDerivatives(
  derivatives: Record<string, number | undefined>,
  known: readonly string[],
  letters: readonly string[],
  path: (string | number)[],
): { controls: ControlDerivatives; problems: ModelProblem[] } {
  const controls: ControlDerivatives = new Map();
  const problems: ModelProblem[] = [];
  const pattern = new RegExp(`^([${letters.join('')}])(d[A-Za-z0-9_]*)$`);
  for (const [key, value] of Object.entries(derivatives)) {
    if (known.includes(key) || value === undefined) continue;
    const match = pattern.exec(key);
    if (!match) {
      problems.push({
        path: [...path, key],
        message: `unknown field '${key}'`,
        expected: `one of ${known.join(', ')}, or a control derivative ${letters.join('/')}<input> with the input name starting with d`,
        code: 'unknown_field',
      });
      continue;
    }
    const [, letter, input] = match as unknown as [string, string, string];
    const entry = controls.get(input) ?? {};
    entry[letter] = value;
    controls.set(input, entry);
  }
  return { controls, problems };
}

/** Problems for required derivatives that are absent. */
export function missingDerivatives(
  derivatives: Record<string, number | undefined>,
  required: readonly (string | readonly string[])[],
  form: string,
  path: (string | number)[],
): ModelProblem[] {
  const missing = required.filter((r) => (typeof r === 'string' ? [r] : r).every((k) => derivatives[k] === undefined));
  if (missing.length === 0) return [];
  const words = missing.map((r) => (typeof r === 'string' ? r : r.join(' or ')));
  return [{
    path,
    message: `missing ${missing.length === 1 ? 'derivative' : 'derivatives'} ${words.join(', ')} (needed for the ${form})`,
    expected: required.map((r) => (typeof r === 'string' ? r : r.join('|'))).join(', '),
    code: 'missing_derivative',
  }];
}
