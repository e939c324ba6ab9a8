const id = (value: string): string => encodeURIComponent(value);

/** REST endpoints of the Covalent server, relative to the app's origin (Vite proxies `/api`). */
export const apiPaths = {
  me: '/api/me',
  signIn: '/api/auth/sign-in',
  signOut: '/api/auth/sign-out',
  passwordResetRequests: '/api/auth/password-reset-requests',
  passwordReset: '/api/auth/password-reset',
  acceptInvitation: '/api/auth/invitations/accept',
  staff: '/api/admin/users',
  staffInvitations: '/api/admin/users/invitations',
  staffDeactivate: (userId: string) => `/api/admin/users/${id(userId)}/deactivate`,
  staffReactivate: (userId: string) => `/api/admin/users/${id(userId)}/reactivate`,
} as const;
