import type { BankDetailDto, ItemDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';
import type { ItemRequestBody } from '../utils/itemRequestBody';

export interface SaveItemInput {
  /** Absent for a new item. */
  itemId?: string;
  body: ItemRequestBody;
}

/** POST a new item or PUT an edited one; the open bank's list is updated in place. */
export function useSaveItem(bankId: string) {
  const queryClient = useQueryClient();
  return useMutation<ItemDto, ApiRequestError, SaveItemInput>({
    mutationFn: ({ itemId, body }) =>
      itemId
        ? apiClient.put<ItemDto>(apiPaths.bankItem(bankId, itemId), body)
        : apiClient.post<ItemDto>(apiPaths.bankItems(bankId), body),
    onSuccess: (saved) => {
      queryClient.setQueryData<BankDetailDto>(bankQueryKeys.detail(bankId), (old) => {
        if (!old) return old;
        const exists = old.items.some((i) => i.id === saved.id);
        const items = exists ? old.items.map((i) => (i.id === saved.id ? saved : i)) : [...old.items, saved];
        return { ...old, items, itemCount: items.length };
      });
      void queryClient.invalidateQueries({ queryKey: ['banks', 'list'] });
    },
  });
}
