import type { ClassTrendDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { debriefQueryKeys } from '../utils/debriefQueryKeys';

/** Accuracy by tag across a class's ended sessions, oldest first. */
export function useClassTrends(classId: string) {
  return useQuery({
    queryKey: debriefQueryKeys.trends(classId),
    queryFn: () => apiClient.get<ClassTrendDto>(apiPaths.classTrends(classId)),
  });
}
