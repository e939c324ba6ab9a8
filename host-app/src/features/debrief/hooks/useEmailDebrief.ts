import type { DebriefEmailResponse } from '@covalent/shared-types';
import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import type { ApiRequestError } from '@/api/client';

/** Sends the debrief to the teacher and the class's co-teachers. */
export function useEmailDebrief(sessionId: string) {
  return useMutation<DebriefEmailResponse, ApiRequestError>({
    mutationFn: () => apiClient.post<DebriefEmailResponse>(apiPaths.debriefEmail(sessionId)),
  });
}
