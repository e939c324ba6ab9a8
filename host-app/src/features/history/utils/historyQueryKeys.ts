/** Cache keys of student histories. */
export const historyQueryKeys = {
  all: ['history'] as const,
  student: (classId: string, entryId: string) => ['history', classId, entryId] as const,
};
