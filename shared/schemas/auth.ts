import { z } from 'zod';
import { ROLES } from '../auth/permissions';

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254)
  .pipe(z.email({ message: 'Enter a valid e-mail address' }));

export const loginSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const PASSWORD_MIN_LENGTH = 12;

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(200, 'Use at most 200 characters')
  .refine((p) => p.trim().length > 0, 'Use more than spaces');

export const setPasswordSchema = z.object({
  token: z.string().min(20).max(200),
  password: passwordSchema,
});
export type SetPasswordInput = z.infer<typeof setPasswordSchema>;

export const roleSchema = z.enum(ROLES);

export const personSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  status: z.enum(['invited', 'active', 'deactivated']),
  createdAt: z.string(),
  lastSignInAt: z.string().nullable(),
});
export type Person = z.infer<typeof personSchema>;

export const inviteSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, 'Enter a name').max(120),
  role: roleSchema,
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const updatePersonSchema = z
  .object({
    role: roleSchema.optional(),
    status: z.enum(['active', 'deactivated']).optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.status !== undefined, { message: 'Give a role or a status' });
export type UpdatePersonInput = z.infer<typeof updatePersonSchema>;

export const idParamSchema = z.object({ id: z.coerce.number().int().positive() });

export const listQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
  sort: z.string().max(40).optional(),
  order: z.enum(['asc', 'desc']).default('asc'),
});
