/**
 * Accepts only an in-app path for the after-sign-in redirect, so a crafted
 * `?next=//elsewhere.example` cannot send a teacher off-site (an open redirect).
 */
export function safeNextPath(next: string | null | undefined): string | undefined {
  if (!next || !next.startsWith('/')) return undefined;
  if (next.startsWith('//') || next.startsWith('/\\')) return undefined;
  return next;
}
