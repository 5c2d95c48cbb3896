/**
 * HTML -> PDF with the system Chromium through puppeteer-core. The browser runs with a fresh
 * profile in a temporary folder (HOME and XDG dirs too, so nothing of the user's is read or
 * written), JavaScript off and every request but the page itself aborted: printing the
 * report cannot reach the network.
 */
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Browser, LaunchOptions } from 'puppeteer-core';
import { InputError } from '../errors.js';

export interface PdfOptions {
  /** path of the Chromium executable (see findBrowser) */
  browser: string;
  paper: 'A4' | 'Letter';
  reportId: string;
  title: string;
}

export const CHROMIUM_ARGS: readonly string[] = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-default-apps',
  '--disable-extensions',
  '--mute-audio',
];

function escapeHtml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** Header and footer run in their own tiny document; they need their own font size. */
function headerFooter(options: PdfOptions): { headerTemplate: string; footerTemplate: string } {
  const style = 'font-family:DejaVu Sans,Liberation Sans,Arial,sans-serif;font-size:7pt;color:#333;width:100%;margin:0 14mm;display:flex;justify-content:space-between;';
  return {
    headerTemplate: `<div style="${style}"><span>${escapeHtml(options.title)}</span><span>${escapeHtml(options.reportId)}</span></div>`,
    footerTemplate: `<div style="${style}"><span>${escapeHtml(options.reportId)} &middot; engineering aid, not a compliance finding</span><span>page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`,
  };
}

/** A browser that will not start is the user's environment to fix (exit 2), not a bug. */
async function launchBrowser(launchOptions: LaunchOptions, executable: string): Promise<Browser> {
  // Loaded only when a PDF is asked for: the import alone costs some 0.2 s of every HTML-only run.
  const { default: puppeteer } = await import('puppeteer-core');
  try {
    return await puppeteer.launch(launchOptions);
  } catch (err) {
    const first = String((err as Error)?.message ?? err).split('\n')[0];
    throw new InputError([
      {
        file: '<command line>',
        field: '--browser',
        message: `the browser ${executable} did not start (${first}); install the Debian package chromium (apt-get install -y chromium) or pass --browser <path>`,
        expected: 'a working Chromium or Chrome executable',
        found: JSON.stringify(executable),
        code: 'browser_failed',
      },
    ]);
  }
}

/** A4 or Letter, portrait, with room for the header and footer lines. */
export async function renderPdf(html: string, options: PdfOptions): Promise<Buffer> {
  const work = await mkdtemp(join(tmpdir(), 'modalgate-pdf-'));
  let browser: Browser | undefined;
  try {
    const home = join(work, 'home');
    await mkdir(home, { mode: 0o700 });
    await mkdir(join(work, 'run'), { mode: 0o700 });
    const pagePath = join(work, 'report.html');
    await writeFile(pagePath, html, 'utf8');
    const pageUrl = pathToFileURL(pagePath).href;
    browser = await launchBrowser({
      executablePath: options.browser,
      headless: true,
      userDataDir: join(work, 'profile'),
      args: [...CHROMIUM_ARGS],
      env: {
        PATH: process.env['PATH'] ?? '/usr/bin:/bin',
        HOME: home,
        XDG_CONFIG_HOME: join(home, '.config'),
        XDG_CACHE_HOME: join(home, '.cache'),
        XDG_DATA_HOME: join(home, '.local', 'share'),
        XDG_RUNTIME_DIR: join(work, 'run'),
      },
      timeout: 30_000,
    }, options.browser);
    const page = await browser.newPage();
    await page.setJavaScriptEnabled(false);
    await page.setRequestInterception(true);
    page.on('request', (request) => {
      if (request.isInterceptResolutionHandled()) return;
      if (request.url() === pageUrl) void request.continue();
      else void request.abort('blockedbyclient');
    });
    await page.goto(pageUrl, { waitUntil: 'load', timeout: 30_000 });
    await page.emulateMediaType('print');
    const pdf = await page.pdf({
      format: options.paper,
      printBackground: true,
      displayHeaderFooter: true,
      ...headerFooter(options),
      margin: { top: '16mm', bottom: '15mm', left: '14mm', right: '14mm' },
      preferCSSPageSize: false,
      timeout: 60_000,
    });
    return Buffer.from(pdf);
  } finally {
    if (browser) await browser.close().catch(() => undefined);
    await rm(work, { recursive: true, force: true, maxRetries: 3 }).catch(() => undefined);
  }
}
