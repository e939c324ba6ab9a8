import type { DeletePlayerDataResponse } from '@covalent/shared-types';
import { useMutation } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { useInvalidatePlayerData } from './useInvalidatePlayerData';

export interface DeleteSessionPlayerDataInput {
  playerId: string;
  /** The name the table shows, for the status line only. */
  name: string;
}

/** Deletes one player's responses in one ended session; the debrief then counts them as removed. */
export function useDeleteSessionPlayerData(sessionId: string) {
  const invalidate = useInvalidatePlayerData();
  return useMutation<DeletePlayerDataResponse, ApiRequestError, DeleteSessionPlayerDataInput>({
    mutationFn: ({ playerId }) => apiClient.delete<DeletePlayerDataResponse>(apiPaths.sessionPlayerData(sessionId, playerId)),
    onSuccess: () => invalidate(),
  });
}
