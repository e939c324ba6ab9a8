import type { CreateCatchupResponse } from '@covalent/shared-types';
import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import type { ApiRequestError } from '@/api/client';
import { useInvalidateCatchups } from './useInvalidateCatchups';

/** Turns the session's missed items into a self-paced catch-up for the class. */
export function useCreateCatchup(sessionId: string) {
  const invalidate = useInvalidateCatchups(sessionId);
  return useMutation<CreateCatchupResponse, ApiRequestError>({
    mutationFn: () => apiClient.post<CreateCatchupResponse>(apiPaths.sessionCatchups(sessionId)),
    onSuccess: () => invalidate(),
  });
}
