import type { BankDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

export interface CreateBankInput {
  title: string;
  description?: string;
  tags?: string[];
}

export function useCreateBank() {
  const queryClient = useQueryClient();
  return useMutation<BankDto, ApiRequestError, CreateBankInput>({
    mutationFn: (input) => apiClient.post<BankDto>(apiPaths.bankCreate, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bankQueryKeys.all }),
  });
}
