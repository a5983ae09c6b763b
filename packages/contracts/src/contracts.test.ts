// The shared schemas as the API and the forms both use them: what each one
// accepts, what it refuses and which field its message names.
import { describe, expect, it } from 'vitest';

import { loginSchema, passwordSchema, updateUserSchema } from './auth.js';
import { REQUIREMENT_WORDS } from './requirement-words.js';
import { REQUIREMENT_FIELDS, regionQuerySchema } from './workflow.js';

describe('passwordSchema', () => {
  it('When a password is shorter than 12 characters, then it is refused with the length in the message', () => {
    const r = passwordSchema.safeParse('short-pass1');
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.message).toContain('12 characters');
  });

  it('When a long password is on the common list in any letter case, then it is refused', () => {
    expect(passwordSchema.safeParse('PassWord1234').success).toBe(false);
    expect(passwordSchema.safeParse('qwertyuiop123').success).toBe(false);
  });

  it('When a long password is not a common one, then it is accepted as typed', () => {
    expect(passwordSchema.parse('gimbal pitch loop 7')).toBe('gimbal pitch loop 7');
  });
});

describe('loginSchema', () => {
  it('When the e-mail has spaces around it, then they are trimmed; a non-address is refused naming email', () => {
    expect(loginSchema.parse({ email: '  a@example.com ', password: 'x' }).email).toBe('a@example.com');
    const r = loginSchema.safeParse({ email: 'not-an-address', password: 'x' });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(['email']);
  });
});

describe('updateUserSchema', () => {
  it('When nothing is given, then "Nothing to change"; an unknown field is refused', () => {
    expect(updateUserSchema.safeParse({}).error!.issues[0]!.message).toBe('Nothing to change');
    expect(updateUserSchema.safeParse({ name: 'A', email: 'b@example.com' }).success).toBe(false);
  });
});

describe('regionQuerySchema', () => {
  it('When the window comes as query strings, then they become numbers; a word is refused naming its key; other keys are ignored', () => {
    expect(regionQuerySchema.parse({ reMin: '-20', reMax: '2', other: 'x' })).toEqual({ reMin: -20, reMax: 2 });
    const r = regionQuerySchema.safeParse({ imMax: 'lots' });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]!.path).toEqual(['imMax']);
    expect(r.error!.issues[0]!.message).toBe('imMax must be a number');
  });
});

describe('REQUIREMENT_WORDS', () => {
  it('When a requirement field exists, then it has a name, a unit entry and a direction for tables and reports', () => {
    for (const field of REQUIREMENT_FIELDS) {
      expect(REQUIREMENT_WORDS[field], field).toBeDefined();
      expect(REQUIREMENT_WORDS[field]!.name.length, field).toBeGreaterThan(0);
    }
  });
});
