import { z } from 'zod';
import { roles } from '../permissions';
import { unitSystemSchema } from './common';
import { notifyPrefsSchema } from './notification';

export const roleSchema = z.enum(roles, { error: 'Choose a role' });

export const loginSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  password: z.string().min(1, 'Enter your password').max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const signedInUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  units: unitSystemSchema,
  siteId: z.number().int(),
  notify: notifyPrefsSchema.optional(),
});
export type SignedInUser = z.infer<typeof signedInUserSchema>;

export const signedInUserResponseSchema = z.object({ user: signedInUserSchema });
/** Who is signed in on this browser, if anyone: `user` is null for a visitor who has not signed in. */
export const signInStateResponseSchema = z.object({ user: signedInUserSchema.nullable() });
export const csrfResponseSchema = z.object({ token: z.string() });
