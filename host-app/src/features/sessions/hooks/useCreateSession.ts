import type { CreateSessionRequest, SessionDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { sessionsQueryKey } from '../utils/sessionsQueryKey';

/** Sets up a session; the answer carries its join code. */
export function useCreateSession() {
  const queryClient = useQueryClient();
  return useMutation<SessionDto, ApiRequestError, CreateSessionRequest>({
    mutationFn: (request) => apiClient.post<SessionDto>(apiPaths.sessions, request),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionsQueryKey }),
  });
}
