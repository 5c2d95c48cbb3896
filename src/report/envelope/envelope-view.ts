/**
 * The envelope summary of a run with more than one condition: what the sweep covers, the
 * verdict matrix, the worst case of every criterion and the trends of the key figures.
 */
import type { ConditionResult, ResolvedCriteriaSet } from '../../types.js';
import type { EnvelopeView } from '../report-view.js';
import { coverageRows } from './coverage.js';
import { criterionColumns } from './criterion-columns.js';
import { envelopeTrends } from './trends.js';
import { verdictMatrix } from './verdict-matrix.js';
import { worstCases } from './worst-cases.js';
import { decidingNumbers } from '../what-would-move.js';

export function envelopeView(
  conditions: readonly ConditionResult[],
  sets: readonly ResolvedCriteriaSet[],
  anchorOf: (index: number) => string | null,
): EnvelopeView {
  const columns = criterionColumns(conditions, sets);
  return {
    conditionCount: conditions.length,
    coverage: coverageRows(conditions),
    matrix: verdictMatrix(conditions, columns, anchorOf),
    worstCases: worstCases(conditions, columns, anchorOf),
    trends: envelopeTrends(conditions),
    trendNote:
      'One mark per condition, its shape the verdict of the findings on that figure (the worst, where several criteria judge it). ' +
      'A boundary line is drawn only where one Level 1 bound holds for every condition; the hatched side is outside Level 1.',
    deciding: decidingNumbers(conditions),
  };
}
