/**
 * The augmented-aircraft parts of the review document, on the shipped KT-4F sample (an
 * invented fly-by-wire variant given by frequency responses written by
 * samples/ketra-kt4f-responses.py): the equivalent-system table, a Bode overlay per fitted
 * response, the bandwidth chart with the criteria file's regions, and the terminal lines.
 */
import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/check.js';
import { renderHtml } from '../../src/report/html.js';
import { formatResultsText } from '../../src/report/terminal.js';
import { buildReportView } from '../../src/report/view-model.js';

const outcome = await runCheck({ model: 'samples/ketra-kt4f.yaml', criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-12-02T00:00:00Z' });
const condition = outcome.results.conditions[0]!;

describe('KT-4F sample: equivalent systems and bandwidth', () => {
  it('fits a valid pitch system (q and nz) and a valid roll system', () => {
    const [pitch, roll] = condition.equivalentSystems!;
    expect(pitch!.axis).toBe('pitch');
    expect(pitch!.method).toBe('q-and-nz');
    expect(pitch!.valid).toBe(true);
    expect(pitch!.mismatch).toBeLessThan(10);
    // Gibson dropback of the fitted system (steady-state form Ttheta2 - 2 zeta / w, memory high)
    const p = pitch!.parameters;
    expect(pitch!.dropback!.dropbackRatio).toBeCloseTo(1 / p['inverseTtheta2']! - (2 * p['dampingRatio']!) / p['naturalFrequency']!, 12);
    expect(roll!.axis).toBe('roll');
    expect(roll!.valid).toBe(true);
  });

  it('shows a Level 2 pitch time delay, a marginal roll delay and a Level 2 bandwidth point in Category A', () => {
    const verdict = (id: string) => condition.findings.find((f) => f.criterion === id)!;
    expect(verdict('equivalent-time-delay-pitch').level).toBe(2);
    expect(verdict('equivalent-time-delay-roll').verdict).toBe('marginal');
    expect(verdict('pitch-bandwidth-phase-delay-cat-a').level).toBe(2);
  });

  it('renders the table, one Bode overlay per fitted response and the bandwidth chart, all finite', () => {
    const html = renderHtml(buildReportView(outcome.results, outcome.sets, { reportId: 'MG-EQ' }));
    expect(html).toContain('<h3>Equivalent systems</h3>');
    expect(html).toContain('q and nz fitted together');
    for (const id of ['tracking-2000m-loes-pitch-q', 'tracking-2000m-loes-pitch-nz', 'tracking-2000m-loes-roll-p', 'tracking-2000m-bandwidth']) {
      expect(html).toContain(`id="${id}"`);
    }
    const bandwidth = html.slice(html.indexOf('class="chart chart-bandwidth'));
    expect(bandwidth.slice(0, bandwidth.indexOf('</svg>')).match(/class="region region-l/g)).toHaveLength(3);
    expect(html).not.toMatch(/NaN|Infinity/);
    // every finding on equivalent figures says so, a pass as well as the others
    const equivalentFindings = condition.findings.filter((f) => f.basis !== undefined).length;
    expect(equivalentFindings).toBeGreaterThanOrEqual(6);
    expect(html.match(/class="sub basis"><b>equivalent system: (pitch, q and nz fitted together|roll, p-only), M /g)).toHaveLength(equivalentFindings);
  });

  it('lists the equivalent systems in the terminal, with validity and the mismatch beside its guidance', () => {
    const text = formatResultsText(outcome.results, { findings: true, color: false, detail: 'all' });
    expect(text).toMatch(/pitch: q\/Fes +q-and-nz, 41 pts 0\.100-10\.0 rad\/s .* yes/);
    expect(text).toContain('equivalent-time-delay-pitch (equivalent)');
    expect(text).toMatch(/pitch-bandwidth-phase-delay-cat-a .* Level 1 region +Level 2/);
  });

  it('draws every condition of a sweep on one bandwidth chart in the envelope summary', () => {
    const second = { ...condition, id: 'tracking-2000m-b' };
    const sweep = { ...outcome.results, conditions: [condition, second] };
    const html = renderHtml(buildReportView(sweep, outcome.sets, { reportId: 'MG-EQ2' }));
    const at = html.indexOf('id="trend-bandwidth-pitch-bandwidth-phase-delay-cat-a"');
    expect(at).toBeGreaterThan(0);
    const svg = html.slice(at, html.indexOf('</svg>', at));
    expect(svg).toContain('2 condition(s) drawn');
    expect(svg.match(/<circle [^>]*r="(4|2.2)" fill="#000"/g)).toHaveLength(2); // the conditions, not the dot screen of Level 3
  });
});
