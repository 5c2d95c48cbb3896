/**
 * The path a file really is at, links followed and `..` resolved: of an existing file its real
 * path, of a missing one its folder's real path and its name. Used to compare inputs and
 * outputs and to keep referenced files inside a folder.
 */
import { realpathSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';

export function realPath(path: string): string {
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
