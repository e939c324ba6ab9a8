import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { useSignOutStore } from '@/stores/useSignOutStore';
import { meQueryKey } from '../utils/meQueryKey';

/** Ends the session; the sign-in guard then shows the sign-in page. */
export function useSignOut() {
  const queryClient = useQueryClient();
  const markSignedOut = useSignOutStore((s) => s.markSignedOut);
  return useMutation<void, ApiRequestError, void>({
    mutationFn: () => apiClient.post<void>(apiPaths.signOut),
    onSuccess: () => {
      markSignedOut();
      // Nothing of this user's data stays in memory on a shared classroom computer.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== meQueryKey[0] });
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}
