/**
 * The printed report: a real PDF from the system Chromium, read back with pdftotext
 * (poppler-utils). Two launches: A4 and Letter.
 */
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { renderHtml } from '../../src/report/html.js';
import { renderPdf } from '../../src/report/pdf.js';
import { buildReportView } from '../../src/report/view-model.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

const work = mkdtempSync(join(tmpdir(), 'mg-pdf-test-'));
const privateTmp = join(work, 'tmp');
let saved: string | undefined;
let a4: Buffer;
let text: string;

beforeAll(async () => {
  execFileSync('mkdir', ['-p', privateTmp]);
  saved = process.env['TMPDIR'];
  process.env['TMPDIR'] = privateTmp;
  const { results, sets } = larkspurReview();
  const view = buildReportView(results, sets, { reportId: 'MG-PDF0000001' });
  a4 = await renderPdf(renderHtml(view), { browser: '/usr/bin/chromium', paper: 'A4', reportId: 'MG-PDF0000001', title: view.title });
  const file = join(work, 'review.pdf');
  writeFileSync(file, a4);
  text = execFileSync('/usr/bin/pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
});

afterAll(() => {
  if (saved === undefined) delete process.env['TMPDIR'];
  else process.env['TMPDIR'] = saved;
  rmSync(work, { recursive: true, force: true });
});

function pageSize(pdf: Buffer): string {
  const file = join(work, `size-${pdf.length}.pdf`);
  writeFileSync(file, pdf);
  const info = execFileSync('/usr/bin/pdfinfo', [file], { encoding: 'utf8' });
  return /Page size:\s+([\d.]+ x [\d.]+)/.exec(info)?.[1] ?? '';
}

describe('renderPdf', () => {
  it('returns a PDF of a plausible length', () => {
    expect(a4.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const pages = text.split('\f').filter((p) => p.trim() !== '').length;
    // title page, 3 conditions of 2 to 3 pages each, criteria sets, cautions and traceability
    expect(pages).toBeGreaterThanOrEqual(6);
    expect(pages).toBeLessThanOrEqual(16);
  });

  it('prints the aircraft, the verdict words and the cautions', () => {
    expect(text).toContain('Larkspur LT-6');
    for (const word of ['pass', 'marginal', 'FAIL', 'not evaluated']) expect(text).toContain(word);
    expect(text).toContain('certifying or procuring');
    expect(text).toMatch(/from memory/);
  });

  it('prints the evidence count on the first page and the list of sources on the last', () => {
    const pages = text.split('\f').filter((p) => p.trim() !== '');
    expect(pages[0]).toMatch(/on boundaries not read in the primary\s+document/);
    expect(pages[pages.length - 1]).toContain('Sources of the boundaries');
    expect(pages[pages.length - 1]).toContain('lt6-hq-spec');
  });

  it('carries the report id and page x of y on every page', () => {
    const pages = text.split('\f').filter((p) => p.trim() !== '');
    pages.forEach((page, i) => {
      expect(page).toContain('MG-PDF0000001');
      expect(page).toContain(`page ${i + 1} of ${pages.length}`);
    });
  });

  it('prints A4 portrait, and Letter on request', async () => {
    // ISO 216 A4 is 210 x 297 mm = 595.28 x 841.89 pt; US Letter 8.5 x 11 in = 612 x 792 pt (common practice)
    expect(pageSize(a4)).toMatch(/^595\.\d+ x 841\.\d+$/);
    const letter = await renderPdf('<!DOCTYPE html><html><body><p>short</p></body></html>', { browser: '/usr/bin/chromium', paper: 'Letter', reportId: 'MG-L', title: 'Letter' });
    expect(pageSize(letter)).toBe('612 x 792');
  });

  it('removes its work folder afterwards', () => {
    expect(existsSync(privateTmp)).toBe(true);
    expect(readdirSync(privateTmp)).toEqual([]);
  });
});
