/**
 * Bad inputs, one row each: the files a case writes into a fresh folder, the command line, and
 * the lines modalgate must print, pinned word for word. Every row must end in exit 2 before any
 * work (no summary printed) and leave the folder as it was. To add a case, add a row: `{dir}`
 * in `argv` and `says` stands for the case's folder.
 */
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli.js';

const root = path.resolve(import.meta.dirname, '..');
/** An invented aircraft at one condition (test/fixtures/cli/marginal-only.yaml): a valid base to break. */
const GOOD = readFileSync(path.join(root, 'test/fixtures/cli/marginal-only.yaml'), 'utf8');
const MIL = readFileSync(path.join(root, 'criteria/mil-f-8785c.yaml'), 'utf8');
const ENVELOPE = readFileSync(path.join(root, 'samples/ketra-kt4-envelope.yaml'), 'utf8');
const ENVELOPE_TABLE = readFileSync(path.join(root, 'samples/ketra-kt4-envelope.csv'), 'utf8');

/** the first short-period damping bound of the shipped military set, made infinite below */
const FIRST_BOUND = '"1": { min: 0.35, max: 1.30 }';
const FIRST_BOUND_LINE = MIL.split('\n').findIndex((l) => l.includes(FIRST_BOUND)) + 1;

/** `line:column` of the first occurrence of `needle` in `text` (1-based), so that rows do not pin line numbers of shipped files. */
function placeOf(text: string, needle: string): string {
  const lines = text.split('\n');
  const line = lines.findIndex((l) => l.includes(needle));
  if (line < 0) throw new Error(`'${needle}' is not in the text`);
  return `${line + 1}:${lines[line]!.indexOf(needle) + 1}`;
}

/** YAML of nine aliases of nine aliases ... nine levels deep: 9^9 values from a few lines. */
function aliasBomb(): string {
  const lines = ['format: modalgate-model/1', 'a0: &a0 [x, x, x, x, x, x, x, x, x]'];
  for (let i = 1; i < 10; i += 1) lines.push(`a${i}: &a${i} [${Array(9).fill(`*a${i - 1}`).join(', ')}]`);
  return `${lines.join('\n')}\n`;
}

/** The envelope table repeated (ids made unique) to `rows` rows. */
function bigTable(rows: number): string {
  const [header, ...body] = ENVELOPE_TABLE.trim().split('\n');
  const out = [header!];
  for (let k = 0; out.length <= rows; k += 1) for (const line of body) if (out.length <= rows) out.push(line.replace(/^([^,]+)/, `$1-${k}`));
  return `${out.join('\n')}\n`;
}

interface Case {
  name: string;
  /** files to write in the case's folder (a name ending in / is a folder) */
  files: Record<string, string>;
  argv: string[];
  /** lines that stderr must hold, exactly */
  says: string[];
}

const cases: Case[] = [
  {
    name: 'an empty model file says "empty"',
    files: { 'm.yaml': '' },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: ['{dir}/m.yaml: is empty (found 0 bytes) [unreadable]', 'modalgate: 1 problem(s) in the input; nothing was written'],
  },
  {
    name: 'lists nested too deeply: no engine text',
    files: { 'm.yaml': `format: modalgate-model/1\nx: ${'['.repeat(50_000)}${']'.repeat(50_000)}\n` },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: ['{dir}/m.yaml:2:68: lists or mappings are nested too deeply to read (a model or criteria file needs fewer than 20 levels) [syntax]'],
  },
  {
    name: 'a YAML alias bomb is bad input at its first alias',
    files: { 'm.yaml': aliasBomb() },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: ['{dir}/m.yaml:3:10: the aliases (*name) expand to too many values (more than 1000); write the values out, or use fewer aliases of aliases (expected at most 1000 alias expansions, found more) [alias_limit]'],
  },
  {
    name: 'an infinite bound in a criteria file',
    files: { 'm.yaml': GOOD, 'c.yaml': MIL.replace(FIRST_BOUND, '"1": { min: 0.35, max: .inf }') },
    argv: ['check', '{dir}/m.yaml', '--criteria', '{dir}/c.yaml', '--json', '{dir}/r.json'],
    says: [`{dir}/c.yaml:${FIRST_BOUND_LINE}:30: criteria[0].levels.1.max: a bound must be a finite number in the quantity\'s SI unit, or "programme-value"; leave min or max out for no bound on that side (found Infinity) [invalid_union]`],
  },
  {
    name: 'an unknown flight phase is pointed at its phase field',
    files: { 'm.yaml': GOOD.replace('phase: FF', 'phase: XX') },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: ["{dir}/m.yaml:8:12: conditions[0].phase: flight phase 'XX' has no category in criteria set 'mil-f-8785c' (expected CO | GA | WD | AR | RC | RR | TF | AS | FF | CL | CR | LO | RT | D | ED | DE | AD | TO | CT | PA | WO | L, found \"XX\") [unknown_phase]"],
  },
  {
    name: 'a missing condition table is pointed at conditionTable.file',
    files: { 'm.yaml': ENVELOPE },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: [`{dir}/m.yaml:${placeOf(ENVELOPE, 'ketra-kt4-envelope.csv')}: conditionTable.file: the condition table {dir}/ketra-kt4-envelope.csv was not found [unreadable]`],
  },
  {
    name: 'a folder named as the condition table is pointed at conditionTable.file',
    files: { 'm.yaml': ENVELOPE, 'ketra-kt4-envelope.csv/': '' },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: [`{dir}/m.yaml:${placeOf(ENVELOPE, 'ketra-kt4-envelope.csv')}: conditionTable.file: the condition table {dir}/ketra-kt4-envelope.csv is a folder, not a file [unreadable]`],
  },
  {
    name: 'a condition table outside the model\'s folder',
    files: { 'sub/m.yaml': ENVELOPE.replace('file: ketra-kt4-envelope.csv', 'file: ../ketra-kt4-envelope.csv'), 'ketra-kt4-envelope.csv': ENVELOPE_TABLE },
    argv: ['check', '{dir}/sub/m.yaml', '--json', '{dir}/r.json'],
    says: [`{dir}/sub/m.yaml:${placeOf(ENVELOPE, 'ketra-kt4-envelope.csv')}: conditionTable.file: the condition table {dir}/ketra-kt4-envelope.csv lies outside the model's folder {dir}/sub; a model may name only files inside its folder (--trust-folder <folder> allows another) (expected a path inside the model's folder, found "{dir}/ketra-kt4-envelope.csv") [outside_folder]`],
  },
  {
    name: 'a criteria file extending a file outside its folder',
    files: { 'm.yaml': GOOD, 'sets/c.yaml': MIL.replace(/^format: (.*)$/m, 'format: $1\nextends: ../base.yaml'), 'base.yaml': MIL },
    argv: ['check', '{dir}/m.yaml', '--criteria', '{dir}/sets/c.yaml', '--json', '{dir}/r.json'],
    says: [`{dir}/sets/c.yaml:${MIL.split('\n').findIndex((l) => l.startsWith('format:')) + 2}:10: extends: the criteria file {dir}/base.yaml lies outside the folder of {dir}/sets/c.yaml; extends may name a shipped set or a file in that folder (--trust-folder <folder> allows another) (expected a shipped set id or a path inside the extending file's folder, found "../base.yaml") [outside_folder]`],
  },
  {
    name: 'a mapped column missing from the table is pointed at its mapping',
    files: { 'm.yaml': ENVELOPE, 'ketra-kt4-envelope.csv': ENVELOPE_TABLE.replace(/^case,phase,V,h,/, 'case,phase,V,alt,') },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: [`{dir}/m.yaml:${placeOf(ENVELOPE, 'altitude: h')}: conditionTable.columns.altitude: column 'h' is not in the header of {dir}/ketra-kt4-envelope.csv (expected a column headed "h", found 19 other column(s)) [missing_column]`],
  },
  {
    name: 'mass: 5e-324 points at the mass field',
    files: { 'm.yaml': ENVELOPE.replace('mass: 2350', 'mass: 5e-324'), 'ketra-kt4-envelope.csv': ENVELOPE_TABLE.split('\n').slice(0, 2).join('\n') },
    argv: ['check', '{dir}/m.yaml', '--json', '{dir}/r.json'],
    says: [`{dir}/m.yaml:${placeOf(ENVELOPE, '2350')}: conditionTable.common.nondimensional.mass: this value is too small to compute with: the state matrices built from the condition have A[u][u] = -Infinity (expected a magnitude between 1e-150 and 1e+150, found 5e-324) [out_of_range]`],
  },
  {
    name: '--json "" is an empty output path',
    files: { 'm.yaml': GOOD },
    argv: ['check', '{dir}/m.yaml', '--json', ''],
    says: ['<command line>: --json: the output path is empty (expected a file name, found "") [output_path]', 'modalgate: 1 problem(s) with the outputs or the browser; nothing was written'],
  },
  {
    name: 'the model as an output',
    files: { 'm.yaml': GOOD },
    argv: ['check', '{dir}/m.yaml', '--html', '{dir}/m.yaml'],
    says: ['{dir}/m.yaml: --html: this output would overwrite the model file {dir}/m.yaml; choose another path (expected a path that is not an input, found {dir}/m.yaml) [output_is_input]'],
  },
  {
    name: 'two outputs on one file',
    files: { 'm.yaml': GOOD },
    argv: ['check', '{dir}/m.yaml', '--html', '{dir}/x', '--junit', '{dir}/x'],
    says: ['{dir}/x: --junit: the same file is also named by --html; each output needs a file of its own (expected a path no other output uses, found {dir}/x) [output_twice]'],
  },
  {
    // the model is broken too: a baseline read after the check would never be reached
    name: 'a broken baseline is read before the work',
    files: { 'm.yaml': GOOD.replace('airspeed: 80', 'airspeed: fast'), 'base.json': '{"format": "modalgate-results/1", "conditions": 3' },
    argv: ['check', '{dir}/m.yaml', '--baseline', '{dir}/base.json', '--json', '{dir}/r.json'],
    says: ['{dir}/base.json:1:50: not valid YAML/JSON: Flow map must end with a } [syntax]'],
  },
  {
    name: 'the default report path is checked before the work',
    files: { 'm.yaml': GOOD, 'm.review.html/': '' },
    argv: ['check', '{dir}/m.yaml'],
    says: ['{dir}/m.review.html: --html: cannot write the output file: a folder of that name is in the way (expected a file that can be written, found EISDIR) [output_unwritable]'],
  },
  {
    name: 'a bad --browser is reported before the analysis, and not as a problem in the input',
    files: { 'm.yaml': GOOD },
    argv: ['check', '{dir}/m.yaml', '--pdf', '{dir}/r.pdf', '--browser', '{dir}/no-such-browser'],
    says: [
      '<command line>: --browser: no executable browser at {dir}/no-such-browser; install the Debian package chromium (apt-get install -y chromium) or pass --browser <path> (expected the path of a Chromium or Chrome executable, found "{dir}/no-such-browser") [no_browser]',
      'modalgate: 1 problem(s) with the outputs or the browser; nothing was written',
    ],
  },
  {
    name: 'a sweep too large for a review document stops before the work',
    files: { 'm.yaml': ENVELOPE, 'ketra-kt4-envelope.csv': bigTable(20_001) },
    argv: ['check', '{dir}/m.yaml', '--html', '{dir}/r.html'],
    says: ['<command line>: --html: a review document of 20001 conditions is more than modalgate writes (at most 20000); check the sweep in parts, or write only --json and --junit for the whole of it (expected at most 20000 conditions with --html or --pdf, found 20001 conditions) [output_too_large]'],
  },
];

function folderWith(files: Record<string, string>): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'modalgate-bad-'));
  for (const [name, text] of Object.entries(files)) {
    const at = path.join(dir, name);
    if (name.endsWith('/')) {
      mkdirSync(at, { recursive: true });
      continue;
    }
    mkdirSync(path.dirname(at), { recursive: true });
    writeFileSync(at, text);
  }
  return dir;
}

function listing(dir: string): string[] {
  return readdirSync(dir, { recursive: true }).map(String).sort();
}

describe('bad inputs: exit 2 before any work, with the pinned message', () => {
  it.each(cases.map((c) => [c.name, c] as const))('%s', async (_name, c) => {
    const dir = folderWith(c.files);
    const before = listing(dir);
    const fill = (s: string) => s.replaceAll('{dir}', dir);
    const r = await runCli(...c.argv.map(fill));
    expect(r.code, r.err).toBe(2);
    const lines = r.err.split('\n');
    for (const said of c.says) {
      const want = fill(said);
      expect(lines, r.err).toContain(want);
    }
    expect(r.out).not.toMatch(/^summary:/m);
    expect(listing(dir)).toEqual(before);
  }, 30_000);
});

describe('inputs that are accepted, with what is said about them', () => {
  it('JSON with a byte-order mark is read as YAML is', async () => {
    const dir = folderWith({});
    const model = path.join(dir, 'm.json');
    const json = JSON.stringify({
      format: 'modalgate-model/1',
      aircraft: { name: 'BOM test case', class: 'I' },
      units: 'SI',
      conditions: [{ id: 'c1', phase: 'CR', airspeed: 50, stateSpace: { states: ['w', 'q'], A: [[-1.2, 50], [-0.05, -1.5]] } }],
    });
    writeFileSync(model, `\ufeff${json}`);
    const r = await runCli('check', model, '--json', path.join(dir, 'r.json'));
    expect([0, 1]).toContain(r.code);
    expect(r.err).toBe('');
  });

  it('an unknown YAML tag is a warning with its place, and the value is read as written', async () => {
    const dir = folderWith({ 'm.yaml': GOOD.replace('name: Test Kestrel', 'name: !nickname Test Kestrel') });
    const r = await runCli('check', path.join(dir, 'm.yaml'), '--json', path.join(dir, 'r.json'));
    expect(r.code).toBe(0);
    expect(r.err).toBe(`warning: ${dir}/m.yaml:4:19: Unresolved tag: !nickname: modalgate does not know this YAML tag; the value is read as if it were not there`);
    expect(r.out).toContain('Test Kestrel (Class I)');
  });
});
