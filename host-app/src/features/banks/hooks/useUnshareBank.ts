import type { BankDetailDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

export function useUnshareBank(bankId: string) {
  const queryClient = useQueryClient();
  return useMutation<void, ApiRequestError, string>({
    mutationFn: (userId) => apiClient.delete<void>(apiPaths.bankShare(bankId, userId)),
    onSuccess: (_, userId) =>
      queryClient.setQueryData<BankDetailDto>(bankQueryKeys.detail(bankId), (old) =>
        old ? { ...old, shares: old.shares.filter((s) => s.userId !== userId) } : old,
      ),
  });
}
