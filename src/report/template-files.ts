/**
 * Where the handlebars templates and the stylesheet live: `templates/` at the package root,
 * two folders above this module both in `src/report/` (tests) and in `dist/report/` (installed).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { InternalError } from '../errors.js';

export const TEMPLATE_DIR = fileURLToPath(new URL('../../templates/', import.meta.url));

export interface TemplateFiles {
  report: string;
  css: string;
  /** partial name (file name without .hbs) -> source */
  partials: Record<string, string>;
}

export function readTemplateFiles(dir: string = TEMPLATE_DIR): TemplateFiles {
  try {
    const partialDir = `${dir}/partials`;
    const partials: Record<string, string> = {};
    for (const name of readdirSync(partialDir)) {
      if (name.endsWith('.hbs')) partials[name.slice(0, -4)] = readFileSync(`${partialDir}/${name}`, 'utf8');
    }
    return {
      report: readFileSync(`${dir}/report.hbs`, 'utf8'),
      css: readFileSync(`${dir}/report.css`, 'utf8'),
      partials,
    };
  } catch (err) {
    // The templates ship with the package: a missing one is a broken install, not bad input.
    throw new InternalError(`report templates not readable in ${dir}: ${(err as Error).message}`);
  }
}
