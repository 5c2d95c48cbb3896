/**
 * The review document's templates compiled at build time: `npm run build` writes
 * dist/report/templates-compiled.cjs (scripts/build.mjs) with each template's compiled form and
 * a digest of the sources it was made from. A run that renders the document then needs only
 * the handlebars runtime, not its parser and compiler, and compiles nothing; templates changed
 * after the build do not match the digest and are compiled as before (html.ts). The output is
 * the same either way (test/report/precompiled-templates.test.ts).
 */
import { createHash } from 'node:crypto';
import type { TemplateFiles } from './template-files.js';

/** The compile options of every template of the document. */
export const COMPILE_OPTIONS = { strict: true, preventIndent: true } as const;

/** SHA-256 (hex) over the templates that are compiled (the stylesheet is inserted as it is). */
export function templatesDigest(files: TemplateFiles): string {
  const hash = createHash('sha256');
  hash.update(`report\n${files.report.length}\n${files.report}`);
  for (const name of Object.keys(files.partials).sort()) {
    const source = files.partials[name]!;
    hash.update(`\npartial ${name}\n${source.length}\n${source}`);
  }
  return hash.digest('hex');
}

/** What the compiled module holds (each spec is handlebars' precompiled template object). */
export interface PrecompiledTemplates {
  sha256: string;
  report: object;
  partials: Record<string, object>;
}

/**
 * The text of the CommonJS module holding the compiled templates. `precompile` is handlebars'
 * (it returns JavaScript source for each template).
 */
export function precompiledModuleText(files: TemplateFiles, precompile: (source: string, options: object) => string): string {
  const partials = Object.keys(files.partials)
    .sort()
    .map((name) => `    ${JSON.stringify(name)}: ${precompile(files.partials[name]!, COMPILE_OPTIONS)}`);
  return [
    '// Written by scripts/build.mjs from templates/ (src/report/precompiled-templates.ts): do not edit.',
    'module.exports = {',
    `  sha256: ${JSON.stringify(templatesDigest(files))},`,
    `  report: ${precompile(files.report, COMPILE_OPTIONS)},`,
    '  partials: {',
    partials.join(',\n'),
    '  },',
    '};',
    '',
  ].join('\n');
}
