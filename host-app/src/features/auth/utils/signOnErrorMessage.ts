import { SIGN_ON_ERRORS, type SignOnError } from '@covalent/shared-types';

// One sentence for each code the server puts in `/sign-in?error=` after a school sign-on fails.
const MESSAGES: Record<SignOnError, string> = {
  no_account: 'No Covalent account uses that school e-mail. Ask your school admin for an invitation.',
  account_deactivated: 'This Covalent account has been deactivated. Ask your school admin.',
  email_unverified:
    "Your school account's e-mail address is not verified, so it cannot be matched to a Covalent account. Ask your school's IT team.",
  email_missing:
    "Your school account did not share an e-mail address, so it cannot be matched to a Covalent account. Ask your school's IT team.",
  sign_on_expired: 'The school sign-on took too long or was started in another window. Try again.',
  state_mismatch: "The school sign-on could not be checked: the answer did not match this browser's request. Try again.",
  sign_on_cancelled: 'School sign-on was cancelled. Sign in again when you are ready.',
  sign_on_invalid: 'The answer from the school sign-on service could not be verified. Try again.',
  provider_error: 'The school sign-on service reported a problem. Try again, or sign in with your e-mail and password.',
  provider_unreachable:
    'The school sign-on service could not be reached. Try again in a moment, or sign in with your e-mail and password.',
};

const FALLBACK = 'School sign-on did not complete. Try again, or sign in with your e-mail and password.';

const isSignOnError = (code: string): code is SignOnError => (SIGN_ON_ERRORS as readonly string[]).includes(code);

/** The sentence for a `?error=` code; undefined when there is no code. */
export function signOnErrorMessage(code: string | null | undefined): string | undefined {
  if (!code) return undefined;
  return isSignOnError(code) ? MESSAGES[code] : FALLBACK;
}
