import type { MeDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient, ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { meQueryKey } from '../utils/meQueryKey';

async function fetchMe(): Promise<MeDto | null> {
  try {
    return await apiClient.get<MeDto>(apiPaths.me);
  } catch (error) {
    // 401 is an answer, not a failure: nobody is signed in.
    if (error instanceof ApiRequestError && error.status === 401) return null;
    throw error;
  }
}

/** The signed-in teacher or admin, or `null` when signed out. */
export function useMe() {
  return useQuery({ queryKey: meQueryKey, queryFn: fetchMe, staleTime: 60_000 });
}
