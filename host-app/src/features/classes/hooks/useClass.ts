import type { ClassDetailDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { classQueryKeys } from '../utils/classQueryKeys';

/** One class with its roster and pair rules. */
export function useClass(classId: string) {
  return useQuery({
    queryKey: classQueryKeys.detail(classId),
    queryFn: () => apiClient.get<ClassDetailDto>(apiPaths.class(classId)),
  });
}
