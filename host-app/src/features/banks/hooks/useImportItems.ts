import type { ImportResultDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

/** Appends a CSV file's items to a bank the teacher may edit. */
export function useImportItems(bankId: string) {
  const queryClient = useQueryClient();
  return useMutation<ImportResultDto, ApiRequestError, File>({
    mutationFn: (file) => {
      const form = new FormData();
      form.append('file', file);
      return apiClient.upload<ImportResultDto>(apiPaths.bankItemsImport(bankId), form);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bankQueryKeys.all }),
  });
}
