/** Cache keys of debriefs and class trends. */
export const debriefQueryKeys = {
  all: ['debriefs'] as const,
  list: () => ['debriefs', 'list'] as const,
  detail: (sessionId: string) => ['debriefs', 'detail', sessionId] as const,
  item: (sessionId: string, itemId: string) => ['debriefs', 'detail', sessionId, 'item', itemId] as const,
  trends: (classId: string) => ['debriefs', 'trends', classId] as const,
};
