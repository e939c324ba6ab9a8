import type { MeDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { useSignOutStore } from '@/stores/useSignOutStore';
import { meQueryKey } from '../utils/meQueryKey';

export interface AcceptInvitationInput {
  token: string;
  password: string;
  displayName?: string;
}

/** Activates an invited teacher's account; the server signs them in. */
export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  const clearSignedOut = useSignOutStore((s) => s.clear);
  return useMutation<MeDto, ApiRequestError, AcceptInvitationInput>({
    mutationFn: (input) => apiClient.post<MeDto>(apiPaths.acceptInvitation, input),
    onSuccess: (me) => {
      clearSignedOut();
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
