import { z } from 'zod';
import { isoDateTime, listOf, named, recordId } from './contract.js';
import { roleSchema } from './roles.js';

/**
 * A few of the most common passwords. NIST SP 800-63B (2017), section 5.1.1.2, asks verifiers to refuse
 * passwords found in lists of commonly used or breached values; this short list is common practice, not a
 * complete breach corpus.
 */
const COMMON_PASSWORDS = new Set([
  'password',
  'password1',
  'password123',
  '12345678',
  '123456789',
  '1234567890',
  'qwertyuiop',
  'qwerty123',
  'iloveyou',
  'sunshine',
  'princess',
  'football',
  'baseball',
  'welcome1',
  'admin123',
  'letmein1',
  'trustno1',
  'passw0rd',
  'abc12345',
  '11111111',
  '00000000',
  'superman',
  'starwars',
  'whatever',
  'qwertyui',
  'linkloom',
]);

export const passwordSchema = z
  .string()
  .min(8, 'must be at least 8 characters')
  .max(256, 'must be at most 256 characters')
  .refine((p) => !COMMON_PASSWORDS.has(p.toLowerCase()), 'is one of the most common passwords; choose another');

export const emailSchema = z.string().trim().toLowerCase().max(254).email('must be an e-mail address');

export const signInSchema = z
  .object({ email: z.string().trim().toLowerCase().min(1).max(254), password: z.string().min(1).max(256) })
  .strict();
export const changePasswordSchema = z.object({ currentPassword: z.string().min(1).max(256), newPassword: passwordSchema }).strict();
export const createUserSchema = z
  .object({ email: emailSchema, name: z.string().trim().min(1).max(120), role: roleSchema, password: passwordSchema })
  .strict();
export const updateUserSchema = z
  .object({ role: roleSchema.optional(), disabled: z.boolean().optional(), name: z.string().trim().min(1).max(120).optional() })
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'give at least one of role, disabled, name');

export const userSummarySchema = named(
  'UserSummary',
  z.object({ id: recordId, email: z.string(), name: z.string(), role: roleSchema }),
  'Who a person is, as sign-in and the session carry it.',
);
export const userDetailsSchema = named(
  'UserDetails',
  userSummarySchema.extend({ disabled: z.boolean(), createdAt: isoDateTime, lastSignInAt: isoDateTime.nullable() }),
);
export const userDetailsListSchema = listOf('UserDetailsList', userDetailsSchema);
export const signInResultSchema = named(
  'SignInResult',
  z.object({ accessToken: z.string().min(1), expiresAt: isoDateTime, user: userSummarySchema }),
  'Send `Authorization: Bearer <accessToken>` until `expiresAt`.',
);

export type UserSummary = z.infer<typeof userSummarySchema>;
export type UserDetails = z.infer<typeof userDetailsSchema>;
export type SignInResult = z.infer<typeof signInResultSchema>;
export type SignInInput = z.infer<typeof signInSchema>;
export type CreateUserInput = z.infer<typeof createUserSchema>;
export type UpdateUserInput = z.infer<typeof updateUserSchema>;
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;
