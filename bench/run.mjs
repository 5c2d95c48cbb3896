#!/usr/bin/env node
/**
 * All benchmarks, one after the other: modal analysis (bench/modes.mjs, when present), the
 * 10,000-condition sweep, the report cold start and what design sensitivities add; the
 * responses to the cockpit controls (bench/responses.mjs). Options after `--` go to every
 * benchmark (e.g. `node bench/run.mjs -- --runs 3`). Exits 1 when any benchmark did.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const HERE = fileURLToPath(new URL('.', import.meta.url));
const dash = process.argv.indexOf('--');
const passOn = dash >= 0 ? process.argv.slice(dash + 1) : [];

let failed = 0;
for (const [name, passArgs] of [['modes.mjs', false], ['responses.mjs', false], ['sweep.mjs', true], ['report.mjs', true], ['sensitivity.mjs', true], ['equivalent.mjs', false]]) {
  const file = join(HERE, name);
  console.log(`\n== bench/${name}`);
  if (!existsSync(file)) {
    console.log(`bench/${name} is not there yet: skipped`);
    continue;
  }
  const child = spawnSync(process.execPath, [file, ...(passArgs ? passOn : [])], { stdio: 'inherit' });
  if (child.status !== 0) {
    failed += 1;
    console.log(`bench/${name} exited with ${child.status ?? child.signal}`);
  }
}
process.exitCode = failed > 0 ? 1 : 0;
