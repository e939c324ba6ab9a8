import type { AuthConfigDto } from '@covalent/shared-types';
import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { authConfigQueryKey } from '../utils/authConfigQueryKey';

/** The server's sign-in options; they only change with a server restart. */
export function useAuthConfig() {
  return useQuery({
    queryKey: authConfigQueryKey,
    queryFn: () => apiClient.get<AuthConfigDto>(apiPaths.authConfig),
    staleTime: Infinity,
  });
}
