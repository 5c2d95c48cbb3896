/**
 * Outputs are never lost: no output may be an input or share a file with another output, a
 * device or FIFO is never renamed over, a full disk is reported as such, the set of outputs is
 * put in place as one (a failure restores the earlier ones), temporaries left by a stopped run
 * are removed by the next one, and two runs writing the same outputs at once leave one run's set.
 */
import { spawn, spawnSync } from 'node:child_process';
import { copyFileSync, existsSync, lstatSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from './run-cli.js';
import { commitFiles, newTemporary, prepareFile, removeLiveTemporaries, writeFileAtomic } from '../src/report/write-atomic.js';
import { writeArtifacts } from '../src/outputs.js';

const root = path.resolve(import.meta.dirname, '..');
const sample = path.join(root, 'samples/ketra-kt4.yaml');
const envelope = path.join(root, 'samples/ketra-kt4-envelope.yaml');

const run = runCli;

function scratch(): string {
  return mkdtempSync(path.join(tmpdir(), 'modalgate-outputs-'));
}

/** A copy of the sample model in a folder of its own. */
function modelIn(dir: string): string {
  const model = path.join(dir, 'model.yaml');
  copyFileSync(sample, model);
  return model;
}

/** Hidden files a run leaves beside its outputs (temporaries, kept files, locks). */
function hidden(dir: string): string[] {
  return readdirSync(dir).filter((n) => n.startsWith('.'));
}

/**
 * A character device to write to: as root, a fresh node in a scratch folder (a writer that
 * renamed over it would otherwise replace the machine's /dev/null); else the system's own.
 */
function device(name: 'null' | 'full'): string {
  if (process.getuid?.() !== 0) return `/dev/${name}`;
  const node = path.join(scratch(), name);
  expect(spawnSync('mknod', ['-m', '666', node, 'c', '1', name === 'null' ? '3' : '7']).status).toBe(0);
  return node;
}

/** The id of a process that has exited. */
function deadPid(): number {
  return spawnSync(process.execPath, ['-e', '0']).pid!;
}

describe('no output may be an input', () => {
  it('--json naming the model file is exit 2 before any work, and the model is untouched', async () => {
    const dir = scratch();
    const model = modelIn(dir);
    const before = readFileSync(model);
    const r = await run('check', model, '--json', model);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${model}: --json: this output would overwrite the model file ${model}; choose another path`);
    expect(r.err).toContain('[output_is_input]');
    expect(r.out).not.toMatch(/summary:/);
    expect(readFileSync(model).equals(before)).toBe(true);
  });

  it('is compared by real path: another spelling and a link to the model are caught', async () => {
    const dir = scratch();
    const model = modelIn(dir);
    mkdirSync(path.join(dir, 'sub'));
    const spelt = path.join(dir, 'sub', '..', 'model.yaml');
    const link = path.join(dir, 'link.yaml');
    symlinkSync(model, link);
    const r = await run('check', model, '--html', spelt);
    expect(r.code).toBe(2);
    expect(r.err).toContain('--html: this output would overwrite the model file');
    const l = await run('check', model, '--junit', link);
    expect(l.code).toBe(2);
    expect(l.err).toContain('--junit: this output would overwrite the model file');
    expect(readFileSync(model, 'utf8')).toBe(readFileSync(sample, 'utf8'));
  });

  it('the condition table, a criteria file and the baseline are inputs too', async () => {
    const dir = scratch();
    const model = path.join(dir, 'env.yaml');
    copyFileSync(envelope, model);
    copyFileSync(path.join(root, 'samples/ketra-kt4-envelope.csv'), path.join(dir, 'ketra-kt4-envelope.csv'));
    const table = path.join(dir, 'ketra-kt4-envelope.csv');
    const tableText = readFileSync(table, 'utf8');
    const t = await run('check', model, '--json', table);
    expect(t.code).toBe(2);
    expect(t.err).toContain(`--json: this output would overwrite the condition table ${table}`);
    expect(readFileSync(table, 'utf8')).toBe(tableText);

    const criteria = path.join(dir, 'programme.yaml');
    copyFileSync(path.join(root, 'criteria/mil-f-8785c.yaml'), criteria);
    const c = await run('check', sample, '--criteria', criteria, '--junit', criteria);
    expect(c.code).toBe(2);
    expect(c.err).toContain(`--junit: this output would overwrite the criteria file ${criteria}`);

    const baseline = path.join(dir, 'base.json');
    expect((await run('check', sample, '--json', baseline)).code).toBe(1);
    const baselineText = readFileSync(baseline, 'utf8');
    const b = await run('check', sample, '--baseline', baseline, '--json', baseline);
    expect(b.code).toBe(2);
    expect(b.err).toContain(`--json: this output would overwrite the baseline file ${baseline}`);
    expect(readFileSync(baseline, 'utf8')).toBe(baselineText);
  });
});

describe('outputs do not share a file', () => {
  it('--html x --json x is exit 2 naming both options, before any work', async () => {
    const dir = scratch();
    const x = path.join(dir, 'x');
    const r = await run('check', sample, '--html', x, '--json', x);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${x}: --json: the same file is also named by --html; each output needs a file of its own`);
    expect(r.out).not.toMatch(/summary:/);
    expect(existsSync(x)).toBe(false);
  });

  it('an empty output path is exit 2, not a silent default report', async () => {
    const dir = scratch();
    const model = modelIn(dir);
    const r = await run('check', model, '--json', '');
    expect(r.code).toBe(2);
    expect(r.err).toContain('<command line>: --json: the output path is empty');
    expect(readdirSync(dir)).toEqual(['model.yaml']);
  });
});

describe('targets that are not regular files', () => {
  it('a character device is written through, never renamed over (a null device stays a device)', async () => {
    const sink = device('null');
    const r = await run('check', sample, '--json', sink);
    expect(r.code).toBe(1);
    expect(r.out).toContain(`wrote JSON ${sink}`);
    expect(statSync(sink).isCharacterDevice()).toBe(true);
  });

  it('a full disk is reported as such (a full device), exit 2, and /dev/full is still a device', async () => {
    const dir = scratch();
    const html = path.join(dir, 'r.html');
    writeFileSync(html, 'previous report');
    const full = device('full');
    const r = await run('check', sample, '--json', full, '--html', html);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${full}: output: cannot write the output file: the disk is full (expected a file that can be written, found ENOSPC) [output_unwritable]`);
    expect(r.err).toContain('nothing was written');
    expect(statSync(full).isCharacterDevice()).toBe(true);
    expect(readFileSync(html, 'utf8')).toBe('previous report');
    expect(hidden(dir)).toEqual([]);
  });

  it('a FIFO is refused before any work and stays a FIFO', async () => {
    const dir = scratch();
    const fifo = path.join(dir, 'pipe.json');
    expect(spawnSync('mkfifo', [fifo]).status).toBe(0);
    const r = await run('check', sample, '--json', fifo);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${fifo}: --json: cannot write the output file: it is not a regular file (a FIFO, socket or block device)`);
    expect(r.out).not.toMatch(/summary:/);
    expect(lstatSync(fifo).isFIFO()).toBe(true);
  });

  it('a link to a report is followed: the file it points to is replaced, the link kept', async () => {
    const dir = scratch();
    const real = path.join(dir, 'real.json');
    const link = path.join(dir, 'link.json');
    writeFileSync(real, 'old');
    symlinkSync(real, link);
    expect((await run('check', sample, '--json', link)).code).toBe(1);
    expect(lstatSync(link).isSymbolicLink()).toBe(true);
    expect(JSON.parse(readFileSync(real, 'utf8')).format).toBe('modalgate-results/1');
  });
});

describe('the output set is put in place as one', () => {
  it('when the third output cannot be put in place, the first two get their previous content back', async () => {
    const dir = scratch();
    const paths = ['a.html', 'b.json', 'c.xml'].map((n) => path.join(dir, n));
    paths.forEach((p, i) => writeFileSync(p, `previous ${i}`));
    const prepared = [];
    for (const p of paths) prepared.push(await prepareFile(p, `new ${p}`));
    // the third one's written file goes missing before it is put in place: its rename fails
    const third = prepared[2]!;
    if (!('temp' in third)) throw new Error('expected a temporary file');
    rmSync(third.temp);
    await expect(commitFiles(prepared)).rejects.toThrow(/c\.xml: output: cannot write the output file: its folder does not exist/);
    paths.forEach((p, i) => expect(readFileSync(p, 'utf8')).toBe(`previous ${i}`));
    expect(hidden(dir)).toEqual([]);
  });

  it('a new output put in place before the failure is removed again', async () => {
    const dir = scratch();
    const fresh = path.join(dir, 'new.json');
    const existing = path.join(dir, 'old.html');
    writeFileSync(existing, 'previous');
    const a = await prepareFile(fresh, 'new');
    const b = await prepareFile(existing, 'new');
    if (!('temp' in b)) throw new Error('expected a temporary file');
    rmSync(b.temp);
    await expect(commitFiles([a, b])).rejects.toThrow();
    expect(existsSync(fresh)).toBe(false);
    expect(readFileSync(existing, 'utf8')).toBe('previous');
  });

  it('two runs writing the same two outputs at once leave one run\'s set, never a mix', async () => {
    const dir = scratch();
    const html = path.join(dir, 'r.html');
    const json = path.join(dir, 'r.json');
    for (let round = 0; round < 20; round += 1) {
      const set = (who: string) => writeArtifacts([
        { kind: 'html', path: html, data: `${who}`.repeat(50_000) },
        { kind: 'json', path: json, data: `${who}`.repeat(50_000) },
      ]);
      await Promise.all([set('A'), set('B')]);
      expect(readFileSync(html, 'utf8')[0], `round ${round}`).toBe(readFileSync(json, 'utf8')[0]);
    }
    expect(hidden(dir)).toEqual([]);
  });

  it('waits while another live run holds the lock beside an output, and takes over one left by a dead run', async () => {
    const dir = scratch();
    const out = path.join(dir, 'r.json');
    const lock = path.join(dir, '.r.json.modalgate.lock');
    writeFileSync(lock, `${process.pid}\n`); // held by a live process (this one)
    let done = false;
    const writing = writeFileAtomic(out, 'new').then(() => (done = true));
    await new Promise((resolve) => setTimeout(resolve, 150));
    expect(done).toBe(false);
    expect(existsSync(out)).toBe(false);
    rmSync(lock);
    await writing;
    expect(readFileSync(out, 'utf8')).toBe('new');

    writeFileSync(lock, `${deadPid()}\n`);
    await writeFileAtomic(out, 'newer');
    expect(readFileSync(out, 'utf8')).toBe('newer');
    expect(hidden(dir)).toEqual([]);
  });
});

describe('temporary files of a stopped run', () => {
  it('the next run writing the same output removes those of runs that no longer exist, and only those', async () => {
    const dir = scratch();
    const out = path.join(dir, 'r.json');
    const dead = `.r.json.modalgate-${deadPid()}-0123abcd.tmp`;
    const alive = `.r.json.modalgate-${process.pid}-0123abcd.tmp`;
    const other = '.notes.txt.modalgate-1-0123abcd.tmp';
    for (const n of [dead, alive, other]) writeFileSync(path.join(dir, n), 'left over');
    expect((await run('check', sample, '--json', out)).code).toBe(1);
    expect(hidden(dir).sort()).toEqual([other, alive].sort());
  });

  it('a signal while outputs are written removes this run\'s temporaries', () => {
    const dir = scratch();
    const temp = newTemporary(path.join(dir, 'r.json'));
    writeFileSync(temp, 'half');
    expect(removeLiveTemporaries()).toBe(true);
    expect(existsSync(temp)).toBe(false);
  });

  it('a large sweep stopped by SIGTERM half-way leaves at most its temporary file, which the next run removes', async () => {
    const dir = scratch();
    const model = path.join(dir, 'big.yaml');
    const envelopeText = readFileSync(envelope, 'utf8');
    writeFileSync(path.join(dir, 'ketra-kt4-envelope.csv'), readFileSync(path.join(root, 'samples/ketra-kt4-envelope.csv')));
    writeFileSync(model, envelopeText);
    const out = path.join(dir, 'r.json');
    writeFileSync(out, 'the last good results');
    // many copies of the envelope table make a sweep long enough to stop half-way
    const table = readFileSync(path.join(dir, 'ketra-kt4-envelope.csv'), 'utf8').split('\n');
    const header = table[0]!;
    const body = table.slice(1).filter((l) => l.trim() !== '');
    const idColumn = 0; // the 'case' column holds the condition id
    const big = [header];
    for (let copy = 0; copy < Math.ceil(20_000 / body.length); copy += 1) {
      for (const line of body) {
        const cells = line.split(',');
        cells[idColumn] = `${cells[idColumn]}-${copy}`;
        big.push(cells.join(','));
      }
    }
    writeFileSync(path.join(dir, 'ketra-kt4-envelope.csv'), `${big.join('\n')}\n`);
    const child = spawn(process.execPath, [path.join(root, 'bin/modalgate.js'), 'check', model, '--json', out], { stdio: 'ignore' });
    const exited = new Promise((resolve) => child.on('exit', resolve));
    // stop it once its temporary results file exists
    const started = Date.now();
    while (!hidden(dir).some((n) => n.endsWith('.tmp')) && Date.now() - started < 20_000) await new Promise((r) => setTimeout(r, 20));
    expect(hidden(dir).some((n) => n.endsWith('.tmp'))).toBe(true);
    child.kill('SIGTERM');
    await exited;
    expect(readFileSync(out, 'utf8')).toBe('the last good results');
    expect(hidden(dir).filter((n) => !n.endsWith('.tmp'))).toEqual([]);
    // the next run (here a small one writing the same output) sweeps what the stopped one left
    expect((await run('check', sample, '--json', out)).code).toBe(1);
    expect(hidden(dir)).toEqual([]);
  }, 60_000);
});
