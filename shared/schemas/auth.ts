import { z } from 'zod';

export const PASSWORD_MIN_LENGTH = 10;

const email = z
  .string({ error: 'e-mail is required' })
  .trim()
  .toLowerCase()
  .max(254, 'e-mail is longer than 254 characters')
  .pipe(z.email({ error: 'e-mail must look like name@example.org' }));
const password = z
  .string({ error: 'password is required' })
  .min(PASSWORD_MIN_LENGTH, `password must have at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(200, 'password must have at most 200 characters');
const name = z
  .string({ error: 'name is required' })
  .trim()
  .min(1, 'name must not be empty')
  .max(120, 'name must have at most 120 characters');
const token = z.string({ error: 'token is required' }).min(16, 'token is too short').max(200);

export const areaUnitSchema = z.enum(['ha', 'acres']);
export type AreaUnit = z.infer<typeof areaUnitSchema>;

export const userSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  areaUnit: areaUnitSchema,
  emailVerified: z.boolean(),
  isAdmin: z.boolean(),
});
export type User = z.infer<typeof userSchema>;

/** POST /auth/sign-up — `invitation` marks the address verified when it came from an invitation link. */
export const signUpBodySchema = z.object({ email, name, password, invitation: token.optional() });
export type SignUpBody = z.infer<typeof signUpBodySchema>;

/** POST /auth/sign-in */
export const signInBodySchema = z.object({ email, password: z.string({ error: 'password is required' }).min(1).max(200) });
export type SignInBody = z.infer<typeof signInBodySchema>;

/** POST /auth/verify and POST /auth/verify/resend */
export const verifyBodySchema = z.object({ token });
export const resendVerificationBodySchema = z.object({ email });

/** POST /auth/forgot */
export const forgotBodySchema = z.object({ email });
export type ForgotBody = z.infer<typeof forgotBodySchema>;

/** POST /auth/reset */
export const resetBodySchema = z.object({ token, password });
export type ResetBody = z.infer<typeof resetBodySchema>;

/** GET /auth/csrf */
export const csrfResponseSchema = z.object({ csrfToken: z.string() });

/** GET /auth/me, POST /auth/sign-in */
export const meResponseSchema = z.object({ user: userSchema });

/** Answers that carry only a sentence for the person (forgot, sign-up, verify …). */
export const messageResponseSchema = z.object({ message: z.string() });

/** PATCH /account */
export const updateAccountBodySchema = z
  .object({ name: name.optional(), areaUnit: areaUnitSchema.optional() })
  .refine((body) => body.name !== undefined || body.areaUnit !== undefined, {
    message: 'send name or areaUnit to change',
  });
export type UpdateAccountBody = z.infer<typeof updateAccountBodySchema>;

/** POST /account/password */
export const changePasswordBodySchema = z.object({
  currentPassword: z.string({ error: 'currentPassword is required' }).min(1).max(200),
  newPassword: password,
});
export type ChangePasswordBody = z.infer<typeof changePasswordBodySchema>;
