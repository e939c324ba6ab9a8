import type { ImportResultDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { bankQueryKeys } from '../utils/bankQueryKeys';

export interface ImportBankInput {
  file: File;
  /** Defaults on the server to the file's name. */
  title?: string;
}

/** A new bank from a CSV file; every row is checked first and nothing is written on a problem. */
export function useImportBank() {
  const queryClient = useQueryClient();
  return useMutation<ImportResultDto, ApiRequestError, ImportBankInput>({
    mutationFn: ({ file, title }) => {
      const form = new FormData();
      form.append('file', file);
      if (title) form.append('title', title);
      return apiClient.upload<ImportResultDto>(apiPaths.bankImport, form);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bankQueryKeys.all }),
  });
}
