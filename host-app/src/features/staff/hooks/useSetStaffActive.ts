import type { StaffUserDto } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { staffQueryKey } from '../utils/staffQueryKey';

export interface SetStaffActiveInput {
  userId: string;
  active: boolean;
}

/** Deactivates (signs out everywhere, blocks sign-in) or reactivates one account. */
export function useSetStaffActive() {
  const queryClient = useQueryClient();
  return useMutation<StaffUserDto, ApiRequestError, SetStaffActiveInput>({
    mutationFn: ({ userId, active }) =>
      apiClient.post<StaffUserDto>(active ? apiPaths.staffReactivate(userId) : apiPaths.staffDeactivate(userId)),
    onSuccess: (updated) => {
      queryClient.setQueryData<StaffUserDto[]>(staffQueryKey, (list) =>
        list?.map((user) => (user.id === updated.id ? updated : user)),
      );
    },
  });
}
