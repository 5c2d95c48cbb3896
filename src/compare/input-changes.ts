/**
 * Which input files changed between two runs. Files are matched by role and base name, not by
 * full path, so that a baseline made in another checkout or on a CI runner still matches; the
 * sha256 of the content decides whether a matched file changed. An unmatched file whose
 * content equals an unmatched baseline file of the same role counts as renamed.
 */
import type { InputFile } from '../types.js';

/** 'renamed': a new base name with the content of a file the baseline had under another name */
export type InputStatus = 'same' | 'changed' | 'renamed' | 'added' | 'removed';

export interface InputChange {
  role: InputFile['role'];
  /** base name of the file (the matching key with the role) */
  name: string;
  /** base name in the baseline, when the file was renamed */
  baselineName?: string;
  status: InputStatus;
  /** sha256 in the baseline run, null when the file is new */
  baselineSha256: string | null;
  /** sha256 in the current run, null when the file is gone */
  currentSha256: string | null;
}

export interface InputsComparison {
  /** true when any model file changed, appeared or disappeared */
  modelChanged: boolean;
  /** true when any criteria file changed, appeared or disappeared */
  criteriaChanged: boolean;
  /** model, criteria and table files, in the order of the current run then the removed ones */
  files: InputChange[];
}

/** Roles that describe what was checked; the baseline file itself is not an input to compare. */
const comparedRoles: ReadonlySet<InputFile['role']> = new Set(['model', 'criteria', 'table']);

export function compareInputs(current: InputFile[], baseline: InputFile[]): InputsComparison {
  const keyOf = (f: InputFile) => `${f.role}\u0000${baseName(f.path)}`;
  const before = new Map<string, InputFile>();
  for (const f of baseline) if (comparedRoles.has(f.role)) before.set(keyOf(f), f);

  const files: InputChange[] = [];
  const seen = new Set<string>();
  for (const f of current) {
    if (!comparedRoles.has(f.role)) continue;
    const key = keyOf(f);
    if (seen.has(key)) continue;
    seen.add(key);
    const old = before.get(key);
    files.push({
      role: f.role,
      name: baseName(f.path),
      status: old === undefined ? 'added' : old.sha256 === f.sha256 ? 'same' : 'changed',
      baselineSha256: old?.sha256 ?? null,
      currentSha256: f.sha256,
    });
  }
  for (const [key, f] of before) {
    if (seen.has(key)) continue;
    // Same role and same content under another name: a rename, not a change of what was checked.
    const twin = files.find((c) => c.status === 'added' && c.role === f.role && c.currentSha256 === f.sha256);
    if (twin) {
      twin.status = 'renamed';
      twin.baselineName = baseName(f.path);
      twin.baselineSha256 = f.sha256;
      continue;
    }
    files.push({ role: f.role, name: baseName(f.path), status: 'removed', baselineSha256: f.sha256, currentSha256: null });
  }

  const changedFor = (role: InputFile['role']) => files.some((f) => f.role === role && f.status !== 'same' && f.status !== 'renamed');
  return { modelChanged: changedFor('model') || changedFor('table'), criteriaChanged: changedFor('criteria'), files };
}

/** Base name for both separators: a baseline may come from a Windows machine. */
export function baseName(path: string): string {
  const parts = path.split(/[\\/]/);
  return parts[parts.length - 1] ?? path;
}
