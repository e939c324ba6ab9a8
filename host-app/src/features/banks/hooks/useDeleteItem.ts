import type { BankDetailDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

export function useDeleteItem(bankId: string) {
  const queryClient = useQueryClient();
  return useMutation<void, ApiRequestError, string>({
    mutationFn: (itemId) => apiClient.delete<void>(apiPaths.bankItem(bankId, itemId)),
    onSuccess: (_, itemId) => {
      queryClient.setQueryData<BankDetailDto>(bankQueryKeys.detail(bankId), (old) => {
        if (!old) return old;
        const items = old.items.filter((i) => i.id !== itemId).map((i, position) => ({ ...i, position }));
        return { ...old, items, itemCount: items.length };
      });
      void queryClient.invalidateQueries({ queryKey: ['banks', 'list'] });
    },
  });
}
