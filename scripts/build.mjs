#!/usr/bin/env node
/**
 * Build dist/ with the TypeScript compiler (tsconfig.build.json), write the parsed and checked
 * form of each shipped criteria set to dist/criteria-cache/ (src/load/criteria-cache.ts) and
 * the review document's templates compiled to dist/report/templates-compiled.cjs
 * (src/report/precompiled-templates.ts), and record a digest of what the build read (every
 * file under src/ and templates/, the shipped criteria files, both tsconfig files, the
 * compiler's version) in dist/.sources-sha256.
 *
 *   node scripts/build.mjs              build (npm run build)
 *   node scripts/build.mjs --if-stale   build only when dist/ is not that of the sources (npm's prepare)
 *   node scripts/build.mjs --status     print "current" or "stale: <why>", build nothing
 *
 * `--if-stale` is for `prepare`, which npm runs on `npm install` and again when `npx modalgate`
 * in the checkout links the package: the second time dist/ is current and the full compile
 * (several seconds) is skipped. The digest is of file contents, not times, so a fresh clone
 * (where every file is new) is judged by what it holds. `--root DIR` (tests) works on another tree.
 */
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join, relative, sep } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const STAMP = join('dist', '.sources-sha256');
/** outputs that must be there for dist/ to count as built */
const OUTPUTS = [join('dist', 'cli.js'), join('dist', 'index.js')];
const INPUTS = ['tsconfig.json', 'tsconfig.build.json'];

function filesUnder(dir) {
  const out = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...filesUnder(path));
    else if (entry.isFile()) out.push(path);
  }
  return out;
}

function compilerVersion(root) {
  try {
    const require = createRequire(join(root, 'package.json'));
    return JSON.parse(readFileSync(require.resolve('typescript/package.json'), 'utf8')).version;
  } catch {
    return 'typescript not found';
  }
}

/** SHA-256 over the build's inputs: each file's path (with /) and contents, in sorted order. */
export function sourcesDigest(root) {
  const hash = createHash('sha256');
  hash.update(`typescript ${compilerVersion(root)}\n`);
  const criteria = existsSync(join(root, 'criteria')) ? filesUnder(join(root, 'criteria')).filter((f) => /\.ya?ml$/i.test(f)) : [];
  const templates = existsSync(join(root, 'templates')) ? filesUnder(join(root, 'templates')) : [];
  const files = [...INPUTS.map((f) => join(root, f)).filter((f) => existsSync(f)), ...filesUnder(join(root, 'src')), ...criteria, ...templates]
    .map((f) => relative(root, f).split(sep).join('/'))
    .sort();
  for (const file of files) {
    const data = readFileSync(join(root, file));
    hash.update(`${file}\n${data.length}\n`);
    hash.update(data);
  }
  return hash.digest('hex');
}

/** null when dist/ was built from the sources as they are, else why not. */
export function staleness(root) {
  const missing = OUTPUTS.find((f) => !existsSync(join(root, f)));
  if (missing) return `${missing.split(sep).join('/')} is missing`;
  if (!existsSync(join(root, STAMP))) return 'no record of the sources dist/ was built from';
  if (readFileSync(join(root, STAMP), 'utf8').trim() !== sourcesDigest(root)) return 'the sources changed since dist/ was built';
  return null;
}

async function build(root) {
  // no record while building: a build that fails part-way must not look current
  rmSync(join(root, STAMP), { force: true });
  const require = createRequire(join(root, 'package.json'));
  const tsc = require.resolve('typescript/bin/tsc');
  const child = spawnSync(process.execPath, [tsc, '-p', join(root, 'tsconfig.build.json')], { stdio: 'inherit' });
  if (child.status !== 0) return child.status ?? 1;
  await writeCriteriaCache(root);
  await writeCompiledTemplates(root);
  writeFileSync(join(root, STAMP), `${sourcesDigest(root)}\n`);
  return 0;
}

/** dist/report/templates-compiled.cjs: every template of templates/, compiled by handlebars. */
async function writeCompiledTemplates(root) {
  const dist = (file) => pathToFileURL(join(root, 'dist', 'report', file)).href;
  const { readTemplateFiles } = await import(dist('template-files.js'));
  const { precompiledModuleText } = await import(dist('precompiled-templates.js'));
  const handlebars = createRequire(join(root, 'package.json'))('handlebars');
  const text = precompiledModuleText(readTemplateFiles(join(root, 'templates')), (source, options) => handlebars.precompile(source, options));
  writeFileSync(join(root, 'dist', 'report', 'templates-compiled.cjs'), text);
}

/** dist/criteria-cache/<id>.json for each shipped criteria/<id>.yaml that passes the schema. */
async function writeCriteriaCache(root) {
  const { criteriaCacheEntry } = await import(pathToFileURL(join(root, 'dist', 'load', 'criteria-cache.js')).href);
  const out = join(root, 'dist', 'criteria-cache');
  rmSync(out, { recursive: true, force: true });
  mkdirSync(out, { recursive: true });
  const dir = join(root, 'criteria');
  if (!existsSync(dir)) return;
  for (const name of readdirSync(dir).filter((f) => /\.ya?ml$/i.test(f)).sort()) {
    const bytes = readFileSync(join(dir, name));
    const text = bytes.toString('utf8').replace(/^\uFEFF/, '');
    let entry = null;
    try {
      entry = criteriaCacheEntry(text, `criteria/${name}`, createHash('sha256').update(bytes).digest('hex'));
    } catch {
      // a file that does not parse is not cached: loading it reports its problems
    }
    if (entry) writeFileSync(join(out, name.replace(/\.ya?ml$/i, '.json')), JSON.stringify(entry));
  }
}

async function main(argv) {
  let mode = 'build';
  let root = fileURLToPath(new URL('..', import.meta.url));
  for (let i = 0; i < argv.length; i++) {
    if (argv[i] === '--if-stale') mode = 'if-stale';
    else if (argv[i] === '--status') mode = 'status';
    else if (argv[i] === '--root' && argv[i + 1] !== undefined) root = argv[++i];
    else {
      console.error(`build: unknown option ${argv[i]} (use --if-stale, --status, --root DIR)`);
      return 2;
    }
  }
  if (mode === 'build') return build(root);
  const why = staleness(root);
  if (mode === 'status') {
    console.log(why === null ? 'current' : `stale: ${why}`);
    return 0;
  }
  if (why === null) {
    console.log('modalgate: dist/ is current with the sources; build skipped');
    return 0;
  }
  console.log(`modalgate: building dist/ (${why})`);
  return build(root);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  process.exitCode = await main(process.argv.slice(2));
}
