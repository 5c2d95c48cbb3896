/**
 * The evaluator table: one row per bounded quantity. A row turns a mode (with its condition
 * and criterion) into the value to hold against the criterion's bounds. Adding a kind of
 * check adds a row here and a name to `Quantity` in src/types.ts.
 */
import type {
  AircraftClass,
  ConditionResponses,
  EquivalentSystem,
  FlightCondition,
  Level,
  LevelBounds,
  ModalAnalysis,
  Mode,
  Quantity,
  ResolvedCriteriaSet,
  ResolvedCriterion,
} from '../types.js';
import {
  controlAnticipation,
  STANDARD_GRAVITY,
  dampingFrequencyProduct,
  isDivergent,
  rollToSideslip,
  timeToDouble,
} from './derived-figures.js';
import { expandLevels, LEVELS, levelKey } from './level-bounds.js';

export interface EvaluatorContext {
  aircraftClass: AircraftClass;
  condition: FlightCondition;
  analysis: ModalAnalysis;
  criterion: ResolvedCriterion;
  /** the condition's responses to its cockpit controls (null when it names none) */
  responses: ConditionResponses | null;
  /** set when the mode is the figures of this equivalent system rather than raw roots */
  equivalent?: EquivalentSystem;
  /** bandwidth and phase delay for the region criteria (from the model's responses or measured ones), when computed */
  responseFigures?: ResponseFigures;
}

/** What judging one criterion in one condition needs. */
export interface CriterionArgs {
  criterion: ResolvedCriterion;
  condition: FlightCondition;
  analysis: ModalAnalysis;
  aircraftClass: AircraftClass;
  requiredLevel: Level;
  set: ResolvedCriteriaSet;
  responses: ConditionResponses | null;
  responseFigures?: ResponseFigures;
}

/** The response figures the criteria read, each null with the reason when it cannot be had. */
export interface ResponseFigures {
  pitch?: {
    /** [rad/s] */
    bandwidth: number | null;
    /** [s] */
    phaseDelay: number | null;
    /** how the figures were obtained, and why one is missing */
    method: string;
    reasons: { bandwidth?: string; phaseDelay?: string };
  };
}

export interface Evaluation {
  /** [SI unit of the quantity]; null when it cannot be had (then `reason` says why) */
  value: number | null;
  method?: string;
  reason?: string;
  /** bounds changed by a rule of the criterion (e.g. the |phi/beta| rise of 3.3.1.1) */
  adjustedBounds?: LevelBounds;
  /** the mode has a root with Re > 0 */
  divergent?: boolean;
}

export interface ModeEvaluatorRow {
  /** SI unit of the quantity, as shown */
  unit: string;
  /** a damping figure: a divergent mode fails it whatever the value */
  damping: boolean;
  /**
   * where the figure comes from: the modes (raw roots, and the equivalent system where one is
   * fitted), an equivalent system only, or the condition's responses (no mode needed)
   */
  from: 'mode' | 'equivalent' | 'response';
  evaluate(mode: Mode, context: EvaluatorContext): Evaluation;
}

/** A figure of the responses to the cockpit controls: one finding per criterion, whatever modes there are. */
export interface ResponseEvaluatorRow {
  unit: string;
  damping: false;
  evaluateResponses(context: EvaluatorContext): Evaluation;
}

export type EvaluatorRow = ModeEvaluatorRow | ResponseEvaluatorRow;

export function isResponseRow(row: EvaluatorRow): row is ResponseEvaluatorRow {
  return 'evaluateResponses' in row;
}

export const evaluators: Record<Quantity, EvaluatorRow> = {
  damping_ratio: {
    from: 'mode',
    unit: '-',
    damping: true,
    evaluate: (mode) => {
      const divergent = isDivergent(mode);
      if (mode.dampingRatio === null) {
        return divergent
          ? { value: null, divergent, reason: 'divergent: real roots of opposite sign, no damping ratio' }
          : { value: null, reason: 'the mode has no damping ratio' };
      }
      return { value: mode.dampingRatio, divergent };
    },
  },

  natural_frequency: {
    from: 'mode',
    unit: 'rad/s',
    damping: false,
    evaluate: (mode) =>
      mode.naturalFrequency === null
        ? { value: null, reason: 'the mode has no natural frequency (real roots of opposite sign)' }
        : { value: mode.naturalFrequency },
  },

  cap: {
    from: 'mode',
    unit: '1/(s^2 g)',
    damping: false,
    evaluate: (mode, { condition, equivalent }) => {
      if (equivalent) return equivalentCap(mode, condition, equivalent);
      const cap = controlAnticipation(mode, condition);
      return cap.value === null ? { value: null, reason: cap.reason } : { value: cap.value, method: cap.method };
    },
  },

  damping_frequency_product: {
    from: 'mode',
    unit: 'rad/s',
    damping: true,
    evaluate: (mode, context) => {
      const divergent = isDivergent(mode);
      const product = dampingFrequencyProduct(mode);
      if (product.value === null) return { value: null, divergent, reason: product.reason };
      const adjusted = adjustForRollToSideslip(mode, context);
      if (adjusted && 'reason' in adjusted) return { value: null, divergent, reason: adjusted.reason };
      const capped = capDampingRatio(mode, context, adjusted?.bounds ?? context.criterion.levels);
      const methods = [product.method, adjusted?.method, capped?.method].filter((m): m is string => m !== undefined);
      return {
        value: product.value,
        divergent,
        method: methods.join('; '),
        ...(adjusted || capped ? { adjustedBounds: capped?.bounds ?? adjusted?.bounds } : {}),
      };
    },
  },

  time_to_double: {
    from: 'mode',
    unit: 's',
    damping: false,
    evaluate: (mode) => {
      const t2 = timeToDouble(mode.eigenvalues);
      return t2.value === null ? { value: null, reason: t2.reason } : { value: t2.value, method: t2.method };
    },
  },

  time_constant: {
    from: 'mode',
    unit: 's',
    damping: true,
    evaluate: (mode) => {
      const root = mode.eigenvalues.length === 1 ? mode.eigenvalues[0] : undefined;
      if (!root || root.im !== 0) return { value: null, reason: 'the mode is not a single real root: no time constant' };
      const divergent = root.re > 0;
      // tau = -1/lambda (common practice); a root at 0 has no finite time constant.
      const value = root.re === 0 ? Infinity : -1 / root.re;
      return { value, divergent, method: 'tau = -1/lambda' };
    },
  },

  time_to_bank: {
    unit: 's',
    damping: false,
    evaluateResponses: ({ criterion, responses }) => {
      const angle = criterion.params['bankAngle'];
      if (typeof angle !== 'number' || !(angle > 0)) return { value: null, reason: `criterion ${criterion.id} gives no positive params.bankAngle [rad]` };
      if (responses === null) return { value: null, reason: 'the condition names no cockpit controls (controls.roll with max is needed)' };
      const deg = `${Number((angle * 180 / Math.PI).toPrecision(4))} deg`;
      if (responses.timeToBank.length === 0) return { value: null, reason: responses.timeToBankReason ?? 'no time to bank' };
      const entry = responses.timeToBank.find((t) => Math.abs(t.angle - angle) < 1e-9);
      if (!entry) return { value: null, reason: `no time to bank was computed for ${deg}` };
      const control = responses.controls.find((c) => c.axis === 'roll');
      const step = control ? `after a step of full roll control (${control.input} = ${control.max} ${control.unit}) from trim` : 'after a step of full roll control';
      if (entry.time === null) {
        // never reached in the simulated time: longer than any bound that time could show
        return { value: Infinity, method: `bank angle change of ${deg} not reached within ${responses.simulatedTime} s ${step}` };
      }
      return { value: entry.time, method: `time to change bank by ${deg} ${step}` };
    },
  },
  equivalent_time_delay: {
    from: 'equivalent',
    unit: 's',
    damping: false,
    evaluate: (_mode, { equivalent }) =>
      equivalent
        ? { value: equivalent.timeDelay, method: `tau of the ${equivalent.axis} equivalent system (${equivalent.output}/${equivalent.input})` }
        : { value: null, reason: 'no equivalent system fitted' },
  },

  pitch_bandwidth: { from: 'response', unit: 'rad/s', damping: false, evaluate: (_mode, { responseFigures }) => pitchFigure(responseFigures, 'bandwidth') },

  pitch_phase_delay: { from: 'response', unit: 's', damping: false, evaluate: (_mode, { responseFigures }) => pitchFigure(responseFigures, 'phaseDelay') },
};

/** Bandwidth [rad/s] or phase delay [s] of the pitch attitude response, or why there is none. */
function pitchFigure(responses: ResponseFigures | undefined, figure: 'bandwidth' | 'phaseDelay'): Evaluation {
  const pitch = responses?.pitch;
  if (!pitch) return { value: null, reason: 'no pitch attitude response: the condition names no pitch control' };
  const value = pitch[figure];
  return value === null ? { value: null, reason: pitch.reasons[figure] ?? `no ${figure === 'bandwidth' ? 'bandwidth' : 'phase delay'}` } : { value, method: pitch.method };
}

/**
 * CAP of an equivalent system: omega_sp^2 / (n/alpha) with n/alpha = (V/g)(1/Ttheta2) of the
 * fit (MIL-STD-1797A guidance; memory, high), i.e. CAP = omega_sp^2 g Ttheta2 / V.
 */
function equivalentCap(mode: Mode, condition: FlightCondition, equivalent: EquivalentSystem): Evaluation {
  const omega = mode.naturalFrequency;
  const inverse = equivalent.parameters['inverseTtheta2'];
  if (omega === null || inverse === undefined) return { value: null, reason: 'the equivalent system has no short-period frequency or 1/Ttheta2' };
  if (!(condition.airspeed > 0)) return { value: null, reason: 'the airspeed is not positive: n/alpha = (V/g)(1/Ttheta2) is undefined' };
  const nAlpha = (condition.airspeed / STANDARD_GRAVITY) * inverse;
  return {
    value: (omega * omega) / nAlpha,
    method: `CAP = omega_sp^2 / (n/alpha), n/alpha = (V/g)(1/Ttheta2) = ${nAlpha.toPrecision(4)} g/rad from the equivalent system`,
  };
}

/**
 * MIL-F-8785C 3.3.1.1: where omega_n^2 |phi/beta| exceeds a threshold T (20 (rad/s)^2), the
 * minimum zeta omega_n rises by k_L (omega_n^2 |phi/beta| - T), k_L per level from the params
 * `phiBetaK1`, `phiBetaK2`, `phiBetaK3` and `phiBetaThreshold` (value from memory).
 */
function adjustForRollToSideslip(
  mode: Mode,
  { condition, criterion }: EvaluatorContext,
): { bounds: LevelBounds; method: string } | { reason: string } | undefined {
  const threshold = criterion.params['phiBetaThreshold'];
  if (typeof threshold !== 'number') return undefined;
  const omega = mode.naturalFrequency;
  if (omega === null) return { reason: 'the mode has no natural frequency for the omega_n^2 |phi/beta| rule' };
  const ratio = rollToSideslip(mode, condition.airspeed);
  if (ratio.value === null) return { reason: `${ratio.reason} (needed for the omega_n^2 |phi/beta| rule of the criterion)` };
  const excess = omega * omega * ratio.value - threshold;
  if (excess <= 0) {
    return { bounds: criterion.levels, method: `${ratio.method}; omega_n^2 |phi/beta| within ${threshold}: no rise of the minimum` };
  }
  const expanded = expandLevels(criterion.levels);
  const bounds: LevelBounds = {};
  for (const level of LEVELS) {
    const key = levelKey(level);
    const bound = { ...expanded[key] };
    const k = criterion.params[`phiBetaK${level}`];
    if (bound.min !== undefined && typeof k === 'number') bound.min += k * excess;
    bounds[key] = bound;
  }
  return { bounds, method: `${ratio.method}; minimum raised by k (omega_n^2 |phi/beta| - ${threshold}) = k x ${excess.toPrecision(4)}` };
}

/**
 * MIL-F-8785C 3.3.1.1 (value from memory): the governing damping is the larger of the zeta and
 * zeta omega_n requirements, except that Class III need not exceed zeta = 0.7; so for the
 * listed classes the zeta omega_n minimum is capped at zetaCap x omega_n.
 */
function capDampingRatio(
  mode: Mode,
  { aircraftClass, criterion }: EvaluatorContext,
  levels: LevelBounds,
): { bounds: LevelBounds; method: string } | undefined {
  const cap = criterion.params['zetaCap'];
  const classes = criterion.params['zetaCapClasses'];
  const omega = mode.naturalFrequency;
  if (typeof cap !== 'number' || typeof classes !== 'string' || omega === null) return undefined;
  if (!classes.split(',').map((c) => c.trim()).includes(aircraftClass)) return undefined;
  const expanded = expandLevels(levels);
  const bounds: LevelBounds = {};
  let changed = false;
  for (const level of LEVELS) {
    const key = levelKey(level);
    const bound = { ...expanded[key] };
    if (bound.min !== undefined && bound.min > cap * omega) {
      bound.min = cap * omega;
      changed = true;
    }
    bounds[key] = bound;
  }
  return changed ? { bounds, method: `Class ${aircraftClass}: minimum capped at zeta = ${cap} (zeta omega_n <= ${cap} omega_n)` } : undefined;
}
