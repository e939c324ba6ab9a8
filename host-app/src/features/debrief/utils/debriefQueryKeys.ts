/** Cache keys of debriefs, their catch-ups and class trends. */
export const debriefQueryKeys = {
  all: ['debriefs'] as const,
  list: () => ['debriefs', 'list'] as const,
  detail: (sessionId: string) => ['debriefs', 'detail', sessionId] as const,
  item: (sessionId: string, itemId: string) => ['debriefs', 'detail', sessionId, 'item', itemId] as const,
  /** A session's catch-ups; the results of each sit under it, so one invalidation refreshes both. */
  catchups: (sessionId: string) => ['debriefs', 'detail', sessionId, 'catchups'] as const,
  catchupResults: (sessionId: string, catchupId: string) => ['debriefs', 'detail', sessionId, 'catchups', catchupId, 'results'] as const,
  allTrends: () => ['debriefs', 'trends'] as const,
  trends: (classId: string) => ['debriefs', 'trends', classId] as const,
};
