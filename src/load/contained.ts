/**
 * Whether a file lies inside a folder, by real path (links followed, `..` resolved): the test
 * that keeps a model's condition table and a criteria file's `extends` inside their own folder
 * (or a folder the command line trusts).
 */
import { realpathSync } from 'node:fs';
import { basename, dirname, isAbsolute, join, relative, sep } from 'node:path';

/** Whether `path` lies, by real path, inside `folder` (itself by real path). */
export function isInside(path: string, folder: string): boolean {
  const rel = relative(realOrSelf(folder), realOrSelf(path));
  return rel !== '' && rel !== '..' && !rel.startsWith(`..${sep}`) && !isAbsolute(rel);
}

/** The real path of an existing file or folder; of a missing one, its folder's real path and its name. */
export function realOrSelf(path: string): string {
  try {
    return realpathSync(path);
  } catch {
    try {
      return join(realpathSync(dirname(path)), basename(path));
    } catch {
      return path;
    }
  }
}
