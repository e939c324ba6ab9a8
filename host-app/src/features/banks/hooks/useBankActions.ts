import type { BankDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

export type BankAction = 'duplicate' | 'archive' | 'unarchive' | 'delete';

export interface BankActionInput {
  bankId: string;
  action: BankAction;
}

function run({ bankId, action }: BankActionInput): Promise<BankDto | undefined> {
  switch (action) {
    case 'duplicate':
      return apiClient.post<BankDto>(apiPaths.bankDuplicate(bankId), {});
    case 'archive':
      return apiClient.post<BankDto>(apiPaths.bankArchive(bankId));
    case 'unarchive':
      return apiClient.post<BankDto>(apiPaths.bankUnarchive(bankId));
    case 'delete':
      return apiClient.delete<undefined>(apiPaths.bank(bankId));
  }
}

/** Duplicate, archive, unarchive or delete a bank from the list. */
export function useBankActions() {
  const queryClient = useQueryClient();
  return useMutation<BankDto | undefined, ApiRequestError, BankActionInput>({
    mutationFn: run,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bankQueryKeys.all }),
  });
}
