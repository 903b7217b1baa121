import { z } from 'zod';
import { UserLimits } from '../validations.ts';

const email = z
  .string({ message: 'Enter your e-mail address' })
  .trim()
  .toLowerCase()
  .max(UserLimits.emailMax, `E-mail addresses are at most ${UserLimits.emailMax} characters`)
  .pipe(z.email({ message: 'Enter a valid e-mail address' }));

/** A new password; the server also checks it against the common-password list. */
export const NewPasswordSchema = z
  .string({ message: 'Choose a password' })
  .min(UserLimits.passwordMin, `Use at least ${UserLimits.passwordMin} characters`)
  .max(UserLimits.passwordMax, `Use at most ${UserLimits.passwordMax} characters`);

export const SignInSchema = z.object({
  email,
  password: z.string({ message: 'Enter your password' }).min(1, 'Enter your password').max(UserLimits.passwordMax),
});
export type SignInInput = z.infer<typeof SignInSchema>;

export const ChangePasswordSchema = z.object({
  currentPassword: z.string({ message: 'Enter your current password' }).min(1, 'Enter your current password'),
  newPassword: NewPasswordSchema,
});
export type ChangePasswordInput = z.infer<typeof ChangePasswordSchema>;

export const RequestPasswordResetSchema = z.object({ email });
export type RequestPasswordResetInput = z.infer<typeof RequestPasswordResetSchema>;

/** Used both to accept an invitation and to finish a password reset. */
export const TokenPasswordSchema = z.object({
  token: z.string({ message: 'The link is missing its token' }).min(20, 'The link is incomplete').max(200),
  newPassword: NewPasswordSchema,
});
export type TokenPasswordInput = z.infer<typeof TokenPasswordSchema>;

/** Checking a link's token without using it. Anything short or odd is simply "invalid", not a 400. */
export const TokenCheckSchema = z.object({
  token: z.string({ message: 'The link is missing its token' }).max(500, 'The link is not valid'),
});

/** What a link's token is now: nothing more (no name, no address), so checking tells a guesser nothing. */
export const TOKEN_STATES = ['valid', 'invalid', 'used', 'expired'] as const;
export type TokenState = (typeof TOKEN_STATES)[number];

export { email as EmailSchema };
