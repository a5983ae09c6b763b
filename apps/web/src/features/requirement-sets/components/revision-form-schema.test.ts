import { describe, expect, it } from 'vitest';

import { formValuesFrom, revisionFormSchema } from './revision-form-schema';

// The messages come from the engine's requirementsSchema (packages/spec/src/schemas/requirements.ts),
// so the form says exactly what the API would; these checks only follow the text -> number step.
function values(texts: Record<string, string>, bandChoice: '2' | '5' | 'other' = '2') {
  const base = formValuesFrom(null, '');
  return { ...base, bandChoice, requirements: { ...base.requirements, ...texts } };
}

describe('revisionFormSchema', () => {
  it('reads 0.5 and 5e-1 as the same number', () => {
    const a = revisionFormSchema.parse(values({ minDampingRatio: '0.5' }));
    const b = revisionFormSchema.parse(values({ minDampingRatio: '5e-1' }));
    expect(a.requirements.minDampingRatio).toBe(0.5);
    expect(b.requirements.minDampingRatio).toBe(0.5);
  });

  it('leaves blank limits out and takes the band from the choice', () => {
    const out = revisionFormSchema.parse(values({ maxSettlingTime: '1.2' }, '5'));
    expect(out.requirements).toEqual({ maxSettlingTime: 1.2, settlingBandPct: 5, dominanceRatio: 5 });
  });

  it('puts the message for text that is not a number under that field', () => {
    const result = revisionFormSchema.safeParse(values({ maxOvershootPct: 'ten' }));
    expect(result.success).toBe(false);
    const issue = result.error!.issues.find((i) => i.path.join('.') === 'requirements.maxOvershootPct');
    expect(issue?.message).toMatch(/overshoot/i);
  });

  it('refuses an overshoot of 100 % or more under the overshoot field', () => {
    const result = revisionFormSchema.safeParse(values({ maxOvershootPct: '100' }));
    expect(result.error?.issues.map((i) => i.path.join('.'))).toContain('requirements.maxOvershootPct');
  });

  it('asks for at least one limit when only settings are given', () => {
    const result = revisionFormSchema.safeParse(values({}));
    expect(result.success).toBe(false);
  });

  it('reads another band value typed in when "other" is chosen', () => {
    const out = revisionFormSchema.parse(values({ maxSettlingTime: '2', settlingBandPct: '1' }, 'other'));
    expect(out.requirements.settlingBandPct).toBe(1);
  });

  it('round-trips stored requirements through the form values', () => {
    const stored = { maxOvershootPct: 12, maxSettlingTime: 0.3, settlingBandPct: 2, maxRiseTime: 0.08 };
    expect(revisionFormSchema.parse(formValuesFrom(stored, 'why')).requirements).toEqual(stored);
  });
});
