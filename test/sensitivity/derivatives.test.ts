/**
 * Every derivative the results report, against central finite differences of the whole
 * pipeline (model text -> parse -> build -> eigen-analysis -> identification -> evaluation),
 * over random models in every input form. The analytic side is the first-order eigenvalue
 * sensitivity d lambda = y^T dA x / (y^T x) (Wilkinson, The Algebraic Eigenvalue Problem,
 * 1965, ch. 2) chained through the figure formulas; the finite difference knows nothing of it.
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import type { ResolvedCriteriaSet } from '../../src/types.js';
import { FORMS, modelOf } from './models.js';
import { changed, checkText, sameFinding, shippedSet } from './pipeline.js';

let set: ResolvedCriteriaSet;
beforeAll(async () => {
  set = await shippedSet();
});

/** relative step of the finite difference */
const H = 1e-5;

describe('sensitivities: analytic derivative = finite difference of the whole pipeline', () => {
  for (const form of FORMS) {
    it(`${form}: every reported derivative, random models`, () => {
      let checked = 0;
      fc.assert(
        fc.property(fc.array(fc.double({ min: 0.85, max: 1.15, noNaN: true }), { minLength: 40, maxLength: 40 }), (list) => {
          const input = modelOf(form, list);
          const results = checkText(input, set, 'all');
          results.forEach((result, c) => {
            for (const finding of result.findings) {
              for (const s of finding.sensitivities ?? []) {
                const h = H * Math.abs(s.current);
                const at = (value: number) => {
                  const again = checkText(changed(input, s.parameter, value), set, 'none')[c]!;
                  return sameFinding(again.findings, result.findings, finding)?.value ?? NaN;
                };
                const fd = (at(s.current + h) - at(s.current - h)) / (2 * h);
                const scale = Math.abs(finding.value! / s.current) * 1e-6;
                expect(Math.abs(s.derivative - fd), `${form} ${finding.criterion} ${s.parameter}: analytic ${s.derivative}, difference ${fd}`).toBeLessThanOrEqual(
                  1e-4 * Math.abs(fd) + scale,
                );
                checked += 1;
              }
            }
          });
        }),
        { numRuns: 4, seed: 20261202 },
      );
      expect(checked).toBeGreaterThan(20);
    }, 120_000);
  }
});
