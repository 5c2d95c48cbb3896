/**
 * ReportView -> one self-contained HTML file. Everything is escaped by handlebars ({{ }});
 * only SVG we generated ({{{svg}}}), Markdown rendered with raw HTML off and our own stylesheet
 * enter unescaped. The page loads nothing: a Content-Security-Policy forbids every fetch.
 *
 * The templates come compiled from the build when they are the ones it compiled
 * (precompiled-templates.ts): then only the handlebars runtime is loaded. Otherwise (templates
 * changed since, or run from the sources) they are compiled here.
 */
import { createRequire } from 'node:module';
import type HandlebarsNamespace from 'handlebars';
import { InternalError } from '../errors.js';
import { renderMarkdown } from './markdown.js';
import { COMPILE_OPTIONS, templatesDigest, type PrecompiledTemplates } from './precompiled-templates.js';
import type { ReportView } from './report-view.js';
import { readTemplateFiles, type TemplateFiles } from './template-files.js';

type Render = (view: ReportView) => string;
type Handlebars = typeof HandlebarsNamespace;

const require = createRequire(import.meta.url);

/** The build's compiled templates beside this module, or null (none, or not of these files). */
function precompiledFor(files: TemplateFiles): PrecompiledTemplates | null {
  let compiled: PrecompiledTemplates;
  try {
    compiled = require('./templates-compiled.cjs') as PrecompiledTemplates;
  } catch {
    return null;
  }
  return compiled.sha256 === templatesDigest(files) ? compiled : null;
}

/**
 * `precompiled` (tests) chooses the route: true = the build's compiled templates (an error if
 * they are missing or out of date), false = compile here; absent = compiled ones when current.
 */
export function createHtmlRenderer(files: TemplateFiles, precompiled?: boolean): Render {
  if (/<\/style/i.test(files.css)) throw new InternalError('report.css must not contain "</style"');
  const compiled = precompiled === false ? null : precompiledFor(files);
  if (precompiled === true && compiled === null) throw new InternalError('no compiled templates of these files (npm run build)');
  const hb: Handlebars = compiled
    ? (require('handlebars/runtime') as Handlebars).create()
    : (require('handlebars') as Handlebars).create();
  const css = new hb.SafeString(files.css);
  hb.registerHelper('styles', () => css);
  hb.registerHelper('markdown', (source: unknown) => new hb.SafeString(renderMarkdown(typeof source === 'string' ? source : '')));
  if (compiled) {
    const template = (spec: object) => hb.template(spec as unknown as Parameters<Handlebars['template']>[0]);
    for (const [name, spec] of Object.entries(compiled.partials)) hb.registerPartial(name, template(spec));
    const render = template(compiled.report) as unknown as (view: ReportView) => string;
    return (view) => render(view);
  }
  for (const [name, source] of Object.entries(files.partials)) hb.registerPartial(name, source);
  const template = hb.compile<ReportView>(files.report, COMPILE_OPTIONS);
  return (view) => template(view);
}

let cached: Render | undefined;

export function renderHtml(view: ReportView): string {
  cached ??= createHtmlRenderer(readTemplateFiles());
  return cached(view);
}
