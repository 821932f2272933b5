import { z } from 'zod';
import { singleLineText } from './text';

export const USER_ROLES = ['buyer', 'grower', 'admin'] as const;
export type UserRole = (typeof USER_ROLES)[number];

const email = z
  .string()
  .trim()
  .max(254, 'E-mail is too long.')
  .email('Enter a valid e-mail address.')
  .transform((s) => s.toLowerCase());

/** Sign-up: only buyers and growers can register themselves; admins are created by operators. */
export const SignUpSchema = z
  .object({
    email,
    password: z
      .string()
      .min(10, 'Use at least 10 characters.')
      .max(200, 'Use at most 200 characters.')
      // Spaces are allowed in a pass phrase, but a password must not be spaces alone.
      .refine((p) => p.trim().length >= 10, 'Use at least 10 characters besides spaces.'),
    displayName: singleLineText('Name', 100, { min: 1, minMessage: 'Enter your name.' }),
    role: z.enum(['buyer', 'grower'], { message: 'Choose buyer or grower.' }),
  })
  .strict();
export type SignUp = z.infer<typeof SignUpSchema>;

export const SignInSchema = z
  .object({ email, password: z.string().min(1, 'Enter your password.').max(200) })
  .strict();
export type SignIn = z.infer<typeof SignInSchema>;

/** The signed-in user as the API returns it (never the password hash). */
export const SessionUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  displayName: z.string(),
  role: z.enum(USER_ROLES),
  /** Whether the owner opened the confirmation link sent to this address; saved-search alerts wait for it. */
  emailVerified: z.boolean(),
});
export type SessionUser = z.infer<typeof SessionUserSchema>;

/**
 * The answer to a sign-up, the same for a new address and one that already has an account, so the form
 * does not tell anyone which addresses are registered. A new account is also signed in (ask `/auth/me`).
 */
export const SignUpAnswerSchema = z.object({ email: z.string(), message: z.string() });
export type SignUpAnswer = z.infer<typeof SignUpAnswerSchema>;

/** The token from a confirmation link. */
export const VerifyEmailSchema = z.object({ token: z.string().min(1, 'The link has no token.').max(1000) }).strict();

/** The answer to opening a confirmation link. */
export const VerifyEmailAnswerSchema = z.object({ email: z.string(), alreadyConfirmed: z.boolean(), message: z.string() });
export type VerifyEmailAnswer = z.infer<typeof VerifyEmailAnswerSchema>;
