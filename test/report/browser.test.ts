import { mkdtempSync, writeFileSync, chmodSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { findBrowser } from '../../src/report/browser.js';

const dir = mkdtempSync(join(tmpdir(), 'mg-browser-test-'));
const fake = join(dir, 'fake-chrome');
writeFileSync(fake, '#!/bin/sh\nexit 0\n');
chmodSync(fake, 0o755);
const notExecutable = join(dir, 'plain-file');
writeFileSync(notExecutable, 'x');
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function issueOf(fn: () => unknown) {
  try {
    fn();
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as InputError).issues[0]!;
  }
  throw new Error('expected an InputError');
}

describe('findBrowser', () => {
  it('takes the explicit path first, then MODALGATE_BROWSER, then the usual places', () => {
    expect(findBrowser(fake, { MODALGATE_BROWSER: '/nowhere' }, [])).toBe(fake);
    expect(findBrowser(undefined, { MODALGATE_BROWSER: fake }, ['/nowhere'])).toBe(fake);
    expect(findBrowser(undefined, {}, ['/nowhere/chromium', fake])).toBe(fake);
  });

  it('finds the system Chromium at /usr/bin/chromium', () => {
    expect(findBrowser(undefined, {})).toBe('/usr/bin/chromium');
  });

  it('says how to install a browser when there is none', () => {
    const issue = issueOf(() => findBrowser(undefined, {}, ['/nowhere/chromium']));
    expect(issue.code).toBe('no_browser');
    expect(issue.field).toBe('--browser');
    expect(issue.message).toContain('install the Debian package chromium (apt-get install -y chromium) or pass --browser');
  });

  it('rejects an explicit path that is not an executable file', () => {
    expect(issueOf(() => findBrowser(notExecutable, {}, [fake])).code).toBe('no_browser');
    expect(issueOf(() => findBrowser(dir, {}, [fake])).code).toBe('no_browser');
    expect(issueOf(() => findBrowser(undefined, { MODALGATE_BROWSER: '/nowhere' }, [fake])).field).toBe('MODALGATE_BROWSER');
  });
});
