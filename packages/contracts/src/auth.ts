import { z } from 'zod';

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
  .max(200, 'Password is too long');

export const roleSchema = z.enum(ROLES, { message: 'Pick one of the four roles' });

export const createUserSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254),
  name: z.string().trim().min(1, 'Enter the person’s name').max(120, 'Name is too long'),
  role: roleSchema,
  password: passwordSchema,
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
