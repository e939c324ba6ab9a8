import type { ClassDto } from '@covalent/shared-types';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { classQueryKeys } from '../utils/classQueryKeys';

/** The teacher's classes (and those they co-teach); archived ones only when asked. */
export function useClasses(archived: 'false' | 'all') {
  return useQuery({
    queryKey: classQueryKeys.list(archived),
    queryFn: () => apiClient.get<ClassDto[]>(apiPaths.classes(archived)),
    placeholderData: keepPreviousData,
  });
}
