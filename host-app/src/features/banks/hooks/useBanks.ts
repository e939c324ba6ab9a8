import type { BankDto } from '@covalent/shared-types';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths, type BankListQuery } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

/** Banks the teacher owns or has a share of, filtered and sorted by the server. */
export function useBanks(query: BankListQuery) {
  return useQuery({
    queryKey: bankQueryKeys.list(query),
    queryFn: () => apiClient.get<BankDto[]>(apiPaths.banks(query)),
    // Keep the table on screen while a new filter loads, so it does not flash empty.
    placeholderData: keepPreviousData,
  });
}
