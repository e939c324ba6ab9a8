import type { CatchupSummaryDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { debriefQueryKeys } from '../utils/debriefQueryKeys';

/** The catch-ups made from one session, oldest first. */
export function useCatchups(sessionId: string) {
  return useQuery({
    queryKey: debriefQueryKeys.catchups(sessionId),
    queryFn: () => apiClient.get<CatchupSummaryDto[]>(apiPaths.sessionCatchups(sessionId)),
  });
}
