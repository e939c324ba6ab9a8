import { FormField } from '@/features/forms/components/FormField';
import { passwordMismatch } from '@/features/forms/utils/passwordMismatch';

// Mirrors the server's password policy (NIST SP 800-63B minimum of 15); the server has the final word.
const PASSWORD_HINT = 'At least 15 characters. A few words make a good passphrase.';

export interface NewPasswordFieldsProps {
  password: string;
  confirm: string;
  onPasswordChange: (value: string) => void;
  onConfirmChange: (value: string) => void;
  /** What the server said about the password (e.g. weak_password details). */
  serverErrors?: string[];
}

/** New password and its confirmation, with the password manager hints browsers expect. */
export function NewPasswordFields({ password, confirm, onPasswordChange, onConfirmChange, serverErrors }: NewPasswordFieldsProps) {
  const mismatch = passwordMismatch(password, confirm);
  return (
    <>
      <FormField
        label="New password"
        hint={PASSWORD_HINT}
        type="password"
        name="password"
        autoComplete="new-password"
        required
        value={password}
        onChange={(e) => onPasswordChange(e.target.value)}
        errors={serverErrors}
      />
      <FormField
        label="Confirm new password"
        type="password"
        name="confirmPassword"
        autoComplete="new-password"
        required
        value={confirm}
        onChange={(e) => onConfirmChange(e.target.value)}
        errors={mismatch ? [mismatch] : undefined}
      />
    </>
  );
}
