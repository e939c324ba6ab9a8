import type { BankDetailDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

/** One bank with its items and (for its owner) its shares. */
export function useBank(bankId: string) {
  return useQuery({
    queryKey: bankQueryKeys.detail(bankId),
    queryFn: () => apiClient.get<BankDetailDto>(apiPaths.bank(bankId)),
  });
}
