/** Frequency responses as input: CSV files beside the model, bad rows placed by row and column. */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { loadModel } from '../../src/load/load-model.js';
import { readFrequencyResponse } from '../../src/load/frequency-response-file.js';

const dir = 'test/fixtures/equivalent/measured';
const spec = {
  input: 'Fes',
  output: 'q' as const,
  file: 'x.csv',
  columns: { frequency: 'w', gain: 'g', phase: 'ph' },
  units: { frequency: 'Hz' as const, gain: 'ratio' as const, phase: 'rad' as const },
};

describe('frequency-response files', () => {
  it('reads rad/s, dB and deg from Hz, gain ratio and rad, and unwraps the phase', () => {
    const read = readFrequencyResponse(spec, { path: 'x.csv', text: 'w,g,ph\n1,10,3\n2,1,-3\n' });
    expect(read.response).not.toBeNull();
    const r = read.response!;
    expect(r.frequency).toEqual([2 * Math.PI, 4 * Math.PI]);
    expect(r.gain[0]).toBeCloseTo(20, 12); // 20 log10 10
    expect(r.gain[1]).toBeCloseTo(0, 12);
    expect(r.phase[0]).toBeCloseTo((3 * 180) / Math.PI, 9);
    // -3 rad is +3 rad minus 6 rad: the step is brought into (-180, 180] deg
    expect(r.phase[1]).toBeCloseTo((-3 * 180) / Math.PI + 360, 9);
  });

  it('reports every bad row by file, line and column, all at once (exit 2)', async () => {
    const err = await loadModel(`${dir}/bad-rows.yaml`).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).issues.map((i) => `${i.file}:${i.line}:${i.column}: ${i.field}: ${i.message} [${i.code}]`)).toEqual([
      `${dir}/bad-rows.csv:3:2: gain_db: not a number [not_a_number]`,
      `${dir}/bad-rows.csv:4:1: w: frequencies must increase (line 3 has 0.2) [not_increasing]`,
      `${dir}/bad-rows.csv:5:1: w: frequency must be positive [out_of_range]`,
      `${dir}/bad-rows.csv:5:3: phase_deg: not a number [not_a_number]`,
      `${dir}/fr-nz.csv:1:1: columns.frequency: no column 'omega' in the header [unknown_column]`,
    ]);
  });

  it('lists each response file among the inputs, role response', async () => {
    const { model, files } = await loadModel(`${dir}/fbw-measured.yaml`);
    expect(files.filter((f) => f.role === 'response').map((f) => f.path)).toEqual([`${dir}/fr-q.csv`, `${dir}/fr-nz.csv`, `${dir}/fr-p.csv`]);
    const c = model.conditions[0]!;
    expect(c.form).toBe('frequencyResponses');
    expect(c.system.states).toEqual([]);
    expect(c.frequencyResponses.map((r) => r.output)).toEqual(['q', 'nz', 'p']);
    expect(c.notes).toContain('given by frequency responses only: no state-space model, so no roots');
  });
});
