import type { ClassDetailDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { classQueryKeys } from '../utils/classQueryKeys';

export interface ClassDetailsInput {
  name: string;
  period: string;
  term: string;
}

export function useCreateClass() {
  const queryClient = useQueryClient();
  return useMutation<ClassDetailDto, ApiRequestError, ClassDetailsInput>({
    mutationFn: (input) => apiClient.post<ClassDetailDto>(apiPaths.classCreate, input),
    onSuccess: (cls) => {
      queryClient.setQueryData(classQueryKeys.detail(cls.id), cls);
      void queryClient.invalidateQueries({ queryKey: ['classes', 'list'] });
    },
  });
}
