import { z } from 'zod';
import { roleSchema } from './auth';
import { listSchema, requiredTextSchema, unitSystemSchema } from './common';
import { notifyPrefsSchema } from './notification';
import { siteIdSchema } from './site';

export const userSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  units: unitSystemSchema,
  siteId: z.number().int(),
  disabled: z.boolean(),
  createdAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

const passwordSchema = z.string().min(10, 'Use at least 10 characters').max(200);

export const createUserSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  name: requiredTextSchema('Enter a name', 120),
  role: roleSchema,
  units: unitSystemSchema.default('metric'),
  password: passwordSchema,
  /** Left out, the new user joins the creating admin's site. */
  siteId: siteIdSchema.optional(),
});
export type CreateUserInput = z.input<typeof createUserSchema>;

export const updateUserSchema = z
  .object({
    name: requiredTextSchema('Enter a name', 120),
    role: roleSchema,
    units: unitSystemSchema,
    disabled: z.boolean(),
    password: passwordSchema,
    siteId: siteIdSchema,
  })
  .partial();
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

/** What any signed-in user may change about themselves. */
export const updateMeSchema = z
  .object({ name: requiredTextSchema('Enter a name', 120), units: unitSystemSchema, notify: notifyPrefsSchema })
  .partial();
export type UpdateMeInput = z.infer<typeof updateMeSchema>;

export const userResponseSchema = z.object({ user: userSchema });
export const userListSchema = listSchema(userSchema);
