import { QueryClient } from '@tanstack/react-query';
import { ApiRequestError } from '@/api/client';

/** Retry only what a retry can fix: network trouble and 5xx, never a 4xx answer. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiRequestError && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { retry: shouldRetry, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
}
