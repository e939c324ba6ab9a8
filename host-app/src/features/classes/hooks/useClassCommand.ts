import type { ClassDetailDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApiRequestError } from '@/api/client';
import { classQueryKeys } from '../utils/classQueryKeys';

/**
 * A change to one class whose answer is not the whole class (a roster row, a pair, a 204):
 * afterwards the open class and the lists are fetched again, so counts stay right.
 */
export function useClassCommand<TInput, TResult = unknown>(classId: string, run: (input: TInput) => Promise<TResult>) {
  const queryClient = useQueryClient();
  return useMutation<TResult, ApiRequestError, TInput>({
    mutationFn: run,
    onSuccess: (result) => {
      if (isClassDetail(result, classId)) queryClient.setQueryData(classQueryKeys.detail(classId), result);
      return queryClient.invalidateQueries({ queryKey: classQueryKeys.all });
    },
  });
}

function isClassDetail(value: unknown, classId: string): value is ClassDetailDto {
  return typeof value === 'object' && value !== null && (value as ClassDetailDto).id === classId && Array.isArray((value as ClassDetailDto).roster);
}
