import { ApiError, friendlyMessage } from '../../lib/api-client';
import { SIGN_IN_FAILED_MESSAGE, TOO_MANY_TRIES_MESSAGE } from '../../../shared/accounts';

/** Too many tries: our per-account pause explains itself; the per-address limit gets the short text. */
function tooMany(error: ApiError) {
  return error.code === 'account_paused' ? error.message : TOO_MANY_TRIES_MESSAGE;
}

/** Sign-in failures in words that never tell whether the e-mail has an account. */
export function signInErrorMessage(error: unknown): string {
  if (!(error instanceof ApiError)) return friendlyMessage(error);
  if (error.status === 429) return tooMany(error);
  if (error.status === 401 || error.status === 400) return SIGN_IN_FAILED_MESSAGE;
  if (error.status === 403 && error.code === 'BANNED_USER') return 'This account is switched off. Please contact the mill.';
  return friendlyMessage(error);
}

export function signUpErrorMessage(error: unknown): string {
  if (!(error instanceof ApiError)) return friendlyMessage(error);
  if (error.status === 429) return tooMany(error);
  if (error.status === 422 || error.code === 'USER_ALREADY_EXISTS') {
    return 'We could not open an account with that e-mail. If you already have one, sign in or reset your password.';
  }
  return friendlyMessage(error);
}

export function passwordErrorMessage(error: unknown): string {
  if (error instanceof ApiError && error.status === 429) return tooMany(error);
  if (error instanceof ApiError && error.code === 'INVALID_TOKEN') return 'This link has expired or was already used. Ask for a new one.';
  return friendlyMessage(error);
}

/** True when the server refused the current password on a change-password call. */
export const isWrongCurrentPassword = (error: unknown) =>
  error instanceof ApiError && (error.code === 'INVALID_PASSWORD' || error.status === 401);
