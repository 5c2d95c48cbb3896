import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { buildReportView } from '../../src/report/view-model.js';
import { renderHtml } from '../../src/report/html.js';
import { renderPdf } from '../../src/report/pdf.js';
import { writeFileAtomic } from '../../src/report/write-atomic.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

const dir = mkdtempSync(join(tmpdir(), 'mg-atomic-test-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const GOOD = Buffer.from('%PDF-1.7 the last good report\n');

function leftovers(folder: string): string[] {
  return readdirSync(folder).filter((name) => name.endsWith('.tmp'));
}

describe('writeFileAtomic', () => {
  it('writes a new file and replaces an existing one', async () => {
    const path = join(dir, 'a.html');
    await writeFileAtomic(path, '<p>one</p>');
    expect(readFileSync(path, 'utf8')).toBe('<p>one</p>');
    await writeFileAtomic(path, Buffer.from('<p>two</p>'));
    expect(readFileSync(path, 'utf8')).toBe('<p>two</p>');
    expect(leftovers(dir)).toEqual([]);
  });

  it('leaves the existing report byte-identical when printing fails mid-render', async () => {
    const path = join(dir, 'review.pdf');
    writeFileSync(path, GOOD);
    const { results, sets } = larkspurReview();
    const html = renderHtml(buildReportView(results, sets, { reportId: 'MG-FAIL' }));
    // /bin/false exits at once: the browser dies before a page is printed.
    const privateTmp = join(dir, 'tmp');
    mkdirSync(privateTmp);
    const saved = process.env['TMPDIR'];
    process.env['TMPDIR'] = privateTmp; // os.tmpdir() reads it on each call
    const run = renderPdf(html, { browser: '/bin/false', paper: 'A4', reportId: 'MG-FAIL', title: 't' }).then((pdf) => writeFileAtomic(path, pdf));
    await expect(run).rejects.toThrow();
    if (saved === undefined) delete process.env['TMPDIR'];
    else process.env['TMPDIR'] = saved;
    expect(readFileSync(path).equals(GOOD)).toBe(true);
    expect(leftovers(dir)).toEqual([]);
    expect(readdirSync(privateTmp)).toEqual([]); // renderPdf removed its work folder
  });

  it('removes its temporary file and keeps the target when the rename fails', async () => {
    // A non-empty directory cannot be replaced by a file: rename fails after the data are written.
    const target = join(dir, 'occupied');
    mkdirSync(target);
    writeFileSync(join(target, 'keep.txt'), 'kept');
    await expect(writeFileAtomic(target, 'new report')).rejects.toThrow();
    expect(readFileSync(join(target, 'keep.txt'), 'utf8')).toBe('kept');
    expect(leftovers(dir)).toEqual([]);
  });

  it('fails cleanly when the folder does not exist', async () => {
    await expect(writeFileAtomic(join(dir, 'missing', 'r.html'), 'x')).rejects.toThrow(/ENOENT/);
  });

  it('writes text made piece by piece in order, several blocks long', async () => {
    const path = join(dir, 'long.json');
    // 3.5 MB in pieces of 70 kB: several 1 MB blocks, each written while the next is made
    const pieces = Array.from({ length: 50 }, (_, k) => `${String(k).padStart(2, '0')}:${'x'.repeat(70_000)}\n`);
    await writeFileAtomic(path, (function* () { yield* pieces; })());
    expect(readFileSync(path, 'utf8')).toBe(pieces.join(''));
    expect(leftovers(dir)).toEqual([]);
  });

  it('keeps the existing file and leaves nothing behind when making the text fails after blocks were written', async () => {
    const path = join(dir, 'sweep.json');
    writeFileSync(path, 'the last good results');
    function* failing(): Generator<string> {
      for (let k = 0; k < 5; k += 1) yield 'y'.repeat(600_000);
      throw new Error('rendering broke half-way');
    }
    await expect(writeFileAtomic(path, failing())).rejects.toThrow('rendering broke half-way');
    expect(readFileSync(path, 'utf8')).toBe('the last good results');
    expect(leftovers(dir)).toEqual([]);
  });
});
