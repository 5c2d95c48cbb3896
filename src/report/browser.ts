/**
 * Which Chromium prints the PDF: the path given with --browser, else MODALGATE_BROWSER, else
 * the usual install places. Nothing is downloaded: without a browser the user is told how to
 * install one.
 */
import { accessSync, constants, statSync } from 'node:fs';
import { InputError } from '../errors.js';

export const USUAL_BROWSER_PATHS: readonly string[] = [
  '/usr/bin/chromium',
  '/usr/bin/chromium-browser',
  '/usr/bin/google-chrome',
  '/usr/bin/google-chrome-stable',
  '/snap/bin/chromium',
  '/usr/local/bin/chromium',
  '/opt/google/chrome/chrome',
  '/Applications/Chromium.app/Contents/MacOS/Chromium',
  '/Applications/Google Chrome.app/Contents/MacOS/Google Chrome',
];

function isExecutableFile(path: string): boolean {
  try {
    if (!statSync(path).isFile()) return false;
    accessSync(path, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

const ADVICE = 'install the Debian package chromium (apt-get install -y chromium) or pass --browser <path>';

export function findBrowser(explicit?: string, env: NodeJS.ProcessEnv = process.env, candidates: readonly string[] = USUAL_BROWSER_PATHS): string {
  if (explicit !== undefined && explicit !== '') {
    if (isExecutableFile(explicit)) return explicit;
    throw new InputError([{ file: '<command line>', field: '--browser', message: `no executable browser at ${explicit}; ${ADVICE}`, expected: 'the path of a Chromium or Chrome executable', found: JSON.stringify(explicit), code: 'no_browser' }]);
  }
  const fromEnv = env['MODALGATE_BROWSER'];
  if (fromEnv !== undefined && fromEnv !== '') {
    if (isExecutableFile(fromEnv)) return fromEnv;
    throw new InputError([{ file: '<environment>', field: 'MODALGATE_BROWSER', message: `no executable browser at ${fromEnv}; ${ADVICE}`, expected: 'the path of a Chromium or Chrome executable', found: JSON.stringify(fromEnv), code: 'no_browser' }]);
  }
  for (const path of candidates) if (isExecutableFile(path)) return path;
  throw new InputError([{ file: '<command line>', field: '--browser', message: `no Chromium or Chrome found to print the PDF; ${ADVICE}`, expected: 'a browser in one of ' + candidates.join(', '), found: 'none', code: 'no_browser' }]);
}
