import { describe, expect, it } from 'vitest';
import { shortPeriodData, dutchRollData } from '../../src/report/charts/chart-data.js';
import { dutchRollChart, dutchRollFloor } from '../../src/report/charts/dutch-roll-chart.js';
import { DAMPING_RAYS, sPlaneChart } from '../../src/report/charts/s-plane-chart.js';
import { lowerEdge, shortPeriodChart, upperEdge } from '../../src/report/charts/short-period-chart.js';
import { MODE_LABEL } from '../../src/report/labels.js';
import type { ConditionResult } from '../../src/types.js';
import { larkspurReview } from '../fixtures/results/larkspur-review.js';

function conditions(): ConditionResult[] {
  return larkspurReview().results.conditions;
}

function count(svg: string, pattern: RegExp): number {
  return svg.match(pattern)?.length ?? 0;
}

describe('s-plane map', () => {
  it('draws one pole marker per eigenvalue, and the slow ones again enlarged', () => {
    for (const c of conditions()) {
      const { svg } = sPlaneChart(c);
      const eigen = c.modes.flatMap((m) => m.eigenvalues).length;
      expect(count(svg!, /class="pole mark"/g)).toBe(eigen);
      expect(count(svg!, /class="pole-zoom mark"/g)).toBeGreaterThan(0);
    }
  });

  it('draws each constant-damping ray at acos(zeta) from the negative real axis', () => {
    const { svg } = sPlaneChart(conditions()[0]!);
    const rays = [...svg!.matchAll(/class="damping-ray" x1="([\d.-]+)" y1="([\d.-]+)" x2="([\d.-]+)" y2="([\d.-]+)"/g)];
    // two panels, upper and lower ray of each zeta
    expect(rays).toHaveLength(DAMPING_RAYS.length * 4);
    DAMPING_RAYS.forEach((zeta, i) => {
      const [, x1, y1, x2, y2] = rays[2 * i]!.map(Number) as number[];
      // Equal axis scales make the screen angle the true one: cos(angle) = zeta (common practice).
      const angle = Math.atan2(-(y2! - y1!), -(x2! - x1!));
      expect(Math.cos(angle)).toBeCloseTo(zeta, 2);
    });
  });

  it('numbers every mode beside its pole, with the key in the caption', () => {
    const c = conditions()[2]!;
    const { svg, caption } = sPlaneChart(c);
    const modes = c.modes.filter((m) => m.eigenvalues.length > 0);
    for (const label of ['short period', 'Dutch roll', 'other', 'phugoid', 'roll\u2013spiral (coupled)']) {
      const n = modes.findIndex((m) => MODE_LABEL[m.kind] === label) + 1;
      expect(n, label).toBeGreaterThan(0);
      expect(caption).toContain(`${n} ${label}`);
      expect(svg).toContain(`class="mode-label">${n}</text>`);
    }
  });

  it('says so when there are no poles', () => {
    const c = { ...conditions()[0]!, modes: [] };
    const out = sPlaneChart(c);
    expect(out.svg).toBeNull();
    expect(out.caption).toMatch(/No eigenvalues/);
  });
});

describe('short-period chart', () => {
  it('bounds each level by omega = sqrt(CAP n/alpha) and the minimum omega_sp', () => {
    const tf = conditions()[2]!; // Category A
    const data = shortPeriodData(tf);
    const l1 = data.levels.find((l) => l.level === 1)!;
    // MIL-F-8785C 3.2.2.1.1, Category A Level 1: CAP 0.28 to 3.6, omega_sp at least 1.0 rad/s (from memory)
    expect(l1).toEqual({ level: 1, capMin: 0.28, capMax: 3.6, omegaMin: 1 });
    expect(lowerEdge(l1, 10)).toBeCloseTo(Math.sqrt(2.8), 10);
    expect(upperEdge(l1, 10)).toBeCloseTo(6, 10);
    expect(lowerEdge(l1, 2)).toBe(1); // sqrt(0.56) = 0.748 lies under the frequency floor
    const l2 = data.levels.find((l) => l.level === 2)!;
    // Category A Level 2: CAP 0.16 to 10, omega_sp at least 0.6 rad/s (from memory)
    expect(lowerEdge(l2, 100)).toBeCloseTo(4, 10);
    expect(upperEdge(l2, 100)).toBeCloseTo(Math.sqrt(1000), 10);
  });

  it('puts the point at n/alpha = omega_sp^2 / CAP', () => {
    const tf = conditions()[2]!;
    const data = shortPeriodData(tf);
    // the fixture's n/alpha is 32.0 g/rad
    expect(data.nAlpha).toBeCloseTo(32, 8);
    const { svg, caption } = shortPeriodChart(tf);
    expect(count(svg!, /class="aircraft-point mark"/g)).toBe(1);
    expect(svg).toContain('Level 1');
    expect(svg).toContain('Level 2');
    expect(caption).toContain('Category A');
  });

  it('draws the split short period of the approach too', () => {
    const pa = conditions()[1]!;
    const out = shortPeriodChart(pa);
    expect(out.caption).toContain('PA-450: n/\u03b1 5.40');
    expect(out.svg).toContain('class="point-label">PA-450</text>');
  });

  it('says so when CAP findings or the mode are missing', () => {
    const c = conditions()[0]!;
    const noFindings = shortPeriodChart({ ...c, findings: c.findings.filter((f) => f.mode !== 'short_period') });
    expect(noFindings.svg).toBeNull();
    expect(noFindings.caption).toMatch(/No short-period CAP or frequency finding/);
    const noMode = shortPeriodChart({ ...c, modes: c.modes.filter((m) => m.kind !== 'short_period') });
    expect(noMode.svg).toBeNull();
    expect(noMode.caption).toMatch(/chart not drawn/);
  });
});

describe('Dutch roll chart', () => {
  it('takes the highest of the zeta, zeta*omega and omega limits as each level floor', () => {
    const cr = conditions()[0]!; // Category B
    const l1 = dutchRollData(cr).levels.find((l) => l.level === 1)!;
    // MIL-F-8785C 3.3.1.1, Category B Level 1: zeta 0.08, zeta*omega 0.15 rad/s, omega 0.4 rad/s (values seen)
    expect(l1).toEqual({ level: 1, zetaMin: 0.08, zetaOmegaMin: 0.15, omegaMin: 0.4 });
    expect(dutchRollFloor(l1, 1)).toBeCloseTo(0.15, 12); // the hyperbola governs below 1.875 rad/s
    expect(dutchRollFloor(l1, 3)).toBe(0.08);
    expect(dutchRollFloor(l1, 0.3)).toBe(Number.POSITIVE_INFINITY);
    const l3 = dutchRollData(cr).levels.find((l) => l.level === 3)!;
    // Level 3: zeta 0, omega 0.4 rad/s (values seen)
    expect(dutchRollFloor(l3, 1)).toBe(0);
  });

  it('draws the regions and the point, or says why not', () => {
    const pa = conditions()[1]!;
    const { svg } = dutchRollChart(pa);
    expect(count(svg!, /class="region region-l\d"/g)).toBe(3);
    expect(count(svg!, /class="aircraft-point mark"/g)).toBe(1);
    const missing = dutchRollChart({ ...pa, modes: pa.modes.filter((m) => m.kind !== 'dutch_roll') });
    expect(missing.svg).toBeNull();
    expect(missing.caption).toMatch(/No identified Dutch roll/);
  });

  it('escapes condition ids it prints', () => {
    const pa = { ...conditions()[1]!, id: '<b>x</b>' };
    const { svg } = dutchRollChart(pa);
    expect(svg).not.toContain('<b>');
    expect(svg).toContain('&lt;b&gt;x&lt;/b&gt;');
  });
});
