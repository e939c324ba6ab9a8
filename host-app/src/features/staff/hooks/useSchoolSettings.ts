import type { SchoolSettingsDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { schoolQueryKey } from '../utils/schoolQueryKey';

/** The admin's school and how long it keeps player data. */
export function useSchoolSettings() {
  return useQuery({ queryKey: schoolQueryKey, queryFn: () => apiClient.get<SchoolSettingsDto>(apiPaths.adminSchool) });
}
