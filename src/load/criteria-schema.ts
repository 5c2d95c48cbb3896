/**
 * The written form of a criteria file, format `modalgate-criteria/1` (YAML or JSON). This is
 * what the user types; src/criteria/resolve.ts turns a chain of these into a
 * ResolvedCriteriaSet (the normalised form in src/types.ts). Every object is strict, so a
 * misspelt field is reported rather than ignored.
 */
import { z } from 'zod';

export const CRITERIA_FORMAT = 'modalgate-criteria/1';

/**
 * Written in place of a bound that the programme has to choose (e.g. the "heavily damped"
 * short period of 14 CFR 25.181, which has no number). A chain that still holds it after
 * resolving is an error.
 */
export const PROGRAMME_VALUE = 'programme-value';

const aircraftClasses = ['I', 'II-L', 'II-C', 'III', 'IV'] as const;
const categories = ['A', 'B', 'C'] as const;
const modeKinds = ['short_period', 'phugoid', 'dutch_roll', 'roll', 'spiral', 'roll_spiral', 'kinematic', 'other'] as const;
export const quantities = [
  'damping_ratio',
  'natural_frequency',
  'cap',
  'damping_frequency_product',
  'time_to_double',
  'time_constant',
  'time_to_bank',
  'equivalent_time_delay',
  'pitch_bandwidth',
  'pitch_phase_delay',
] as const;

const idText = z.string().regex(/^[a-z0-9]+(?:[-_.][a-z0-9]+)*$/, 'an id of lower-case letters, digits and - _ .');
const phaseCode = z.string().regex(/^[A-Z]{1,4}$/, 'a flight-phase code of capital letters, e.g. CR');

const boundValue = z
  .union([z.number(), z.literal(PROGRAMME_VALUE)], {
    error: `a bound must be a finite number in the quantity's SI unit, or "${PROGRAMME_VALUE}"; leave min or max out for no bound on that side`,
  })
  .describe(`a number in the quantity's SI unit, or "${PROGRAMME_VALUE}" where the programme must choose it`);

export const boundSchema = z
  .strictObject({ min: boundValue.optional(), max: boundValue.optional() })
  .describe('bounds of one level; {} means any value is acceptable at this level');

export const levelsSchema = z
  .strictObject({ '1': boundSchema, '2': boundSchema.optional(), '3': boundSchema.optional() })
  .describe('Level 1 is required; a level left out holds the bounds of the next better level');

export const appliesSchema = z
  .strictObject({
    classes: z.array(z.enum(aircraftClasses)).min(1).optional(),
    categories: z.array(z.enum(categories)).min(1).optional(),
    phases: z.array(phaseCode).min(1).optional(),
    altitude: z
      .strictObject({
        below: z.number().describe('[m] applies below this geometric altitude').optional(),
        atOrAbove: z.number().describe('[m] applies at or above this geometric altitude').optional(),
      })
      .optional(),
  })
  .describe('where the criterion applies; a selector left out means all');

const vertex = z
  .tuple([z.number(), z.number()])
  .describe("[x, y]: the criterion's quantity, then the `against` quantity, in their SI units");
const polygonSchema = z
  .union([z.array(vertex).min(3), z.literal('any')])
  .describe('a closed polygon (at least 3 vertices, in order round the edge; the last joins the first), or "any" for the whole plane');

export const regionSchema = z
  .strictObject({
    against: z.enum(quantities).describe('the quantity on the second (y) axis, judged together with the criterion quantity (x)'),
    levels: z
      .strictObject({ '1': polygonSchema, '2': polygonSchema.optional(), '3': polygonSchema.optional() })
      .describe('the region of each level; a level left out holds the region of the next better level'),
    figure: z.string().min(1).describe('the figure of the document the vertices are read from').optional(),
  })
  .describe('a region criterion: the point (quantity, against) must lie in the level\'s polygon');

const paramsSchema = z.record(z.string(), z.union([z.number(), z.string(), z.boolean()]));

export const sourceSchema = z.strictObject({
  document: z.string().min(1).describe('e.g. MIL-F-8785C'),
  paragraph: z.string().min(1).describe('e.g. 3.2.2.1.2'),
});

export const evidenceClasses = ['published', 'secondary', 'conflicting', 'memory', 'programme-set'] as const;

export const sourceKinds = ['primary', 'reproduction', 'recollection'] as const;

export const sourceEntrySchema = z
  .strictObject({
    id: idText.describe('the id evidence entries cite it by (unique within the extends chain)'),
    kind: z
      .enum(sourceKinds)
      .describe('primary: the document itself; reproduction: a named text quoting or reprinting it; recollection: a memory of it, not a text'),
    title: z.string().min(1).describe('full citation: author, title, issuer, date'),
    reproduces: z.string().min(1).describe('the document it reproduces or recalls, e.g. MIL-F-8785C').optional(),
    where: z.string().min(1).describe('where it can be found: address or library reference').optional(),
    note: z.string().describe('Markdown').optional(),
  })
  .describe('one source of the set');

export const citationSchema = z
  .strictObject({
    source: idText.describe('id of an entry of the source list (this file or a file it extends)'),
    at: z.string().min(1).describe('page, table, figure or paragraph; required for a published boundary').optional(),
    quote: z.string().min(1).describe('a short quote of the source').optional(),
    value: z
      .union([z.number(), z.string().min(1)])
      .describe("the value this source gives, in the quantity's SI unit or as text; required for each source of a conflicting boundary")
      .optional(),
  })
  .describe('one source cited for a boundary');

const levelNumber = z.union([z.literal(1), z.literal(2), z.literal(3)]);

export const evidenceEntrySchema = z
  .strictObject({
    levels: z
      .array(levelNumber)
      .min(1)
      .describe('the levels whose bounds this entry covers; with neither levels nor params, every level the criterion lists')
      .optional(),
    params: z.array(z.string().min(1)).min(1).describe('names of `params` holding boundary values that this entry covers').optional(),
    class: z
      .enum(evidenceClasses)
      .describe(
        'published: read in the primary document at a stated page; secondary: read in a named reproduction; ' +
          'conflicting: the sources disagree (each with its value); memory: recalled or inferred, not read; ' +
          'programme-set: chosen by the programme',
      ),
    cites: z.array(citationSchema).describe('the sources, from the source list').optional(),
    note: z.string().describe('Markdown: what was read, and what remains to check').optional(),
  })
  .describe('what is known of some of the bounds of a criterion');

export const evidenceSchema = z
  .array(evidenceEntrySchema)
  .min(1)
  .describe('where each level of the bounds comes from; every level listed under `levels` is covered by exactly one entry');

export const criterionSchema = z
  .strictObject({
    id: idText,
    title: z.string().min(1),
    mode: z.enum(modeKinds),
    quantity: z.enum(quantities),
    applies: appliesSchema,
    levels: levelsSchema.describe('bounds per level (a region criterion gives `region` instead)').optional(),
    region: regionSchema.optional(),
    params: paramsSchema.optional(),
    source: sourceSchema,
    evidence: evidenceSchema,
    note: z.string().describe('Markdown'),
  })
  .refine((c) => (c.levels === undefined) !== (c.region === undefined), {
    message: 'a criterion gives `levels` (bounds) or `region` (polygons per level): exactly one of the two',
    path: ['levels'],
  });

export const overrideSchema = z.strictObject({
  id: idText,
  title: z.string().min(1).optional(),
  applies: appliesSchema.optional(),
  levels: z
    .strictObject({ '1': boundSchema.optional(), '2': boundSchema.optional(), '3': boundSchema.optional() })
    .describe('each level given replaces that level of the parent; the others are kept')
    .optional(),
  region: regionSchema.describe('replaces the parent region whole').optional(),
  params: paramsSchema.describe('merged key by key into the parent params').optional(),
  source: sourceSchema.optional(),
  evidence: evidenceSchema
    .describe('evidence of the levels (or params) given here; it replaces the parent evidence of the levels it covers. A level changed without evidence is shown as programme-set')
    .optional(),
  note: z.string().describe('Markdown; replaces the parent note').optional(),
});

export const dropSchema = z.strictObject({
  id: idText,
  reason: z.string().min(1).describe('why the programme does not apply this criterion (shown in the report)'),
});

const absoluteBandSchema = z.strictObject(
  Object.fromEntries(quantities.map((q) => [q, z.number().nonnegative().optional()])) as Record<
    (typeof quantities)[number],
    z.ZodOptional<z.ZodNumber>
  >,
);

export const criteriaFileSchema = z.strictObject({
  format: z.literal(CRITERIA_FORMAT),
  id: idText,
  title: z.string().min(1),
  extends: z.string().min(1).describe('a path relative to this file, or the id of a shipped set').optional(),
  requiredLevel: z.union([z.literal(1), z.literal(2), z.literal(3)]).describe('level required where the model gives none').optional(),
  marginalBand: z
    .strictObject({
      relative: z.number().min(0).max(1).describe('fraction of the governing boundary, e.g. 0.1').optional(),
      absolute: absoluteBandSchema.describe("per quantity, in its SI unit, used where the boundary is 0").optional(),
    })
    .optional(),
  phaseCategories: z.record(phaseCode, z.enum(categories)).describe('flight-phase code -> category').optional(),
  notes: z.string().describe('Markdown').optional(),
  sources: z.array(sourceEntrySchema).describe('the sources the evidence entries of this file cite').optional(),
  criteria: z.array(criterionSchema).optional(),
  overrides: z.array(overrideSchema).optional(),
  drop: z.array(dropSchema).optional(),
});

export type CriteriaFileInput = z.infer<typeof criteriaFileSchema>;
export type CriterionInput = z.infer<typeof criterionSchema>;
export type OverrideInput = z.infer<typeof overrideSchema>;
export type BoundInput = z.infer<typeof boundSchema>;
export type EvidenceEntryInput = z.infer<typeof evidenceEntrySchema>;
export type SourceEntryInput = z.infer<typeof sourceEntrySchema>;
