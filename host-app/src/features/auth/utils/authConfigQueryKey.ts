/** Cache key of what the server offers for signing in (school sign-on or not). */
export const authConfigQueryKey = ['auth-config'] as const;
