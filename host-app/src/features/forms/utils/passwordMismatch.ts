/** The confirm field's problem, if any, once the teacher has typed in it. */
export function passwordMismatch(password: string, confirm: string): string | undefined {
  if (!confirm || password === confirm) return undefined;
  return 'The two passwords are not the same.';
}
