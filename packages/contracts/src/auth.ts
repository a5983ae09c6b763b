import { z } from 'zod';

import { isCommonPassword } from './common-passwords.js';
import { ROLES } from './roles.js';

export const loginSchema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address').email('Enter a valid e-mail address').max(254),
  password: z.string().min(1, 'Enter your password').max(200, 'Password is too long'),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const MIN_PASSWORD_LENGTH = 12;

export const passwordSchema = z
  .string()
  .min(MIN_PASSWORD_LENGTH, `Password must be at least ${MIN_PASSWORD_LENGTH} characters`)
  .max(200, 'Password is too long')
  .refine((p) => !isCommonPassword(p), 'This password is one of the first anyone would guess; choose another');

export const roleSchema = z.enum(ROLES, { message: 'Pick one of the four roles' });

export const createUserSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254),
  name: z.string().trim().min(1, 'Enter the person’s name').max(120, 'Name is too long'),
  role: roleSchema,
  // Left out, the account gets an invitation e-mail with a one-time link to set
  // its own password. Given (scripts, pipelines), the account can sign in at once
  // and no invitation is sent.
  password: passwordSchema.optional(),
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const updateUserSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter the person’s name').max(120, 'Name is too long').optional(),
    role: roleSchema.optional(),
    active: z.boolean().optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

/** The user as every route returns it: never a password hash. */
export interface PublicUser {
  id: number;
  email: string;
  name: string;
  role: (typeof ROLES)[number];
  active: boolean;
  createdAt: string;
  lastLoginAt: string | null;
}

export interface SessionInfo {
  user: Pick<PublicUser, 'id' | 'email' | 'name' | 'role'>;
  csrfToken: string;
}

export const INVITE_TOKEN_HOURS = 72;
export const RESET_TOKEN_HOURS = 1;

export const setPasswordSchema = z.object({
  token: z.string().trim().min(1, 'The link has no token; open the link from the e-mail again').max(200, 'The token is too long'),
  password: passwordSchema,
});
export type SetPasswordInput = z.infer<typeof setPasswordSchema>;

export const requestResetSchema = z.object({
  email: z.string().trim().toLowerCase().min(1, 'Enter your e-mail address').email('Enter a valid e-mail address').max(254),
});
export type RequestResetInput = z.infer<typeof requestResetSchema>;

/** What POST /api/auth/request-reset always answers (202), whether or not the account exists. */
export interface RequestResetReply {
  message: string;
}

/** What POST /api/auth/set-password answers once the password is set. */
export interface SetPasswordReply {
  email: string;
}

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password').max(200, 'Password is too long'),
    newPassword: passwordSchema,
  })
  .strict()
  .refine((v) => v.currentPassword !== v.newPassword, { path: ['newPassword'], message: 'Choose a password different from the current one' });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
