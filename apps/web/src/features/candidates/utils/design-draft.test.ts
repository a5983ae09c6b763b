import { describe, expect, it } from 'vitest';

import { type DesignDraft, buildDesign, conjugateOf, emptyDraft, newRow, placeError, rowFieldKey, textErrors } from './design-draft';

function zpk(poles: [string, string][], gain: string, zeros: [string, string][] = []): DesignDraft {
  return { ...emptyDraft(), name: 'x', poles: poles.map(([re, im]) => newRow(re, im)), zeros: zeros.map(([re, im]) => newRow(re, im)), gain };
}

describe('buildDesign (zero-pole-gain)', () => {
  it('adds the conjugate of each complex row right after it', () => {
    const built = buildDesign(zpk([['-2', '3'], ['-15', '']], '195'));
    expect(built.errors).toEqual({});
    expect(built.design).toEqual({ poles: [{ re: -2, im: 3 }, { re: -2, im: -3 }, { re: -15, im: 0 }], zeros: [], gain: 195 });
  });

  it('accepts numbers as engineers type them (5e-1, .5)', () => {
    const built = buildDesign(zpk([['-5e-1', ''], ['-.5', '']], '0.25'));
    expect(built.design).toEqual({ poles: [{ re: -0.5, im: 0 }, { re: -0.5, im: 0 }], zeros: [], gain: 0.25 });
  });

  it("puts a bad imaginary part under pole 2's imaginary part", () => {
    const draft = zpk([['-2', '3'], ['-4', 'abc']], '1');
    const built = buildDesign(draft);
    expect(built.design).toBeNull();
    expect(built.errors[rowFieldKey('poles', draft.poles[1]!.key, 'im')]).toMatch(/^Pole 2: the imaginary part/);
  });

  it('passes the engine rules on: more zeros than poles is refused under the zeros', () => {
    const built = buildDesign(zpk([['-2', '']], '1', [['-1', ''], ['-3', '']]));
    expect(built.design).toBeNull();
    expect(built.errors.zeros).toMatch(/proper/);
  });

  it('refuses a zero gain with the engine message under the gain', () => {
    const built = buildDesign(zpk([['-2', '']], '0'));
    expect(built.errors.gain).toMatch(/must not be zero/);
  });
});

describe('buildDesign (polynomial)', () => {
  it('reads "1, 19, 73, 195" as the denominator, highest power first', () => {
    const built = buildDesign({ ...emptyDraft(), form: 'polynomial', numerator: '195', denominator: '1, 19, 73, 195' });
    expect(built.design).toEqual({ numerator: [195], denominator: [1, 19, 73, 195] });
  });

  it('names the coefficient of a zero leading denominator coefficient', () => {
    const built = buildDesign({ ...emptyDraft(), form: 'polynomial', numerator: '1', denominator: '0 1 2' });
    expect(built.errors.denominator).toMatch(/^Coefficient 1: /);
  });
});

describe('placeError (server fields)', () => {
  it('maps design.poles[1].im to the conjugate of pole 1 when pole 1 is complex', () => {
    const draft = zpk([['-2', '3'], ['-15', '']], '195');
    const built = buildDesign(draft);
    const errors: Record<string, string> = {};
    placeError('design.poles[1].im', 'must be a number', built.slots, errors);
    expect(errors[rowFieldKey('poles', draft.poles[0]!.key, 'im')]).toBe('Pole 1 (its conjugate), imaginary part: must be a number');
    placeError('design.poles[2].re', 'too far', built.slots, errors);
    expect(errors[rowFieldKey('poles', draft.poles[1]!.key, 're')]).toBe('Pole 2, real part: too far');
  });

  it('keeps name and unknown paths apart', () => {
    const errors: Record<string, string> = {};
    placeError('name', 'Give the candidate a name', [], errors);
    placeError('design', 'A design needs either poles and gain', [], errors);
    expect(errors).toEqual({ name: 'Give the candidate a name', design: 'A design needs either poles and gain' });
  });
});

describe('conjugateOf and textErrors', () => {
  it('shows a conjugate only for a complex row', () => {
    expect(conjugateOf(newRow('-2', '3'))).toEqual({ re: -2, im: -3 });
    expect(conjugateOf(newRow('-2', ''))).toBeNull();
    expect(conjugateOf(newRow('x', '3'))).toBeNull();
  });
  it('uses the contract message for a missing name', () => {
    expect(textErrors({ ...emptyDraft(), name: '  ' }).name).toBe('Give the candidate a name');
  });
});
