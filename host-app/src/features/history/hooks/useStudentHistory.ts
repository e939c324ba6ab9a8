import type { StudentHistoryDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { historyQueryKeys } from '../utils/historyQueryKeys';

/** One student's sessions and catch-ups in one class; 404 when the reader may not see them. */
export function useStudentHistory(classId: string, entryId: string) {
  return useQuery({
    queryKey: historyQueryKeys.student(classId, entryId),
    queryFn: () => apiClient.get<StudentHistoryDto>(apiPaths.studentHistory(classId, entryId)),
  });
}
