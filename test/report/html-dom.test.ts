/**
 * The rendered report in a real headless Chromium: DOM structure, escaping of criteria notes
 * and proof that the page fetches nothing. One browser for the whole file.
 */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Browser, Page } from 'puppeteer-core';
import { launchTestBrowser } from './test-browser.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCheck } from '../../src/check.js';
import { renderHtml } from '../../src/report/html.js';
import { buildReportView } from '../../src/report/view-model.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

const work = mkdtempSync(join(tmpdir(), 'mg-dom-test-'));
let browser: Browser;

beforeAll(async () => {
  browser = await launchTestBrowser(work);
});

afterAll(async () => {
  await browser?.close();
  rmSync(work, { recursive: true, force: true });
});

/** Open the HTML from a file with every request other than the document itself counted and aborted. */
async function open(html: string, name: string): Promise<{ page: Page; outside: string[] }> {
  const file = join(work, name);
  writeFileSync(file, html);
  const url = pathToFileURL(file).href;
  const page = await browser.newPage();
  await page.setViewport({ width: 900, height: 1270 });
  const outside: string[] = [];
  await page.setRequestInterception(true);
  page.on('request', (req) => {
    if (req.url() === url) void req.continue();
    else {
      outside.push(req.url());
      void req.abort();
    }
  });
  await page.goto(url, { waitUntil: 'load' });
  return { page, outside };
}

describe('HTML report in Chromium', () => {
  const { results, sets } = larkspurReview();
  const html = renderHtml(buildReportView(results, sets, { reportId: 'MG-DOM0000001' }));
  const findings = results.conditions.flatMap((c) => c.findings);

  it('has one findings row per finding and every verdict word', async () => {
    const { page } = await open(html, 'report.html');
    expect(await page.$$eval('table.findings tbody tr.finding', (rows) => rows.length)).toBe(findings.length);
    for (const [i, c] of results.conditions.entries()) {
      const section = await page.$eval(`section.condition[id^="condition-${i + 1}-"]`, (s) => s.querySelectorAll('tr.finding').length);
      expect(section).toBe(c.findings.length);
    }
    const text = await page.$eval('body', (b) => b.innerText);
    for (const word of ['pass', 'marginal', 'FAIL', 'not evaluated']) expect(text).toContain(word);
    expect(text).toContain('Larkspur LT-6');
    expect(text).toContain('from memory');
    expect(text).toContain('roll-spiral-oscillation');
    await page.close();
  });

  it('draws every pole and every aircraft point', async () => {
    const { page } = await open(html, 'report.html');
    for (const [i, c] of results.conditions.entries()) {
      const sel = `section.condition[id^="condition-${i + 1}-"]`;
      const poles = await page.$eval(sel, (s) => s.querySelectorAll('svg.chart-s-plane g.pole').length);
      expect(poles).toBe(c.modes.flatMap((m) => m.eigenvalues).length);
      const points = await page.$eval(sel, (s) => s.querySelectorAll('svg.chart-short-period .aircraft-point, svg.chart-dutch-roll .aircraft-point').length);
      expect(points).toBe(2);
      // charts are really laid out, not empty boxes
      const width = await page.$eval(`${sel} svg.chart-s-plane`, (s) => s.getBoundingClientRect().width);
      expect(width).toBeGreaterThan(300);
    }
    await page.close();
  });

  it('loads nothing from outside the document', async () => {
    const { page, outside } = await open(html, 'report.html');
    expect(outside).toEqual([]);
    const csp = await page.$eval('meta[http-equiv="Content-Security-Policy"]', (m) => m.getAttribute('content'));
    expect(csp).toContain("default-src 'none'");
    expect(await page.$$eval('script, link, iframe, object, embed, img', (els) => els.length)).toBe(0);
    mkdirSync('test-artifacts', { recursive: true });
    await page.screenshot({ path: 'test-artifacts/report-first-page.png', clip: { x: 0, y: 0, width: 900, height: 1270 } });
    await page.close();
  });

  it('counts an outside request when one is made (the counter itself works)', async () => {
    // Same page without its policy and with one image from outside: the counter must see it.
    const leaky = html
      .replace(/<meta http-equiv="Content-Security-Policy"[^>]*>/, '')
      .replace('</main>', '<img src="http://example.invalid/leak.png" alt=""></main>');
    const { page, outside } = await open(leaky, 'leaky.html');
    expect(outside).toEqual(['http://example.invalid/leak.png']);
    await page.close();
  });

  it('shows in each envelope matrix cell the verdict of the finding, in symbol and letter', async () => {
    const { page } = await open(html, 'report.html');
    const cells = await page.$$eval('table.matrix tbody tr', (rows) =>
      rows.flatMap((r) => [...r.querySelectorAll('td.cell')].map((td) => ({
        condition: r.getAttribute('data-condition'),
        criterion: td.getAttribute('data-criterion'),
        text: (td as HTMLElement).innerText.trim(),
      }))),
    );
    // The key printed under the matrix: check mark P pass, half circle M marginal, cross F fail, circle N not evaluated.
    const expected: Record<string, string> = { pass: '\u2713P', marginal: '\u25d2M', fail: '\u2717F', not_evaluated: '\u25cbN' };
    for (const c of results.conditions) {
      const row = cells.filter((x) => x.condition === c.id);
      for (const f of c.findings) expect(row.find((x) => x.criterion === f.criterion)?.text).toBe(expected[f.verdict]);
      for (const n of c.notApplicable) expect(row.find((x) => x.criterion === n.criterion)?.text).toBe('\u00b7');
      const judged = new Set([...c.findings.map((f) => f.criterion), ...c.notApplicable.map((n) => n.criterion)]);
      for (const x of row) if (!judged.has(x.criterion ?? '')) expect(x.text).toBe('');
    }
    expect(new Set(cells.map((x) => x.condition))).toEqual(new Set(results.conditions.map((c) => c.id)));
    // the matrix is the first section after the title block
    const order = await page.$$eval('main > *', (els) => els.map((e) => e.className));
    expect(order.slice(0, 2)).toEqual(['title-block', 'envelope']);
    await page.close();
  });

  it('lists the not-applicable criteria under the findings table and does not count them', async () => {
    const { page } = await open(html, 'report.html');
    const cruise = await page.$eval('section.condition[id^="condition-1-"]', (s) => ({
      list: [...s.querySelectorAll('ul.not-applicable li')].map((li) => (li as HTMLElement).innerText),
      afterFindings: s.querySelector('table.findings ~ ul.not-applicable') !== null,
      rows: s.querySelectorAll('tr.finding').length,
    }));
    expect(cruise.list[0]).toBe('Not applicable: roll-spiral-coupling-bc (MIL-F-8785C 3.3.1.4): no coupled roll-spiral oscillation (roll and spiral are separate real roots)');
    expect(cruise.afterFindings).toBe(true);
    expect(cruise.rows).toBe(results.conditions[0]!.findings.length);
    const tf = await page.$eval('section.condition[id^="condition-3-"]', (s) => s.querySelectorAll('ul.not-applicable').length);
    expect(tf).toBe(0);
    const outcome = await page.$eval('.outcome', (o) => (o as HTMLElement).innerText);
    expect(outcome).toContain(`findings ${findings.length}`);
    expect(outcome).toMatch(new RegExp(`pass\\s*${findings.filter((f) => f.verdict === 'pass').length}\\b`));
    await page.close();
  });

  it('shows hostile criteria notes as text', async () => {
    const fresh = larkspurReview();
    fresh.sets[0]!.notes.push('Injected <script>alert(1)</script> here.');
    fresh.sets[0]!.criteria[0]!.note = 'Injected <img src=x onerror=alert(1)> here.';
    fresh.results.conditions[0]!.warnings.push('<script>alert(2)</script>');
    const hostile = renderHtml(buildReportView(fresh.results, fresh.sets, { reportId: 'MG-XSS' }));
    const { page, outside } = await open(hostile, 'hostile.html');
    expect(await page.$$eval('script, img', (els) => els.length)).toBe(0);
    const text = await page.$eval('body', (b) => b.innerText);
    expect(text).toContain('<script>alert(1)</script>');
    expect(text).toContain('<img src=x onerror=alert(1)>');
    expect(text).toContain('<script>alert(2)</script>');
    expect(outside).toEqual([]);
    await page.close();
  });

  it('keeps every table of the shipped samples within the page column on screen', async () => {
    // A wide verdict matrix (24 criteria for the Class I sample) once ran past the column.
    for (const sample of ['samples/ketra-kt4.yaml', 'samples/ketra-kt4-envelope.yaml', 'samples/ketra-kt4f.yaml']) {
      const { results: r, sets: s } = await runCheck({ model: sample, criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-12-02T00:00:00Z' });
      const { page } = await open(renderHtml(buildReportView(r, s, { reportId: 'MG-WIDTH', detail: 'all' })), 'width.html');
      await page.setViewport({ width: 1280, height: 900 });
      const overflow = await page.evaluate(() => {
        const column = document.querySelector('.document')!.getBoundingClientRect();
        return [...document.querySelectorAll('table')]
          .map((t) => ({ cls: t.className, right: t.getBoundingClientRect().right }))
          .filter((t) => t.right > column.right + 0.5);
      });
      expect(overflow, sample).toEqual([]);
      await page.close();
    }
  });
});
