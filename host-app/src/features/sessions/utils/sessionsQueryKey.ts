export const sessionsQueryKey = ['sessions'] as const;
