export const staffQueryKey = ['admin', 'staff'] as const;
