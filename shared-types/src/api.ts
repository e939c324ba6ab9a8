/** Roles of signed-in staff (DESIGN.md §2). Players never have accounts. */
export const ROLES = ['admin', 'teacher'] as const;
/** One of {@link ROLES}. */
export type Role = (typeof ROLES)[number];

/** The one error shape of every REST error response and every failed socket ack. */
export interface ApiError {
  ok: false;
  /** A stable machine-readable code, e.g. `validation_failed`, `forbidden`, `not_found`. */
  error: string;
  /** A sentence a teacher can read. */
  message: string;
  /** Field-level problems, when the error is about input. */
  details?: { field: string; message: string }[];
}

/** The signed-in user, as `GET /api/me` returns it. */
export interface MeDto {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  school: { id: string; name: string };
}

/** A teacher of the admin's school, as the admin's user list shows it. */
export interface StaffUserDto {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  active: boolean;
  /** False until an invited teacher has set a password. */
  activated: boolean;
  createdAt: string;
}

/** `GET`/`PATCH /api/admin/school`: the admin's own school and how long it keeps player data. */
export interface SchoolSettingsDto {
  id: string;
  name: string;
  /** Days nicknames and responses are kept after a session ends; a daily job deletes older ones. */
  retentionDays: number;
}

/** Bounds of {@link SchoolSettingsDto.retentionDays}, as the server checks them. */
export const RETENTION_DAYS_MIN = 1;
export const RETENTION_DAYS_MAX = 3650;

/** `PATCH /api/admin/school` body. */
export interface UpdateSchoolSettingsRequest {
  retentionDays: number;
}

/** `GET /api/auth/config`: what the sign-in page needs to know before it draws. */
export interface AuthConfigDto {
  /** Whether "Sign in with school account" is offered (OIDC_ISSUER is set). */
  signOn: boolean;
}

/** Why a school sign-on ended on the sign-in page (`/sign-in?error=<code>`); the host app turns each into a sentence. */
export const SIGN_ON_ERRORS = [
  'sign_on_expired',
  'state_mismatch',
  'sign_on_cancelled',
  'provider_error',
  'provider_unreachable',
  'sign_on_invalid',
  'email_missing',
  'email_unverified',
  'no_account',
  'account_deactivated',
] as const;
/** One of {@link SIGN_ON_ERRORS}. */
export type SignOnError = (typeof SIGN_ON_ERRORS)[number];
