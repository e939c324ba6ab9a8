import { useMutation } from '@tanstack/react-query';
import { apiClient, type ApiRequestError } from '@/api/client';
import { apiPaths } from '@/api/apiPaths';

/** The server answers 202 whether or not the address has an account. */
export interface PasswordResetRequested {
  ok: true;
  message: string;
}

export function useRequestPasswordReset() {
  return useMutation<PasswordResetRequested, ApiRequestError, { email: string }>({
    mutationFn: (input) => apiClient.post<PasswordResetRequested>(apiPaths.passwordResetRequests, input),
  });
}
