/**
 * Files from anywhere: a model names only files inside its own folder (unless the caller trusts
 * another), a problem with such a file never echoes what the file holds, and only regular files
 * up to the stated size are read (a FIFO, /dev/zero or a folder neither hangs nor fills memory).
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, symlinkSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { loadCriteriaSet } from '../../src/load/criteria-file.js';
import { loadModel } from '../../src/load/load-model.js';
import { INPUT_LIMIT_BYTES, readInputFile } from '../../src/load/read-file.js';

const SECRET = 'root:x:0:0:do-not-echo-me';

const model = (table: string) => `format: modalgate-model/1
aircraft: { name: Test Case, class: I }
units: SI
conditionTable:
  file: ${table}
  common: { stateSpace: { states: [u, w] } }
  columns:
    id: id
    phase: phase
    airspeed: V
    stateSpace.A[u][u]: Xu
    stateSpace.A[u][w]: Xw
    stateSpace.A[w][u]: Zu
    stateSpace.A[w][w]: Zw
`;
const TABLE = 'id,phase,V,Xu,Xw,Zu,Zw\nc1,CR,50,-0.04,0.04,-0.3,-2\n';

/** A folder holding `model/m.yaml` (naming `table`) and, beside `model/`, an `outside/` folder. */
function layout(table: string): { root: string; modelPath: string } {
  const root = mkdtempSync(join(tmpdir(), 'modalgate-contain-'));
  mkdirSync(join(root, 'model'));
  mkdirSync(join(root, 'outside'));
  writeFileSync(join(root, 'outside', 'secret.csv'), `${SECRET}\nmore,lines\n`);
  writeFileSync(join(root, 'outside', 'table.csv'), TABLE);
  const modelPath = join(root, 'model', 'm.yaml');
  writeFileSync(modelPath, model(table));
  return { root, modelPath };
}

async function messageOf(run: Promise<unknown>): Promise<string> {
  const err = await run.then(() => undefined, (e: unknown) => e);
  expect(err).toBeInstanceOf(InputError);
  return (err as InputError).message;
}

describe('a model names only files inside its folder', () => {
  it('../ out of the folder is refused at conditionTable.file, and the file is not echoed', async () => {
    const { modelPath } = layout('../outside/secret.csv');
    const message = await messageOf(loadModel(modelPath));
    expect(message).toMatch(new RegExp(`^${modelPath}:5:9: conditionTable\\.file: the condition table .*secret\\.csv lies outside the model's folder .*; a model may name only files inside its folder \\(--trust-folder <folder> allows another\\)`));
    expect(message).toContain('[outside_folder]');
    expect(message).not.toContain('root:x');
  });

  it('an absolute path and a link inside the folder that points out are refused too', async () => {
    const { root, modelPath } = layout('PLACEHOLDER');
    writeFileSync(modelPath, model(join(root, 'outside', 'secret.csv')));
    expect(await messageOf(loadModel(modelPath))).toContain('[outside_folder]');
    symlinkSync(join(root, 'outside', 'secret.csv'), join(root, 'model', 'linked.csv'));
    writeFileSync(modelPath, model('linked.csv'));
    const message = await messageOf(loadModel(modelPath));
    expect(message).toContain('[outside_folder]');
    expect(message).not.toContain('root:x');
  });

  it('a folder the caller trusts widens it', async () => {
    const { root, modelPath } = layout('../outside/table.csv');
    const loaded = await loadModel(modelPath, { trustedFolders: [join(root, 'outside')] });
    expect(loaded.model.conditions.map((c) => c.id)).toEqual(['c1']);
  });

  it('a file of the wrong shape in a trusted folder is reported by its offending cells only, never whole lines', async () => {
    const { root, modelPath } = layout('../outside/secret.csv');
    const message = await messageOf(loadModel(modelPath, { trustedFolders: [join(root, 'outside')] }));
    expect(message).toContain(`${modelPath}:8:5: conditionTable.columns.id: column 'id' is not in the header of ${join(root, 'outside', 'secret.csv')} (expected a column headed "id", found 1 other column(s)) [missing_column]`);
    expect(message).toContain('secret.csv:1:1: column \'root:x:0:0:do-not-echo-me\' is not mapped'); // the offending cell
    expect(message).not.toContain('more,lines');
  });

  it('a missing table and a folder named as the table are reported at conditionTable.file', async () => {
    const { root, modelPath } = layout('absent.csv');
    expect(await messageOf(loadModel(modelPath))).toBe(`${modelPath}:5:9: conditionTable.file: the condition table ${join(root, 'model', 'absent.csv')} was not found [unreadable]`);
    mkdirSync(join(root, 'model', 'tables'));
    writeFileSync(modelPath, model('tables'));
    expect(await messageOf(loadModel(modelPath))).toBe(`${modelPath}:5:9: conditionTable.file: the condition table ${join(root, 'model', 'tables')} is a folder, not a file [unreadable]`);
  });
});

describe('a criteria file extends only shipped sets and files in its folder', () => {
  it('a file outside is refused at extends; a trusted folder widens it; a shipped set by path is fine', async () => {
    const root = mkdtempSync(join(tmpdir(), 'modalgate-extends-'));
    mkdirSync(join(root, 'sets'));
    mkdirSync(join(root, 'common'));
    const shipped = fileURLToPath(new URL('../../criteria/mil-f-8785c.yaml', import.meta.url));
    // the common base only extends the shipped set and renames it
    writeFileSync(join(root, 'common', 'base.yaml'), `format: modalgate-criteria/1\nid: common-base\ntitle: Common base\nextends: ${shipped}\ncriteria: []\n`);
    writeFileSync(join(root, 'sets', 'c.yaml'), 'format: modalgate-criteria/1\nid: programme\ntitle: Programme\nextends: ../common/base.yaml\ncriteria: []\n');
    const message = await messageOf(loadCriteriaSet(join(root, 'sets', 'c.yaml')));
    expect(message).toContain(`${join(root, 'sets', 'c.yaml')}:4:10: extends: the criteria file ${join(root, 'common', 'base.yaml')} lies outside the folder of`);
    const set = await loadCriteriaSet(join(root, 'sets', 'c.yaml'), { trustedFolders: [join(root, 'common')] }).catch((e: unknown) => e);
    expect(set instanceof InputError ? set.message : '').toBe('');
    expect((set as { set: { chain: string[] } }).set.chain).toEqual(['mil-f-8785c', 'common-base', 'programme']);
  });
});

describe('only regular files, up to the size limit, are read', () => {
  const dir = mkdtempSync(join(tmpdir(), 'modalgate-regular-'));

  it('/dev/zero is refused at once (a device would be read for ever)', async () => {
    expect(await messageOf(readInputFile('/dev/zero'))).toBe('/dev/zero: is not a regular file (a FIFO, socket or device); only regular files are read (found a character device) [unreadable]');
  });

  it('a FIFO with no writer neither blocks the open nor is read', async () => {
    const fifo = join(dir, 'model.yaml');
    expect(spawnSync('mkfifo', [fifo]).status).toBe(0);
    expect(await messageOf(readInputFile(fifo))).toBe(`${fifo}: is not a regular file (a FIFO, socket or device); only regular files are read (found a FIFO) [unreadable]`);
  }, 5_000);

  it('a folder is named as one', async () => {
    expect(await messageOf(readInputFile(dir))).toBe(`${dir}: is a folder, not a file [unreadable]`);
  });

  it('an empty file says "empty"', async () => {
    const empty = join(dir, 'empty.yaml');
    writeFileSync(empty, '');
    expect(await messageOf(readInputFile(empty))).toBe(`${empty}: is empty (found 0 bytes) [unreadable]`);
  });

  it(`a file above the limit (${INPUT_LIMIT_BYTES / 1024 / 1024} MiB) is refused before it is read`, async () => {
    const big = join(dir, 'big.yaml');
    writeFileSync(big, '');
    truncateSync(big, INPUT_LIMIT_BYTES + 1); // sparse: no disk used
    expect(await messageOf(readInputFile(big))).toBe(`${big}: is larger than the 256 MiB limit for an input file (found 256 MiB) [unreadable]`);
  });

  it('a criteria file that is a device or a FIFO is refused the same way', async () => {
    const fifo = join(dir, 'criteria.yaml');
    expect(spawnSync('mkfifo', [fifo]).status).toBe(0);
    expect(await messageOf(loadCriteriaSet(fifo))).toBe(`${fifo}: the file is not a regular file (a FIFO, socket or device); only regular files are read: ${fifo} (shipped sets: civil-dynamic-stability, mil-f-8785c; template to copy: criteria/programme-template.yaml) [unreadable]`);
  }, 5_000);
});
