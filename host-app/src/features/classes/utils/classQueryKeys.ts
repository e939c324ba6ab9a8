/** Cache keys of classes; invalidating `all` refreshes lists and open classes alike. */
export const classQueryKeys = {
  all: ['classes'] as const,
  list: (archived: 'false' | 'all') => ['classes', 'list', archived] as const,
  detail: (classId: string) => ['classes', 'detail', classId] as const,
};
