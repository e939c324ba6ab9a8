import type { MeDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { useSignOutStore } from '@/stores/useSignOutStore';
import { meQueryKey } from '../utils/meQueryKey';

export interface ResetPasswordInput {
  token: string;
  password: string;
}

/** Sets a new password from an e-mailed link; the server signs the user in. */
export function useResetPassword() {
  const queryClient = useQueryClient();
  const clearSignedOut = useSignOutStore((s) => s.clear);
  return useMutation<MeDto, ApiRequestError, ResetPasswordInput>({
    mutationFn: (input) => apiClient.post<MeDto>(apiPaths.passwordReset, input),
    onSuccess: (me) => {
      clearSignedOut();
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
