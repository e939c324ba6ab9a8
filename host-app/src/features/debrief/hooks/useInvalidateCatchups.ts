import { useQueryClient } from '@tanstack/react-query';
import { debriefQueryKeys } from '../utils/debriefQueryKeys';

/** After a catch-up is made or closed: the session's list and results, and the class trends that count them. */
export function useInvalidateCatchups(sessionId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: debriefQueryKeys.catchups(sessionId) }),
      queryClient.invalidateQueries({ queryKey: debriefQueryKeys.allTrends() }),
    ]);
}
