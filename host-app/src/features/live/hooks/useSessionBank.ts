import type { BankDetailDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';

/** The session's bank with its items, for the lab-safety caution (the live view carries no tags). */
export function useSessionBank(bankId: string | undefined) {
  return useQuery({
    queryKey: ['live', 'bank', bankId],
    queryFn: () => apiClient.get<BankDetailDto>(apiPaths.bank(bankId!)),
    enabled: bankId !== undefined,
    staleTime: 5 * 60_000,
  });
}
