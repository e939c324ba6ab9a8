import { useQuery } from '@tanstack/react-query';
import { apiClient } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';
import { authConfigQueryKey } from '../utils/authConfigQueryKey';

/** `GET /api/auth/config`: what the sign-in page may offer. */
export interface AuthConfig {
  /** Whether the server has school sign-on (OpenID Connect) set up. */
  signOn: boolean;
}

/** The server's sign-in options; they only change with a server restart. */
export function useAuthConfig() {
  return useQuery({
    queryKey: authConfigQueryKey,
    queryFn: () => apiClient.get<AuthConfig>(apiPaths.authConfig),
    staleTime: Infinity,
  });
}
