import type { SessionDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { sessionsQueryKey } from '../utils/sessionsQueryKey';

/** The teacher's sessions, newest first. */
export function useSessions() {
  return useQuery({
    queryKey: sessionsQueryKey,
    queryFn: () => apiClient.get<SessionDto[]>(apiPaths.sessions),
    select: (sessions) => [...sessions].sort((a, b) => b.createdAt.localeCompare(a.createdAt)),
  });
}
