/**
 * A region criterion: two figures judged together as a point in a plane (e.g. pitch bandwidth
 * and phase delay, MIL-STD-1797A 4.2.1.2 guidance). The level is the best one whose polygon
 * holds the point; the margin is the smallest fractional change of one figure alone that
 * takes the point across the required level's boundary [-] (positive inside); within the
 * criteria set's relative marginal band of it the verdict is marginal.
 */
import { flat } from '../flat-string.js';
import type { Finding, Mode, Quantity } from '../types.js';
import { evaluators, isResponseRow, type CriterionArgs } from './evaluators.js';
import { findingEvidence } from './evidence.js';
import { judged } from './finding.js';
import { expandedLevelsOf, levelKey } from './level-bounds.js';
import { expandRegions, levelInRegions, relativeMargin } from './level-regions.js';

export function judgeRegion(args: CriterionArgs): Finding {
  const { criterion, requiredLevel, set } = args;
  const region = criterion.region!;
  const mode = { kind: criterion.mode, shape: [], eigenvalues: [] } as unknown as Mode;
  const figure = (q: Quantity) => {
    const row = evaluators[q];
    return isResponseRow(row) ? row.evaluateResponses(args) : row.evaluate(mode, args);
  };
  const x = figure(criterion.quantity);
  const y = figure(region.against);
  const bounds = expandedLevelsOf(criterion.levels);
  const evidence = findingEvidence(criterion, requiredLevel, false);
  const against = { quantity: region.against, value: y.value, unit: evaluators[region.against].unit };
  const method = [x.method, y.method].filter((m, i, all): m is string => m !== undefined && all.indexOf(m) === i).join('; ');
  if (x.value === null || y.value === null) {
    const reason = [x.reason, y.reason].filter((r): r is string => r !== undefined).join('; ');
    const finding = judged(criterion, bounds, evidence, x.value, null, 'not_evaluated', null, reason || 'a figure of the region is missing', method || undefined);
    finding.against = against;
    finding.region = expandRegions(region) as NonNullable<Finding['region']>;
    return finding;
  }
  const regions = expandRegions(region);
  const level = levelInRegions(regions, x.value, y.value);
  const margin = relativeMargin(regions[levelKey(requiredLevel)], x.value, y.value);
  const shownMargin = Number.isFinite(margin) ? margin : null;
  let verdict: Finding['verdict'];
  let reason: string;
  if (level === null || level > requiredLevel) {
    verdict = 'fail';
    reason = `${level === null ? 'no level reached' : `Level ${level} reached`}, Level ${requiredLevel} required (outside the Level ${requiredLevel} region)`;
  } else if (margin < set.marginalBand.relative) {
    verdict = 'marginal';
    reason = `Level ${level} reached (Level ${requiredLevel} required), within ${Math.round(set.marginalBand.relative * 100)} % of the Level ${requiredLevel} region's edge`;
  } else {
    verdict = 'pass';
    reason = `Level ${level} reached (Level ${requiredLevel} required)`;
  }
  const finding = judged(criterion, bounds, evidence, x.value, level, verdict, shownMargin, flat(reason), method || undefined);
  finding.against = against;
  finding.region = regions as NonNullable<Finding['region']>;
  return finding;
}
