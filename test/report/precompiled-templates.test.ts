/**
 * The review document's templates compiled at build time (precompiled-templates.ts): the
 * compiled build renders exactly what compiling the templates at run time renders, and a
 * template changed after the build is compiled afresh, not replaced by the stale form.
 * The compiled form exists only in dist/ (npm run build), so these run the compiled modules.
 */
import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { templatesDigest } from '../../src/report/precompiled-templates.js';
import { readTemplateFiles } from '../../src/report/template-files.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));

function inDist(body: string): string {
  const script = `
    const dist = (f) => ${JSON.stringify(join(ROOT, 'dist'))} + '/' + f;
    const { runCheck } = await import(dist('check.js'));
    const { buildReportView } = await import(dist('report/view-model.js'));
    const { createHtmlRenderer } = await import(dist('report/html.js'));
    const { readTemplateFiles } = await import(dist('report/template-files.js'));
    const viewOf = async (model) => {
      const o = await runCheck({ model, criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-12-02T00:00:00.000Z' });
      return buildReportView(o.results, o.sets, { reportId: 'MG-TEST', detail: 'all' });
    };
    ${body}`;
  return execFileSync(process.execPath, ['--input-type=module', '-e', script], { cwd: ROOT, encoding: 'utf8' });
}

describe('compiled templates', () => {
  it('render the sample and the envelope sweep exactly as templates compiled at run time do', () => {
    const out = inDist(`
      const files = readTemplateFiles();
      const lines = [];
      for (const model of ['samples/ketra-kt4.yaml', 'samples/ketra-kt4-envelope.yaml']) {
        const view = await viewOf(model);
        const built = createHtmlRenderer(files, true)(view);
        const compiledHere = createHtmlRenderer(files, false)(view);
        lines.push(model + ' ' + (built === compiledHere) + ' ' + built.length);
      }
      process.stdout.write(lines.join('\\n'));`);
    const lines = out.split('\n');
    expect(lines).toHaveLength(2);
    for (const line of lines) expect(line).toMatch(/ true \d{5,}$/);
  });

  it('are not used for a template changed after the build', () => {
    const out = inDist(`
      const files = readTemplateFiles();
      const changed = { ...files, partials: { ...files.partials, cautions: files.partials.cautions + '<!-- changed after the build -->' } };
      let refused = 'used';
      try { createHtmlRenderer(changed, true); } catch (err) { refused = err.message; }
      const html = createHtmlRenderer(changed)(await viewOf('samples/ketra-kt4.yaml'));
      process.stdout.write(JSON.stringify({ refused, changedShown: html.includes('<!-- changed after the build -->') }));`);
    expect(JSON.parse(out)).toEqual({ refused: expect.stringMatching(/no compiled templates/), changedShown: true });
  });

  it('are told apart by a digest of every compiled template', () => {
    const files = readTemplateFiles();
    const digest = templatesDigest(files);
    expect(templatesDigest({ ...files, css: `${files.css}\n` })).toBe(digest); // the stylesheet is inserted as it is
    expect(templatesDigest({ ...files, report: `${files.report} ` })).not.toBe(digest);
    const [name, source] = Object.entries(files.partials)[0]!;
    expect(templatesDigest({ ...files, partials: { ...files.partials, [name]: `${source} ` } })).not.toBe(digest);
    expect(templatesDigest({ ...files, partials: { ...files.partials, extra: '' } })).not.toBe(digest);
  });
});
