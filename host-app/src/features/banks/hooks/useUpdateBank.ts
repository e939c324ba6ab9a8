import type { BankDetailDto, BankDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

export interface UpdateBankInput {
  title?: string;
  description?: string;
  tags?: string[];
  standardsCode?: string | null;
}

/** PATCH a bank's details; the open bank keeps its items and shares. */
export function useUpdateBank(bankId: string) {
  const queryClient = useQueryClient();
  return useMutation<BankDto, ApiRequestError, UpdateBankInput>({
    mutationFn: (input) => apiClient.patch<BankDto>(apiPaths.bank(bankId), input),
    onSuccess: (bank) => {
      queryClient.setQueryData<BankDetailDto>(bankQueryKeys.detail(bankId), (old) => (old ? { ...old, ...bank } : old));
      void queryClient.invalidateQueries({ queryKey: ['banks', 'list'] });
    },
  });
}
