import type { StaffUserDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { staffQueryKey } from '../utils/staffQueryKey';

export interface InviteTeacherInput {
  email: string;
  displayName: string;
}

/** Creates an account and e-mails its invitation link. */
export function useInviteTeacher() {
  const queryClient = useQueryClient();
  return useMutation<StaffUserDto, ApiRequestError, InviteTeacherInput>({
    mutationFn: (input) => apiClient.post<StaffUserDto>(apiPaths.staffInvitations, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffQueryKey }),
  });
}
