import type { SchoolSettingsDto, UpdateSchoolSettingsRequest } from '@covalent/shared-types';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { schoolQueryKey } from '../utils/schoolQueryKey';

/** Changes how long the school keeps player data; the server answers with the saved settings. */
export function useUpdateSchoolSettings() {
  const queryClient = useQueryClient();
  return useMutation<SchoolSettingsDto, ApiRequestError, UpdateSchoolSettingsRequest>({
    mutationFn: (body) => apiClient.patch<SchoolSettingsDto>(apiPaths.adminSchool, body),
    onSuccess: (saved) => queryClient.setQueryData(schoolQueryKey, saved),
  });
}
