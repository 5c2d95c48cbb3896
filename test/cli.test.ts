/**
 * The command line end to end, in-process (main() with captured output) and once as a real
 * process for the exit code. Contract 3 of the design notes: exit codes 0 / 1 / 2 / 3.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../src/cli.js';

const root = path.resolve(import.meta.dirname, '..');
const sample = path.join(root, 'samples/ketra-kt4.yaml');
const marginalOnly = path.join(root, 'test/fixtures/cli/marginal-only.yaml');
const badAirspeed = path.join(root, 'test/fixtures/cli/bad-airspeed.yaml');

async function run(...argv: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, {
    out: (t) => out.push(t),
    err: (t) => err.push(t),
    color: false,
    now: () => new Date('2026-12-01T12:00:00Z'),
  });
  return { code, out: out.join('\n'), err: err.join('\n') };
}

function scratch(): string {
  return mkdtempSync(path.join(tmpdir(), 'modalgate-cli-'));
}

describe('modalgate check', () => {
  it('runs the bundled sample: every verdict appears, exit 1 because a finding fails', async () => {
    const dir = scratch();
    const json = path.join(dir, 'r.json');
    const r = await run('check', sample, '--json', json);
    expect(r.code).toBe(1);
    expect(r.out).toContain('no --criteria given: using the shipped set mil-f-8785c');
    expect(r.out).toMatch(/\+ pass/);
    expect(r.out).toMatch(/~ marginal/);
    expect(r.out).toMatch(/x FAIL/);
    const results = JSON.parse(readFileSync(json, 'utf8'));
    expect(results.format).toBe('modalgate-results/1');
    expect(results.aircraft).toEqual({ name: 'Ketra KT-4', class: 'I' });
    expect(results.inputs.map((i: { role: string }) => i.role)).toEqual(['model', 'criteria']);
    expect(results.inputs[0].sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(results.conditions.map((c: { id: string }) => c.id)).toEqual(['cruise-3000m', 'formation-2000m', 'approach-300m', 'climb-1500m']);
    const verdicts = new Set(results.conditions.flatMap((c: { findings: { verdict: string }[] }) => c.findings.map((f) => f.verdict)));
    expect(verdicts).toEqual(new Set(['pass', 'marginal', 'fail']));
    // The actuator state of the approach model is an "other" mode, never a flight mode.
    const approach = results.conditions[2];
    expect(approach.subsystems.other).toEqual(['de_act']);
    expect(approach.modes.find((m: { kind: string }) => m.kind === 'other').eigenvalues).toEqual([{ re: -18, im: 0 }]);
  });

  it('runs the bundled envelope sweep whose conditions come from a CSV table', async () => {
    const json = path.join(scratch(), 'env.json');
    const r = await run('check', path.join(root, 'samples/ketra-kt4-envelope.yaml'), '--json', json);
    expect(r.code).toBe(1);
    const results = JSON.parse(readFileSync(json, 'utf8'));
    expect(results.conditions).toHaveLength(30);
    expect(results.inputs.map((i: { role: string; path: string }) => [i.role, path.basename(i.path)])).toEqual([
      ['model', 'ketra-kt4-envelope.yaml'],
      ['table', 'ketra-kt4-envelope.csv'],
      ['criteria', 'mil-f-8785c.yaml'],
    ]);
  });

  it('--fail-on marginal turns a marginal finding into exit 1; the default does not', async () => {
    expect((await run('check', marginalOnly, '--json', path.join(scratch(), 'a.json'))).code).toBe(0);
    expect((await run('check', marginalOnly, '--fail-on', 'marginal', '--json', path.join(scratch(), 'b.json'))).code).toBe(1);
  });

  it('writes the HTML beside the model when no output is named, and says where', async () => {
    const dir = scratch();
    const model = path.join(dir, 'kestrel.yaml');
    copyFileSync(marginalOnly, model);
    const r = await run('check', model);
    const expected = path.join(dir, 'kestrel.review.html');
    expect(r.out).toContain(`wrote HTML ${expected}`);
    expect(readFileSync(expected, 'utf8')).toContain('Test Kestrel');
  });

  it('bad input: exit 2, the place and the field named, and no output file written or clobbered', async () => {
    const dir = scratch();
    const json = path.join(dir, 'r.json');
    const html = path.join(dir, 'r.html');
    writeFileSync(html, 'previous report');
    const r = await run('check', badAirspeed, '--json', json, '--html', html);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${badAirspeed}:7:15: conditions[0].airspeed:`);
    expect(r.err).toContain('found "fast"');
    expect(r.err).toContain('nothing was written');
    expect(existsSync(json)).toBe(false);
    expect(readFileSync(html, 'utf8')).toBe('previous report');
  });

  it('a failure while rendering the PDF leaves every earlier report byte-identical', async () => {
    const dir = scratch();
    const html = path.join(dir, 'r.html');
    const pdf = path.join(dir, 'r.pdf');
    writeFileSync(html, 'previous html');
    writeFileSync(pdf, 'previous pdf');
    const r = await run('check', marginalOnly, '--html', html, '--pdf', pdf, '--browser', '/bin/false');
    expect(r.code).toBe(2);
    expect(r.err).toContain('[browser_failed]');
    expect(readFileSync(html, 'utf8')).toBe('previous html');
    expect(readFileSync(pdf, 'utf8')).toBe('previous pdf');
  });

  it('an output that cannot be written is exit 2 before any work, and no other output is written', async () => {
    const dir = scratch();
    const json = path.join(dir, 'r.json');
    const html = path.join(dir, 'no-such-folder', 'r.html');
    const r = await run('check', sample, '--json', json, '--html', html);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${html}: --html: cannot write the output file: its folder does not exist (expected a file that can be written, found ENOENT) [output_unwritable]`);
    expect(r.out).not.toMatch(/summary:/); // nothing was checked
    expect(existsSync(json)).toBe(false);
    const folder = await run('check', sample, '--json', dir);
    expect(folder.code).toBe(2);
    expect(folder.err).toContain('a folder of that name is in the way');
  });

  it('a missing model file and a usage error are exit 2', async () => {
    const missing = await run('check', path.join(scratch(), 'nope.yaml'));
    expect(missing.code).toBe(2);
    expect(missing.err).toMatch(/nope\.yaml.*\[unreadable\]/);
    expect((await run('check', sample, '--fail-on', 'sometimes')).code).toBe(2);
    expect((await run('frobnicate')).code).toBe(2);
  });

  it('--baseline shows what changed since an earlier run', async () => {
    const dir = scratch();
    const first = path.join(dir, 'first.json');
    await run('check', marginalOnly, '--json', first);
    const second = await run('check', sample, '--json', path.join(dir, 'second.json'), '--baseline', first);
    expect(second.code).toBe(1);
    expect(second.out.toLowerCase()).toContain('baseline');
    const results = JSON.parse(readFileSync(path.join(dir, 'second.json'), 'utf8'));
    expect(results.inputs.map((i: { role: string }) => i.role)).toContain('baseline');
  });

  it('--junit writes one test case per condition and criterion, failures for failed findings', async () => {
    const dir = scratch();
    const junit = path.join(dir, 'r.xml');
    const json = path.join(dir, 'r.json');
    await run('check', sample, '--junit', junit, '--json', json);
    const xml = readFileSync(junit, 'utf8');
    const results = JSON.parse(readFileSync(json, 'utf8'));
    // a run of a few conditions keeps the mode shapes, and the file says so
    expect(results.contents).toEqual({ modeShapes: true });
    expect(results.conditions[0].modes[0].shape.length).toBeGreaterThan(0);
    const findings = results.conditions.flatMap((c: { findings: unknown[] }) => c.findings);
    expect(xml.startsWith('<?xml')).toBe(true);
    expect((xml.match(/<testcase /g) ?? []).length).toBe(findings.length);
    expect((xml.match(/<failure /g) ?? []).length).toBe(results.summary.fail);
  });
});

describe('modalgate check of a large sweep written to JSON and JUnit', () => {
  // 260 conditions of the invented benchmark aircraft: above 200 the results file is written
  // as the conditions are checked (results-json-file.ts), and the JUnit file always is
  // (junit-file.ts), unless the report or a comparison needs every result.
  const dir = scratch();
  const model = path.join(dir, 'sweep.json');
  execFileSync(process.execPath, [path.join(root, 'bench/make-sweep.mjs'), '--count', '260', '--seed', '11', '--out', model]);
  const strip = (text: string) => text.replace(/"command":\[[^\]]*\]/, '');

  it('writes the same file and terminal text as the run that keeps every result', async () => {
    const streamed = path.join(dir, 'streamed.json');
    const kept = path.join(dir, 'kept.json');
    const a = await run('check', model, '--json', streamed, '--junit', path.join(dir, 'streamed.xml'));
    // the report needs every result, so this run keeps them all and writes at the end
    const b = await run('check', model, '--json', kept, '--junit', path.join(dir, 'kept.xml'), '--html', path.join(dir, 'kept.html'));
    expect(a.code).toBe(b.code);
    expect(strip(readFileSync(streamed, 'utf8'))).toBe(strip(readFileSync(kept, 'utf8')));
    expect(readFileSync(path.join(dir, 'streamed.xml'), 'utf8')).toBe(readFileSync(path.join(dir, 'kept.xml'), 'utf8'));
    const terminal = (out: string) => out.split('\n').filter((l) => !l.startsWith('wrote '));
    expect(terminal(a.out)).toEqual(terminal(b.out));
    expect(a.out).toContain(`wrote JSON ${streamed}`);
    expect(a.out).toContain(`wrote JUNIT ${path.join(dir, 'streamed.xml')}`);
    expect(a.out).toMatch(/of 260 conditions not listed/);
    expect(a.out).toContain('260 conditions: mode shapes left out of the results JSON (more than 200 conditions; --mode-shapes to write them)');
  });

  it('leaves the mode shapes out of a sweep\'s results and says so in the file and the terminal; --mode-shapes writes them', async () => {
    const without = JSON.parse(readFileSync(path.join(dir, 'streamed.json'), 'utf8'));
    expect(without.contents).toEqual({ modeShapes: false });
    const modes = without.conditions.flatMap((c: { modes: object[] }) => c.modes);
    expect(modes.length).toBeGreaterThan(1000);
    expect(modes.some((m: object) => 'shape' in m || 'referenceState' in m)).toBe(false);

    const withShapes = path.join(dir, 'shapes.json');
    const r = await run('check', model, '--json', withShapes, '--mode-shapes');
    expect(r.out).not.toMatch(/mode shapes left out/);
    const full = JSON.parse(readFileSync(withShapes, 'utf8'));
    expect(full.contents).toEqual({ modeShapes: true });
    expect(full.conditions[0].modes[0].shape.length).toBeGreaterThan(0);
    // the same results but for the shapes (and the command line that asked for them)
    for (const c of full.conditions) for (const m of c.modes) {
      delete m.shape;
      delete m.referenceState;
    }
    expect({ ...full, command: [], contents: null }).toEqual({ ...without, command: [], contents: null });
  });

  it('writes JUnit alone as it checks, the same file as a run that keeps every result', async () => {
    const streamed = path.join(dir, 'alone.xml');
    const a = await run('check', model, '--junit', streamed);
    expect(a.code).toBe(1); // the sweep has failing findings
    expect(readFileSync(streamed, 'utf8')).toBe(readFileSync(path.join(dir, 'kept.xml'), 'utf8'));
  });

  it('a condition found bad half-way through: exit 2, the last good file untouched, no temporary file left', async () => {
    const written = JSON.parse(readFileSync(model, 'utf8'));
    written.conditions[240].phase = 'ZZ'; // no criteria category for it: found while evaluating
    const broken = path.join(dir, 'broken.json');
    writeFileSync(broken, JSON.stringify(written));
    const out = path.join(dir, 'out');
    mkdirSync(out);
    const json = path.join(out, 'results.json');
    const junit = path.join(out, 'results.xml');
    writeFileSync(json, 'the last good results');
    writeFileSync(junit, 'the last good JUnit');
    const r = await run('check', broken, '--json', json, '--junit', junit);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/ZZ/);
    expect(readFileSync(json, 'utf8')).toBe('the last good results');
    expect(readFileSync(junit, 'utf8')).toBe('the last good JUnit');
    expect(readdirSync(out).sort()).toEqual(['results.json', 'results.xml']);
  });
});

describe('modalgate modes and criteria', () => {
  it('modes prints the modal table and writes results with no findings', async () => {
    const json = path.join(scratch(), 'm.json');
    const r = await run('modes', sample, '--json', json);
    expect(r.code).toBe(0);
    expect(r.out).toContain('Dutch roll');
    const results = JSON.parse(readFileSync(json, 'utf8'));
    expect(results.conditions.every((c: { findings: unknown[] }) => c.findings.length === 0)).toBe(true);
  });

  it('criteria check accepts the shipped programme template; criteria show prints the resolved set', async () => {
    const check = await run('criteria', 'check', path.join(root, 'criteria/programme-template.yaml'));
    expect(check.code).toBe(0);
    expect(check.out).toMatch(/valid; set .* \(mil-f-8785c > /);
    const show = await run('criteria', 'show', 'mil-f-8785c');
    expect(show.code).toBe(0);
    expect(show.out).toContain('dutch-roll-damping-cat-a');
    expect(show.out).toContain('MIL-F-8785C 3.3.1.1');
  });

  it('criteria check of a broken file is exit 2 with the place', async () => {
    const dir = scratch();
    const bad = path.join(dir, 'bad.yaml');
    writeFileSync(bad, 'format: modalgate-criteria/1\nid: broken\ntitle: Broken\ncriteria: 12\n');
    const r = await run('criteria', 'check', bad);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${bad}:4:`);
  });
});

describe('the installed command', () => {
  it('bin/modalgate.js sets the process exit code (2 for bad input)', () => {
    const r = spawnSync(process.execPath, [path.join(root, 'bin/modalgate.js'), 'check', badAirspeed], { encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('conditions[0].airspeed');
  });

  it('--help lists the commands', () => {
    const text = execFileSync(process.execPath, [path.join(root, 'bin/modalgate.js'), '--help'], { encoding: 'utf8' });
    for (const command of ['check', 'modes', 'criteria']) expect(text).toContain(command);
  });
});

describe('command line words and usage', () => {
  it('a usage error prints the error and one usage line, not the whole help (exit 2)', async () => {
    const r = await run('check', sample, '--bogus');
    expect(r.code).toBe(2);
    expect(r.err).toContain("unknown option '--bogus'");
    expect(r.err).toContain('usage: modalgate check [options] <model>');
    expect(r.err).not.toContain('--baseline');
    expect(r.err.split('\n').length).toBeLessThanOrEqual(3);
  });

  it('the help gives one default for --criteria', async () => {
    const r = await run('check', '--help');
    const help = `${r.out}\n${r.err}`;
    expect(help).toContain('default: mil-f-8785c');
    expect(help).not.toContain('default: []');
  });

  it('set ids are matched whatever their case; a close miss gets a "did you mean" and templates are named as such', async () => {
    const dir = scratch();
    const ok = await run('check', sample, '--criteria', 'MIL-F-8785C', '--json', path.join(dir, 'r.json'));
    expect(ok.code).toBe(1);
    const miss = await run('check', sample, '--criteria', 'mil-f-8875c', '--json', path.join(dir, 'r2.json'));
    expect(miss.code).toBe(2);
    expect(miss.err).toContain("did you mean 'mil-f-8785c'?");
    expect(miss.err).toContain('template to copy: criteria/programme-template.yaml');
    expect(miss.err).not.toMatch(/shipped sets: [^;)]*programme-template/);
  });

  it('the same set given twice is refused, naming both references', async () => {
    const dir = scratch();
    const r = await run('check', sample, '--criteria', 'mil-f-8785c', '--criteria', path.join(root, 'criteria/mil-f-8785c.yaml'), '--json', path.join(dir, 'r.json'));
    expect(r.code).toBe(2);
    expect(r.err).toContain("criteria set 'mil-f-8785c' is given twice");
    expect(existsSync(path.join(dir, 'r.json'))).toBe(false);
  });

  it('no internal snake_case name in the terminal tables', async () => {
    const dir = scratch();
    const r = await run('check', sample, '--json', path.join(dir, 'r.json'));
    const tables = r.out.split('\n').filter((l) => !l.includes('note:') && !l.startsWith('wrote'));
    expect(tables.join('\n')).not.toMatch(/\b[a-z]+_[a-z]+(_[a-z]+)*\b/);
  });
});
