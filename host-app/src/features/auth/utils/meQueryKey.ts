/** Cache key of the signed-in user; `null` in the cache means signed out. */
export const meQueryKey = ['me'] as const;
