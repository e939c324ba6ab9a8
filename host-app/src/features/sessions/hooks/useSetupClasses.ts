import type { ClassDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';

/** The teacher's current classes, to pick who is playing. */
export function useSetupClasses() {
  return useQuery({
    queryKey: ['sessions', 'setup', 'classes'],
    queryFn: () => apiClient.get<ClassDto[]>(apiPaths.classes()),
  });
}
