import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseDesign } from './parse-design.js';
import { designSchema } from './schemas/design.js';
import { SpecInputError } from './spec-input-error.js';
import { assertClose } from '../test/asserts.js';
import { pairOf, re } from '../test/design-builders.js';

function errorOf(input: unknown): SpecInputError {
  try {
    parseDesign(input);
  } catch (e) {
    expect(e).toBeInstanceOf(SpecInputError);
    return e as SpecInputError;
  }
  throw new Error('parseDesign accepted the input');
}

describe('parseDesign', () => {
  it('fills in the polynomial form of the contract example (-2 ± 3j, -15, gain 195)', () => {
    const m = parseDesign({ id: 'c-17', poles: [re(-15), { re: -2, im: -3 }, { re: -2, im: 3 }], gain: 195 });
    expect(m.id).toBe('c-17');
    expect(m.form).toBe('zpk');
    expect(m.denominator).toEqual([1, 19, 73, 195]);
    expect(m.numerator).toEqual([195]);
    expect(m.poles).toEqual([{ re: -2, im: 3 }, { re: -2, im: -3 }, re(-15)]);
    expect(m.zeros).toEqual([]);
  });

  it('fills in the zpk form of the same model from polynomials', () => {
    const m = parseDesign({ numerator: [0, 0, 390], denominator: [2, 38, 146, 390] });
    expect(m.form).toBe('polynomial');
    expect(m.denominator).toEqual([1, 19, 73, 195]);
    expect(m.numerator).toEqual([195]);
    assertClose(m.gain, 195, 1e-15);
    expect(m.poles).toHaveLength(3);
    assertClose(m.poles[0]?.re, -2, 1e-13);
    assertClose(m.poles[0]?.im, 3, 1e-13);
    expect(m.poles[1]).toEqual({ re: m.poles[0]?.re, im: -(m.poles[0]?.im as number) });
    assertClose(m.poles[2]?.re, -15, 1e-13);
    expect('id' in m).toBe(false);
  });

  it('makes near conjugates exact (relative 1e-9) and expands them in real arithmetic', () => {
    const m = parseDesign({ poles: [{ re: -1, im: 2 }, { re: -1 + 1e-12, im: -2 - 1e-12 }], zeros: [re(-3)], gain: 2 });
    expect(m.poles[0]?.re).toBe(m.poles[1]?.re);
    expect(m.poles[0]?.im).toBe(-(m.poles[1]?.im as number));
    expect(m.numerator).toEqual([2, 6]);
    assertClose(m.denominator[2], 5, 1e-11);
  });

  const bad: [string, unknown, string, string][] = [
    // name                         input                                                         code                     path
    ['not an object',               [1, 2],                                                       'design_not_object',     ''],
    ['null',                        null,                                                         'design_not_object',     ''],
    ['both forms',                  { poles: [], gain: 1, numerator: [1], denominator: [1] },     'design_form_ambiguous', ''],
    ['neither form',                { id: 'x' },                                                  'design_form_missing',   ''],
    ['unknown field',               { poles: [re(-1)], zero: [re(-2)], gain: 1 },                 'unknown_field',         'zero'],
    ['NaN gain',                    { poles: [re(-1)], gain: Number.NaN },                        'not_finite',            'gain'],
    ['infinite pole',               { poles: [{ re: -Infinity, im: 0 }], gain: 1 },               'not_finite',            'poles[0].re'],
    ['string coefficient',          { numerator: [1], denominator: [1, '2'] },                    'invalid_type',          'denominator[1]'],
    ['missing im',                  { poles: [{ re: -1 }], gain: 1 },                             'missing_field',         'poles[0].im'],
    ['empty denominator',           { numerator: [1], denominator: [] },                          'empty_denominator',     'denominator'],
    ['leading zero denominator',    { numerator: [1], denominator: [0, 1, 2] },                   'leading_zero',          'denominator[0]'],
    ['improper polynomial',         { numerator: [1, 2, 3], denominator: [1, 2] },                'improper_model',        'numerator'],
    ['improper zpk',                { poles: [re(-1)], zeros: [re(-2), re(-3)], gain: 1 },        'improper_model',        'zeros'],
    ['zero gain',                   { poles: [re(-1)], gain: 0 },                                 'zero_gain',             'gain'],
    ['all-zero numerator',          { numerator: [0, 0], denominator: [1, 2] },                   'zero_gain',             'numerator'],
    ['unmatched complex pole',      { poles: [{ re: -1, im: 2 }, { re: -1, im: -2.1 }], gain: 1 }, 'unmatched_conjugate',  'poles[0]'],
    ['unmatched complex zero',      { poles: [re(-1), re(-2)], zeros: [{ re: 1, im: 1 }], gain: 1 }, 'unmatched_conjugate', 'zeros[0]'],
    ['id not a string',             { poles: [re(-1)], gain: 1, id: 7 },                          'invalid_type',          'id'],
    ['poles not a list',            { poles: 'x', gain: 1 },                                      'invalid_type',          'poles'],
    ['coefficient overflow',        { poles: Array.from({ length: 120 }, () => re(-1e5)), gain: 1 }, 'coefficient_overflow', 'poles'],
  ];
  it.each(bad)('rejects %s with a SpecInputError naming the field', (_name, input, code, path) => {
    const e = errorOf(input);
    expect(e.code).toBe(code);
    expect(e.path).toBe(path);
    expect(e.message.length).toBeGreaterThan(10);
  });

  it('refuses a 10,000-pole model at once with a clear message', () => {
    const poles = Array.from({ length: 10000 }, (_, i) => re(-1 - i));
    const e = errorOf({ poles, gain: 1 });
    expect(e.code).toBe('order_too_high');
    expect(e.message).toMatch(/at most 200 poles; this one has 10000/);
    const e2 = errorOf({ numerator: [1], denominator: Array.from({ length: 10001 }, () => 1) });
    expect(e2.code).toBe('order_too_high');
  });

  it('accepts order 200 in both forms', () => {
    const poles = Array.from({ length: 100 }, (_, k) => pairOf(-0.5 - k * 0.01, 1 + k * 0.01)).flat();
    expect(parseDesign({ poles, gain: 1 }).denominator).toHaveLength(201);
  });

  it('random garbage only ever throws SpecInputError (fast-check)', () => {
    const complexLike = fc.record({ re: fc.oneof(fc.double(), fc.string(), fc.constant(undefined)), im: fc.oneof(fc.double(), fc.constant(null)) }, { requiredKeys: [] });
    const garbage = fc.oneof(
      fc.anything(),
      fc.record({ poles: fc.array(complexLike, { maxLength: 6 }), zeros: fc.anything(), gain: fc.oneof(fc.double(), fc.anything()) }, { requiredKeys: [] }),
      fc.record({ numerator: fc.array(fc.oneof(fc.double(), fc.anything()), { maxLength: 6 }), denominator: fc.oneof(fc.array(fc.double(), { maxLength: 8 }), fc.anything()), id: fc.anything() }, { requiredKeys: [] }),
    );
    fc.assert(
      fc.property(garbage, (input) => {
        try {
          parseDesign(input);
        } catch (e) {
          return e instanceof SpecInputError && typeof e.code === 'string' && e.code.length > 0;
        }
        return true;
      }),
      { numRuns: 3000 },
    );
 }, 60_000);

  it('designSchema agrees: what parseDesign accepts the schema accepts (fast-check)', () => {
    const real = fc.double({ min: -50, max: 50, noNaN: true });
    const design = fc.oneof(
      fc.record({ poles: fc.array(fc.record({ re: real, im: fc.constant(0) }), { maxLength: 5 }), gain: real }),
      fc.record({ numerator: fc.array(real, { minLength: 1, maxLength: 4 }), denominator: fc.array(real, { minLength: 1, maxLength: 5 }) }),
    );
    fc.assert(
      fc.property(design, (input) => {
        let accepted = true;
        try {
          parseDesign(input);
        } catch {
          accepted = false;
        }
        return !accepted || designSchema.safeParse(input).success;
      }),
      { numRuns: 1000 },
    );
    expect(designSchema.safeParse({ poles: [{ re: 1, im: Infinity }], gain: 1 }).success).toBe(false);
    expect(designSchema.safeParse({ poles: [], gain: 1, extra: 1 }).success).toBe(false);
  });
});
