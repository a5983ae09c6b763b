import { describe, expect, it } from 'vitest';

import { setPasswordFormSchema } from './set-password-form';

function issues(values: { password: string; confirm: string }): Record<string, string> {
  const parsed = setPasswordFormSchema.safeParse(values);
  if (parsed.success) return {};
  return Object.fromEntries(parsed.error.issues.map((i) => [i.path.join('.'), i.message]));
}

describe('setPasswordFormSchema', () => {
  it('accepts a long password typed the same twice', () => {
    expect(issues({ password: 'tarnwell-gimbal-42-axis', confirm: 'tarnwell-gimbal-42-axis' })).toEqual({});
  });

  it('names confirm when the two entries differ', () => {
    expect(Object.keys(issues({ password: 'tarnwell-gimbal-42-axis', confirm: 'tarnwell-gimbal-42-axes' }))).toEqual(['confirm']);
  });

  it.each(['short', 'password1234', 'QWERTY123456', 'zzzzzzzzzzzzzz'])('refuses %j as the password', (password) => {
    expect(issues({ password, confirm: password })).toHaveProperty('password');
  });
});
