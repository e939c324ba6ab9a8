import type { DeletePlayerDataResponse } from '@covalent/shared-types';
import { useMutation } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { useInvalidatePlayerData } from '@/features/debrief/hooks/useInvalidatePlayerData';

/** Deletes one student's responses and catch-up cards across the class's ended sessions (the class's owner only). */
export function useDeleteStudentData(classId: string, entryId: string) {
  const invalidate = useInvalidatePlayerData();
  return useMutation<DeletePlayerDataResponse, ApiRequestError, void>({
    mutationFn: () => apiClient.delete<DeletePlayerDataResponse>(apiPaths.rosterEntryData(classId, entryId)),
    onSuccess: () => invalidate(),
  });
}
