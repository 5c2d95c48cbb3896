/**
 * Whether a file lies inside a folder, by real path (links followed, `..` resolved): the test
 * that keeps a model's condition table and a criteria file's `extends` inside their own folder
 * (or a folder the command line trusts).
 */
import { isAbsolute, relative, sep } from 'node:path';
import { realPath } from '../real-path.js';

export { realPath as realOrSelf };

/** Whether `path` lies, by real path, inside `folder` (itself by real path). */
export function isInside(path: string, folder: string): boolean {
  const rel = relative(realPath(folder), realPath(path));
  return rel !== '' && rel !== '..' && !rel.startsWith(`..${sep}`) && !isAbsolute(rel);
}
