import type { CatchupSummaryDto } from '@covalent/shared-types';
import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import type { ApiRequestError } from '@/api/client';
import { useInvalidateCatchups } from './useInvalidateCatchups';

/** Closes one catch-up so students can no longer open it; closing twice is harmless. */
export function useCloseCatchup(sessionId: string) {
  const invalidate = useInvalidateCatchups(sessionId);
  return useMutation<CatchupSummaryDto, ApiRequestError, string>({
    mutationFn: (catchupId) => apiClient.post<CatchupSummaryDto>(apiPaths.catchupClose(sessionId, catchupId)),
    onSuccess: () => invalidate(),
  });
}
