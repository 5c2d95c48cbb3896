/**
 * The written form of a model file, `format: modalgate-model/1` (DESIGN.md, Contract 1), as
 * zod schemas. Numbers are in the file's unit system (US or SI); angles in rad, rates in rad/s.
 * Objects are strict, so a misspelt field is an error rather than a silently ignored value.
 * Checks that need more than one field (shapes, one dynamics form, derivative sets) are
 * semantic and live in src/model/.
 */
import { z } from 'zod';

/** z.number() in zod 4 already refuses NaN and +-Infinity: only finite numbers pass. */
const finite = z.number();
const positive = z.number().positive();
const name = z.string().min(1);
const matrix = z.array(z.array(finite));

export const aircraftClassSchema = z.enum(['I', 'II-L', 'II-C', 'III', 'IV']);
export const unitSystemSchema = z.enum(['US', 'SI']);

export const stateSpaceSchema = z
  .object({
    states: z.array(name).min(1),
    A: matrix,
    inputs: z.array(name).optional(),
    B: matrix.optional(),
    outputs: z.array(name).optional(),
    C: matrix.optional(),
    D: matrix.optional(),
  })
  .strict();

/**
 * Longitudinal dimensional derivatives in stability axes, mass-normalised (Nelson, 2nd ed.,
 * ch. 4): Xu, Xw, Zu, Zw [1/s]; Zwdot [-]; Zq, Xq [length/s]; Mu, Mw [1/(length s)];
 * Mwdot [1/length]; Mq [1/s]. Control derivatives are written X<input>, Z<input>, M<input>
 * with an input name starting with `d` (e.g. Xde, Zde, Mde); they are let through here
 * and checked by name in src/model/derivative-names.ts.
 */
export const longitudinalDerivativesSchema = z
  .object({
    Xu: finite.optional(),
    Xw: finite.optional(),
    Xq: finite.optional(),
    Zu: finite.optional(),
    Zw: finite.optional(),
    Zwdot: finite.optional(),
    Zq: finite.optional(),
    Mu: finite.optional(),
    Mw: finite.optional(),
    Mwdot: finite.optional(),
    Mq: finite.optional(),
  })
  .catchall(finite);

/**
 * Lateral-directional dimensional derivatives (Nelson, 2nd ed., ch. 5): either the v form
 * (Yv [1/s], Lv, Nv [1/(length s)]) or the beta form (Ybeta [length/s^2], Lbeta, Nbeta
 * [1/s^2]); Yp, Yr [length/s]; Lp, Lr, Np, Nr [1/s]. Control derivatives Y<input>,
 * L<input>, N<input> with an input name starting with `d` (e.g. Lda, Ndr).
 */
export const lateralDerivativesSchema = z
  .object({
    Yv: finite.optional(),
    Ybeta: finite.optional(),
    Yp: finite.optional(),
    Yr: finite.optional(),
    Lv: finite.optional(),
    Lbeta: finite.optional(),
    Lp: finite.optional(),
    Lr: finite.optional(),
    Nv: finite.optional(),
    Nbeta: finite.optional(),
    Np: finite.optional(),
    Nr: finite.optional(),
  })
  .catchall(finite);

export const longitudinalSchema = z
  .object({
    stateSpace: stateSpaceSchema.optional(),
    derivatives: longitudinalDerivativesSchema.optional(),
    /** [rad] trim pitch attitude */
    theta0: finite.optional(),
  })
  .strict();

export const lateralSchema = z
  .object({
    stateSpace: stateSpaceSchema.optional(),
    derivatives: lateralDerivativesSchema.optional(),
    /** true: L and N derivatives already include the inertia coupling (primed) */
    primed: z.boolean().optional(),
    /** [mass length^2] product of inertia, stability axes */
    Ixz: finite.optional(),
    /** [mass length^2] */
    Ix: positive.optional(),
    /** [mass length^2] */
    Iz: positive.optional(),
    /** [rad] trim pitch attitude */
    theta0: finite.optional(),
  })
  .strict();

/** Nondimensional stability and control coefficients, per rad, stability axes (Nelson, 2nd ed., ch. 3). */
export const coefficientsSchema = z
  .object({
    CL0: finite.optional(),
    CLtrim: finite.optional(),
    CD0: finite.optional(),
    CLalpha: finite.optional(),
    CDalpha: finite.optional(),
    CDu: finite.optional(),
    CLu: finite.optional(),
    CLq: finite.optional(),
    CLalphadot: finite.optional(),
    Cmu: finite.optional(),
    Cmalpha: finite.optional(),
    Cmalphadot: finite.optional(),
    Cmq: finite.optional(),
    CYbeta: finite.optional(),
    CYp: finite.optional(),
    CYr: finite.optional(),
    Clbeta: finite.optional(),
    Clp: finite.optional(),
    Clr: finite.optional(),
    Cnbeta: finite.optional(),
    Cnp: finite.optional(),
    Cnr: finite.optional(),
  })
  .strict();

/** Control coefficients of one input [1/rad, or per input unit]. */
export const controlCoefficientsSchema = z
  .object({
    CL: finite.optional(),
    CD: finite.optional(),
    Cm: finite.optional(),
    CY: finite.optional(),
    Cl: finite.optional(),
    Cn: finite.optional(),
  })
  .strict();

export const nondimensionalSchema = z
  .object({
    /** [mass] */
    mass: positive,
    /** [mass length^2] stability axes */
    inertia: z.object({ Ix: positive, Iy: positive, Iz: positive, Ixz: finite }).strict(),
    /** S [length^2], cbar and b [length] */
    geometry: z.object({ S: positive, cbar: positive, b: positive }).strict(),
    coefficients: coefficientsSchema,
    /** per input name (e.g. de, da, dr): its control coefficients */
    controls: z.record(name, controlCoefficientsSchema).optional(),
    /** [rad] trim pitch attitude */
    theta0: finite.optional(),
  })
  .strict();

/**
 * One cockpit control: the state-space input it drives (a column of B), the unit that input
 * was written in, and optionally the full control travel `max` in that unit.
 */
export const cockpitControlSchema = z
  .object({
    input: name,
    unit: name,
    /** [input unit] full control */
    max: positive.optional(),
  })
  .strict();

/** The pilot's controls by axis; at least one. */
export const cockpitControlsSchema = z
  .object({
    pitch: cockpitControlSchema.optional(),
    roll: cockpitControlSchema.optional(),
    yaw: cockpitControlSchema.optional(),
  })
  .strict();

/**
 * A measured or simulated frequency response of one output to one cockpit input, from a CSV
 * file beside the model (one row per frequency; the header names the columns):
 *   { input: Fes, output: q, file: fr-pitch.csv,
 *     columns: { frequency: w, gain: gain_db, phase: phase_deg },
 *     units: { frequency: rad/s, gain: dB, phase: deg } }
 * The output names the axis: q, theta, nz (pitch), p, phi (roll), beta, r (yaw).
 */
export const frequencyResponseSchema = z
  .object({
    input: name,
    output: z.enum(['q', 'theta', 'nz', 'p', 'phi', 'beta', 'r']),
    file: name,
    columns: z.object({ frequency: name, gain: name, phase: name }).strict(),
    units: z
      .object({
        frequency: z.enum(['rad/s', 'Hz']),
        gain: z.enum(['dB', 'ratio']),
        phase: z.enum(['deg', 'rad']),
      })
      .strict(),
  })
  .strict();

export const conditionSchema = z
  .object({
    id: name,
    phase: name,
    /** [velocity] true airspeed */
    airspeed: positive,
    /** [length] geometric altitude */
    altitude: finite.optional(),
    /** 1 | 2 | 3, checked after the schema so the message can say so */
    requiredLevel: finite.optional(),
    /** [g/rad] */
    nAlpha: positive.optional(),
    stateSpace: stateSpaceSchema.optional(),
    longitudinal: longitudinalSchema.optional(),
    lateral: lateralSchema.optional(),
    nondimensional: nondimensionalSchema.optional(),
    /** the pilot's controls, naming inputs of the model */
    controls: cockpitControlsSchema.optional(),
    /** measured or simulated frequency responses, beside or instead of the dynamics */
    frequencyResponses: z.array(frequencyResponseSchema).min(1).optional(),
  })
  .strict();

export const MODEL_FORMAT = 'modalgate-model/1';

/**
 * Conditions from a CSV table beside the model file, one row per condition (an envelope sweep):
 *
 *   conditionTable:
 *     file: sweep.csv                 # relative to the model file
 *     common:                         # condition fields shared by every row
 *       stateSpace: { states: [u, w, q, theta] }
 *     columns:                        # condition field path -> column header
 *       id: case
 *       phase: phase
 *       airspeed: V_tas
 *       stateSpace.A[u][w]: a_u_w      # matrix entry by row and column names
 *     ignore: [notes]                 # columns that are read by nobody
 *
 * Every row is `common` with its cells written on top, checked exactly like a condition of
 * `conditions:`; the values are in the file's unit system. A matrix filled in by entries takes
 * its other entries from `common` when given there, else 0 (noted on every condition). Every
 * column of the table must be mapped or ignored. In a flow mapping (`{ .. }`) YAML reads `[`
 * as the start of a list, so write the columns as a block (as above) or quote a key with
 * brackets. See src/load/condition-table.ts.
 */
export const conditionTableSchema = z
  .object({
    file: name,
    /** checked row by row, as part of each condition */
    common: z.record(z.string(), z.unknown()).optional(),
    columns: z.record(name, name),
    ignore: z.array(name).optional(),
  })
  .strict();

export const modelFileSchema = z
  .object({
    format: z.literal(MODEL_FORMAT),
    aircraft: z.object({ name, class: aircraftClassSchema }).strict(),
    units: unitSystemSchema,
    /** [acceleration, in the file's units] g for the kinematic terms; default 32.174 ft/s^2 (US) or 9.80665 m/s^2 (SI) */
    gravity: positive.optional(),
    /** at least one condition in all, from here and/or from conditionTable */
    conditions: z.array(z.unknown()).min(1).optional(),
    conditionTable: conditionTableSchema.optional(),
  })
  .strict();

/** The whole file with its conditions typed (for documentation and JSON Schema export). */
export const modelFileFullSchema = modelFileSchema.extend({
  conditions: z.array(conditionSchema).min(1).optional(),
  conditionTable: conditionTableSchema.extend({ common: conditionSchema.partial().optional() }).optional(),
});

export type WrittenModelFile = z.infer<typeof modelFileFullSchema>;
export type WrittenCondition = z.infer<typeof conditionSchema>;
export type WrittenConditionTable = z.infer<typeof conditionTableSchema>;
export type WrittenCockpitControls = z.infer<typeof cockpitControlsSchema>;
export type WrittenFrequencyResponse = z.infer<typeof frequencyResponseSchema>;
export type WrittenStateSpace = z.infer<typeof stateSpaceSchema>;
export type WrittenLongitudinal = z.infer<typeof longitudinalSchema>;
export type WrittenLateral = z.infer<typeof lateralSchema>;
export type WrittenLongitudinalDerivatives = z.infer<typeof longitudinalDerivativesSchema>;
export type WrittenLateralDerivatives = z.infer<typeof lateralDerivativesSchema>;
export type WrittenNondimensional = z.infer<typeof nondimensionalSchema>;
export type WrittenCoefficients = z.infer<typeof coefficientsSchema>;
