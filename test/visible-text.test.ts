/**
 * Terminal escaping: every string from the user's files reaches the terminal with its control,
 * bidirectional and separator characters shown as escapes (ECMA-48 C0/C1 controls; Unicode
 * bidirectional formatting characters, UAX #9), in tables and in error messages alike.
 */
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli.js';
import { formatIssue } from '../src/errors.js';
import { visible, visibleData } from '../src/visible-text.js';

const root = path.resolve(import.meta.dirname, '..');
const marginalOnly = path.join(root, 'test/fixtures/cli/marginal-only.yaml');

const run = runCli;

/** Anything a terminal would act on: C0 (but for the line breaks between lines), DEL, C1, bidi controls. */
// The pattern is the list the issue names; a line break is allowed only between whole lines.
const ACTIVE = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f\u061c\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069]/;

describe('visible', () => {
  const cases: [string, string, string][] = [
    ['ESC of a colour or screen-clearing sequence', '\u001b[2J\u001b[31mred', '\\x1b[2J\\x1b[31mred'],
    ['an OSC 8 hyperlink ended by BEL', '\u001b]8;;http://x\u0007click\u001b]8;;\u0007', '\\x1b]8;;http://x\\x07click\\x1b]8;;\\x07'],
    ['a line break and a carriage return', 'one\nsummary: 0 fail\rtwo', 'one\\nsummary: 0 fail\\rtwo'],
    ['a tab, a backspace and DEL', 'a\tb\bc\u007f', 'a\\tb\\x08c\\x7f'],
    ['the 8-bit CSI (C1)', '\u009b2J', '\\x9b2J'],
    ['a right-to-left override and an isolate', 'abc\u202edcba\u2066x\u2069', 'abc\\u202edcba\\u2066x\\u2069'],
    ['the line separator', 'a\u2028b', 'a\\u2028b'],
    ['accented, Greek and CJK letters are left as written', 'Künstler α 飞机 ✓', 'Künstler α 飞机 ✓'],
  ];
  it.each(cases)('%s', (_what, text, shown) => {
    expect(visible(text)).toBe(shown);
  });

  it('visibleData reaches strings nested in objects and arrays, keys too, and leaves numbers', () => {
    expect(visibleData({ 'k\u001b': ['\u001b[0m', 1.5, null, { n: '\n' }] })).toEqual({ 'k\\x1b': ['\\x1b[0m', 1.5, null, { n: '\\n' }] });
  });

  it('an error message stays one line whatever the found text holds', () => {
    const line = formatIssue({ file: 'm\u001b[2J.yaml', line: 3, column: 4, field: 'aircraft.name', message: 'bad', found: '"x\nmodalgate: 0 problem(s) in the input"', code: 'c' });
    expect(line).toBe('m\\x1b[2J.yaml:3:4: aircraft.name: bad (found "x\\nmodalgate: 0 problem(s) in the input") [c]');
  });
});

describe('the terminal shows hostile names as escapes', () => {
  function hostileModel(): string {
    const dir = mkdtempSync(path.join(tmpdir(), 'modalgate-escape-'));
    const model = path.join(dir, 'm.yaml');
    const text = readFileSync(marginalOnly, 'utf8')
      .replace('name: Test Kestrel', 'name: "Kestrel\\e[2J\\e]8;;http://evil\\a link\\e]8;;\\a \\u202Eylno\\u202C"')
      .replace('id: formation', 'id: "formation\\nsummary: 0 pass, 0 marginal, 0 fail"');
    writeFileSync(model, text);
    return model;
  }

  it('a check prints no control character from the model, and no fake summary line', async () => {
    const model = hostileModel();
    const r = await run('check', model, '--json', `${model}.json`);
    expect(r.code).toBe(0);
    for (const line of r.out.split('\n')) expect(line, line).not.toMatch(ACTIVE);
    expect(r.out).toContain('Kestrel\\x1b[2J\\x1b]8;;http://evil\\x07 link\\x1b]8;;\\x07 \\u202eylno\\u202c');
    expect(r.out).toContain('condition formation\\nsummary: 0 pass, 0 marginal, 0 fail, phase FF');
    expect(r.out.split('\n').filter((l) => l.startsWith('summary:'))).toHaveLength(1);
  });

  it('an unknown key with escapes is shown as escapes in the error message', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'modalgate-escape-'));
    const model = path.join(dir, 'm.yaml');
    copyFileSync(marginalOnly, model);
    writeFileSync(model, readFileSync(model, 'utf8').replace('    airspeed: 80', '    airspeed: 80\n    "x\\e[2J\\rmodalgate: all good": 1'));
    const r = await run('check', model);
    expect(r.code).toBe(2);
    for (const line of r.err.split('\n')) expect(line, line).not.toMatch(ACTIVE);
    expect(r.err).toContain("unknown field(s) 'x\\x1b[2J\\rmodalgate: all good'");
  });

  it('criteria show prints a hostile note as escapes', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'modalgate-escape-'));
    const file = path.join(dir, 'c.yaml');
    const shipped = readFileSync(path.join(root, 'criteria/mil-f-8785c.yaml'), 'utf8');
    writeFileSync(file, shipped.replace(/^title: .*$/m, 'title: "Set\\e[31m red\\u202E"'));
    const r = await run('criteria', 'show', file);
    expect(r.code).toBe(0);
    for (const line of r.out.split('\n')) expect(line, line).not.toMatch(ACTIVE);
    expect(r.out).toContain('Set\\x1b[31m red\\u202e');
  });

  it('an unknown option is echoed as escapes', async () => {
    const r = await run('check', marginalOnly, '--\u001b[2Jx');
    expect(r.code).toBe(2);
    for (const line of r.err.split('\n')) expect(line, line).not.toMatch(ACTIVE);
    expect(r.err).toContain('--\\x1b[2Jx');
  });
});
