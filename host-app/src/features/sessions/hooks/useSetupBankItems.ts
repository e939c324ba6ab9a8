import type { ItemDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';

/** A bank's items in bank order, once a bank is chosen. */
export function useSetupBankItems(bankId: string) {
  return useQuery({
    queryKey: ['sessions', 'setup', 'bank-items', bankId],
    queryFn: () => apiClient.get<ItemDto[]>(apiPaths.bankItems(bankId)),
    enabled: bankId !== '',
    select: (items) => [...items].sort((a, b) => a.position - b.position),
  });
}
