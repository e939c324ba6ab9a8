import type { StaffUserDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { staffQueryKey } from '../utils/staffQueryKey';

/** The teachers and admins of the admin's school. */
export function useStaff() {
  return useQuery({ queryKey: staffQueryKey, queryFn: () => apiClient.get<StaffUserDto[]>(apiPaths.staff) });
}
