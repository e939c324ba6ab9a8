import type { CatchupResultsDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { debriefQueryKeys } from '../utils/debriefQueryKeys';

/** Every student's cards in one catch-up: box, attempts, last result, next review. */
export function useCatchupResults(sessionId: string, catchupId: string) {
  return useQuery({
    queryKey: debriefQueryKeys.catchupResults(sessionId, catchupId),
    queryFn: () => apiClient.get<CatchupResultsDto>(apiPaths.catchupResults(sessionId, catchupId)),
  });
}
