/**
 * ReportView -> one self-contained HTML file. Everything is escaped by handlebars ({{ }});
 * only SVG we generated ({{{svg}}}), Markdown rendered with raw HTML off and our own stylesheet
 * enter unescaped. The page loads nothing: a Content-Security-Policy forbids every fetch.
 */
import Handlebars from 'handlebars';
import { InternalError } from '../errors.js';
import { renderMarkdown } from './markdown.js';
import type { ReportView } from './report-view.js';
import { readTemplateFiles, type TemplateFiles } from './template-files.js';

type Render = (view: ReportView) => string;

export function createHtmlRenderer(files: TemplateFiles): Render {
  const hb = Handlebars.create();
  for (const [name, source] of Object.entries(files.partials)) hb.registerPartial(name, source);
  if (/<\/style/i.test(files.css)) throw new InternalError('report.css must not contain "</style"');
  const css = new hb.SafeString(files.css);
  hb.registerHelper('styles', () => css);
  hb.registerHelper('markdown', (source: unknown) => new hb.SafeString(renderMarkdown(typeof source === 'string' ? source : '')));
  const template = hb.compile<ReportView>(files.report, { strict: true, preventIndent: true });
  return (view) => template(view);
}

let cached: Render | undefined;

export function renderHtml(view: ReportView): string {
  cached ??= createHtmlRenderer(readTemplateFiles());
  return cached(view);
}
