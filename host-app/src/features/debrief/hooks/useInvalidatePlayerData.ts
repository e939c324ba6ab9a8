import { useQueryClient } from '@tanstack/react-query';
import { historyQueryKeys } from '@/features/history/utils/historyQueryKeys';
import { debriefQueryKeys } from '../utils/debriefQueryKeys';

/**
 * After a student's data is deleted: every debrief, list, trend and history may count them,
 * so all of those refetch rather than guessing which sessions they played in.
 */
export function useInvalidatePlayerData() {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: debriefQueryKeys.all }),
      queryClient.invalidateQueries({ queryKey: historyQueryKeys.all }),
    ]);
}
