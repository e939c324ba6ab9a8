import type { BankDetailDto, ItemDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

/** PUT the bank's new item order (every item id once); the server answers with the list. */
export function useReorderItems(bankId: string) {
  const queryClient = useQueryClient();
  return useMutation<ItemDto[], ApiRequestError, string[]>({
    mutationFn: (itemIds) => apiClient.put<ItemDto[]>(apiPaths.bankItemsOrder(bankId), { itemIds }),
    onSuccess: (items) =>
      queryClient.setQueryData<BankDetailDto>(bankQueryKeys.detail(bankId), (old) => (old ? { ...old, items } : old)),
  });
}
