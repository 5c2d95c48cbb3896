/** One way for the report tests to start the system Chromium: headless, no sandbox, nothing fetched in the background. */
import { join } from 'node:path';
import puppeteer, { type Browser } from 'puppeteer-core';

export function launchTestBrowser(profileParent: string): Promise<Browser> {
  return puppeteer.launch({
    executablePath: '/usr/bin/chromium',
    headless: true,
    userDataDir: join(profileParent, 'profile'),
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
}
