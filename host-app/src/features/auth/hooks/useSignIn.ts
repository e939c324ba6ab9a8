import type { MeDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { useSignOutStore } from '@/stores/useSignOutStore';
import { meQueryKey } from '../utils/meQueryKey';

export interface SignInInput {
  email: string;
  password: string;
}

export function useSignIn() {
  const queryClient = useQueryClient();
  const clearSignedOut = useSignOutStore((s) => s.clear);
  return useMutation<MeDto, ApiRequestError, SignInInput>({
    mutationFn: (input) => apiClient.post<MeDto>(apiPaths.signIn, input),
    onSuccess: (me) => {
      clearSignedOut();
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
