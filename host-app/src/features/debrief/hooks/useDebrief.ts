import type { DebriefDto, DebriefItemDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { debriefQueryKeys } from '../utils/debriefQueryKeys';

/** One session's debrief; the server answers 409 `session_not_ended` while it is live. */
export function useDebrief(sessionId: string) {
  return useQuery({
    queryKey: debriefQueryKeys.detail(sessionId),
    queryFn: () => apiClient.get<DebriefDto>(apiPaths.debrief(sessionId)),
  });
}

/** The analysis of one item of a session, with its distractor table. */
export function useDebriefItem(sessionId: string, itemId: string) {
  return useQuery({
    queryKey: debriefQueryKeys.item(sessionId, itemId),
    queryFn: () => apiClient.get<DebriefItemDto>(apiPaths.debriefItem(sessionId, itemId)),
  });
}
