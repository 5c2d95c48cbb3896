/**
 * loadModel: reads a model file and the table it names (relative to the model file), and
 * returns every file read with its SHA-256 (FIPS 180-4; computed here independently with
 * node:crypto). runCheck lists the table among the results' inputs.
 */
import { createHash } from 'node:crypto';
import { mkdtempSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/check.js';
import { InputError } from '../../src/errors.js';
import { loadModel } from '../../src/load/load-model.js';

const dir = 'test/fixtures/models/tables';
const sha256 = (file: string) => createHash('sha256').update(readFileSync(file)).digest('hex');

function scratch(files: Record<string, string>): string {
  const root = mkdtempSync(join(tmpdir(), 'modalgate-load-'));
  for (const [name, text] of Object.entries(files)) {
    mkdirSync(join(root, name, '..'), { recursive: true });
    writeFileSync(join(root, name), text);
  }
  return root;
}

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

describe('loadModel', () => {
  it('reads the model and its table, and returns both with their SHA-256', async () => {
    const path = `${dir}/tarnwing-sweep-derivatives.yaml`;
    const loaded = await loadModel(path);
    expect(loaded.files).toEqual([
      { role: 'model', path, sha256: sha256(path) },
      { role: 'table', path: `${dir}/tarnwing-sweep-derivatives.csv`, sha256: sha256(`${dir}/tarnwing-sweep-derivatives.csv`) },
    ]);
    expect(loaded.model.conditions.map((c) => c.id)).toEqual(['cruise-8000ft', 'cruise-4000ft', 'climb-2000ft']);
  });

  it('finds the table relative to the model file, wherever the process runs', async () => {
    const root = scratch({ 'models/m.yaml': model('sweeps/s.csv'), 'models/sweeps/s.csv': 'id,phase,V,Xu,Xw,Zu,Zw\nc1,CR,50,-0.02,0.07,-0.3,-1.9\n' });
    const loaded = await loadModel(join(root, 'models/m.yaml'));
    expect(loaded.files.map((f) => [f.role, f.path])).toEqual([
      ['model', join(root, 'models/m.yaml')],
      ['table', join(root, 'models/sweeps/s.csv')],
    ]);
    expect(loaded.model.conditions[0]!.place).toEqual({ file: join(root, 'models/sweeps/s.csv'), line: 2 });
  });

  it('reports a missing table at the model\'s conditionTable.file, with its path', async () => {
    const root = scratch({ 'm.yaml': model('absent.csv') });
    const err = await loadModel(join(root, 'm.yaml')).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).message).toBe(`${join(root, 'm.yaml')}:5:9: conditionTable.file: the condition table ${join(root, 'absent.csv')} was not found [unreadable]`);
  });

  it('reads a model without a table as before (one file)', async () => {
    const path = 'test/fixtures/models/tarnwing-state-space-si.yaml';
    const loaded = await loadModel(path);
    expect(loaded.files).toEqual([{ role: 'model', path, sha256: sha256(path) }]);
  });
});

describe('runCheck with a condition table', () => {
  const request = (path: string) => ({ model: path, criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-01-01T00:00:00Z' });

  it('lists the table among the inputs, with role table', async () => {
    const path = `${dir}/tarnwing-sweep-state-space.yaml`;
    const { results } = await runCheck(request(path));
    expect(results.inputs.filter((i) => i.role !== 'criteria')).toEqual([
      { role: 'model', path, sha256: sha256(path) },
      { role: 'table', path: `${dir}/tarnwing-sweep-state-space.csv`, sha256: sha256(`${dir}/tarnwing-sweep-state-space.csv`) },
    ]);
    expect(results.conditions.map((c) => c.id)).toEqual(['approach-300m', 'cruise-2400m', 'cruise-3000m']);
  });

  it('places a phase that the criteria set does not know at its row of the table', async () => {
    const root = scratch({ 'm.yaml': model('s.csv'), 's.csv': 'id,phase,V,Xu,Xw,Zu,Zw\nc1,CR,50,-0.02,0.07,-0.3,-1.9\nc2,XX,50,-0.02,0.07,-0.3,-1.9\n' });
    const err = await runCheck(request(join(root, 'm.yaml'))).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(InputError);
    const [issue] = (err as InputError).issues;
    expect(issue).toMatchObject({ file: join(root, 's.csv'), line: 3, field: 'phase', found: '"XX"', code: 'unknown_phase' });
  });
});
