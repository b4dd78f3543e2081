import { z } from 'zod';

/** Limits shared by the forms and the server (the auth library enforces the same password bounds). */
export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 128;
export const NAME_MAX = 80;

/** Failed sign-ins allowed per e-mail address before it is paused, and for how long. */
export const SIGN_IN_FAILURES_PER_ACCOUNT = 5;
export const SIGN_IN_PAUSE_MINUTES = 15;

/** The one text for a failed sign-in: it must not tell whether the e-mail has an account. */
export const SIGN_IN_FAILED_MESSAGE = 'E-mail or password is not right.';
export const TOO_MANY_TRIES_MESSAGE = 'Too many tries, wait a minute and try again.';
export const RESET_REQUESTED_MESSAGE = 'If an account exists for that e-mail, we sent a link to choose a new password.';

const email = z.string().trim().min(1, 'Enter your e-mail').max(254, 'That e-mail is too long').pipe(z.email('Enter a valid e-mail'));
const newPassword = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters`);

export const signInSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password').max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters`),
});
export type SignInInput = z.infer<typeof signInSchema>;

// No role here on purpose: every new account is a buyer; only an admin can change a role.
export const signUpSchema = z.object({
  name: z.string().trim().min(1, 'Enter your name').max(NAME_MAX, `Use at most ${NAME_MAX} characters`),
  email,
  password: newPassword,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password'),
    newPassword,
    confirmPassword: z.string(),
  })
  .refine((v) => v.newPassword === v.confirmPassword, { path: ['confirmPassword'], message: 'The two new passwords differ' });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

export const updateNameSchema = z.object({
  name: z.string().trim().min(1, 'Enter your name').max(NAME_MAX, `Use at most ${NAME_MAX} characters`),
});
export type UpdateNameInput = z.infer<typeof updateNameSchema>;

export const changeEmailSchema = z.object({ newEmail: email });
export type ChangeEmailInput = z.infer<typeof changeEmailSchema>;

export const forgotPasswordSchema = z.object({ email });
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z
  .object({ newPassword, confirmPassword: z.string() })
  .refine((v) => v.newPassword === v.confirmPassword, { path: ['confirmPassword'], message: 'The two passwords differ' });
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

/**
 * Where to go after signing in: only a path on this site ("/orders?x=1"), never another origin.
 * Rejects "//evil", "/\evil", "https://…", "javascript:" and control characters, which browsers
 * would treat as a jump to another site.
 */
export function safeNextPath(next: string | null | undefined, fallback = '/'): string {
  if (!next || next.length > 2000) return fallback;
  if (!next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  // eslint-disable-next-line no-control-regex
  if (/[\u0000-\u001f\u007f\\]/.test(next)) return fallback;
  try {
    const base = 'http://stickerline.invalid';
    const url = new URL(next, base);
    if (url.origin !== base) return fallback;
    return url.pathname + url.search + url.hash;
  } catch {
    return fallback;
  }
}
