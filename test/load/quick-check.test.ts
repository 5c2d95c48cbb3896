/**
 * The quick acceptance test compiled from a zod schema never accepts what zod refuses, and
 * what it accepts zod returns unchanged (zod 4 documentation: strict objects, optional fields,
 * z.number() refusing NaN and Infinity). Random conditions, most of them nearly valid, are the
 * check cases; a few fixed ones show that it does accept ordinary conditions.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { conditionSchema } from '../../src/load/model-schema.js';
import { quickCheck } from '../../src/load/quick-check.js';

const accepts = quickCheck(conditionSchema);

const odd = fc.constantFrom<unknown>(undefined, null, 'x', '', Number.NaN, Number.POSITIVE_INFINITY, -1, 0, true, [], {}, [[]]);
const num = fc.oneof({ weight: 40, arbitrary: fc.double({ min: -100, max: 100, noNaN: true }) }, { weight: 1, arbitrary: odd });
const text = fc.oneof({ weight: 40, arbitrary: fc.constantFrom('CR', 'PA', 'c-1') }, { weight: 1, arbitrary: odd });
const names = fc.oneof({ weight: 20, arbitrary: fc.constant(['u', 'w']) }, { weight: 1, arbitrary: fc.constantFrom<unknown>([], ['u', ''], ['u', 3], 'u') });
const matrix = fc.oneof({ weight: 20, arbitrary: fc.array(fc.array(num, { minLength: 2, maxLength: 2 }), { minLength: 2, maxLength: 2 }) }, { weight: 1, arbitrary: odd });
const condition = fc.record(
  {
    id: text,
    phase: text,
    airspeed: num,
    altitude: num,
    requiredLevel: num,
    stateSpace: fc.oneof(fc.record({ states: names, A: matrix }, { requiredKeys: ['states'] }), odd),
    lateral: fc.oneof(fc.record({ primed: fc.oneof(fc.boolean(), odd), derivatives: fc.dictionary(fc.constantFrom('Yv', 'Lp', 'Lda', 'Nr'), num) }, { requiredKeys: [] }), odd),
  },
  { requiredKeys: ['id', 'phase', 'airspeed'] },
).chain((c) => fc.oneof({ weight: 9, arbitrary: fc.constant<Record<string, unknown>>(c) }, { weight: 1, arbitrary: num.map((x) => ({ ...c, unknownField: x })) }));

describe('quickCheck(conditionSchema)', () => {
  it('accepts only what zod accepts, and zod returns it unchanged', () => {
    let accepted = 0;
    fc.assert(
      fc.property(condition, (value) => {
        if (!accepts(value)) return;
        accepted++;
        const parsed = conditionSchema.safeParse(value);
        expect(parsed.success).toBe(true);
        expect(parsed.data).toEqual(value);
      }),
      { numRuns: 3000 },
    );
    // the property says something only if some random conditions pass
    expect(accepted).toBeGreaterThan(50);
  });

  it('accepts ordinary conditions (state-space and derivatives)', () => {
    expect(accepts({ id: 'c1', phase: 'CR', airspeed: 58, altitude: 2400, stateSpace: { states: ['u', 'w'], A: [[-0.02, 0.07], [-0.3, -1.9]] } })).toBe(true);
    expect(accepts({ id: 'c2', phase: 'PA', airspeed: 40, lateral: { primed: true, Ixz: 60, derivatives: { Yv: -0.2, Lp: -7, Lda: 22 } } })).toBe(true);
  });

  it.each([
    ['an unknown field', { id: 'c', phase: 'CR', airspeed: 50, mach: 0.2 }],
    ['NaN', { id: 'c', phase: 'CR', airspeed: Number.NaN }],
    ['a zero airspeed (must be > 0)', { id: 'c', phase: 'CR', airspeed: 0 }],
    ['an empty state list', { id: 'c', phase: 'CR', airspeed: 50, stateSpace: { states: [], A: [] } }],
    ['an empty id', { id: '', phase: 'CR', airspeed: 50 }],
    ['a missing phase', { id: 'c', airspeed: 50 }],
  ])('leaves %s to zod', (_, value) => {
    expect(accepts(value)).toBe(false);
    expect(conditionSchema.safeParse(value).success).toBe(false);
  });
});
