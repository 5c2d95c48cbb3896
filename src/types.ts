/**
 * The normalised data model, declared once. Everything here is SI (m, kg, N, s) with angles
 * in rad and rates in rad/s. The written form (what the user typed) lives in the zod schemas
 * under src/load/ and is converted to these types at load time.
 */

export type AircraftClass = 'I' | 'II-L' | 'II-C' | 'III' | 'IV';
export type UnitSystem = 'US' | 'SI';
export type Level = 1 | 2 | 3;
export type Category = 'A' | 'B' | 'C';

export interface Place {
  file: string;
  line?: number;
  column?: number;
}

/** x' = A x + B u, y = C x + D u, with states, inputs and outputs named (never by position). */
export interface StateSpace {
  states: string[];
  /** n x n */
  A: number[][];
  inputs: string[];
  /** n x m (n x 0 when there are no inputs) */
  B: number[][];
  outputs: string[];
  /** p x n */
  C: number[][];
  /** p x m */
  D: number[][];
}

/** How a condition's dynamics were written. */
export type DynamicsForm = 'stateSpace' | 'derivatives' | 'nondimensional' | 'mixed' | 'frequencyResponses';

/** A measured or simulated frequency response read from a CSV file beside the model. */
export interface MeasuredResponse {
  /** the cockpit input as named in the model file */
  input: string;
  /** q, theta, nz, p, phi, beta or r */
  output: string;
  /** [rad/s] increasing */
  frequency: number[];
  /** [dB] */
  gain: number[];
  /** [deg] unwrapped from the lowest frequency */
  phase: number[];
  /** the CSV file, as the model file names it relative to itself */
  file: string;
}

/** Lift data kept from nondimensional input, for n/alpha = q S CL_alpha / W. */
export interface LiftData {
  /** [Pa] */
  dynamicPressure: number;
  /** [m^2] */
  wingArea: number;
  /** [N] */
  weight: number;
  /** [1/rad] */
  liftCurveSlope: number;
}

/** The pilot's control axes a condition may name. */
export type ControlAxis = 'pitch' | 'roll' | 'yaw';

/** One cockpit control: an input of the state-space model, in the unit the model was written in. */
export interface CockpitControl {
  /** name of the input (a column of B) */
  input: string;
  /** unit of the input as written (B and D are per this unit); recorded, not converted */
  unit: string;
  /** [input unit] full control; null when not given */
  max: number | null;
}

export type CockpitControls = Partial<Record<ControlAxis, CockpitControl>>;

export interface FlightCondition {
  id: string;
  /** flight-phase code as written, e.g. CR, PA, CO */
  phase: string;
  /** [m/s] true airspeed */
  airspeed: number;
  /** [m] geometric altitude, null when not given */
  altitude: number | null;
  /** required level from the model file; null means "the criteria set's default" */
  requiredLevel: Level | null;
  /** [g/rad] n/alpha given by the user (overrides the computed one), else null */
  nAlpha: number | null;
  /** [rad] trim pitch attitude, when known */
  theta0: number | null;
  form: DynamicsForm;
  system: StateSpace;
  liftData: LiftData | null;
  /** the cockpit controls named by the condition (empty when none) */
  controls: CockpitControls;
  /** measured or simulated frequency responses (empty when none) */
  frequencyResponses: MeasuredResponse[];
  /** conversions and defaults applied while building the model, shown in every output */
  notes: string[];
  place: Place;
  /** the condition as written, kept to rebuild it with one number changed (design sensitivities) */
  written?: WrittenSource;
}

/**
 * A condition in its written form (a table row as if written in the model file), with what is
 * needed to rebuild it and to name each of its numbers the way the user finds it in the files.
 * Plain data, so that it travels to worker threads.
 */
export interface WrittenSource {
  /** the written condition (numbers in the file's units) */
  condition: Record<string, unknown>;
  units: UnitSystem;
  /** [written acceleration unit] g used in the kinematic terms */
  gravity: number;
  gravityOrigin: string;
  naming: WrittenNaming;
}

/**
 * How a number of the written condition is named: by its path in the model file
 * (`conditions[2].lateral.derivatives.Nr`), or for a table row by `table.csv:LINE:HEADER`
 * (numbers from `common` by `conditionTable.common.<path>`).
 */
export type WrittenNaming =
  | { in: 'model'; prefix: (string | number)[] }
  | { in: 'table'; file: string; line: number; columns: readonly { path: readonly (string | number)[]; header: string }[] };

export interface AircraftModel {
  file: string;
  aircraft: { name: string; class: AircraftClass };
  /** the unit system the file was written in (the model itself is SI) */
  units: UnitSystem;
  conditions: FlightCondition[];
  /** what reading the file let pass but the user should know (e.g. a YAML tag modalgate does not know), with its place */
  warnings?: string[];
}

// ---------------------------------------------------------------- modes

export type ModeKind =
  | 'short_period'
  | 'phugoid'
  | 'dutch_roll'
  | 'roll'
  | 'spiral'
  | 'roll_spiral'
  | 'kinematic'
  | 'other';

export interface Complex {
  re: number;
  im: number;
}

/** One state's part in a mode. */
export interface StateShare {
  state: string;
  /** eigenvector magnitude relative to the reference state (the reference has 1) */
  magnitude: number;
  /** [rad] eigenvector phase relative to the reference state */
  phase: number;
  /** participation factor magnitude |w_i v_i|, normalised to sum 1 over the mode's states */
  participation: number;
}

export interface Mode {
  kind: ModeKind;
  /** one real root, a complex pair (positive imaginary part first) or two real roots (split) */
  eigenvalues: Complex[];
  /** [rad/s] |lambda|; for two real roots sqrt(l1 l2) when both are of one sign, else null */
  naturalFrequency: number | null;
  /** -Re(lambda)/|lambda|; for two stable real roots -(l1+l2)/(2 sqrt(l1 l2)) (> 1); else null */
  dampingRatio: number | null;
  /** [rad/s] |Im(lambda)|, null for real roots */
  dampedFrequency: number | null;
  /** [s] 2 pi / omega_d, null for real roots */
  period: number | null;
  /** [s] -1/lambda of a real root (negative when divergent); null for oscillatory modes */
  timeConstant: number | null;
  /** [s] ln2 / -Re(lambda) of the slowest root, only when every root converges */
  timeToHalf: number | null;
  /** [s] ln2 / Re(lambda) of the fastest divergent root, only when a root diverges */
  timeToDouble: number | null;
  /** cycles to half amplitude, oscillatory convergent modes only */
  cyclesToHalf: number | null;
  /** why this kind was chosen: dominant states, participation sums, frequency rule */
  basis: string;
  /** true when the identification was not clear-cut (a warning says why) */
  ambiguous: boolean;
  /** reference state of the normalised eigenvector */
  referenceState: string;
  /** per state, largest participation first */
  shape: StateShare[];
  /** present when rounding leaves the roots' figures untrustworthy: why (its findings are not evaluated) */
  inaccurate?: string;
}

/**
 * A mode as the results hold it: the mode shape (`referenceState`, `shape`) is there only when
 * the results say so (`Results.contents.modeShapes`); a sweep's results leave it out unless
 * asked, as it is about a third of the file and only the file ever shows it.
 */
export type ResultMode = Omit<Mode, 'referenceState' | 'shape'> & Partial<Pick<Mode, 'referenceState' | 'shape'>>;

export interface Subsystems {
  longitudinal: string[];
  lateral: string[];
  kinematic: string[];
  other: string[];
}

export interface ModalAnalysis {
  subsystems: Subsystems;
  /**
   * Coupling between the longitudinal and lateral-directional blocks: the largest relative
   * shift of any root when the cross blocks of A are set to zero, |lambda - lambda0| /
   * max(|lambda0|, 1e-4 x spectral radius) (dimensionless, 0 = decoupled; invariant to state
   * scaling). See src/modes/subsystems.ts.
   */
  coupling: number;
  /** true when the blocks are decoupled within tolerance (symmetry assumption holds) */
  decoupled: boolean;
  modes: Mode[];
  warnings: string[];
}

// ---------------------------------------------------------------- findings

export type Verdict = 'pass' | 'marginal' | 'fail' | 'not_evaluated';

/**
 * The kinds of bounded quantity; each has one evaluator in the criteria evaluator table.
 * - damping_ratio             zeta [-]
 * - natural_frequency         omega_n [rad/s]
 * - cap                       control anticipation parameter omega_sp^2 / (n/alpha) [1/(s^2 g)]
 * - damping_frequency_product zeta omega_n [rad/s]
 * - time_to_double            [s] (a convergent mode has an infinite time to double)
 * - time_constant             [s] of a real root
 * - time_to_bank              [s] to change bank by `params.bankAngle` [rad] after a step of
 *                             full roll control (a response figure, evaluated with or without a roll mode)
 * - equivalent_time_delay     [s] tau of the low-order equivalent system of the mode's axis
 * - pitch_bandwidth           [rad/s] bandwidth of theta/Fes (the lesser of the gain and phase bandwidths)
 * - pitch_phase_delay         [s] tau_p = -(Phi(2 w180) + 180 deg) / (57.3 x 2 w180)
 */
export type Quantity =
  | 'damping_ratio'
  | 'natural_frequency'
  | 'cap'
  | 'damping_frequency_product'
  | 'time_to_double'
  | 'time_constant'
  | 'time_to_bank'
  | 'equivalent_time_delay'
  | 'pitch_bandwidth'
  | 'pitch_phase_delay';

/**
 * Level regions in the plane of two quantities (x = the criterion's quantity, y = `against`),
 * each a closed polygon of [x, y] vertices in SI units; 'any' is the whole plane. A level left
 * out holds the region of the next better level.
 */
export interface LevelRegions {
  against: Quantity;
  levels: Partial<Record<'1' | '2' | '3', [number, number][] | 'any'>>;
  /** the figure of the document the polygons are taken from */
  figure?: string;
}

/** Bounds of one level: min and/or max of the quantity (SI). */
export interface Bound {
  min?: number;
  max?: number;
}

export type LevelBounds = Partial<Record<'1' | '2' | '3', Bound>>;

export interface Finding {
  criterion: string;
  /** the criteria set the criterion came from */
  set: string;
  title: string;
  mode: ModeKind;
  quantity: Quantity;
  /** [SI unit of the quantity] */
  value: number | null;
  unit: string;
  /** best level whose bounds hold, null when none */
  level: Level | null;
  verdict: Verdict;
  /** signed distance to the governing boundary of the required level (positive = inside) */
  margin: number | null;
  bounds: LevelBounds;
  source: string;
  /**
   * where the boundary that decides the verdict (the required level's, with any adjustment
   * applied) was read: its evidence class and the ids of the sources it cites
   */
  evidence: FindingEvidence;
  reason: string;
  /** how a derived figure was obtained (e.g. n/alpha method) */
  method?: string;
  /**
   * What would move it: the model's numbers with the largest normalised influence on the
   * value, at most five (failing and marginal findings by default; see src/sensitivity/).
   */
  sensitivities?: Sensitivity[];
  /** why a finding asked for has no sensitivities (e.g. a nearly defective mode) */
  sensitivityNote?: string;
  /**
   * where the figures came from when not the raw roots of the model: e.g. "equivalent system:
   * pitch, q and nz fitted together, M 1.41 (guidance 10)"
   */
  basis?: string;
  /** the second figure of a region criterion (judged together with `value`) */
  against?: { quantity: Quantity; value: number | null; unit: string };
  /** the level regions of a region criterion, every level filled in ([x, y] vertices, SI) */
  region?: Record<'1' | '2' | '3', [number, number][] | 'any'>;
}

/** d value / d parameter of one number of the model as written, and the change that reaches the boundary. */
export interface Sensitivity {
  /** the number's place in the files: `conditions[0].stateSpace.A[3][2]`, `table.csv:14:Cma` */
  parameter: string;
  /** [file's unit] the number as written */
  current: number;
  /** [SI unit of the quantity per file's unit of the parameter] */
  derivative: number;
  /** |current x derivative| / distance of the value to its target (the boundary, or the band's edge when marginal) [-] */
  influence: number;
  /** the change of this number alone that reaches the target, or null (then `reason` says why) */
  toBoundary: ToBoundary | null;
  reason?: string;
}

export interface ToBoundary {
  /** [file's unit] change found by re-analysis of the model (a one-dimensional root find) */
  change: number;
  /** [file's unit] linear estimate from the derivative */
  estimate: number;
  /** [SI unit of the quantity] value re-analysed at the change */
  verifiedValue: number;
  /** level reached at the change */
  verifiedLevel: Level | null;
  /** verdict at the change */
  verifiedVerdict: Verdict;
}

/** Which findings get sensitivities: failing and marginal ones (the default), every one, or none. */
export type SensitivityChoice = 'issues' | 'all' | 'none';

/** An applicable criterion that makes no finding in a condition, and why (never a pass). */
export interface NotApplicable {
  criterion: string;
  set: string;
  title: string;
  source: string;
  reason: string;
}

// ---------------------------------------------------------------- equivalent systems

export type ControlAxisName = 'pitch' | 'roll' | 'yaw';

/** One response of an equivalent-system fit, with the points it was fitted over. */
export interface EquivalentChannel {
  output: string;
  /** K of the form [output unit per input unit] */
  gain: number;
  /** [s] */
  timeDelay: number;
  /** mismatch M over this response's points */
  mismatch: number;
  /** the high-order response as fitted: [rad/s], [dB], [deg] */
  hos: { frequency: number[]; gain: number[]; phase: number[] };
  /** the equivalent system at the same frequencies: [dB], [deg] */
  loes: { gain: number[]; phase: number[] };
  /** low-frequency dynamics held at their high-order values, when any */
  fixed?: string;
}

/** A low-order equivalent system fitted to one axis of a condition (results contract). */
export interface EquivalentSystem {
  axis: ControlAxisName;
  /** the cockpit input, e.g. Fes */
  input: string;
  /** the primary output, e.g. q */
  output: string;
  form: string;
  /** how the pitch fit treated 1/Ttheta2 (q-and-nz, q-with-fixed-ttheta2, q-only), p-only, beta-only */
  method: string;
  /** pitch { gain, inverseTtheta2 [1/s], dampingRatio, naturalFrequency [rad/s] }; roll { gain,
   *  rollTimeConstant [s] }; yaw { gain, dampingRatio, naturalFrequency [rad/s] } */
  parameters: Record<string, number>;
  /** [s] equivalent time delay of the primary output */
  timeDelay: number;
  /** the largest mismatch of the fitted responses */
  mismatch: number;
  mismatchForm: string;
  /** the guidance the mismatch is held against */
  mismatchGuidance: number;
  /** [rad/s] */
  frequencyRange: [number, number];
  /** points per response */
  points: number;
  valid: boolean;
  /** why not valid, or what limits the fit */
  remarks: string[];
  /** where the high-order response came from */
  from: 'model' | 'frequency response';
  /** pitch only: Gibson dropback figures of the equivalent system (no boundary judged) */
  dropback?: { /** [s] DB/q_ss */ dropbackRatio: number; /** [-] q_pk/q_ss */ peakRatio: number; definition: string };
  channels: EquivalentChannel[];
}

export interface ConditionResult {
  id: string;
  phase: string;
  category: Category | null;
  /** null only when no criteria were evaluated (the `modes` command) and the model gives none */
  requiredLevel: Level | null;
  /** where the required level came from (null when not set) */
  requiredLevelFrom: 'model' | 'criteria default' | null;
  /** [m/s] */
  airspeed: number;
  /** [m] */
  altitude: number | null;
  form: DynamicsForm;
  subsystems: Subsystems;
  coupling: number;
  modes: ResultMode[];
  findings: Finding[];
  /** applicable criteria that make no finding here, with the reason */
  notApplicable: NotApplicable[];
  /** responses to the cockpit controls; null when the condition names none */
  responses: ConditionResponses | null;
  /** low-order equivalent systems fitted for the condition's controls (absent when none) */
  equivalentSystems?: EquivalentSystem[];
  warnings: string[];
  /** conversions and defaults applied */
  notes: string[];
}

// ---------------------------------------------------------------- responses to the pilot's controls

/** A figure, or null and why not (never a stand-in value). */
export type ResponseFigure = { value: number; method: string } | { value: null; reason: string };

export interface ResponseControl {
  axis: ControlAxis;
  input: string;
  /** the input's unit as written */
  unit: string;
  /** [input unit] full control, null when not given */
  max: number | null;
  /** true when the model's positive input is the pilot's negative (the responses are given for the pilot's sense) */
  signReversed: boolean;
}

/** G(s) = gain prod(s - zeros) / prod(s - poles), in the pilot's sense of the control. */
export interface TransferFunction {
  axis: ControlAxis;
  input: string;
  /** a state name, an output of C/D, or a derived output (nz) */
  output: string;
  /** unit of the output: rad, rad/s, g, or 'as written' for an output row of the model */
  outputUnit: string;
  /** [output unit per input unit, times (rad/s)^relativeDegree] d where d != 0, else c A^(r-1) b; 0 when there is no path */
  gain: number;
  /** [rad/s] finite transmission zeros (with the eigenvalues of states the channel cannot see, which cancel poles) */
  zeros: Complex[];
  /** [rad/s] every eigenvalue of A */
  poles: Complex[];
  /** poles minus zeros; null when the channel is identically zero */
  relativeDegree: number | null;
}

/** Bandwidth and phase delay of an attitude response (MIL-STD-1797A 4.2.1.2 guidance); see src/responses/bandwidth.ts. */
export interface BandwidthFigures {
  /** [rad/s] */
  omega180: number | null;
  /** [rad/s] */
  bandwidthPhase: number | null;
  /** [rad/s] */
  bandwidthGain: number | null;
  /** [rad/s] */
  bandwidth: number | null;
  /** which of the two the bandwidth is */
  bandwidthFrom: 'phase' | 'gain' | null;
  /** [s] */
  phaseDelay: number | null;
  /** [rad/s] the band searched */
  range: [number, number];
  responseType: 'rate' | 'attitude';
  /** why a figure is null, by figure name */
  reasons: Partial<Record<'omega180' | 'bandwidthPhase' | 'bandwidthGain' | 'bandwidth' | 'phaseDelay', string>>;
}

/** The bandwidth figures of theta / pitch control. */
export interface PitchBandwidth extends BandwidthFigures {
  input: string;
  output: 'theta';
  /** how the phase branch and the response type were chosen */
  method: string;
}

export interface BankTime {
  /** [rad] bank angle change */
  angle: number;
  /** [s] from the start of the full roll-control step; null when not reached within the simulated time */
  time: number | null;
}

export interface ConditionResponses {
  controls: ResponseControl[];
  transferFunctions: TransferFunction[];
  /** trade figures from the numerators */
  figures: {
    /** [rad/s] 1/Ttheta2 from the q / pitch numerator */
    inverseTtheta2: ResponseFigure;
    /** [rad/s] omega_phi from the phi / roll numerator */
    omegaPhi: ResponseFigure;
    /** [-] zeta_phi */
    zetaPhi: ResponseFigure;
    /** [-] omega_phi / omega_d */
    omegaPhiOverOmegaD: ResponseFigure;
  };
  /** null with `pitchReason` when there is no pitch control or no theta */
  pitch: PitchBandwidth | null;
  pitchReason: string | null;
  /** after a step of full roll control; empty with `timeToBankReason` when it cannot be had */
  timeToBank: BankTime[];
  timeToBankReason: string | null;
  /** [s] simulated time of the step responses */
  simulatedTime: number;
  /** after the full roll-control step */
  roll: {
    /** [-] p_osc / p_av */
    rollRateOscillation: ResponseFigure;
    /** [deg] psi_beta, phase of the Dutch roll in sideslip */
    sideslipPhase: ResponseFigure;
    /** [rad] largest adverse sideslip (nose away from the roll) in the first max(2 s, T_d/2) */
    adverseSideslip: ResponseFigure;
    /** [rad] largest proverse sideslip in the same time */
    proverseSideslip: ResponseFigure;
  } | null;
  /** what of the curves the results hold */
  curves: string;
  /** how outputs were derived, sign reversals, outputs that could not be had */
  notes: string[];
}

export interface InputFile {
  role: 'model' | 'criteria' | 'table' | 'response' | 'baseline';
  path: string;
  sha256: string;
}

export interface VerdictCounts {
  pass: number;
  marginal: number;
  fail: number;
  not_evaluated: number;
}

export interface Results {
  format: 'modalgate-results/1';
  tool: { name: 'modalgate'; version: string };
  /** ISO time of the run (set at the I/O edge) */
  generatedAt: string;
  /** the command line that produced the results, when run from the CLI */
  command: string[];
  inputs: InputFile[];
  aircraft: { name: string; class: AircraftClass };
  criteriaSets: { id: string; title: string; chain: string[]; sources: SourceEntry[] }[];
  /** what the results hold beyond the always-present fields */
  contents: ResultsContents;
  summary: VerdictCounts;
  conditions: ConditionResult[];
}

export interface ResultsContents {
  /** whether each mode carries its shape (`referenceState`, `shape`) */
  modeShapes: boolean;
}

/** The results without their summary and conditions: all that is known before the check. */
export type ResultsHead = Omit<Results, 'summary' | 'conditions'>;

// ---------------------------------------------------------------- criteria (resolved form)

/**
 * How a boundary value is known:
 * - published      read in the primary document (the standard or regulation itself), at a stated page or paragraph
 * - secondary      read in a named reproduction (report, textbook reprint, notes quoting the document)
 * - conflicting    the sources disagree; each is listed with its value, and the value kept is said
 * - memory         recalled or inferred, not read in any text: verify before relying on it
 * - programme-set  chosen by the programme (an override that states no evidence of its own)
 */
export type EvidenceClass = 'published' | 'secondary' | 'conflicting' | 'memory' | 'programme-set';

/** One source cited for a boundary. */
export interface Citation {
  /** id of an entry of the set's source list */
  source: string;
  /** page, table, figure or paragraph of the source */
  at?: string;
  /** a short quote of the source */
  quote?: string;
  /** the value this source gives (required where the class is conflicting) [SI unit of the quantity] */
  value?: number | string;
}

/** What is known of one boundary (one level, or a group of parameters). */
export interface Evidence {
  class: EvidenceClass;
  cites: Citation[];
  /** Markdown */
  note: string;
  /** the set that stated this evidence */
  by: string;
}

/** The evidence of a finding's boundary, as the results carry it. */
export interface FindingEvidence {
  class: EvidenceClass;
  /** ids of the sources cited */
  sources: string[];
}

/** An entry of a criteria set's source list. */
export interface SourceEntry {
  id: string;
  /**
   * primary: the document itself; reproduction: a named text that quotes or reprints it;
   * recollection: someone's memory of it, not a text
   */
  kind: 'primary' | 'reproduction' | 'recollection';
  /** full citation */
  title: string;
  /** the document it reproduces or recalls, when it is not the document itself */
  reproduces?: string;
  /** where it can be found (address, library reference) */
  where?: string;
  /** Markdown */
  note?: string;
  /** the set that lists it */
  set: string;
}

export interface ResolvedCriterion {
  id: string;
  /** id of the criteria set (file) that defined or last changed this criterion */
  set: string;
  title: string;
  mode: ModeKind;
  /** the evaluator kind */
  quantity: Quantity;
  /** where it applies; an absent selector means "all" */
  applies: {
    classes?: AircraftClass[];
    categories?: Category[];
    phases?: string[];
    /**
     * [m] geometric altitude band, e.g. the 18,000 ft split of 14 CFR 23.181: `below` applies
     * where altitude < below, `atOrAbove` where altitude >= atOrAbove. A condition without an
     * altitude gives a not_evaluated finding for such a criterion (no guess).
     */
    altitude?: { below?: number; atOrAbove?: number };
  };
  levels: LevelBounds;
  /** a region criterion: the levels are regions in the plane of `quantity` and `region.against` */
  region?: LevelRegions;
  /** quantity-specific parameters (e.g. the omega^2 |phi/beta| adjustment factors) */
  params: Record<string, number | string | boolean>;
  /** document and paragraph */
  source: string;
  /** what is known of each level's bounds (every level filled in; a level left out of `levels` takes the evidence of the level whose bounds it holds) */
  evidence: Record<'1' | '2' | '3', Evidence>;
  /** evidence of boundary values held in `params` (e.g. an adjustment rule), by parameter names */
  paramEvidence: (Evidence & { params: string[] })[];
  /** Markdown */
  note: string;
}

export interface ResolvedCriteriaSet {
  id: string;
  title: string;
  /** files from the root of the `extends` chain to this one */
  files: string[];
  /** set ids from the root of the `extends` chain to this one */
  chain: string[];
  phaseCategories: Record<string, Category>;
  defaultRequiredLevel: Level;
  /** marginal band: fraction of the boundary, and the absolute band used where the boundary is 0 */
  marginalBand: { relative: number; absolute: Record<string, number> };
  criteria: ResolvedCriterion[];
  /** the source list of every file of the chain, root first */
  sources: SourceEntry[];
  dropped: { id: string; reason: string; by: string }[];
  /** Markdown notes of the set (all files of the chain, root first) */
  notes: string[];
}
