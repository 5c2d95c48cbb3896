/**
 * The responses part of a condition's section in the review document, from the shipped sample
 * (every condition names its controls): the tables, the bandwidth figures, the charts, and the
 * envelope trends of time to bank and pitch bandwidth. Values are the sample's own (computed),
 * checked against the results they come from; the rendering must be greyscale and self-contained.
 */
import { describe, expect, it } from 'vitest';
import { runCheck } from '../../src/check.js';
import { renderOutputs } from '../../src/outputs.js';
import { responseCurves } from '../../src/responses/response-curves.js';
import { buildReportView } from '../../src/report/view-model.js';
import { envelopeTrends } from '../../src/report/envelope/trends.js';

const outcome = await runCheck({ model: 'samples/ketra-kt4.yaml', criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-12-02T00:00:00Z', workers: 0 });
const byId = new Map(outcome.model.conditions.map((c) => [c.id, c]));
const curvesOf = (c: (typeof outcome.results.conditions)[number]) => responseCurves(byId.get(c.id)!, c.responses!, c.modes);

describe('responses section of the sample review', () => {
  const view = buildReportView(outcome.results, outcome.sets, { reportId: 'T', responseCurves: curvesOf });
  const approach = view.conditions.find((c) => c.id === 'approach-300m')!;
  const r = approach.responses!;

  it('lists the three controls, with the reversed elevator and rudder said', () => {
    expect(r.controls.map((c) => [c.axis, c.input, c.max])).toEqual([['pitch', 'de_cmd', 'not given'], ['roll', 'da', '0.350 rad'], ['yaw', 'dr', 'not given']]);
    expect(r.controls[0]!.sense).toMatch(/^reversed/);
  });

  it('has one transfer-function row per control and output, gains as in the results', () => {
    const results = outcome.results.conditions.find((c) => c.id === 'approach-300m')!.responses!;
    expect(r.transferFunctions.map((t) => t.channel)).toEqual(results.transferFunctions.map((t) => `${t.output} / ${t.input} (${t.axis})`));
    expect(r.transferFunctions).toHaveLength(10);
  });

  it('gives the pitch bandwidth figures: the actuator lag brings omega180 into the band', () => {
    const figure = (name: string) => r.figures.find((f) => f.name === name)!;
    expect(figure('\u03c9180').value).toMatch(/rad\/s$/);
    expect(figure('phase delay \u03c4p').value).toMatch(/ s$/);
    expect(figure('pitch bandwidth').how).toMatch(/bandwidth of \u03b8 \/ de_cmd/);
  });

  it('draws a Bode diagram and a step chart per control, in black and grey only', () => {
    expect(r.charts.map((c) => c.id)).toEqual([
      'approach-300m-bode-pitch', 'approach-300m-step-pitch', 'approach-300m-bode-roll', 'approach-300m-step-roll', 'approach-300m-bode-yaw', 'approach-300m-step-yaw',
    ]);
    for (const chart of r.charts) {
      expect(chart.svg).not.toBeNull();
      const colours = new Set([...chart.svg!.matchAll(/#([0-9a-fA-F]{3,6})\b/g)].map((m) => m[1]!.toLowerCase()));
      for (const c of colours) {
        const hex = c.length === 3 ? c.split('').map((d) => d + d).join('') : c;
        expect(hex.slice(0, 2) === hex.slice(2, 4) && hex.slice(2, 4) === hex.slice(4, 6), `colour #${c} is not a grey`).toBe(true);
      }
    }
    // the roll step marks the 30 deg requirement of MIL-F-8785C 3.3.4 (Class I, Category C: 1.3 / 1.8 s, from memory)
    expect(r.charts.find((c) => c.id === 'approach-300m-step-roll')!.svg).toContain('30.0 deg by L1 1.30 s, L2 1.80 s');
  });

  it('the time-to-bank table gives 30, 45, 60, 90 deg and the 25 deg a criterion names', () => {
    expect(r.timeToBank.map((t) => t.angle)).toEqual(['25.0 deg', '30.0 deg', '45.0 deg', '60.0 deg', '90.0 deg']);
    expect(r.timeToBank[2]!.time).toBe('not reached in 10 s');
  });
});

describe('the rendered document', () => {
  it('holds the responses of every condition, and loads nothing from outside', async () => {
    const [html] = await renderOutputs(outcome, { html: 'x.html', detail: 'all', paper: 'A4', failOn: 'fail' } as never);
    const text = String(html!.data);
    expect(text.match(/Responses to the cockpit controls/g)).toHaveLength(4);
    expect(text).not.toMatch(/<(img|script|link)\b[^>]*(src|href)=/i);
  });
});

describe('envelope trends', () => {
  it('add time to bank and pitch bandwidth when the conditions have controls, and leave them out otherwise', async () => {
    const sweep = await runCheck({ model: 'samples/ketra-kt4-envelope.yaml', criteria: ['mil-f-8785c'], toolVersion: 'test', command: [], generatedAt: '2026-12-02T00:00:00Z', workers: 0 });
    const titles = envelopeTrends(sweep.results.conditions).map((c) => c.title);
    expect(titles).toContain('Time to bank (roll performance) against airspeed');
    expect(titles).toContain('Pitch attitude bandwidth against airspeed');
    const bare = sweep.results.conditions.map((c) => ({ ...c, responses: null, findings: c.findings.filter((f) => f.quantity !== 'time_to_bank') }));
    const none = envelopeTrends(bare).map((c) => c.title);
    expect(none.some((t) => t.startsWith('Time to bank') || t.startsWith('Pitch attitude'))).toBe(false);
  });
});
