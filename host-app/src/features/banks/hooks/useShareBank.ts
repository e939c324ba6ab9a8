import type { BankDetailDto, ShareAccess } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

export interface ShareBankInput {
  email: string;
  access: ShareAccess;
}

/** Shares the bank with a colleague of the same school (or changes their access). */
export function useShareBank(bankId: string) {
  const queryClient = useQueryClient();
  return useMutation<BankDetailDto, ApiRequestError, ShareBankInput>({
    mutationFn: (input) => apiClient.post<BankDetailDto>(apiPaths.bankShares(bankId), input),
    onSuccess: (bank) => queryClient.setQueryData(bankQueryKeys.detail(bankId), bank),
  });
}
