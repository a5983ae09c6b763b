import { describe, expect, it } from 'vitest';
import { evaluate } from './evaluate.js';
import { evaluateBatch } from './evaluate-batch.js';
import { SpecInputError } from './spec-input-error.js';

const nise = { numerator: [100], denominator: [1, 15, 100] };

describe('evaluateBatch', () => {
  it('gives each design its assessment, in order, and a bad design its error object in place', () => {
    const out = evaluateBatch([{ ...nise, id: 'a' }, { poles: 3 }, { ...nise, id: 'c' }], { maxOvershootPct: 5 });
    expect(out.length).toBe(3);
    expect(out[0]).toEqual(evaluate({ ...nise, id: 'a' }, { maxOvershootPct: 5 }));
    const err = out[1];
    expect(err && 'error' in err ? typeof err.error.code : null).toBe('string');
    expect(out[2] && 'id' in out[2] ? out[2].id : null).toBe('c');
  });

  it('parses the requirement set once and rejects the whole batch when it is bad', () => {
    expect(() => evaluateBatch([nise], { maxOvershootPct: -1 })).toThrow(SpecInputError);
  });
});
