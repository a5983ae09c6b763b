import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assertClose } from '../test/asserts.js';
import { parseRequirements } from './parse-requirements.js';
import { SpecInputError } from './spec-input-error.js';

function rejection(input: unknown): SpecInputError {
  try {
    parseRequirements(input);
  } catch (e) {
    if (e instanceof SpecInputError) return e;
    throw e;
  }
  throw new Error(`expected ${JSON.stringify(input)} to be rejected`);
}

describe('parseRequirements', () => {
  it('parseRequirements(contract example) keeps every field and fills nothing it was given', () => {
    const r = parseRequirements({
      maxOvershootPct: 10,
      maxSettlingTime: 1.2,
      settlingBandPct: 2,
      maxPeakTime: 0.6,
      maxRiseTime: 0.3,
      minDampingRatio: 0.6,
      maxNaturalFrequency: 80,
      dominanceRatio: 5,
      marginPct: 0,
    });
    expect(r).toMatchObject({ maxOvershootPct: 10, maxSettlingTime: 1.2, maxPeakTime: 0.6, maxRiseTime: 0.3, maxNaturalFrequency: 80 });
    assertClose(r.minDampingRatio, 0.6, 0);
  });

  it('parseRequirements({maxOvershootPct}) fills settlingBandPct 2, dominanceRatio 5, marginPct 0', () => {
    const r = parseRequirements({ maxOvershootPct: 10 });
    assertClose(r.settlingBandPct, 2, 0);
    assertClose(r.dominanceRatio, 5, 0);
    assertClose(r.marginPct, 0, 0);
  });

  const bad: [input: unknown, path: string, words: RegExp][] = [
    [{ maxOvershootPct: 0 }, 'maxOvershootPct', /Max overshoot must be between 0 and 100 %/],
    [{ maxOvershootPct: 100 }, 'maxOvershootPct', /Max overshoot/],
    [{ maxOvershootPct: -3 }, 'maxOvershootPct', /Max overshoot/],
    [{ maxOvershootPct: Number.NaN }, 'maxOvershootPct', /Max overshoot/],
    [{ maxOvershootPct: '10' }, 'maxOvershootPct', /Max overshoot/],
    [{ maxSettlingTime: 0 }, 'maxSettlingTime', /Max settling time must be a positive/],
    [{ maxSettlingTime: Number.POSITIVE_INFINITY }, 'maxSettlingTime', /Max settling time/],
    [{ maxSettlingTime: 1, settlingBandPct: 0 }, 'settlingBandPct', /Settling band/],
    [{ maxSettlingTime: 1, settlingBandPct: 20.5 }, 'settlingBandPct', /Settling band/],
    [{ maxPeakTime: -1 }, 'maxPeakTime', /Max peak time/],
    [{ maxRiseTime: null }, 'maxRiseTime', /Max rise time/],
    [{ minDampingRatio: 1.2 }, 'minDampingRatio', /Min damping ratio must be more than 0 and at most 1/],
    [{ minDampingRatio: 0 }, 'minDampingRatio', /Min damping ratio/],
    [{ maxNaturalFrequency: 0 }, 'maxNaturalFrequency', /Max natural frequency/],
    [{ maxRiseTime: 1, dominanceRatio: 0.5 }, 'dominanceRatio', /Dominance ratio/],
    [{ maxRiseTime: 1, marginPct: 100 }, 'marginPct', /Margin/],
    [{ maxRiseTime: 1, marginPct: -1 }, 'marginPct', /Margin/],
    [{ maxRiseTime: 1, maxOvershoot: 5 }, 'maxOvershoot', /Unknown field "maxOvershoot"/],
    [{ settlingBandPct: 2, marginPct: 5 }, '', /at least one limit/],
    [{}, '', /at least one limit/],
    [[], '', /must be an object/],
    ['maxOvershootPct=10', '', /must be an object/],
    [null, '', /must be an object/],
  ];
  for (const [input, path, words] of bad) {
    it(`parseRequirements(${JSON.stringify(input)}) throws invalid_requirements naming ${path || 'the whole set'}`, () => {
      const e = rejection(input);
      expect(e.code).toBe('invalid_requirements');
      expect(e.path).toBe(path);
      expect(e.message).toMatch(words);
    });
  }

  it('accepts a settling band of exactly 20 % and a damping floor of exactly 1 (closed ends)', () => {
    expect(parseRequirements({ maxSettlingTime: 1, settlingBandPct: 20, minDampingRatio: 1 }).settlingBandPct).toBe(20);
  });

  it('throws nothing but SpecInputError on garbage (property test)', () => {
    const field = fc.constantFrom(
      'maxOvershootPct',
      'maxSettlingTime',
      'settlingBandPct',
      'maxPeakTime',
      'maxRiseTime',
      'minDampingRatio',
      'maxNaturalFrequency',
      'dominanceRatio',
      'marginPct',
      'other',
    );
    const value = fc.oneof(fc.double(), fc.anything(), fc.constant(undefined));
    const garbage = fc.oneof(fc.anything(), fc.dictionary(field, value));
    fc.assert(
      fc.property(garbage, (input) => {
        try {
          const r = parseRequirements(input);
          return r.settlingBandPct > 0 && r.dominanceRatio >= 1 && r.marginPct >= 0;
        } catch (e) {
          return e instanceof SpecInputError && e.code === 'invalid_requirements' && e.message.length > 0;
        }
      }),
      { numRuns: 2000 },
    );
  }, 120_000);
});
