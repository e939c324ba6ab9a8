import { passwordMismatch } from './passwordMismatch';

/** Why a new-password form cannot be sent yet, checked before asking the server. */
export function newPasswordProblem(password: string, confirm: string): string | undefined {
  if (!password) return 'Choose a password.';
  if (!confirm) return 'Type the password a second time to confirm it.';
  return passwordMismatch(password, confirm);
}
