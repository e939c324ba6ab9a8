import type { DebriefSummaryDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { debriefQueryKeys } from '../utils/debriefQueryKeys';

/** The ended sessions the teacher may debrief, most recent first. */
export function useDebriefs() {
  return useQuery({
    queryKey: debriefQueryKeys.list(),
    queryFn: () => apiClient.get<DebriefSummaryDto[]>(apiPaths.debriefs),
    select: (list) => [...list].sort((a, b) => b.playedAt.localeCompare(a.playedAt)),
  });
}
